// Constraints for a corpus (counted per form type, then each type analyzed once) or for a whole lexicon.
import type { Analyzer } from './analyzer.ts'
import type { ConstrainToken } from './constrain-token.ts'
import { type CoverageReport, ReportBuilder, type ReportOptions } from './coverage-report.ts'
import { FormTally } from './form-tally.ts'
import { type ConstrainOptions, constrainForm, type TypeConstraint } from './type-constraint.ts'

/** The result for a corpus: one row per form type, most frequent first, and the report over them. */
export interface CorpusConstraints {
  rows: TypeConstraint[]
  report: CoverageReport
  tally: FormTally
}

/** Called every `PROGRESS_EVERY` tokens while counting and every `PROGRESS_EVERY` types while analyzing. */
export type ProgressListener = (phase: 'count' | 'analyze', done: number, total?: number) => void

/** How often progress is reported (tokens or types). */
export const PROGRESS_EVERY = 100_000

/**
 * Count a token stream into a tally (memory grows with form types, not tokens).
 * @example const tally = await countTokens(sentences.flatMap(sentenceTokens))
 */
export async function countTokens(
  tokens: Iterable<ConstrainToken> | AsyncIterable<ConstrainToken>,
  tally: FormTally = new FormTally(),
  onProgress?: ProgressListener,
): Promise<FormTally> {
  for await (const token of tokens) {
    tally.add(token)
    if (onProgress && tally.tokens % PROGRESS_EVERY === 0) onProgress('count', tally.tokens)
  }
  return tally
}

/**
 * The constraint rows of every counted form, most frequent first, made one at a time (so a writer can
 * stream them), each also added to `report`. A form with no candidate gets an explicit unconstrained row.
 * @example
 * const report = new ReportBuilder()
 * for (const row of constraintRows(tally, analyzer, { level: 'upos' }, report)) out.write(formatConstraintRow(row, 'upos'))
 * report.finish()
 */
export function* constraintRows(
  tally: FormTally,
  analyzer: Analyzer,
  options: ConstrainOptions,
  report?: ReportBuilder,
  onProgress?: ProgressListener,
): Generator<TypeConstraint> {
  let done = 0
  for (const [form, stats] of tally.byFrequency()) {
    const contexts = { plain: stats.count > stats.initial, initial: stats.initial > 0 }
    const row = constrainForm(analyzer, form, contexts, options, stats.count)
    report?.add(row, stats)
    yield row
    if (onProgress && ++done % PROGRESS_EVERY === 0) onProgress('analyze', done, tally.types)
  }
}

/**
 * All rows of a tally at once, with the report. Nothing is dropped: unconstrained forms have rows.
 * @example constrainTally(tally, analyzer, { level: 'upos' }).report.tokens.coverage // 0.97
 */
export function constrainTally(
  tally: FormTally,
  analyzer: Analyzer,
  options: ConstrainOptions & ReportOptions,
  onProgress?: ProgressListener,
): CorpusConstraints {
  const report = new ReportBuilder(options)
  const rows = [...constraintRows(tally, analyzer, options, report, onProgress)]
  return { rows, report: report.finish(), tally }
}

/**
 * Count a corpus and constrain every form type in it: `countTokens` then `constrainTally`.
 * @example
 * const { rows, report } = await constrainCorpus(tokens, analyzer, { level: 'upos', excludeGold: ['PUNCT'] })
 */
export async function constrainCorpus(
  tokens: Iterable<ConstrainToken> | AsyncIterable<ConstrainToken>,
  analyzer: Analyzer,
  options: ConstrainOptions & ReportOptions,
  onProgress?: ProgressListener,
): Promise<CorpusConstraints> {
  const tally = await countTokens(tokens, new FormTally(), onProgress)
  return constrainTally(tally, analyzer, options, onProgress)
}

/**
 * The whole-lexicon constraints: one row per distinct form the model knows (count 0: no corpus), in the
 * order given, each analyzed as a form in running text (not sentence-initial).
 * @example for (const row of lexiconConstraints(modelForms, analyzer, { level: 'upos' })) write(row)
 */
export function* lexiconConstraints(
  forms: Iterable<string>,
  analyzer: Analyzer,
  options: ConstrainOptions,
): Generator<TypeConstraint> {
  const seen = new Set<string>()
  for (const form of forms) {
    if (seen.has(form)) continue
    seen.add(form)
    yield constrainForm(analyzer, form, { plain: true, initial: false }, options, 0)
  }
}

/**
 * A form → allowed tags function over a corpus's rows; a form not among them (a word inside a multi-word
 * token) is analyzed on first use, as in running text, and remembered.
 * @example const allowedOf = allowedLookup(rows, analyzer, options); allowedOf('vessat') // ['NOUN']
 */
export function allowedLookup(
  rows: readonly TypeConstraint[],
  analyzer: Analyzer,
  options: ConstrainOptions,
): (form: string) => readonly string[] | null {
  const known = new Map<string, readonly string[] | null>(rows.map((row) => [row.form, row.allowed]))
  return (form) => {
    let allowed = known.get(form)
    if (allowed === undefined) {
      allowed = constrainForm(analyzer, form, { plain: true, initial: false }, options, 0).allowed
      known.set(form, allowed)
    }
    return allowed
  }
}
