// Test helpers for the formats suite: byte chunks from text and collecting async streams.
import { formatProblem, ProblemError } from '../../src/core/lexicon/problem.ts'

const encoder = new TextEncoder()

/** UTF-8 bytes of a string. */
export function utf8(text: string): Uint8Array {
  return encoder.encode(text)
}

/** Concatenate byte arrays and numbers (raw bytes). */
export function bytes(...parts: (string | number[] | Uint8Array)[]): Uint8Array {
  const arrays = parts.map((p) => (typeof p === 'string' ? utf8(p) : Uint8Array.from(p)))
  const out = new Uint8Array(arrays.reduce((n, a) => n + a.length, 0))
  let at = 0
  for (const a of arrays) {
    out.set(a, at)
    at += a.length
  }
  return out
}

/** Split bytes into chunks at the given offsets, as an async iterable (like a file stream). */
export async function* chunked(data: Uint8Array, cuts: number[]): AsyncGenerator<Uint8Array> {
  let start = 0
  for (const cut of [...cuts].sort((a, b) => a - b)) {
    yield data.slice(start, cut)
    start = cut
  }
  yield data.slice(start)
}

/** Collect an async iterable into an array. */
export async function collect<T>(items: AsyncIterable<T>): Promise<T[]> {
  const out: T[] = []
  for await (const item of items) out.push(item)
  return out
}

/** The problem a promise rejects with, as `file:line: message` plus its code; fails on anything else. */
export async function thrownProblem(run: () => Promise<unknown>): Promise<{ code: string; where: string }> {
  try {
    await run()
  } catch (error) {
    if (!(error instanceof ProblemError)) throw error
    const text = formatProblem(error.problem)
    return { code: error.problem.code, where: text.slice(0, text.indexOf(': ')) }
  }
  throw new Error('expected a ProblemError')
}
