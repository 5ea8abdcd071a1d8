// The app the HTTP fuzz targets drive (through app.request, no server) and the check every answer must pass.
import { createApp } from '../../src/http/app.ts'
import { check } from './target.ts'

/** The write secret the fuzzed app is given. */
export const TOKEN = 'fuzz-write-token'

let app: ReturnType<typeof createApp> | undefined

/** Send a request to the app (built on first use; it keeps its in-memory model store between requests). */
export function send(path: string, init?: RequestInit): Promise<Response> {
  app ??= createApp()
  return Promise.resolve(app.request(path, init, { WRITE_TOKEN: TOKEN }))
}

/**
 * Send a request and check the answer: under 500; an error is JSON in the one shape, with no stack; the body
 * reads to its end (a stream that breaks off after its headers fails too).
 * @example const res = await checkAnswer('/v1/analyze?form=lokan', { method: 'GET' }) // { status: 200, body: '{…}' }
 */
export async function checkAnswer(
  path: string,
  init: RequestInit,
): Promise<{ status: number; body: string }> {
  const res = await send(path, init)
  let body: string
  try {
    body = await res.text()
  } catch (err) {
    throw new Error(
      `${init.method ?? 'GET'} ${path} answered ${res.status} and broke off its body: ${(err as Error).message}`,
    )
  }
  check(
    res.status < 500,
    () => `${init.method ?? 'GET'} ${path} answered ${res.status}: ${body.slice(0, 300)}`,
  )
  check(!/\bat \S+ \(|\.ts:\d+|node_modules/.test(body), () => `${path}: a stack trace in the body`)
  if (res.status >= 400 && init.method !== 'HEAD') {
    const parsed = JSON.parse(body) as { error?: Record<string, unknown> }
    check(
      parsed.error && Object.keys(parsed.error).sort().join() === 'code,details,message',
      () => `${path}: error shape ${body.slice(0, 200)}`,
    )
  }
  return { status: res.status, body }
}
