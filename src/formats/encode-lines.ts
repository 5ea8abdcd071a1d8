// Turn written lines into a UTF-8 byte stream, for response bodies in Node and the Workers runtime.

/**
 * A `ReadableStream` of UTF-8 bytes from lines (sync or async), pulled one chunk at a time so a long
 * output streams in bounded memory.
 * @example new Response(encodeLines(writeTableRows(rows)), { headers: { 'content-type': 'text/tab-separated-values' } })
 */
export function encodeLines(lines: Iterable<string> | AsyncIterable<string>): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder()
  const iterator =
    Symbol.asyncIterator in lines
      ? (lines as AsyncIterable<string>)[Symbol.asyncIterator]()
      : (lines as Iterable<string>)[Symbol.iterator]()
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      const next = await iterator.next()
      if (next.done) controller.close()
      else controller.enqueue(encoder.encode(next.value))
    },
    async cancel() {
      await iterator.return?.()
    },
  })
}
