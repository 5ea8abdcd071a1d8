// An upload's body as a bounded byte stream: gzip undone (Content-Encoding), bytes counted, the start kept.
import { concatBytes } from '../formats/bytes.ts'
import type { Context } from 'hono'
import { ApiError } from './api-error.ts'

/** Content encodings an upload may declare (`identity` or none: the bytes as sent). */
export const UPLOAD_ENCODINGS: readonly string[] = ['gzip', 'identity']

/** How many leading bytes of the decoded body are kept, to explain an upload in which nothing read. */
const KEPT_PREFIX_BYTES = 64 * 1024

/** The decoded bytes of an upload, pulled on demand; `bytes` and `prefix` grow as they are pulled. */
export interface UploadBody {
  chunks: AsyncIterable<Uint8Array>
  /** Decoded bytes pulled so far. */
  readonly bytes: number
  /** Whether the body was sent gzip-compressed. */
  readonly gzip: boolean
  /** The first decoded bytes (up to 64 KiB). */
  prefix(): Uint8Array
}

/**
 * Open a request body for streaming. `Content-Encoding: gzip` is decoded with `DecompressionStream`;
 * any other encoding is a 415. Beyond `limit` decoded bytes (or a declared length beyond it) the read
 * stops with `tooBig()`, so a small compressed body cannot expand without bound.
 * @example
 * const body = openUpload(c, MAX_LEXICON_BYTES, () => tooLarge('lexicon', MAX_LEXICON_BYTES))
 * await readLexicon(body.chunks, { file: 'upload' })
 */
export function openUpload(c: Context, limit: number, tooBig: () => ApiError): UploadBody {
  const encoding = (c.req.header('content-encoding') ?? 'identity').trim().toLowerCase()
  if (!UPLOAD_ENCODINGS.includes(encoding)) {
    throw new ApiError(
      415,
      'unsupported-media-type',
      `send the body as is or gzip-compressed, not "${encoding}"`,
      {
        contentEncoding: encoding,
        accepted: UPLOAD_ENCODINGS,
      },
    )
  }
  const declared = Number(c.req.header('content-length') ?? Number.NaN)
  if (declared > limit) throw tooBig()
  const gzip = encoding === 'gzip'
  let source = c.req.raw.body
  if (source && gzip) source = source.pipeThrough(new DecompressionStream('gzip'))
  const kept: Uint8Array[] = []
  let keptBytes = 0
  let bytes = 0
  async function* pull(): AsyncGenerator<Uint8Array> {
    if (!source) return
    const reader = source.getReader()
    try {
      for (;;) {
        let next: ReadableStreamReadResult<Uint8Array>
        try {
          next = await reader.read()
        } catch (err) {
          if (!gzip) throw err
          throw new ApiError(422, 'bad-encoding', 'the body is not valid gzip', { contentEncoding: 'gzip' })
        }
        if (next.done) return
        bytes += next.value.byteLength
        if (bytes > limit) throw tooBig()
        if (keptBytes < KEPT_PREFIX_BYTES) {
          const part = next.value.subarray(0, KEPT_PREFIX_BYTES - keptBytes)
          kept.push(part.slice())
          keptBytes += part.byteLength
        }
        yield next.value
      }
    } finally {
      await reader.cancel().catch(() => undefined)
    }
  }
  return {
    chunks: pull(),
    get bytes() {
      return bytes
    },
    gzip,
    prefix: () => concatBytes(kept, keptBytes),
  }
}
