// CoNLL-U corpora (UD v2 format): sentences of surface tokens and syntactic words, streamed.
import { type Problem, ProblemError } from '../core/lexicon/problem.ts'
import { parseConlluLine } from './conllu-line.ts'
import { type ConlluSentence, SentenceBuilder } from './conllu-sentence.ts'
import type { TextInput } from './input.ts'
import { type LineItem, readLines } from './line-reader.ts'
import { makeReader, type Reader, type ReadOptions, ReadTally } from './read-summary.ts'

export interface ConlluReadOptions extends ReadOptions {
  /** Check UPOS and FEATS of every word (default true); off, they are kept as written. */
  checkTags?: boolean
}

/**
 * Stream the sentences of a CoNLL-U file. Comments are kept per sentence; multi-word token lines give
 * the surface token, the word lines after them its parts; empty nodes are checked and left out.
 * Without `skipBad` the first bad line throws a `ProblemError`; with it a sentence holding a bad line is
 * dropped and all its lines are counted in `summary.skipped`.
 * @example for await (const s of streamConllu(text, { file: 'gold.conllu' })) s.words.map((w) => w.lemma)
 */
export function streamConllu(input: TextInput, options: ConlluReadOptions): Reader<ConlluSentence> {
  const tally = new ReadTally(options)
  return makeReader(tally, conlluFromLines(readLines(input, options), tally, options.checkTags ?? true))
}

/**
 * The same over lines already read.
 * @example conlluFromLines(readLines(text, { file }), new ReadTally({ file }), true)
 */
export async function* conlluFromLines(
  lines: AsyncIterable<LineItem>,
  tally: ReadTally,
  checkTags: boolean,
): AsyncGenerator<ConlluSentence> {
  const file = tally.summary.file
  let builder: SentenceBuilder | undefined
  const end = (): ConlluSentence | undefined => {
    const done = builder
    builder = undefined
    if (!done) return undefined
    const problem = done.problem ?? done.finish(file)
    if (problem) {
      tally.reject(problem, done.lineCount)
      return undefined
    }
    tally.accept(done.lineCount)
    tally.noteFeatures(done.features)
    return done.sentence.words.length > 0 ? done.sentence : undefined
  }
  for await (const item of lines) {
    if (!item.problem && item.text.trim() === '') {
      tally.accept()
      const sentence = end()
      if (sentence) yield sentence
      continue
    }
    builder ??= new SentenceBuilder(item.line)
    builder.lineCount++
    if (builder.problem) continue
    let problem: Problem | undefined
    if (item.problem) {
      problem = item.problem
    } else if (item.text.startsWith('#')) {
      builder.sentence.comments.push(item.text)
    } else {
      const parsed = parseConlluLine(item.text, { file, line: item.line }, checkTags)
      problem = 'problem' in parsed ? parsed.problem : builder.add(parsed, { file, line: item.line })
    }
    if (problem) {
      if (!tally.skipBad) throw new ProblemError(problem)
      builder.problem = problem
    }
  }
  const sentence = end()
  if (sentence) yield sentence
}
