// Publishing to a running service: `PUT /v1/models/:name` with a model file and the bearer token.
import type { ShardedModelFiles } from '../core/model/shard-model.ts'
import type { ErrorBody } from './api-error.ts'
import { SHARD_MEDIA_TYPE } from './routes/shards.ts'
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
  return put(new URL(`/v1/models/${encodeURIComponent(name)}`, baseUrl), MODEL_MEDIA_TYPE, bytes, token)
}

/**
 * Send a sharded model: every shard first (each stored under its hash), the manifest last, so the pointer
 * moves only once all shards are stored; a refused shard stops before the manifest and nothing changes.
 * @example await publishShardedToService(url, 'de', await shardModel(model, 4 << 20), token)
 */
export async function publishShardedToService(
  baseUrl: string,
  name: string,
  files: ShardedModelFiles,
  token: string | undefined,
): Promise<PublishResult> {
  const encoder = new TextEncoder()
  for (let i = 0; i < files.shards.length; i++) {
    const path = `/v1/models/${encodeURIComponent(name)}/shards/${files.refs[i]!.sha256}`
    const res = await put(new URL(path, baseUrl), SHARD_MEDIA_TYPE, encoder.encode(files.shards[i]!), token)
    if (!res.ok) return res
  }
  return publishToService(baseUrl, name, encoder.encode(files.manifest), token)
}

async function put(
  url: URL,
  type: string,
  bytes: Uint8Array,
  token: string | undefined,
): Promise<PublishResult> {
  const headers: Record<string, string> = { 'content-type': type }
  if (token) headers.authorization = `Bearer ${token}`
  const res = await fetch(url, { method: 'PUT', headers, body: bytes as Uint8Array<ArrayBuffer> })
  const text = await res.text()
  let body: unknown
  try {
    body = JSON.parse(text)
  } catch {
    body = undefined
  }
  if (res.ok && body && typeof body === 'object' && ('version' in body || 'sha256' in body)) {
    return { ok: true, status: res.status, version: body as VersionInfo & { name: string } }
  }
  const error = (body as ErrorBody | undefined)?.error ?? {
    code: 'internal' as const,
    message: `the service answered ${res.status}: ${text.slice(0, 200)}`,
    details: null,
  }
  return { ok: false, status: res.status, error }
}
