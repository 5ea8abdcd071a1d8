// Table rows `.tsv`: `lemma<TAB>form<TAB>upos<TAB>feats`, one row per form per cell.
import type { TableRow } from '../core/lexicon/entry.ts'
import { checkFeats, checkUpos, checkWord, type LineResult, problemAt, type Where } from './fields.ts'
import type { TextInput } from './input.ts'
import type { ReadOptions, ReadSummary } from './read-summary.ts'
import { streamRecords } from './record-reader.ts'

/** Is this a line with no data (blank, or a `#` comment) in the TSV formats? */
export function isTsvNonData(text: string): boolean {
  return text.trim() === '' || text.startsWith('#')
}

/**
 * Parse one line of the table-rows format; FEATS come out canonical.
 * @example parseTableRow('vessa\tvessan\tNOUN\tNumber=Sing|Case=Gen', at).value.feats // 'Case=Gen|Number=Sing'
 */
export function parseTableRow(text: string, at: Where): LineResult<TableRow> {
  if (isTsvNonData(text)) return null
  const cols = text.split('\t')
  if (cols.length !== 4) {
    const message = `expected 4 tab-separated columns (lemma, form, upos, feats), found ${cols.length}`
    return { problem: problemAt('bad-columns', message, at) }
  }
  const [rawLemma, rawForm, upos, rawFeats] = cols as [string, string, string, string]
  const lemma = checkWord(rawLemma, 'lemma', at)
  if ('problem' in lemma) return lemma
  const form = checkWord(rawForm, 'form', at)
  if ('problem' in form) return form
  const badUpos = checkUpos(upos, at)
  if (badUpos) return { problem: badUpos }
  const feats = checkFeats(rawFeats, at)
  if ('problem' in feats) return feats
  return {
    value: { lemma: lemma.value, form: form.value, upos, feats: feats.feats, file: at.file, line: at.line },
    languageSpecific: feats.languageSpecific,
  }
}

/**
 * Read a whole table-rows file. Throws `ProblemError` at the first bad line unless `skipBad`.
 * @example const { rows, skipped } = await readTableRows(text, { file: 'tables.tsv' })
 */
export async function readTableRows(
  input: TextInput,
  options: ReadOptions,
): Promise<ReadSummary & { rows: TableRow[] }> {
  const reader = streamRecords(input, parseTableRow, options)
  const rows: TableRow[] = []
  for await (const row of reader) rows.push(row)
  return { ...reader.summary, rows }
}
