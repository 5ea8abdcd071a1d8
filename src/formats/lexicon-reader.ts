// Read any lexicon source (table rows, entries, lemma list) into entries, picking the format by sniffing.
import { type Entry, rowsToEntries, type TableRow } from '../core/lexicon/entry.ts'
import { ProblemError } from '../core/lexicon/problem.ts'
import { parseEntryLine } from './entries-jsonl.ts'
import type { LineParser } from './fields.ts'
import type { TextInput } from './input.ts'
import { parseLemmaLine } from './lemma-list.ts'
import { type LineItem, readLines } from './line-reader.ts'
import { type ReadOptions, type ReadSummary, ReadTally } from './read-summary.ts'
import { peekLines, recordsFromLines } from './record-reader.ts'
import { isTsvNonData, parseTableRow } from './table-rows.ts'

/** The three lexicon formats: table rows (`.tsv`, 4 columns), entries (`.jsonl`), lemma lists (2–3 columns). */
export type LexiconFormat = 'rows' | 'entries' | 'lemmas'

export interface LexiconReadOptions extends ReadOptions {
  /** Skip sniffing and read this format. */
  format?: LexiconFormat
}

export interface LexiconReadResult extends ReadSummary {
  format: LexiconFormat
  /** Entries in order of first appearance; table rows are grouped per (lemma, upos). */
  entries: Entry[]
}

/** How many leading lines (comments, blanks, bad lines) sniffing looks through before assuming rows. */
const SNIFF_LINES = 1000

/**
 * The format a first data line suggests: `{` → entries, 4 columns → rows, 2–3 → lemmas;
 * `undefined` for a blank or comment line. Any other line is taken as (bad) table rows.
 * @example sniffLexiconLine('vessa\tNOUN') // 'lemmas'
 */
export function sniffLexiconLine(text: string): LexiconFormat | undefined {
  if (isTsvNonData(text)) return undefined
  if (text.trimStart().startsWith('{')) return 'entries'
  const columns = text.split('\t').length
  return columns === 2 || columns === 3 ? 'lemmas' : 'rows'
}

/**
 * Read a lexicon source into entries. The format comes from `options.format`, else a `.jsonl` file name,
 * else the first data line (see `sniffLexiconLine`).
 *
 * Errors: without `skipBad` the first bad line throws a `ProblemError` (the caller exits 2 or answers 4xx);
 * with `skipBad` bad lines are counted in `skipped` and the first five kept in `problems`. A source with
 * no entries at all throws `ProblemError` with code `no-entries` in both modes.
 * @example
 * const { entries, format } = await readLexicon(fs.createReadStream(path), { file: path, skipBad: true })
 */
export async function readLexicon(input: TextInput, options: LexiconReadOptions): Promise<LexiconReadResult> {
  const tally = new ReadTally(options)
  let lines: AsyncIterable<LineItem> = readLines(input, options)
  let format = options.format ?? (/\.jsonl$/i.test(options.file) ? 'entries' : undefined)
  if (format === undefined) {
    const peek = await peekLines(lines, sniffLexiconLine, SNIFF_LINES)
    format = peek.decision ?? 'rows'
    lines = peek.lines
  }
  let entries: Entry[]
  if (format === 'rows') {
    const rows: TableRow[] = []
    for await (const row of recordsFromLines(lines, parseTableRow, tally)) rows.push(row)
    entries = rowsToEntries(rows)
  } else {
    const parse: LineParser<Entry> = format === 'entries' ? parseEntryLine : parseLemmaLine
    entries = []
    for await (const entry of recordsFromLines(lines, parse, tally)) entries.push(entry)
  }
  const summary = tally.summary
  if (entries.length === 0) {
    const skipped = summary.skipped > 0 ? `, ${summary.skipped} bad lines skipped` : ''
    throw new ProblemError({
      code: 'no-entries',
      file: options.file,
      message: `no entries found (${summary.lines} lines read${skipped})`,
    })
  }
  return { ...summary, format, entries }
}
