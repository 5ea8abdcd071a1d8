// The constraint file a tagger trains from: TSV (header comments, then one row per form) or JSON lines.
import { ProblemError } from '../lexicon/problem.ts'
import {
  allowedSeparator,
  type ConstrainOptions,
  formatAllowed,
  type TypeConstraint,
  UNCONSTRAINED_MARK,
} from './type-constraint.ts'

export type ConstraintFormat = 'tsv' | 'jsonl'

/** What the header says, so a file can be traced back to the model and the run that made it. */
export interface ConstraintFileHeader {
  /** `digest`: a content hash of the model file, when known, so the exact model can be found again. */
  model: { name: string; version: string | number; digest?: string }
  /** The corpus, or null for the whole-lexicon file (every form the model knows). */
  corpus: { file: string; tokens: number; types: number } | null
  options: ConstrainOptions
  /** The lookup's own settings (candidate bound, score floor, guessing), written as given. */
  lookup?: Record<string, string | number | boolean>
}

/** The TSV column names: the line after the header comments; every line after it is a row. */
export const CONSTRAINT_COLUMNS = ['form', 'count', 'source', 'allowed'] as const

const BREAKS_TSV = /[\t\n\r]/

/**
 * The options as one `name=value` line, every option spelled out (defaults too).
 * @example describeOptions({ level: 'upos' }) // 'level=upos min-score=0 sources=attested,predicted,guessed best-source-only=no'
 */
export function describeOptions(options: ConstrainOptions): string {
  const sources = (options.sources ?? ['attested', 'predicted', 'guessed']).join(',')
  const best = options.bestSourceOnly ? 'yes' : 'no'
  return `level=${options.level} min-score=${options.minScore ?? 0} sources=${sources} best-source-only=${best}`
}

/**
 * Lookup settings as one `name=value` line, in the order given.
 * @example describeLookup({ top: 8, guess: true }) // 'top=8 guess=yes'
 */
export function describeLookup(lookup: Record<string, string | number | boolean>): string {
  const value = (v: string | number | boolean) => (v === true ? 'yes' : v === false ? 'no' : String(v))
  return Object.entries(lookup)
    .map(([k, v]) => `${k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}=${value(v)}`)
    .join(' ')
}

/**
 * The header comment lines of the TSV file (each `# …`), ending with the column-name line.
 * @example constraintHeaderLines(header)[1] // '# model: english, version 3'
 */
export function constraintHeaderLines(header: ConstraintFileHeader): string[] {
  const { model, corpus, options } = header
  const sep = allowedSeparator(options.level)
  const tags = options.level === 'upos' ? 'UPOS tags' : 'UPOS|FEATS tags'
  return [
    '# formfold constraint file',
    `# model: ${oneLine(model.name)}, version ${model.version}${model.digest ? `, ${model.digest}` : ''}`,
    corpus
      ? `# corpus: ${oneLine(corpus.file)}, ${corpus.tokens} tokens, ${corpus.types} form types`
      : '# corpus: none; every form the model knows (count 0)',
    `# options: ${describeOptions(options)}`,
    ...(header.lookup ? [`# lookup: ${describeLookup(header.lookup)}`] : []),
    `# allowed: ${tags} joined with "${sep}"; "${UNCONSTRAINED_MARK}" = unconstrained, every tag allowed (no candidate)`,
    '# source: best source of the form analyses (attested, predicted or guessed; predicted and guessed are hypotheses), none = no candidate',
    CONSTRAINT_COLUMNS.join('\t'),
  ]
}

/**
 * One TSV row (no line break). A form holding a tab or line break cannot be written and throws.
 * @example formatConstraintRow({ form: 'vessat', count: 3, source: 'predicted', allowed: ['NOUN'], analyses: [] }, 'upos') // 'vessat\t3\tpredicted\tNOUN'
 */
export function formatConstraintRow(row: TypeConstraint, level: ConstrainOptions['level']): string {
  if (BREAKS_TSV.test(row.form)) {
    const message = `cannot write form "${row.form}" as a TSV field: it holds a tab or line break`
    throw new ProblemError({ code: 'control-char', message })
  }
  return `${row.form}\t${row.count}\t${row.source}\t${formatAllowed(row.allowed, level)}`
}

/**
 * One JSON line of a row: `allowed` is null when unconstrained; analyses carry source and score.
 * @example constraintJson(row) // '{"form":"vessat","count":3,"source":"predicted","allowed":["NOUN"],"analyses":[…]}'
 */
export function constraintJson(row: TypeConstraint): string {
  const analyses = row.analyses.map((a) => ({ ...a, score: Math.round(a.score * 10_000) / 10_000 }))
  return JSON.stringify({
    form: row.form,
    count: row.count,
    source: row.source,
    allowed: row.allowed,
    analyses,
  })
}

/**
 * The lines of a constraint file, each ending in LF. TSV: header comments, the column names, one row
 * per form. JSON lines: a first `{"meta":…}` line with the same header facts, then one object per form.
 * @example for (const chunk of writeConstraintFile(rows, header, 'tsv')) out.write(chunk)
 */
export function* writeConstraintFile(
  rows: Iterable<TypeConstraint>,
  header: ConstraintFileHeader,
  format: ConstraintFormat = 'tsv',
): Generator<string> {
  if (format === 'tsv') {
    for (const line of constraintHeaderLines(header)) yield `${line}\n`
    for (const row of rows) yield `${formatConstraintRow(row, header.options.level)}\n`
    return
  }
  const meta = {
    format: 'formfold constraints',
    model: header.model,
    corpus: header.corpus,
    options: { ...header.options, described: describeOptions(header.options) },
    lookup: header.lookup ?? null,
    allowed: 'tags at the level; null = unconstrained, every tag allowed (no candidate)',
  }
  yield `${JSON.stringify({ meta })}\n`
  for (const row of rows) yield `${constraintJson(row)}\n`
}

function oneLine(text: string): string {
  return text.replace(/[\r\n\t]+/g, ' ')
}
