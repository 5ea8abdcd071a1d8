// Publishing to a running service: `PUT /v1/models/:name` with a model file and the bearer token.
import type { ErrorBody } from './api-error.ts'
import { MODEL_MEDIA_TYPE } from './served-model.ts'
import type { VersionInfo } from './store/model-store.ts'

/** What a publish answered: the version now served, or the service's error. */
export type PublishResult =
  | { ok: true; status: number; version: VersionInfo & { name: string } }
  | { ok: false; status: number; error: ErrorBody['error'] }

/**
 * Send a model file to a service's write route. Network failures throw; HTTP refusals are returned.
 * @example await publishToService('http://127.0.0.1:8787', 'demo2', bytes, process.env.FORMFOLD_WRITE_TOKEN)
 */
export async function publishToService(
  baseUrl: string,
  name: string,
  bytes: Uint8Array,
  token: string | undefined,
): Promise<PublishResult> {
  const url = new URL(`/v1/models/${encodeURIComponent(name)}`, baseUrl)
  const headers: Record<string, string> = { 'content-type': MODEL_MEDIA_TYPE }
  if (token) headers.authorization = `Bearer ${token}`
  const res = await fetch(url, { method: 'PUT', headers, body: bytes as Uint8Array<ArrayBuffer> })
  const text = await res.text()
  let body: unknown
  try {
    body = JSON.parse(text)
  } catch {
    body = undefined
  }
  if (res.ok && body && typeof body === 'object' && 'version' in body) {
    return { ok: true, status: res.status, version: body as VersionInfo & { name: string } }
  }
  const error = (body as ErrorBody | undefined)?.error ?? {
    code: 'internal' as const,
    message: `the service answered ${res.status}: ${text.slice(0, 200)}`,
    details: null,
  }
  return { ok: false, status: res.status, error }
}
