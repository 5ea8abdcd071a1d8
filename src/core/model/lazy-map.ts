// A Map filled on first use: reading a model file defers decoding ranker weights until something ranks.

/**
 * A `Map` whose entries come from `load`, called once, on the first read or write of any kind. Lookups
 * of indexed forms never rank, so a model that only answers them never decodes its weights.
 * @example const m = new LazyMap(() => [['a', 1]]); m.get('a') // 1 (loaded now)
 */
export class LazyMap<K, V> extends Map<K, V> {
  private load: (() => Iterable<readonly [K, V]>) | undefined

  constructor(load: () => Iterable<readonly [K, V]>) {
    super()
    this.load = load
  }

  private ready(): void {
    const load = this.load
    if (!load) return
    this.load = undefined
    for (const [k, v] of load()) super.set(k, v)
  }

  override get(key: K): V | undefined {
    if (this.load) this.ready()
    return super.get(key)
  }

  override has(key: K): boolean {
    this.ready()
    return super.has(key)
  }

  override set(key: K, value: V): this {
    this.ready()
    return super.set(key, value)
  }

  override delete(key: K): boolean {
    this.ready()
    return super.delete(key)
  }

  override clear(): void {
    this.load = undefined
    super.clear()
  }

  override get size(): number {
    this.ready()
    return super.size
  }

  override forEach(fn: (value: V, key: K, map: Map<K, V>) => void, thisArg?: unknown): void {
    this.ready()
    super.forEach(fn, thisArg)
  }

  override entries(): MapIterator<[K, V]> {
    this.ready()
    return super.entries()
  }

  override keys(): MapIterator<K> {
    this.ready()
    return super.keys()
  }

  override values(): MapIterator<V> {
    this.ready()
    return super.values()
  }

  override [Symbol.iterator](): MapIterator<[K, V]> {
    return this.entries()
  }
}
