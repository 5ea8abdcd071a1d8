// A bounded map that evicts the least recently used entry: decoded models, and answers of a model.

/**
 * A small LRU over a Map (whose iteration order is insertion order: the first key is the least recent).
 * @example const cache = new LruCache<Model>(8); cache.get(sha) ?? cache.set(sha, decode(bytes))
 */
export class LruCache<M> {
  readonly #entries = new Map<string, M>()
  readonly #capacity: number

  constructor(capacity: number) {
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
