// Reading requests strictly: URLs and bodies must be valid UTF-8, bodies stay under their limit, media types match.
import type { Context, MiddlewareHandler } from 'hono'
import { bodyLimit } from 'hono/body-limit'
import { ApiError, tooLarge } from './api-error.ts'

/** Media types a route accepts, compared without parameters (`; charset=utf-8`). */
export function mediaType(c: Context): string {
  return (c.req.header('content-type') ?? '').split(';')[0]!.trim().toLowerCase()
}

/**
 * Refuse a URL whose path or query has a percent-escape that is not UTF-8 (Hono would keep it as raw
 * text and the lookup would silently answer for `%FF`).
 * @example app.use('*', strictUrl)
 */
export const strictUrl: MiddlewareHandler = async (c, next) => {
  const url = c.req.url
  const start = url.indexOf('/', url.indexOf('//') + 2)
  const rest = start < 0 ? '' : url.slice(start)
  for (const part of rest.split(/[/?&=#]/)) {
    if (!part.includes('%')) continue
    try {
      decodeURIComponent(part.replaceAll('+', ' '))
    } catch {
      throw new ApiError(400, 'bad-utf8', 'the URL has a percent-escape that is not valid UTF-8', { part })
    }
  }
  await next()
}

/**
 * Bound the body of a route at `limit` bytes (declared or streamed): beyond it, 413 naming `instead`.
 * @example createRoute({ …, middleware: [limitBody(MAX_BODY_BYTES)] })
 */
export function limitBody(limit: number, instead?: string): MiddlewareHandler {
  return bodyLimit({
    maxSize: limit,
    onError: () => {
      throw tooLarge('request body', limit, instead)
    },
  })
}

const JSON_TYPE = /^application\/([\w.-]+\+)?json$/

/**
 * A JSON body read strictly: 415 unless it is declared JSON, 413 over `limit`, 400 for bytes that are not
 * UTF-8 or text that is not JSON. The parsed value is left where the route's zod validator reads it.
 * @example createRoute({ method: 'post', path: '/v1/analyze', middleware: [jsonBody(MAX_BODY_BYTES)], … })
 */
export function jsonBody(limit: number, instead?: string): MiddlewareHandler {
  const bound = limitBody(limit, instead)
  return async (c, next) => {
    if (!JSON_TYPE.test(mediaType(c))) {
      throw new ApiError(
        415,
        'unsupported-media-type',
        'the body must be JSON (Content-Type: application/json)',
        {
          contentType: c.req.header('content-type') ?? null,
        },
      )
    }
    await bound(c, async () => {
      const text = decodeStrict(new Uint8Array(await c.req.arrayBuffer()), 400)
      let value: unknown
      try {
        value = JSON.parse(text)
      } catch (err) {
        throw new ApiError(400, 'bad-json', 'body is not valid JSON', { reason: (err as Error).message })
      }
      c.req.bodyCache.json = Promise.resolve(value)
      await next()
    })
  }
}

/**
 * Bytes as UTF-8 text, refusing invalid sequences (`status` 400 for a request body, 422 for uploaded content).
 * @example decodeStrict(new Uint8Array([0xff]), 400) // throws ApiError bad-utf8
 */
export function decodeStrict(bytes: Uint8Array, status: 400 | 422): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    throw new ApiError(status, 'bad-utf8', 'the body is not valid UTF-8')
  }
}

/**
 * The whole body as bytes, under `limit` (413 beyond, naming `instead`).
 * @example const bytes = await readBytes(c, MAX_CORPUS_BYTES, 'formfold constrain')
 */
export async function readBytes(c: Context, limit: number, instead?: string): Promise<Uint8Array> {
  let bytes: Uint8Array | undefined
  await limitBody(limit, instead)(c, async () => {
    bytes = new Uint8Array(await c.req.arrayBuffer())
  })
  return bytes!
}
