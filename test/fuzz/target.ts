// What a fuzz target is, and the one outcome rule they share: a value, or a ProblemError, nothing else.
import type fc from 'fast-check'
import { ProblemError } from '../../src/core/lexicon/problem.ts'

/** A property run for a bounded number of generated inputs. */
export interface FuzzTarget {
  name: string
  /** What it drives and what must hold, for the report. */
  checks: string
  property: () => fc.IAsyncProperty<unknown>
  /** Each input is this many times dearer than a reader run: runs are divided by it (at least 1). */
  cost?: number
}

/**
 * Run a step; a `ProblemError` (bad input, reported) is returned, anything else thrown fails the property.
 * @example const r = await problemOr(() => readLexicon(text, { file: 'f' })); if (r instanceof ProblemError) …
 */
export async function problemOr<T>(run: () => T | Promise<T>): Promise<T | ProblemError> {
  try {
    return await run()
  } catch (err) {
    if (err instanceof ProblemError) return err
    throw err
  }
}

/** Fail the property with a message (plain Error: the targets run outside vitest too). */
export function check(ok: unknown, message: string | (() => string)): asserts ok {
  if (!ok) throw new Error(typeof message === 'string' ? message : message())
}

/** Lines as the readers number them: split at LF, no line after a final LF. */
export function countLines(text: string | Uint8Array): number {
  const lf = typeof text === 'string' ? '\n' : 10
  let n = 0
  for (let i = 0; i < text.length; i++) if (text[i] === lf) n++
  return text.length === 0 ? 0 : text[text.length - 1] === lf ? n : n + 1
}

/** Bytes as the async chunks a stream would deliver, cut at the given offsets. */
export async function* chunks(bytes: Uint8Array, cuts: readonly number[]): AsyncGenerator<Uint8Array> {
  let start = 0
  for (const cut of [...cuts].filter((c) => c < bytes.length).sort((a, b) => a - b)) {
    yield bytes.slice(start, cut)
    start = cut
  }
  yield bytes.slice(start)
}
