// Reading a sharded model: the manifest now (head and shard list), each shard when a lookup needs it.
import { ProblemError } from '../lexicon/problem.ts'
import { FormIndexBuilder, type MemoryFormIndex } from '../lookup/memory-index.ts'
import { ShardCache, type ShardRef } from '../lookup/shard-cache.ts'
import { SHARD_HASH, SHARD_ROUTE, sha256Hex } from '../lookup/shard-route.ts'
import { ShardedFormIndex } from '../lookup/sharded-index.ts'
import { smokeTestModel } from './check-model.ts'
import { decodeModelHead } from './decode-model.ts'
import type { Model } from './model.ts'
import { decodeShard, type ShardContext } from './shard-codec.ts'
import { SHARDED_FORMAT, SHARDED_VERSION, type ShardedManifestJson } from './shard-model.ts'

/** Fetches the bytes of shard `i` (from R2, a directory, memory…). */
export type ShardFetcher = (i: number, ref: ShardRef) => Promise<Uint8Array>

/** Default bytes of shard files kept decoded per model (the LRU budget of `ShardCache`). */
export const DEFAULT_SHARD_CACHE_BYTES = 32 * 1024 * 1024

/**
 * Does this text look like a sharded model's manifest (its first field names the format)?
 * @example isShardedManifest(text) // true for what shardModel wrote
 */
export function isShardedManifest(text: string): boolean {
  return text.startsWith(`{"format":"${SHARDED_FORMAT}"`)
}

/**
 * Read a manifest: the model head is decoded now and checked on a few of its entries; the index answers
 * through `fetch` and an LRU of decoded shards (`cacheBytes` of shard files). Each fetched shard is checked
 * against the size and SHA-256 the manifest lists. Throws `ProblemError` (`bad-model`).
 * @example const model = decodeShardedModel(text, (i, ref) => r2Bytes(ref.sha256))
 */
export function decodeShardedModel(
  text: string,
  fetch: ShardFetcher,
  cacheBytes = DEFAULT_SHARD_CACHE_BYTES,
): Model {
  let json: ShardedManifestJson
  try {
    json = JSON.parse(text)
  } catch {
    throw bad('not JSON')
  }
  const refs = checkManifest(json)
  const head = decodeModelHead(json.model, { lazyTables: true })
  const ctx: ShardContext = {
    entries: head.inflection.lexicon.entries,
    memberOf: head.inflection.book.memberOf,
    paradigmIds: head.inflection.book.paradigms.map((p) => p.id),
  }
  const n = refs.length
  const loader = async (i: number, ref: ShardRef): Promise<MemoryFormIndex> => {
    const bytes = await fetch(i, ref)
    if (bytes.byteLength !== ref.bytes || (await sha256Hex(bytes)) !== ref.sha256)
      throw bad(`shard ${i} does not match its size and hash`)
    return decodeShard(new TextDecoder().decode(bytes), i, n, ctx)
  }
  const index = new ShardedFormIndex(new ShardCache(refs, loader, cacheBytes), {
    forms: json.forms,
    analyses: json.analyses,
  })
  // The head is exercised without any shard: lookups guess, expansion predicts.
  smokeTestModel({ ...head, index: new FormIndexBuilder().build([], []) })
  return { ...head, index }
}

/**
 * The shard list of a manifest after checking its header (format, major version, hash and routing).
 * @example checkManifest(JSON.parse(text)).length // 8
 */
export function checkManifest(json: ShardedManifestJson): ShardRef[] {
  if (!json || typeof json !== 'object' || json.format !== SHARDED_FORMAT)
    throw bad(`not a ${SHARDED_FORMAT} file`)
  const major = String(json.version).split('.')[0]
  if (major !== SHARDED_VERSION.split('.')[0])
    throw bad(`format version ${json.version} is not readable by this reader (${SHARDED_VERSION})`)
  if (json.hash !== SHARD_HASH || json.route !== SHARD_ROUTE)
    throw bad(`unknown shard routing ${json.hash}/${json.route} (this reader: ${SHARD_HASH}/${SHARD_ROUTE})`)
  const ok = (r: ShardRef) =>
    r && /^[0-9a-f]{64}$/.test(r.sha256) && [r.bytes, r.forms, r.analyses].every(Number.isInteger)
  if (!Array.isArray(json.shards) || json.shards.length === 0 || !json.shards.every(ok))
    throw bad('malformed shard list')
  if (!Number.isInteger(json.forms) || !Number.isInteger(json.analyses) || !json.model)
    throw bad('missing counts or model head')
  return json.shards
}

function bad(message: string): ProblemError {
  return new ProblemError({ code: 'bad-model', message: `sharded model: ${message}` })
}
