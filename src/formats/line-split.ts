// Split byte chunks or a string into raw lines at LF, bounding the memory one line may take.
import { concatBytes } from './bytes.ts'

/** A raw line: its bytes (or text, for string input), or `null` when it went past the byte cap. */
export type RawLine<T> = T | null

/**
 * Split byte chunks at LF (0x0A never occurs inside a multi-byte UTF-8 sequence, so splitting before
 * decoding is safe and a bad sequence stays on its own line). Lines longer than `maxBytes` are dropped
 * as they stream and reported as `null`, so one huge line cannot exhaust memory.
 * @example for await (const l of splitByteLines(chunks, 1024)) l?.length
 */
export async function* splitByteLines(
  chunks: AsyncIterable<Uint8Array>,
  maxBytes: number,
): AsyncGenerator<RawLine<Uint8Array>> {
  let pieces: Uint8Array[] = []
  let size = 0
  let overflow = false
  for await (const chunk of chunks) {
    let start = 0
    for (;;) {
      const nl = chunk.indexOf(10, start)
      const end = nl === -1 ? chunk.length : nl
      if (!overflow && end > start) {
        if (size + end - start > maxBytes) {
          overflow = true
          pieces = []
          size = 0
        } else {
          // A piece kept across chunks is copied: a producer may reuse its buffer.
          pieces.push(nl === -1 ? chunk.slice(start, end) : chunk.subarray(start, end))
          size += end - start
        }
      }
      if (nl === -1) break
      yield overflow ? null : join(pieces, size)
      pieces = []
      size = 0
      overflow = false
      start = nl + 1
    }
  }
  if (overflow) yield null
  else if (size > 0) yield join(pieces, size)
}

/**
 * Split a string at LF; the same line numbering as the byte splitter (no line after a final LF).
 * @example [...splitStringLines('a\nb\n', 10)] // ['a', 'b']
 */
export function* splitStringLines(text: string, maxChars: number): Generator<RawLine<string>> {
  let start = 0
  while (start < text.length) {
    const nl = text.indexOf('\n', start)
    const end = nl === -1 ? text.length : nl
    yield end - start > maxChars ? null : text.slice(start, end)
    start = end + 1
  }
}

function join(pieces: Uint8Array[], size: number): Uint8Array {
  return pieces.length === 1 ? pieces[0]! : concatBytes(pieces, size)
}
