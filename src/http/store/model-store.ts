// Published models by name and version, with a pointer that moves only after a new version is written and checked.
import { ProblemError } from '../../core/lexicon/problem.ts'
import { ApiError, problemError } from '../api-error.ts'
import type { BlobStore } from './blob-store.ts'

/** Counts that describe a model (lemmas, tables, paradigms, forms…), shown by the models routes. */
export type ModelSummary = Record<string, number>

/** How the store turns bytes into a model and describes it; decoding is the validation of a publish. */
export interface ModelCodec<M> {
  decode(text: string): M
  summarize(model: M): ModelSummary
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
 * Hex SHA-256 of bytes (Web Crypto: the same in Node and workerd).
 * @example await sha256Hex(new TextEncoder().encode('abc')) // 'ba7816bf…'
 */
export async function sha256Hex(bytes: Uint8Array): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>))
  return [...digest].map((b) => b.toString(16).padStart(2, '0')).join('')
}

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

  constructor(blobs: BlobStore, codec: ModelCodec<M>) {
    this.#blobs = blobs
    this.#codec = codec
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

  /** Decode bytes as a model, or the 422 saying why they are not one. */
  validate(bytes: Uint8Array): M {
    let text: string
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(bytes)
    } catch {
      throw new ApiError(422, 'bad-utf8', 'the model file is not valid UTF-8')
    }
    try {
      return this.#codec.decode(text)
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
    const model = this.validate(bytes)
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
    return { version, sha256: sha256!, model: this.validate(blob.bytes) }
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
    await this.#blobs.delete(key)
  }
}

/** A storage fault as a 503 (logged with its cause; the answer does not carry internals). */
function storeFailed(message: string, cause: unknown): ApiError {
  console.error(`formfold: ${message}`, cause)
  return new ApiError(503, 'store-failed', message)
}
