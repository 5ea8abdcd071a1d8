// Files for `formfold constrain`: the corpus as a token stream (CoNLL-U with gold), atomic streamed output.

import { once } from 'node:events'
import { createReadStream, createWriteStream } from 'node:fs'
import { rename, rm } from 'node:fs/promises'
import { basename, dirname, join } from 'node:path'
import { type ConstrainToken, sentenceTokens } from '../core/constrain/index.ts'
import { conlluFromLines } from '../formats/conllu-reader.ts'
import { type CorpusFormat, sniffCorpusLine } from '../formats/corpus-reader.ts'
import { type LineItem, readLines } from '../formats/line-reader.ts'
import { type ReadSummary, ReadTally } from '../formats/read-summary.ts'
import { peekLines } from '../formats/record-reader.ts'
import { textTokensFromLines } from '../formats/text-tokens.ts'

/** A corpus opened for counting: its format, its tokens (with gold UPOS from CoNLL-U), its read summary. */
export interface CorpusInput {
  format: CorpusFormat
  tokens: AsyncIterable<ConstrainToken>
  summary: ReadSummary
}

const SNIFF_LINES = 1000

/** A path's bytes, or standard input for `-`. */
export function inputStream(path: string): AsyncIterable<Uint8Array> {
  return path === '-' ? process.stdin : createReadStream(path)
}

/** The name problems use for a path. */
export function inputName(path: string): string {
  return path === '-' ? '<stdin>' : path
}

/**
 * Open a corpus: format from `format`, else a `.conllu` name, else the first data lines. CoNLL-U tokens
 * are surface tokens carrying their words' gold UPOS; plain text is split by `Intl.Segmenter`.
 * @example for await (const t of (await openCorpusInput('gold.conllu', { skipBad: false })).tokens) tally.add(t)
 */
export async function openCorpusInput(
  path: string,
  opts: { format?: CorpusFormat; skipBad: boolean },
): Promise<CorpusInput> {
  const file = inputName(path)
  const tally = new ReadTally({ file, skipBad: opts.skipBad })
  let lines: AsyncIterable<LineItem> = readLines(inputStream(path), { file })
  let format = opts.format ?? (/\.conllu$/i.test(path) ? 'conllu' : undefined)
  if (format === undefined) {
    const peek = await peekLines(lines, sniffCorpusLine, SNIFF_LINES)
    format = peek.decision ?? 'text'
    lines = peek.lines
  }
  const tokens =
    format === 'conllu'
      ? conlluTokens(conlluFromLines(lines, tally, true))
      : textTokensFromLines(lines, tally)
  return { format, tokens, summary: tally.summary }
}

async function* conlluTokens(sentences: ReturnType<typeof conlluFromLines>): AsyncGenerator<ConstrainToken> {
  for await (const sentence of sentences) yield* sentenceTokens(sentence)
}

/**
 * Write lines to `path` through a temporary file renamed into place when complete, so a failed run never
 * leaves a partial file; `-` writes to standard output. Honors back-pressure: memory stays bounded.
 * @example await writeLinesAtomic('out.tsv', writeConstraintFile(rows, header))
 */
export async function writeLinesAtomic(
  path: string,
  lines: Iterable<string> | AsyncIterable<string>,
): Promise<void> {
  if (path === '-') {
    for await (const line of lines) {
      if (!process.stdout.write(line)) await once(process.stdout, 'drain')
    }
    return
  }
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`)
  const out = createWriteStream(tmp)
  const failed = new Promise<never>((_, reject) => out.once('error', reject))
  failed.catch(() => {})
  try {
    for await (const line of lines) {
      if (!out.write(line)) await Promise.race([once(out, 'drain'), failed])
    }
    out.end()
    await Promise.race([once(out, 'finish'), failed])
    await rename(tmp, path)
  } catch (err) {
    out.destroy()
    await rm(tmp, { force: true })
    throw err
  }
}

/**
 * A progress line on stderr, only when stderr is a terminal (pipes and logs stay clean).
 * @example const progress = terminalProgress(); progress?.('count', 100000); progress?.done()
 */
export function terminalProgress(): ((phase: string, done: number, total?: number) => void) | undefined {
  if (!process.stderr.isTTY) return undefined
  return (phase, done, total) => {
    const of = total ? ` of ${total}` : ''
    const what = phase === 'count' ? 'tokens counted' : 'form types analyzed'
    process.stderr.write(`\r${done}${of} ${what}\u001b[K`)
  }
}

/** End a progress line (when one was shown). */
export function endProgress(): void {
  if (process.stderr.isTTY) process.stderr.write('\r\u001b[K')
}
