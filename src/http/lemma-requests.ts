// The lemma list of an expansion request, from JSON items or a lemma-list TSV body, checked like any lexicon line.
import type { Problem } from '../core/lexicon/problem.ts'
import { checkFeats, checkUpos, checkWord } from '../formats/fields.ts'
import { readLemmaList } from '../formats/lemma-list.ts'
import { MAX_PROBLEM_EXAMPLES } from '../formats/read-summary.ts'
import { ApiError, tooLarge } from './api-error.ts'
import { MAX_EXPAND_LEMMAS } from './limits.ts'

/** One lemma to expand: its UPOS and inherent features (`_` for none). */
export interface LemmaRequest {
  lemma: string
  upos: string
  feats: string
}

/** The 422 for a list with bad items: how many, and the first few with their line (or item) numbers. */
function badList(problems: Problem[], count: number): ApiError {
  const first = problems[0]!
  const where = first.line ? `line ${first.line}: ` : ''
  return new ApiError(422, first.code, `${count} bad line(s) in the lemma list; ${where}${first.message}`, {
    count,
    problems: problems.slice(0, MAX_PROBLEM_EXAMPLES),
  })
}

function checkCount(n: number): void {
  if (n > MAX_EXPAND_LEMMAS) throw tooLarge(`a list of ${n} lemmas`, MAX_EXPAND_LEMMAS, 'formfold expand')
}

/**
 * JSON items as lemma requests: each checked and canonicalized (NFC lemma, known UPOS, canonical FEATS);
 * problems carry the 1-based item number as `line`.
 * @example lemmasFromJson([{ lemma: 'vessa', upos: 'NOUN' }]) // [{ lemma: 'vessa', upos: 'NOUN', feats: '_' }]
 */
export function lemmasFromJson(
  items: readonly { lemma: string; upos: string; feats?: string }[],
): LemmaRequest[] {
  checkCount(items.length)
  const out: LemmaRequest[] = []
  const problems: Problem[] = []
  let bad = 0
  items.forEach((item, i) => {
    const at = { file: 'lemmas', line: i + 1 }
    const lemma = checkWord(item.lemma, 'lemma', at)
    const upos = checkUpos(item.upos, at)
    const feats = checkFeats(item.feats ?? '_', at)
    const problem =
      'problem' in lemma ? lemma.problem : (upos ?? ('problem' in feats ? feats.problem : undefined))
    if (problem) {
      bad++
      if (problems.length < MAX_PROBLEM_EXAMPLES) problems.push(problem)
    } else if (!('problem' in lemma) && !('problem' in feats))
      out.push({ lemma: lemma.value, upos: item.upos, feats: feats.feats })
  })
  if (bad > 0) throw badList(problems, bad)
  return out
}

/**
 * A lemma-list TSV body (`lemma<TAB>upos[<TAB>feats]`) as lemma requests; bad lines (bad UTF-8, NUL,
 * unknown UPOS…) make it a 422 naming their lines.
 * @example await lemmasFromTsv(new TextEncoder().encode('vessa\tNOUN\n'))
 */
export async function lemmasFromTsv(bytes: Uint8Array): Promise<LemmaRequest[]> {
  const read = await readLemmaList(bytes, { file: 'lemmas', skipBad: true })
  if (read.skipped > 0) throw badList(read.problems, read.skipped)
  if (read.entries.length === 0) throw new ApiError(422, 'no-entries', 'the lemma list has no lemmas')
  checkCount(read.entries.length)
  return read.entries.map((e) => ({ lemma: e.lemma, upos: e.upos, feats: e.feats }))
}
