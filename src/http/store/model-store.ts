// Published models by name and version, with a pointer that moves only after a new version is written and checked.
import { ProblemError } from '../../core/lexicon/problem.ts'
import type { ShardRef } from '../../core/lookup/shard-cache.ts'
import { sha256Hex } from '../../core/lookup/shard-route.ts'
import { ApiError, problemError } from '../api-error.ts'
import type { BlobStore } from './blob-store.ts'
import { ShardObjects } from './shard-objects.ts'

export { sha256Hex }

/** Counts that describe a model (lemmas, tables, paradigms, forms…), shown by the models routes. */
export type ModelSummary = Record<string, number>

/** Reads the bytes of one shard of a sharded model (named by its hash in the manifest). */
export type ShardBytes = (i: number, ref: ShardRef) => Promise<Uint8Array>

/**
 * How the store turns bytes into a model and describes it; decoding is the validation of a publish.
 * `shardsOf` lists the shards a sharded manifest names (empty for a whole model file).
 */
export interface ModelCodec<M> {
  decode(text: string, shards: ShardBytes): M
  summarize(model: M): ModelSummary
  shardsOf(text: string): ShardRef[]
}

/** One stored version. */
export interface VersionInfo {
  version: number
  sha256: string
  bytes: number
  createdAt: string
  summary: ModelSummary
}

/** The object naming the version served. */
export interface Pointer {
  version: number
  sha256: string
  movedAt: string
}

const ROOT = 'models/'
const versionKey = (name: string, v: number) => `${ROOT}${name}/versions/${String(v).padStart(8, '0')}.model`
const pointerKey = (name: string) => `${ROOT}${name}/pointer.json`
const VERSION_KEY = /\/versions\/(\d{8})\.model$/

/**
 * Models in a `BlobStore`: `models/<name>/versions/<n>.model` plus `models/<name>/pointer.json`.
 * `publish` decodes the bytes first (refusing a corrupt model with 422), writes the version, reads it
 * back and compares its hash, and only then rewrites the pointer. Any failure before that last step
 * leaves the old pointer, so the old version keeps serving.
 * @example
 * const store = new ModelStore(new MemoryBlobStore(), codec)
 * const v = await store.publish('demo', bytes) // { version: 1, sha256, … }
 * const { model } = await store.load('demo')
 */
export class ModelStore<M> {
  readonly #blobs: BlobStore
  readonly #codec: ModelCodec<M>
  /** The shard objects of sharded versions (uploaded before their manifest is published). */
  readonly shards: ShardObjects

  constructor(blobs: BlobStore, codec: ModelCodec<M>) {
    this.#blobs = blobs
    this.#codec = codec
    this.shards = new ShardObjects(blobs)
  }

  /** Names that have a served version, sorted. */
  async names(): Promise<string[]> {
    const keys = await this.#blobs.list(ROOT)
    return keys
      .filter((b) => b.key.endsWith('/pointer.json'))
      .map((b) => b.key.slice(ROOT.length, -'/pointer.json'.length))
  }

  /** The pointer of a name, or null when nothing is published under it. */
  async pointer(name: string): Promise<Pointer | null> {
    const blob = await this.#blobs.get(pointerKey(name))
    if (!blob) return null
    try {
      return JSON.parse(new TextDecoder().decode(blob.bytes)) as Pointer
    } catch {
      throw new ApiError(503, 'store-failed', `the pointer of model "${name}" is unreadable`)
    }
  }

  /** Every stored version of a name, oldest first. */
  async versions(name: string): Promise<VersionInfo[]> {
    const listed = await this.#blobs.list(`${ROOT}${name}/versions/`)
    return listed.flatMap((b) => {
      const m = VERSION_KEY.exec(b.key)
      if (!m) return []
      let summary: ModelSummary = {}
      try {
        summary = JSON.parse(b.meta.summary ?? '{}') as ModelSummary
      } catch {
        // a version without a readable summary is still listed, so it can be deleted
      }
      return [
        {
          version: Number(m[1]),
          sha256: b.meta.sha256 ?? '',
          bytes: b.size,
          createdAt: b.meta.createdAt ?? '',
          summary,
        },
      ]
    })
  }

  /**
   * Decode bytes as a model of `name` (a sharded manifest reads its shards from this store when a lookup
   * needs them), or the 422 saying why they are not one.
   */
  validate(bytes: Uint8Array, name = ''): M {
    return this.#decode(utf8(bytes), name)
  }

  #decode(text: string, name: string): M {
    try {
      return this.#codec.decode(text, (_, ref) => this.shards.bytes(name, ref))
    } catch (err) {
      if (err instanceof ProblemError) throw problemError(err.problem)
      throw problemError({ code: 'bad-model', message: `not a formfold model: ${(err as Error).message}` })
    }
  }

  /**
   * Write a new version and move the pointer to it (see the class comment for the order of steps).
   * `facts` are further counts stored in the version's summary (how a learned version was made).
   */
  async publish(
    name: string,
    bytes: Uint8Array,
    facts: ModelSummary = {},
  ): Promise<VersionInfo & { model: M }> {
    const text = utf8(bytes)
    const model = this.#decode(text, name)
    const missing = await this.shards.missing(name, this.#codec.shardsOf(text))
    if (missing.length > 0) {
      throw new ApiError(
        422,
        'missing-shards',
        `${missing.length} shard(s) the manifest lists are not uploaded; upload them first`,
        { missing: missing.slice(0, 10).map((r) => r.sha256) },
      )
    }
    const summary = { ...this.#codec.summarize(model), ...facts }
    const sha256 = await sha256Hex(bytes)
    const existing = await this.versions(name)
    const version = (existing.at(-1)?.version ?? 0) + 1
    const createdAt = new Date().toISOString()
    const key = versionKey(name, version)
    let back: Awaited<ReturnType<BlobStore['get']>>
    try {
      await this.#blobs.put(key, bytes, { sha256, createdAt, summary: JSON.stringify(summary) })
      back = await this.#blobs.get(key)
    } catch (err) {
      throw storeFailed(
        `version ${version} of "${name}" could not be written; the served version is unchanged`,
        err,
      )
    }
    if (!back || (await sha256Hex(back.bytes)) !== sha256) {
      await this.#blobs.delete(key).catch(() => undefined)
      throw new ApiError(
        503,
        'store-failed',
        `version ${version} of "${name}" did not read back intact; the served version is unchanged`,
      )
    }
    const pointer: Pointer = { version, sha256, movedAt: new Date().toISOString() }
    try {
      await this.#blobs.put(pointerKey(name), new TextEncoder().encode(JSON.stringify(pointer)), {
        version: String(version),
      })
    } catch (err) {
      throw storeFailed(
        `the pointer of "${name}" could not be moved to version ${version}; the served version is unchanged`,
        err,
      )
    }
    return { version, sha256, bytes: bytes.byteLength, createdAt, summary, model }
  }

  /**
   * The model of a version (default: the one the pointer names), checked against the hash it was
   * published with. 404 for an unknown name or version; 503 when storage returns something else.
   */
  async load(name: string, version?: number): Promise<{ version: number; sha256: string; model: M }> {
    let sha256: string | undefined
    if (version === undefined) {
      const pointer = await this.pointer(name)
      if (!pointer) throw new ApiError(404, 'unknown-model', `no model named "${name}"`, { model: name })
      version = pointer.version
      sha256 = pointer.sha256
    }
    const blob = await this.#blobs.get(versionKey(name, version))
    if (!blob)
      throw new ApiError(404, 'unknown-version', `model "${name}" has no version ${version}`, {
        model: name,
        version,
      })
    sha256 ??= blob.meta.sha256
    if ((await sha256Hex(blob.bytes)) !== sha256) {
      throw new ApiError(503, 'store-failed', `version ${version} of "${name}" does not match its hash`)
    }
    return { version, sha256: sha256!, model: this.validate(blob.bytes, name) }
  }

  /** Remove a version that is not served (409 for the served one, 404 for one that does not exist). */
  async deleteVersion(name: string, version: number): Promise<void> {
    const pointer = await this.pointer(name)
    if (pointer?.version === version) {
      throw new ApiError(
        409,
        'version-served',
        `version ${version} of "${name}" is the one served; publish another first`,
      )
    }
    const key = versionKey(name, version)
    if (!(await this.#blobs.list(key)).some((b) => b.key === key)) {
      throw new ApiError(404, 'unknown-version', `model "${name}" has no version ${version}`, {
        model: name,
        version,
      })
    }
    const deleted = await this.#blobs.get(key)
    await this.#blobs.delete(key)
    if (deleted && this.#listed(deleted.bytes).length > 0) await this.#collectShards(name)
  }

  /** The shards a stored version lists (none for a whole model file, or one that no longer reads). */
  #listed(bytes: Uint8Array): ShardRef[] {
    try {
      return this.#codec.shardsOf(utf8(bytes))
    } catch {
      return []
    }
  }

  /** Remove the shards no remaining version lists (after deleting a sharded version). */
  async #collectShards(name: string): Promise<void> {
    const kept = new Set<string>()
    for (const v of await this.versions(name)) {
      const blob = await this.#blobs.get(versionKey(name, v.version))
      if (blob) for (const r of this.#listed(blob.bytes)) kept.add(r.sha256)
    }
    await this.shards.collect(name, kept)
  }
}

function utf8(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    throw new ApiError(422, 'bad-utf8', 'the model file is not valid UTF-8')
  }
}

/** A storage fault as a 503 (logged with its cause; the answer does not carry internals). */
function storeFailed(message: string, cause: unknown): ApiError {
  console.error(`formfold: ${message}`, cause)
  return new ApiError(503, 'store-failed', message)
}
