// What a read reports besides its records: lines read, bad lines skipped, example problems, features seen.
import { type Problem, ProblemError } from '../core/lexicon/problem.ts'

/** With `skipBad`, how many problems a summary keeps as examples (all are counted). */
export const MAX_PROBLEM_EXAMPLES = 5

/** Options every reader takes. */
export interface ReadOptions {
  /** Name used in problems (a path or an upload name). */
  file: string
  /** Count bad lines and go on instead of throwing a `ProblemError` at the first one. */
  skipBad?: boolean
  maxLineChars?: number
}

/**
 * The account of one read. `lines + skipped` is the number of input lines: nothing is dropped silently.
 * @example { file: 'a.tsv', lines: 3, skipped: 1, problems: [{ code: 'bad-upos', … }], languageSpecific: ['Foo=Bar'] }
 */
export interface ReadSummary {
  file: string
  /** Lines read without a problem (data, comments and blank lines). */
  lines: number
  /** Bad lines skipped (only with `skipBad`; otherwise the first problem is thrown). */
  skipped: number
  /** The first `MAX_PROBLEM_EXAMPLES` problems. */
  problems: Problem[]
  /** Each language-specific `Feature=Value` seen, once, in order of first appearance. */
  languageSpecific: string[]
}

/** A single-use stream of records whose summary is complete once iteration ends. */
export interface Reader<T> extends AsyncIterable<T> {
  readonly summary: ReadSummary
}

/** Accumulates a summary and applies the skip-bad policy. */
export class ReadTally {
  readonly summary: ReadSummary
  readonly #skipBad: boolean
  readonly #seen = new Set<string>()

  constructor(options: ReadOptions) {
    this.summary = { file: options.file, lines: 0, skipped: 0, problems: [], languageSpecific: [] }
    this.#skipBad = options.skipBad ?? false
  }

  get skipBad(): boolean {
    return this.#skipBad
  }

  accept(count = 1): void {
    this.summary.lines += count
  }

  /** Record a bad stretch of `count` lines, or throw its problem when bad lines are fatal. */
  reject(problem: Problem, count = 1): void {
    if (!this.#skipBad) throw new ProblemError(problem)
    this.summary.skipped += count
    if (this.summary.problems.length < MAX_PROBLEM_EXAMPLES) this.summary.problems.push(problem)
  }

  /** Note language-specific features as `canonicalizeFeats` lists them (`Name=v1,v2` → one per value). */
  noteFeatures(list: readonly string[] | undefined): void {
    if (!list) return
    for (const item of list) {
      const eq = item.indexOf('=')
      for (const value of item.slice(eq + 1).split(',')) {
        const pair = `${item.slice(0, eq)}=${value}`
        if (this.#seen.has(pair)) continue
        this.#seen.add(pair)
        this.summary.languageSpecific.push(pair)
      }
    }
  }
}

/**
 * Wrap a generator as a `Reader` sharing the tally's summary.
 * @example const r = makeReader(tally, gen()); for await (const x of r) …; r.summary.skipped
 */
export function makeReader<T>(tally: ReadTally, records: AsyncGenerator<T>): Reader<T> {
  return {
    summary: tally.summary,
    [Symbol.asyncIterator]: () => records,
  }
}
