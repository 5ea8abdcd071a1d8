// One suite, two implementations: the whole in-memory index and the sharded one answer every form alike.
// Model: German handbook tables and bare lemmas (test/core/lookup/fixtures, tables from memory).
import { describe, expect, it } from 'vitest'
import { analyzeForm } from '../../../src/core/lookup/analyze.ts'
import type { FormIndex } from '../../../src/core/lookup/form-index.ts'
import { foldDiacritics } from '../../../src/core/lookup/normalize.ts'
import { ShardCache } from '../../../src/core/lookup/shard-cache.ts'
import { shardOf } from '../../../src/core/lookup/shard-route.ts'
import { ShardedFormIndex } from '../../../src/core/lookup/sharded-index.ts'
import type { Model } from '../../../src/core/model/model.ts'
import { decodeShardedModel } from '../../../src/core/model/read-sharded.ts'
import { encodeShard } from '../../../src/core/model/shard-codec.ts'
import { shardModel } from '../../../src/core/model/shard-model.ts'
import { germanModel } from './fixtures/german.ts'
import { contractRecords, formIndexContract, type IndexRecord } from './form-index-contract.ts'

const whole = germanModel()
const allForms = [...whole.index.forms()]
const encoder = new TextEncoder()

/** A budget a quarter of the index's size: at least four shards. */
async function sharded(): Promise<{ model: Model; fetched: number[]; shards: string[] }> {
  const one = await shardModel(whole, Number.MAX_SAFE_INTEGER)
  const files = await shardModel(whole, Math.ceil(one.refs[0]!.bytes / 4))
  const fetched: number[] = []
  const model = decodeShardedModel(files.manifest, async (i) => {
    fetched.push(i)
    return encoder.encode(files.shards[i]!)
  })
  return { model, fetched, shards: files.shards }
}

const factories: { name: string; partial: boolean; make: () => Promise<Model> }[] = [
  { name: 'whole', partial: false, make: async () => whole },
  { name: 'sharded', partial: true, make: async () => (await sharded()).model },
]

describe.each(factories)('form index contract on a learned model: $name', ({ partial, make }) => {
  it('gives the answers of the whole index for every form, and the same counts', async () => {
    const index = (await make()).index.session()
    await index.load(allForms)
    for (const f of allForms) expect(index.get(f), f).toEqual(whole.index.get(f))
    expect([index.formCount, index.analysisCount]).toEqual([whole.index.formCount, whole.index.analysisCount])
    expect(index.get('Quastenflosser')).toBeUndefined()
  })

  it('finds forms by their folded spelling once the folded key is loaded', async () => {
    const index = (await make()).index.session()
    const keys = [...new Set(allForms.map(foldDiacritics))]
    await index.load(keys)
    for (const k of keys) {
      const expected = [...whole.index.folded(k)]
      expect([...index.folded(k)].sort(), k).toEqual(expected.sort())
      for (const f of expected) expect(index.get(f)).toEqual(whole.index.get(f))
    }
    expect(keys.some((k) => !allForms.includes(k))).toBe(true)
  })

  it(`${partial ? 'throws for' : 'answers'} a form whose part is not loaded`, async () => {
    const index = (await make()).index.session()
    const ask = () => index.get('Tage')
    if (partial) expect(ask).toThrow(/not loaded/)
    else expect(ask()).toEqual(whole.index.get('Tage'))
    await index.load(['TAGE'])
    expect(ask()).toEqual(whole.index.get('Tage'))
  })

  it('lists every form once across its groups', async () => {
    const index = (await make()).index
    const seen: string[] = []
    for await (const group of index.formGroups()) seen.push(...group)
    expect(seen.length).toBe(index.formCount)
    expect(new Set(seen)).toEqual(new Set(allForms))
  })

  it('analyzes a token as the whole model does after loading its spellings', async () => {
    const model = await make()
    for (const token of ['TAGE', 'tage', 'Mänteln', 'mantel', 'Kabeln']) {
      const index = model.index.session()
      await index.load([token, token.toLowerCase(), foldDiacritics(token)])
      const opts = { foldDiacritics: true }
      expect(analyzeForm({ ...model, index }, token, opts)).toEqual(analyzeForm(whole, token, opts))
    }
  })
})

describe('sharded index', () => {
  it('writes the same bytes for the same model and budget, each shard within the budget', async () => {
    const budget = Math.ceil((await shardModel(whole, Number.MAX_SAFE_INTEGER)).refs[0]!.bytes / 5)
    const a = await shardModel(whole, budget)
    const b = await shardModel(whole, budget)
    expect(a.manifest).toBe(b.manifest)
    expect(a.shards).toEqual(b.shards)
    expect(a.shards.length).toBeGreaterThanOrEqual(5)
    for (const s of a.shards) expect(encoder.encode(s).byteLength).toBeLessThanOrEqual(budget)
    expect(a.refs.reduce((n, r) => n + r.forms, 0)).toBe(whole.index.formCount)
  })

  it('fetches one shard for a token, whatever its case or diacritics, and each shard once', async () => {
    const { model, fetched } = await sharded()
    const index = model.index.session()
    await index.load(['Mäntel', 'mäntel', 'MÄNTEL', 'Mantel', 'mantel'])
    expect(fetched).toEqual([shardOf('Mantel', (model.index as ShardedFormIndex).shardCount)])
    await model.index.session().load(['Mantel'])
    expect(fetched.length).toBe(1)
  })

  it('keeps at most its byte budget of shards in the cache, least recently used out first', async () => {
    const { model } = await sharded()
    const full = model.index as ShardedFormIndex
    const refs = full.cache.refs
    const cache = new ShardCache(
      refs,
      (i) => full.cache.shard(i) as Promise<never>,
      refs[0]!.bytes + refs[1]!.bytes,
    )
    await cache.shard(0)
    await cache.shard(1)
    await cache.shard(0)
    await cache.shard(2)
    expect(cache.resident()).toEqual([0, 2])
    expect(cache.residentBytes).toBeLessThanOrEqual(cache.budget)
    await cache.shard(0)
    expect(cache.fetched).toBe(3)
  })

  it('refuses a shard that does not match the manifest', async () => {
    const files = await shardModel(whole, 8_000)
    const model = decodeShardedModel(files.manifest, async () => encoder.encode(files.shards[1]!))
    await expect(model.index.session().load(allForms)).rejects.toThrow(/size and hash|shard/)
  })
})

/** The record contract too, with the records routed to three shards written by the shard codec. */
formIndexContract('sharded', async (records: IndexRecord[]) => {
  const owners = [...new Map(records.map((r) => [`${r.lemma}\t${r.upos}`, r])).values()]
  const entries = owners.map((r) => ({
    lemma: r.lemma,
    upos: r.upos,
    inherent: '_',
    cells: r.source === 'attested' ? [] : null,
  }))
  const paradigmIds = [...new Set(records.flatMap((r) => (r.paradigm ? [r.paradigm] : [])))]
  const memberOf = owners.map((r) => (r.source === 'attested' ? paradigmIds.indexOf(r.paradigm!) : -1))
  const ids = {
    entry: new Map(owners.map((r, i) => [`${r.lemma}\t${r.upos}`, i])),
    paradigm: new Map(paradigmIds.map((p, i) => [p, i])),
  }
  const n = 3
  const byForm = new Map<string, IndexRecord[]>()
  for (const r of records) byForm.set(r.form, [...(byForm.get(r.form) ?? []), r])
  const texts = Array.from({ length: n }, (_, i) =>
    encodeShard(
      i,
      n,
      [...byForm].filter(([f]) => shardOf(f, n) === i),
      ids,
    ),
  )
  const { decodeShard } = await import('../../../src/core/model/shard-codec.ts')
  const refs = texts.map((t) => ({
    sha256: '0'.repeat(64),
    bytes: t.length,
    forms: [...byForm.keys()].filter((f) => shardOf(f, n) === texts.indexOf(t)).length,
    analyses: 0,
  }))
  const cache = new ShardCache(
    refs,
    async (i) => decodeShard(texts[i]!, i, n, { entries, memberOf, paradigmIds }),
    1 << 20,
  )
  const index: FormIndex = new ShardedFormIndex(cache, { forms: byForm.size, analyses: records.length })
  return index
})

it('the record contract covers forms in more than one shard', () => {
  expect(new Set(contractRecords.map((r) => shardOf(r.form, 3))).size).toBeGreaterThan(1)
})

it('hashes a string as FNV-1a 32 over its UTF-8 bytes (offset basis 2166136261, prime 16777619)', async () => {
  const { fnv1a32, fnv1a32Utf8 } = await import('../../../src/core/lookup/shard-route.ts')
  // FNV-1a 32 of "a" is 0xe40c292c (the published test vector, from memory).
  expect(fnv1a32(encoder.encode('a'))).toBe(0xe40c292c)
  for (const s of ['a', 'Mäntel', 'straße', '€', '𝔘x', ''])
    expect(fnv1a32Utf8(s)).toBe(fnv1a32(encoder.encode(s)))
})
