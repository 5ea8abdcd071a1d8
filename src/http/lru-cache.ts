// Decoded models kept per isolate, keyed by content hash, least recently used evicted first.
import { MAX_CACHED_MODELS } from './limits.ts'

/**
 * A small LRU. A key is a model file's SHA-256, so an entry can never go stale: the same hash is the same bytes.
 * @example const cache = new ModelCache<Model>(); cache.get(sha) ?? cache.set(sha, decode(bytes))
 */
export class ModelCache<M> {
  readonly #entries = new Map<string, M>()
  readonly #capacity: number

  constructor(capacity = MAX_CACHED_MODELS) {
    this.#capacity = capacity
  }

  get(key: string): M | undefined {
    const found = this.#entries.get(key)
    if (found !== undefined) {
      this.#entries.delete(key)
      this.#entries.set(key, found)
    }
    return found
  }

  set(key: string, model: M): M {
    this.#entries.delete(key)
    this.#entries.set(key, model)
    while (this.#entries.size > this.#capacity) this.#entries.delete(this.#entries.keys().next().value!)
    return model
  }

  get size(): number {
    return this.#entries.size
  }
}
