// Models by name: embedded ones (the demo) and published ones from the store, loaded once per isolate.
import { ApiError } from './api-error.ts'
import { MAX_CACHED_MODELS, MAX_MODEL_NAME_CHARS, POINTER_TTL_MS } from './limits.ts'
import { LruCache } from './lru-cache.ts'
import type { ModelStore, ModelSummary, Pointer, VersionInfo } from './store/model-store.ts'

/** A model ready to answer, with the name and version it was asked by (`version` null: embedded). */
export interface LoadedModel<M> {
  name: string
  version: number | null
  model: M
}

/** A model that ships with the app: decoded on first use. */
export interface EmbeddedModel<M> {
  name: string
  load: () => M
  summarize: (model: M) => ModelSummary
}

/** One line of `GET /v1/models`. */
export interface ModelListing {
  name: string
  embedded: boolean
  default: boolean
  served: number | null
  summary: ModelSummary
}

/** A valid model name: lowercase letters, digits, `.`, `_`, `-`, starting with a letter or digit. */
export const MODEL_NAME = new RegExp(`^[a-z0-9][a-z0-9._-]{0,${MAX_MODEL_NAME_CHARS - 1}}$`)

/** Decoded models shared by every registry of the isolate (keys are content hashes, so sharing is safe). */
const decoded = new LruCache<unknown>(MAX_CACHED_MODELS)

/**
 * The models one app serves. A published model's pointer is re-read after `POINTER_TTL_MS`, so a publish
 * from another isolate shows up within that time; a publish through this registry shows up at once.
 * @example
 * const registry = new ModelRegistry({ store, embedded: [demo], defaultName: 'demo' })
 * const { model, version } = await registry.get('demo')
 */
export class ModelRegistry<M> {
  readonly store: ModelStore<M>
  readonly defaultName: string
  readonly #embedded = new Map<string, EmbeddedModel<M> & { model?: M }>()
  readonly #pointers = new Map<string, { pointer: Pointer; readAt: number }>()

  constructor(options: { store: ModelStore<M>; embedded: EmbeddedModel<M>[]; defaultName: string }) {
    this.store = options.store
    this.defaultName = options.defaultName
    for (const e of options.embedded) this.#embedded.set(e.name, { ...e })
  }

  /** The model of a name (default: the default model), or 404 `unknown-model`. */
  async get(name: string = this.defaultName): Promise<LoadedModel<M>> {
    const embedded = this.#embedded.get(name)
    if (embedded) {
      embedded.model ??= embedded.load()
      return { name, version: null, model: embedded.model }
    }
    checkName(name)
    const pointer = await this.#pointer(name)
    const cached = decoded.get(pointer.sha256) as M | undefined
    if (cached !== undefined) return { name, version: pointer.version, model: cached }
    const loaded = await this.store.load(name, pointer.version)
    return { name, version: loaded.version, model: decoded.set(loaded.sha256, loaded.model) as M }
  }

  /** Publish a model file under a name (embedded names are read-only: 409); `facts` join its summary. */
  async publish(name: string, bytes: Uint8Array, facts?: ModelSummary): Promise<VersionInfo> {
    this.assertWritable(name)
    const { model, ...info } = await this.store.publish(name, bytes, facts)
    decoded.set(info.sha256, model)
    this.#pointers.set(name, {
      pointer: { version: info.version, sha256: info.sha256, movedAt: info.createdAt },
      readAt: Date.now(),
    })
    return info
  }

  /** Remove an unserved version. */
  async deleteVersion(name: string, version: number): Promise<void> {
    this.assertWritable(name)
    await this.store.deleteVersion(name, version)
  }

  /** Every model: embedded first, then published ones by name. */
  async list(): Promise<ModelListing[]> {
    const out: ModelListing[] = [...this.#embedded.values()].map((e) => this.#embeddedListing(e))
    for (const name of await this.store.names()) {
      if (this.#embedded.has(name)) continue
      const { served, versions } = await this.describe(name)
      const summary = versions.find((v) => v.version === served)?.summary ?? {}
      out.push({ name, embedded: false, default: name === this.defaultName, served, summary })
    }
    return out
  }

  /** A name's served version and all its stored versions (404 when the name has neither). */
  async describe(
    name: string,
  ): Promise<{ name: string; embedded: boolean; served: number | null; versions: VersionInfo[] }> {
    const embedded = this.#embedded.get(name)
    if (embedded) return { name, embedded: true, served: null, versions: [] }
    checkName(name)
    const [pointer, versions] = await Promise.all([this.store.pointer(name), this.store.versions(name)])
    if (!pointer && versions.length === 0) throw unknownModel(name)
    return { name, embedded: false, served: pointer?.version ?? null, versions }
  }

  #embeddedListing(e: EmbeddedModel<M> & { model?: M }): ModelListing {
    e.model ??= e.load()
    return {
      name: e.name,
      embedded: true,
      default: e.name === this.defaultName,
      served: null,
      summary: e.summarize(e.model),
    }
  }

  async #pointer(name: string): Promise<Pointer> {
    const seen = this.#pointers.get(name)
    if (seen && Date.now() - seen.readAt < POINTER_TTL_MS) return seen.pointer
    const pointer = await this.store.pointer(name)
    if (!pointer) throw unknownModel(name)
    this.#pointers.set(name, { pointer, readAt: Date.now() })
    return pointer
  }

  /** Refuse a name a write may not use: malformed (400) or embedded (409). Checked before costly work. */
  assertWritable(name: string): void {
    checkName(name)
    if (this.#embedded.has(name))
      throw new ApiError(
        409,
        'read-only-model',
        `model "${name}" is embedded in the service and can't be replaced`,
      )
  }
}

function checkName(name: string): void {
  if (!MODEL_NAME.test(name)) {
    throw new ApiError(
      400,
      'invalid-request',
      `"${name}" is not a model name (lowercase letters, digits, ".", "_", "-")`,
      { model: name },
    )
  }
}

function unknownModel(name: string): ApiError {
  return new ApiError(404, 'unknown-model', `no model named "${name}"`, { model: name })
}
