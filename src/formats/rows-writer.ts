// Write table rows as TSV (the table-rows input format), optionally with `source` and `score` columns.
import type { TableRow } from '../core/lexicon/entry.ts'
import { ProblemError } from '../core/lexicon/problem.ts'

/** Where a form comes from: listed by the dictionary, or predicted/guessed by the model (a hypothesis). */
export type FormSource = 'attested' | 'predicted' | 'guessed'

/** A row to write; `source` and `score` are needed when the scores columns are asked for. */
export interface WritableRow extends TableRow {
  source?: FormSource
  score?: number
}

export interface RowsWriteOptions {
  /** Add `source` and `score` columns after FEATS. */
  scores?: boolean
  /** Lines written first as `# ` comments (the reader ignores them). */
  comments?: string[]
}

const BREAKS_TSV = /[\t\n\r]/

/**
 * One TSV line (no line break). A field holding a tab or line break cannot be written and throws.
 * @example formatTableRow({ lemma: 'vessa', form: 'vessat', upos: 'NOUN', feats: 'Number=Plur', source: 'predicted', score: 0.8125 }, { scores: true })
 * // 'vessa\tvessat\tNOUN\tNumber=Plur\tpredicted\t0.8125'
 */
export function formatTableRow(row: WritableRow, options: RowsWriteOptions = {}): string {
  const fields = [row.lemma, row.form, row.upos, row.feats]
  for (const field of fields) {
    if (BREAKS_TSV.test(field)) {
      const message = `cannot write "${field}" as a TSV field: it holds a tab or line break`
      throw new ProblemError({ code: 'control-char', message })
    }
  }
  if (options.scores) {
    if (row.source === undefined || row.score === undefined) {
      throw new TypeError(`row ${row.lemma}/${row.form} has no source or score to write`)
    }
    fields.push(row.source, formatScore(row.score))
  }
  return fields.join('\t')
}

/**
 * A score with at most four decimals and no exponent (`0.8125`, `1`, `0`).
 * @example formatScore(2 / 3) // '0.6667'
 */
export function formatScore(score: number): string {
  if (!Number.isFinite(score)) throw new TypeError(`score ${score} is not a finite number`)
  return (Math.round(score * 10_000) / 10_000).toFixed(4).replace(/\.?0+$/, '')
}

/**
 * The lines of a TSV file, each ending in LF: comments first, then one line per row.
 * @example for (const chunk of writeTableRows(rows, { scores: true })) stdout.write(chunk)
 */
export function* writeTableRows(
  rows: Iterable<WritableRow>,
  options: RowsWriteOptions = {},
): Generator<string> {
  for (const comment of options.comments ?? []) {
    for (const line of comment.split(/\r?\n/)) yield `# ${line}\n`
  }
  for (const row of rows) yield `${formatTableRow(row, options)}\n`
}

/**
 * A whole TSV file as one string.
 * @example tableRowsToTsv([{ lemma: 'vessa', form: 'vessa', upos: 'NOUN', feats: 'Number=Sing' }]) // 'vessa\tvessa\tNOUN\tNumber=Sing\n'
 */
export function tableRowsToTsv(rows: Iterable<WritableRow>, options: RowsWriteOptions = {}): string {
  let out = ''
  for (const chunk of writeTableRows(rows, options)) out += chunk
  return out
}
