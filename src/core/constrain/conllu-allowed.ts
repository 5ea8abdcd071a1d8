// CoNLL-U with each word's allowed tags in MISC: the type constraint, coupled with a token tag if given.
import { type Problem, ProblemError } from '../lexicon/problem.ts'
import {
  type CouplingRule,
  coupleConstraints,
  setMiscValue,
  type TokenTagSource,
  tokenTagOf,
} from './coupling.ts'
import { formatAllowed } from './type-constraint.ts'

/** The MISC attribute written unless another name is asked for. */
export const DEFAULT_ALLOWED_KEY = 'Allowed'

export interface AllowedOptions {
  /** Where each word's own tag is read; absent: type constraints alone. */
  tokenTags?: TokenTagSource
  /** MISC attribute to write (default `Allowed`). */
  key?: string
}

/** Words annotated, by the case of the coupling rule that decided them. */
export type RuleCounts = Record<CouplingRule, number>

/** Fresh zero counts. */
export function ruleCounts(): RuleCounts {
  return { intersection: 0, fallback: 0, token: 0, type: 0, unconstrained: 0 }
}

const WORD_ID = /^[1-9][0-9]*$/

/**
 * One CoNLL-U line with the allowed UPOS of its word in MISC (`Allowed=NOUN,VERB`, `Allowed=*` when every
 * tag is allowed). Comments, blank lines, multi-word token ranges and empty nodes pass unchanged; a word
 * inside a multi-word token is constrained by its own FORM. `typeAllowed` gives a form's type constraint.
 * @example
 * annotateConlluLine('1\tvessa\t_\t_\t_\t_\t0\troot\t_\t_', () => ['NOUN'], {}, counts)
 * // { text: '1\tvessa\t_\t_\t_\t_\t0\troot\t_\tAllowed=NOUN' }
 */
export function annotateConlluLine(
  text: string,
  typeAllowed: (form: string) => readonly string[] | null,
  options: AllowedOptions,
  counts: RuleCounts = ruleCounts(),
): { text: string } | { problem: Problem } {
  const tab = text.indexOf('\t')
  if (tab === -1 || !WORD_ID.test(text.slice(0, tab))) return { text }
  const cols = text.split('\t')
  if (cols.length !== 10) {
    return {
      problem: { code: 'bad-conllu', message: `expected 10 tab-separated columns, found ${cols.length}` },
    }
  }
  let tag: string | undefined
  if (options.tokenTags) {
    const found = tokenTagOf(cols[3]!, cols[9]!, options.tokenTags)
    if ('problem' in found) return found
    tag = found.tag
  }
  const coupled = coupleConstraints(typeAllowed(cols[1]!), tag)
  counts[coupled.rule]++
  cols[9] = setMiscValue(cols[9]!, options.key ?? DEFAULT_ALLOWED_KEY, formatAllowed(coupled.allowed, 'upos'))
  return { text: cols.join('\t') }
}

/**
 * Annotate a stream of CoNLL-U lines (without line breaks). A line with a problem goes to `onProblem`,
 * which throws by default; if it returns instead, the line is left out (the caller counts it).
 * @example for await (const line of annotateConllu(lines, allowedOf, { tokenTags: { column: 'upos' } })) out.write(`${line}\n`)
 */
export async function* annotateConllu(
  lines: Iterable<{ text: string; line: number }> | AsyncIterable<{ text: string; line: number }>,
  typeAllowed: (form: string) => readonly string[] | null,
  options: AllowedOptions,
  counts: RuleCounts = ruleCounts(),
  onProblem: (problem: Problem) => void = (problem) => {
    throw new ProblemError(problem)
  },
): AsyncGenerator<string> {
  for await (const item of lines) {
    const result = annotateConlluLine(item.text, typeAllowed, options, counts)
    if ('text' in result) {
      yield result.text
      continue
    }
    onProblem({ ...result.problem, line: item.line })
  }
}
