// The shards of one sharded model resident in an isolate: fetched on demand, at most a byte budget kept (LRU).
import type { MemoryFormIndex } from './memory-index.ts'

/** A shard as the manifest lists it. */
export interface ShardRef {
  sha256: string
  bytes: number
  forms: number
  analyses: number
}

/** Fetches and decodes shard `i` (the caller checks its hash and shape). */
export type ShardLoader = (i: number, ref: ShardRef) => Promise<MemoryFormIndex>

/**
 * Decoded shards, least recently used first out once the file bytes of those kept exceed `budget`
 * (the shard being added always stays). Concurrent requests for one shard share one fetch; `fetched`
 * counts the fetches made.
 * @example const cache = new ShardCache(manifest.shards, loader, 32 << 20); await cache.shard(3)
 */
export class ShardCache {
  readonly #loaded = new Map<number, MemoryFormIndex>()
  readonly #pending = new Map<number, Promise<MemoryFormIndex>>()
  #bytes = 0
  fetched = 0

  constructor(
    readonly refs: readonly ShardRef[],
    private readonly loader: ShardLoader,
    readonly budget: number,
  ) {}

  /** Bytes (shard file sizes) of the shards kept now. */
  get residentBytes(): number {
    return this.#bytes
  }

  /** Indices of the shards kept now, least recently used first. */
  resident(): number[] {
    return [...this.#loaded.keys()]
  }

  /** Shard `i`, from memory or fetched. */
  shard(i: number): Promise<MemoryFormIndex> {
    const hit = this.#loaded.get(i)
    if (hit) {
      this.#loaded.delete(i)
      this.#loaded.set(i, hit)
      return Promise.resolve(hit)
    }
    let pending = this.#pending.get(i)
    if (!pending) {
      const ref = this.refs[i]
      if (!ref) return Promise.reject(new RangeError(`no shard ${i} of ${this.refs.length}`))
      this.fetched++
      pending = this.loader(i, ref).then(
        (index) => {
          this.#pending.delete(i)
          this.#keep(i, index, ref.bytes)
          return index
        },
        (err) => {
          this.#pending.delete(i)
          throw err
        },
      )
      this.#pending.set(i, pending)
    }
    return pending
  }

  #keep(i: number, index: MemoryFormIndex, bytes: number): void {
    this.#loaded.set(i, index)
    this.#bytes += bytes
    for (const [j] of this.#loaded) {
      if (this.#bytes <= this.budget || j === i) break
      this.#loaded.delete(j)
      this.#bytes -= this.refs[j]!.bytes
    }
  }
}
