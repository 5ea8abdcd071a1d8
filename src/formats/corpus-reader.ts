// Open a corpus as a stream of lookup tokens, telling plain text from CoNLL-U.
import { type ConlluReadOptions, conlluFromLines } from './conllu-reader.ts'
import type { TextInput } from './input.ts'
import { type LineItem, readLines } from './line-reader.ts'
import { makeReader, type Reader, ReadTally } from './read-summary.ts'
import { peekLines } from './record-reader.ts'
import { type CorpusToken, textTokensFromLines } from './text-tokens.ts'

export type CorpusFormat = 'text' | 'conllu'

export interface CorpusReadOptions extends ConlluReadOptions {
  /** Skip sniffing and read this format. */
  format?: CorpusFormat
}

/** How many leading blank or `#` lines sniffing looks through before assuming plain text. */
const SNIFF_LINES = 1000
const CONLLU_ID = /^(?:[1-9][0-9]*(?:-[1-9][0-9]*)?|(?:0|[1-9][0-9]*)\.[1-9][0-9]*)\t/

/**
 * The format a line suggests: a CoNLL-U word line (10 columns, a word, range or empty-node ID) →
 * `conllu`; any other text → `text`; blank and `#` lines (a comment in either) → `undefined`.
 * @example sniffCorpusLine('1\tVessa\tvessa\tNOUN\t_\t_\t0\troot\t_\t_') // 'conllu'
 */
export function sniffCorpusLine(text: string): CorpusFormat | undefined {
  if (text.trim() === '' || text.startsWith('#')) return undefined
  return CONLLU_ID.test(text) && text.split('\t').length === 10 ? 'conllu' : 'text'
}

/**
 * Open a corpus: the format comes from `options.format`, else a `.conllu` name, else the first lines.
 * CoNLL-U yields its surface tokens (a multi-word token once, by its FORM; empty nodes never).
 * Tags are not checked unless `checkTags` (only FORM matters for lookup). Errors as in the readers:
 * a `ProblemError` at the first bad line, or counted in `summary` with `skipBad`.
 * @example
 * const corpus = await openCorpus(request.body!, { file: 'upload', skipBad: true })
 * for await (const token of corpus) count(token.form)
 * corpus.format // 'text' | 'conllu'
 */
export async function openCorpus(
  input: TextInput,
  options: CorpusReadOptions,
): Promise<Reader<CorpusToken> & { format: CorpusFormat }> {
  const tally = new ReadTally(options)
  let lines: AsyncIterable<LineItem> = readLines(input, options)
  let format = options.format ?? (/\.conllu$/i.test(options.file) ? 'conllu' : undefined)
  if (format === undefined) {
    const peek = await peekLines(lines, sniffCorpusLine, SNIFF_LINES)
    format = peek.decision ?? 'text'
    lines = peek.lines
  }
  const tokens =
    format === 'conllu'
      ? surfaceTokens(conlluFromLines(lines, tally, options.checkTags ?? false))
      : textTokensFromLines(lines, tally)
  return { ...makeReader(tally, tokens), format }
}

async function* surfaceTokens(sentences: ReturnType<typeof conlluFromLines>): AsyncGenerator<CorpusToken> {
  for await (const sentence of sentences) {
    for (const { form, line, sentenceInitial } of sentence.surface) yield { form, line, sentenceInitial }
  }
}
