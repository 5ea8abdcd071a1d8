// Lemma lists `.tsv`: `lemma<TAB>upos[<TAB>inherent feats]`, dictionary words with no table.
import type { Entry } from '../core/lexicon/entry.ts'
import { checkFeats, checkUpos, checkWord, type LineResult, problemAt, type Where } from './fields.ts'
import type { TextInput } from './input.ts'
import type { ReadOptions, ReadSummary } from './read-summary.ts'
import { streamRecords } from './record-reader.ts'
import { isTsvNonData } from './table-rows.ts'

/**
 * Parse one line of a lemma list into a lemma-only entry (no `forms`).
 * @example parseLemmaLine('vessa\tNOUN\tGender=Fem', at).value // { lemma: 'vessa', upos: 'NOUN', feats: 'Gender=Fem', … }
 */
export function parseLemmaLine(text: string, at: Where): LineResult<Entry> {
  if (isTsvNonData(text)) return null
  const cols = text.split('\t')
  if (cols.length < 2 || cols.length > 3) {
    const message = `expected 2 or 3 tab-separated columns (lemma, upos[, feats]), found ${cols.length}`
    return { problem: problemAt('bad-columns', message, at) }
  }
  const [rawLemma, upos, rawFeats = '_'] = cols as [string, string, string?]
  const lemma = checkWord(rawLemma, 'lemma', at)
  if ('problem' in lemma) return lemma
  const badUpos = checkUpos(upos, at)
  if (badUpos) return { problem: badUpos }
  const feats = checkFeats(rawFeats, at)
  if ('problem' in feats) return feats
  return {
    value: { lemma: lemma.value, upos, feats: feats.feats, file: at.file, line: at.line },
    languageSpecific: feats.languageSpecific,
  }
}

/**
 * Read a whole lemma list. Throws `ProblemError` at the first bad line unless `skipBad`.
 * For a list too big to hold, stream it: `streamRecords(input, parseLemmaLine, options)`.
 * @example const { entries } = await readLemmaList('vessa\tNOUN\n', { file: 'lemmas.tsv' })
 */
export async function readLemmaList(
  input: TextInput,
  options: ReadOptions,
): Promise<ReadSummary & { entries: Entry[] }> {
  const reader = streamRecords(input, parseLemmaLine, options)
  const entries: Entry[] = []
  for await (const entry of reader) entries.push(entry)
  return { ...reader.summary, entries }
}
