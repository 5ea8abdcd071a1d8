// Run a line parser over an input: one record per data line, bad lines thrown or counted.
import type { LineParser } from './fields.ts'
import type { TextInput } from './input.ts'
import { type LineItem, readLines } from './line-reader.ts'
import { makeReader, type Reader, type ReadOptions, ReadTally } from './read-summary.ts'

/**
 * Stream the records of a line-based format. Without `skipBad` the first bad line throws a
 * `ProblemError`; with it, bad lines are counted in `summary` and reading goes on.
 * @example
 * const reader = streamRecords(file, parseLemmaLine, { file: 'lemmas.tsv', skipBad: true })
 * for await (const entry of reader) use(entry)
 * reader.summary.skipped // bad lines
 */
export function streamRecords<T>(input: TextInput, parse: LineParser<T>, options: ReadOptions): Reader<T> {
  const tally = new ReadTally(options)
  return makeReader(tally, recordsFromLines(readLines(input, options), parse, tally))
}

/**
 * The same over lines already read (used after sniffing a format from the first lines).
 * @example recordsFromLines(readLines(text, { file }), parseTableRow, new ReadTally({ file }))
 */
export async function* recordsFromLines<T>(
  lines: AsyncIterable<LineItem>,
  parse: LineParser<T>,
  tally: ReadTally,
): AsyncGenerator<T> {
  const file = tally.summary.file
  for await (const item of lines) {
    if (item.problem) {
      tally.reject(item.problem)
      continue
    }
    const result = parse(item.text, { file, line: item.line })
    if (result === null) {
      tally.accept()
    } else if ('problem' in result) {
      tally.reject(result.problem)
    } else {
      tally.accept()
      tally.noteFeatures(result.languageSpecific)
      yield result.value
    }
  }
}

/**
 * Read the first lines until `decide` names a format (or `limit` lines pass), then replay them.
 * `decide` sees only readable lines; `undefined` means "look further".
 * @example const { decision, lines } = await peekLines(readLines(input, o), sniffLexiconLine, 1000)
 */
export async function peekLines<F>(
  lines: AsyncIterable<LineItem>,
  decide: (text: string) => F | undefined,
  limit: number,
): Promise<{ decision: F | undefined; lines: AsyncIterable<LineItem> }> {
  const iterator = lines[Symbol.asyncIterator]()
  const buffered: LineItem[] = []
  let decision: F | undefined
  let finished = false
  while (decision === undefined && buffered.length < limit) {
    const next = await iterator.next()
    if (next.done) {
      finished = true
      break
    }
    buffered.push(next.value)
    if (!next.value.problem) decision = decide(next.value.text)
  }
  async function* replay(): AsyncGenerator<LineItem> {
    yield* buffered
    if (finished) return
    for (;;) {
      const next = await iterator.next()
      if (next.done) return
      yield next.value
    }
  }
  return { decision, lines: replay() }
}
