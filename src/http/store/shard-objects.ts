// The shards of sharded models in a BlobStore: content-addressed objects a manifest names by SHA-256.
import type { ShardRef } from '../../core/lookup/shard-cache.ts'
import { sha256Hex } from '../../core/lookup/shard-route.ts'
import { ApiError } from '../api-error.ts'
import type { BlobStore } from './blob-store.ts'

const ROOT = 'models/'
const SHA256 = /^[0-9a-f]{64}$/

/** Where the shards of a name live: `models/<name>/shards/<sha256>.shard`. */
export const shardPrefix = (name: string) => `${ROOT}${name}/shards/`
const shardKey = (name: string, sha256: string) => `${shardPrefix(name)}${sha256}.shard`

/**
 * Shard objects of one store. A shard is written under its own hash (checked on the way in and read back),
 * so uploading one twice is harmless, versions share the shards they have in common, and nothing a served
 * manifest names ever changes.
 * @example await new ShardObjects(blobs).put('de', sha, bytes)
 */
export class ShardObjects {
  constructor(private readonly blobs: BlobStore) {}

  /** Store a shard under its hash (422 when the bytes have another hash, 503 when it does not read back). */
  async put(name: string, sha256: string, bytes: Uint8Array): Promise<{ sha256: string; bytes: number }> {
    if (!SHA256.test(sha256))
      throw new ApiError(400, 'invalid-request', 'a shard is named by its hex SHA-256')
    if ((await sha256Hex(bytes)) !== sha256)
      throw new ApiError(422, 'bad-model', `the shard's bytes do not have the hash ${sha256}`)
    const key = shardKey(name, sha256)
    await this.blobs.put(key, bytes, { sha256 })
    const back = await this.blobs.get(key)
    if (!back || (await sha256Hex(back.bytes)) !== sha256)
      throw new ApiError(503, 'store-failed', `shard ${sha256} of "${name}" did not read back intact`)
    return { sha256, bytes: bytes.byteLength }
  }

  /** The shards of a list that are not stored with the listed size (what a manifest still waits for). */
  async missing(name: string, refs: readonly ShardRef[]): Promise<ShardRef[]> {
    const stored = new Map((await this.blobs.list(shardPrefix(name))).map((b) => [b.key, b.size]))
    return refs.filter((r) => stored.get(shardKey(name, r.sha256)) !== r.bytes)
  }

  /** The bytes of a listed shard (503 when storage lost it: its manifest was checked when published). */
  async bytes(name: string, ref: ShardRef): Promise<Uint8Array> {
    const blob = await this.blobs.get(shardKey(name, ref.sha256))
    if (!blob) throw new ApiError(503, 'store-failed', `shard ${ref.sha256} of model "${name}" is missing`)
    return blob.bytes
  }

  /** Remove the shards of a name that no remaining manifest lists. */
  async collect(name: string, kept: ReadonlySet<string>): Promise<number> {
    let removed = 0
    for (const b of await this.blobs.list(shardPrefix(name))) {
      const sha = b.key.slice(shardPrefix(name).length, -'.shard'.length)
      if (kept.has(sha)) continue
      await this.blobs.delete(b.key)
      removed++
    }
    return removed
  }
}
