// The sharded form index: the manifest's counts, and the shards one unit of work has loaded from a shared cache.
import type { FormIndex, IndexedAnalysis } from './form-index.ts'
import type { MemoryFormIndex } from './memory-index.ts'
import type { ShardCache } from './shard-cache.ts'
import { shardOf } from './shard-route.ts'

/**
 * A `FormIndex` over shards. `load(keys)` makes resident the shard of each key's routing key (see
 * `shardOf`): a token's case and folded spellings share one shard, and so do a folded key and the forms it
 * names. The shards it loaded stay referenced by this index (not only by the shared cache), so what a
 * request loaded cannot be evicted under it by another; `session()` gives a fresh view over the same cache.
 * @example
 * const index = new ShardedFormIndex(cache, { forms: 120000, analyses: 310000 }).session()
 * await index.load(['Tage'])
 * index.get('Tage')?.[0]?.lemma // 'Tag'
 */
export class ShardedFormIndex implements FormIndex {
  readonly #held = new Map<number, MemoryFormIndex>()

  constructor(
    readonly cache: ShardCache,
    private readonly counts: { forms: number; analyses: number },
  ) {}

  get formCount(): number {
    return this.counts.forms
  }

  get analysisCount(): number {
    return this.counts.analyses
  }

  /** Number of shards. */
  get shardCount(): number {
    return this.cache.refs.length
  }

  get(form: string): readonly IndexedAnalysis[] | undefined {
    return this.#shard(form).get(form)
  }

  folded(folded: string): readonly string[] {
    return this.#shard(folded).folded(folded)
  }

  async load(keys: Iterable<string>): Promise<void> {
    const want = new Set<number>()
    for (const k of keys) {
      const i = shardOf(k, this.shardCount)
      if (!this.#held.has(i)) want.add(i)
    }
    const order = [...want]
    const got = await Promise.all(order.map((i) => this.cache.shard(i)))
    for (let k = 0; k < order.length; k++) this.#held.set(order[k]!, got[k]!)
  }

  session(): FormIndex {
    return new ShardedFormIndex(this.cache, this.counts)
  }

  /** Every form, once every shard that has forms is loaded (else throws: iterate `formGroups` instead). */
  *forms(): Iterable<string> {
    for (let i = 0; i < this.shardCount; i++) {
      if (this.cache.refs[i]!.forms === 0) continue
      const shard = this.#held.get(i)
      if (!shard) throw new Error(`form index: shard ${i} is not loaded (use formGroups)`)
      yield* shard.forms()
    }
  }

  async *formGroups(): AsyncIterable<readonly string[]> {
    for (let i = 0; i < this.shardCount; i++) {
      if (this.cache.refs[i]!.forms === 0) continue
      yield [...(await this.cache.shard(i)).forms()]
    }
  }

  #shard(key: string): MemoryFormIndex {
    const i = shardOf(key, this.shardCount)
    const shard = this.#held.get(i)
    if (!shard) throw new Error(`form index: "${key}" was not loaded (its shard ${i} is not resident)`)
    return shard
  }
}
