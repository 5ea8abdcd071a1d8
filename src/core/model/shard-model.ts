// Writing a sharded model: the form index split by form hash into shards under a byte budget, plus a manifest.
import type { IndexedAnalysis } from '../lookup/form-index.ts'
import type { ShardRef } from '../lookup/shard-cache.ts'
import { fnv1a32, routeKey, SHARD_HASH, SHARD_ROUTE, sha256Hex } from '../lookup/shard-route.ts'
import { encodeModel, type ModelJson } from './encode-model.ts'
import type { Model } from './model.ts'
import { encodeShard, type ShardIds } from './shard-codec.ts'

export const SHARDED_FORMAT = 'formfold-sharded-model'
/** Major changes break old readers; minor ones only add what old readers may ignore. */
export const SHARDED_VERSION = '1.0'

/** The manifest (FORMAT.md, "Sharded models"): counts, how forms are routed, the shards, the model head. */
export interface ShardedManifestJson {
  format: typeof SHARDED_FORMAT
  version: string
  hash: typeof SHARD_HASH
  route: typeof SHARD_ROUTE
  forms: number
  analyses: number
  shards: ShardRef[]
  /** The model file (format 1.x): everything but the form index, which the shards hold. */
  model: ModelJson
}

/** A sharded model as written: the manifest text and each shard's text, in shard order. */
export interface ShardedModelFiles {
  manifest: string
  shards: string[]
  refs: ShardRef[]
}

const encoder = new TextEncoder()

/**
 * Split a model's form index into the fewest shards (at least `minShards`) whose files are each at most
 * `budget` bytes, routing each form by `shardOf`. Deterministic: the same model and budget give the same
 * bytes. Throws when a single form's records alone exceed the budget.
 * @example const { manifest, shards } = await shardModel(model, 4 << 20)
 */
export async function shardModel(model: Model, budget: number, minShards = 1): Promise<ShardedModelFiles> {
  const index = model.index
  const entries = model.inflection.lexicon.entries
  const ids: ShardIds = {
    entry: new Map(entries.map((e, i) => [`${e.lemma}\t${e.upos}`, i])),
    paradigm: new Map(model.inflection.book.paradigms.map((p, i) => [p.id, i])),
  }
  const forms: [string, readonly IndexedAnalysis[]][] = []
  for await (const group of index.formGroups()) {
    const part = index.session()
    await part.load(group)
    for (const f of group) forms.push([f, part.get(f)!])
  }
  const hashes = forms.map(([f]) => fnv1a32(encoder.encode(routeKey(f))))
  const whole = encoder.encode(encodeShard(0, 1, forms, ids)).byteLength
  let n = Math.max(1, minShards, Math.ceil(whole / budget))
  for (;;) {
    const texts = split(n, forms, hashes, ids)
    const sizes = texts.map((t) => encoder.encode(t).byteLength)
    const largest = Math.max(...sizes)
    if (largest <= budget) return write(model, texts, sizes, forms, hashes)
    if (n >= forms.length) throw new Error(`a shard budget of ${budget} bytes is less than one form needs`)
    n = Math.min(forms.length, Math.max(n + 1, Math.ceil((n * largest) / budget)))
  }
}

function split(
  n: number,
  forms: readonly [string, readonly IndexedAnalysis[]][],
  hashes: readonly number[],
  ids: ShardIds,
): string[] {
  const parts: [string, readonly IndexedAnalysis[]][][] = Array.from({ length: n }, () => [])
  for (let i = 0; i < forms.length; i++) parts[hashes[i]! % n]!.push(forms[i]!)
  return parts.map((p, i) => encodeShard(i, n, p, ids))
}

async function write(
  model: Model,
  texts: string[],
  sizes: number[],
  forms: readonly [string, readonly IndexedAnalysis[]][],
  hashes: readonly number[],
): Promise<ShardedModelFiles> {
  const n = texts.length
  const counts = texts.map(() => ({ forms: 0, analyses: 0 }))
  forms.forEach(([, a], i) => {
    const c = counts[hashes[i]! % n]!
    c.forms++
    c.analyses += a.length
  })
  const refs: ShardRef[] = []
  for (let i = 0; i < n; i++)
    refs.push({ sha256: await sha256Hex(encoder.encode(texts[i]!)), bytes: sizes[i]!, ...counts[i]! })
  const json: ShardedManifestJson = {
    format: SHARDED_FORMAT,
    version: SHARDED_VERSION,
    hash: SHARD_HASH,
    route: SHARD_ROUTE,
    forms: forms.length,
    analyses: counts.reduce((a, c) => a + c.analyses, 0),
    shards: refs,
    model: JSON.parse(encodeModel(model)),
  }
  return { manifest: JSON.stringify(json), shards: texts, refs }
}
