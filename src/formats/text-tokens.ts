// Plain-text corpora: word tokens found by `Intl.Segmenter` (word granularity, UAX #29 word boundaries).
import type { TextInput } from './input.ts'
import { type LineItem, readLines } from './line-reader.ts'
import { makeReader, type Reader, type ReadOptions, ReadTally } from './read-summary.ts'

/** A corpus token as lookup sees it. */
export interface CorpusToken {
  form: string
  /** 1-based line of the input. */
  line: number
  /** First word of a line or sentence, so lookup may try the lower-cased form too. */
  sentenceInitial: boolean
}

// Sentence-final punctuation by the Unicode Sentence_Terminal property (UAX #29): . ! ? and their kin.
const SENTENCE_END = /\p{Sentence_Terminal}/u

let segmenter: Intl.Segmenter | undefined

/**
 * The word tokens of one line: word-like segments only (no spaces, punctuation or symbols).
 * A token is sentence-initial when it is the first of the line or follows `.`, `!`, `?` (or another
 * sentence terminal) with only non-word segments between.
 * @example tokenizeLine('Vessa miral. Koru!', 1).map((t) => t.sentenceInitial) // [true, false, true]
 */
export function tokenizeLine(text: string, line: number): CorpusToken[] {
  segmenter ??= new Intl.Segmenter(undefined, { granularity: 'word' })
  const tokens: CorpusToken[] = []
  let initial = true
  for (const segment of segmenter.segment(text)) {
    if (segment.isWordLike) {
      tokens.push({ form: segment.segment, line, sentenceInitial: initial })
      initial = false
    } else if (SENTENCE_END.test(segment.segment)) {
      initial = true
    }
  }
  return tokens
}

/**
 * Stream the word tokens of a plain-text corpus. Unreadable lines (bad UTF-8, control characters…) throw
 * a `ProblemError` unless `skipBad`, which counts them in `summary.skipped`.
 * @example for await (const token of streamTextTokens(body, { file: 'corpus.txt' })) lookup(token.form)
 */
export function streamTextTokens(input: TextInput, options: ReadOptions): Reader<CorpusToken> {
  const tally = new ReadTally(options)
  return makeReader(tally, textTokensFromLines(readLines(input, options), tally))
}

/**
 * The same over lines already read.
 * @example textTokensFromLines(readLines(text, { file }), new ReadTally({ file }))
 */
export async function* textTokensFromLines(
  lines: AsyncIterable<LineItem>,
  tally: ReadTally,
): AsyncGenerator<CorpusToken> {
  for await (const item of lines) {
    if (item.problem) {
      tally.reject(item.problem)
      continue
    }
    tally.accept()
    yield* tokenizeLine(item.text, item.line)
  }
}
