// What the readers accept: a string, bytes, or any (async) iterable or web stream of byte chunks.

/**
 * A text source. A Node `fs.createReadStream(...)`, a web `ReadableStream`, a `Request` body, an array of
 * `Uint8Array` chunks or a plain string all fit.
 * @example const input: TextInput = new Request('http://x', { method: 'POST', body: 'a\tNOUN\n' }).body!
 */
export type TextInput =
  | string
  | Uint8Array
  | Iterable<Uint8Array>
  | AsyncIterable<Uint8Array>
  | ReadableStream<Uint8Array>

/** Byte input: everything except a string (strings are split without a decode step). */
export type ByteInput = Exclude<TextInput, string>

/**
 * The chunks of a byte input, each as a `Uint8Array` view. A stream without async iteration is read
 * through its reader; anything that is not bytes is a caller's mistake (TypeError).
 * @example for await (const chunk of byteChunks([new Uint8Array([97])])) chunk.length // 1
 */
export async function* byteChunks(input: ByteInput): AsyncGenerator<Uint8Array> {
  if (ArrayBuffer.isView(input)) {
    yield asBytes(input)
    return
  }
  if (isStreamWithoutIterator(input)) {
    const reader = input.getReader()
    try {
      for (;;) {
        const { done, value } = await reader.read()
        if (done) return
        yield asBytes(value)
      }
    } finally {
      reader.releaseLock()
    }
  }
  for await (const chunk of input as AsyncIterable<unknown>) yield asBytes(chunk)
}

function asBytes(chunk: unknown): Uint8Array {
  if (chunk instanceof Uint8Array) return chunk
  if (ArrayBuffer.isView(chunk)) return new Uint8Array(chunk.buffer, chunk.byteOffset, chunk.byteLength)
  throw new TypeError(`expected byte chunks (Uint8Array), got ${typeof chunk}`)
}

function isStreamWithoutIterator(input: ByteInput): input is ReadableStream<Uint8Array> {
  const candidate = input as Partial<ReadableStream<Uint8Array>> & Partial<AsyncIterable<Uint8Array>>
  return typeof candidate.getReader === 'function' && typeof candidate[Symbol.asyncIterator] !== 'function'
}
