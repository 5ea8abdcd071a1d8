// A sharded model's head keeps attested tables as their compact records and decodes them when read
// (German handbook tables from memory, see test/core/lookup/fixtures): the same tables and kept tables,
// the same predictions, and a damaged record still refused while reading.
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../../src/core/inflect/expand.ts'
import { FeatureIndex } from '../../../src/core/inflect/feature-index.ts'
import { decodeModelHead } from '../../../src/core/model/decode-model.ts'
import { encodeModel } from '../../../src/core/model/encode-model.ts'
import { germanSampleModel } from '../../workers/german-sample.ts'
import { germanModel } from '../lookup/fixtures/german.ts'

describe('lazy tables in a model head', () => {
  const text = encodeModel(germanModel())
  const eager = decodeModelHead(JSON.parse(text))
  const lazy = decodeModelHead(JSON.parse(text), { lazyTables: true })

  it('reads every entry as the eager head does, field by field and written out', () => {
    const a = eager.inflection.lexicon.entries
    const b = lazy.inflection.lexicon.entries
    expect(b.length).toBe(a.length)
    expect(a.filter((e) => e.cells).length).toBeGreaterThan(5)
    const plain = (e: (typeof a)[number]) => ({ lemma: e.lemma, upos: e.upos, inherent: e.inherent, cells: e.cells })
    expect(b.map(plain)).toEqual(a.map(plain))
    expect(JSON.stringify(b)).toBe(JSON.stringify(a))
    for (const e of b.slice(0, 20))
      expect(expandLemma(lazy.inflection, e.lemma, e.upos, e.inherent)).toEqual(
        expandLemma(eager.inflection, e.lemma, e.upos, e.inherent),
      )
  })

  it('still refuses a table record that does not fit its lemma', () => {
    const json = JSON.parse(text)
    const at = json.entries.findIndex((e: unknown[]) => typeof e[3] === 'number')
    json.entries[at][3] = json.paradigms.length + 5 // a paradigm that does not exist
    expect(() => decodeModelHead(json, { lazyTables: true })).toThrow(/model file/)
  })
})

describe('lazy kept tables in a model head', () => {
  // Source: the npm German sample of the sharded-serving test (test/workers/german-sample.ts); a fifth of its
  // lemmas are bare, and some of their kept tables are mixed from cell predictions (cells of their own).
  const text = germanSampleModel()
  const eager = decodeModelHead(JSON.parse(text))
  const lazy = decodeModelHead(JSON.parse(text), { lazyTables: true })

  it('reads every bare lemma\'s kept tables as the eager head does, and writes them out alike', () => {
    const plain = (k: (typeof eager.kept)[number]) =>
      k?.map((t) => ({ paradigm: t.paradigm, score: t.score, cells: t.cells, completes: t.completes ?? false }))
    expect(eager.kept.filter((k) => k?.some((t) => t.cells)).length).toBeGreaterThan(3)
    expect(lazy.kept.map(plain)).toEqual(eager.kept.map(plain))
    expect(JSON.stringify(lazy.kept)).toBe(JSON.stringify(eager.kept))
  })
})

describe('FeatureIndex', () => {
  it('gives each (feature, class) its weight, classes ascending, features in order', () => {
    const index = FeatureIndex.fromGroups([
      ['s1:e', [[7, 0.5], [2, -1], [40, 3]]],
      ['p1:g', [[2, 0.25]]],
    ])
    const s = index.slotOf('s1:e')!
    expect([2, 7, 40, 3].map((c) => index.weightOf(s, c))).toEqual([-1, 0.5, 3, undefined])
    expect(index.weightOf(index.slotOf('p1:g')!, 2)).toBe(0.25)
    expect([...index.entries()]).toEqual([['s1:e', 2, -1], ['s1:e', 7, 0.5], ['s1:e', 40, 3], ['p1:g', 2, 0.25]])
  })
})

describe('FeatureIndex through a name table', () => {
  const names = ['b', 'p1:g', 's1:e', 's2:el']
  const table = { names, position: new Map(names.map((f, i) => [f, i])) }
  const groups: [number, [number, number][]][] = [
    [1, [[2, 0.25]]],
    [2, [[7, 0.5], [2, -1]]],
    [3, [[1, 2]]],
  ]

  it('answers as the index with a map of its own does, and lists the same entries', () => {
    const viaTable = FeatureIndex.fromTableGroups(table, groups)
    const viaMap = FeatureIndex.fromGroups(groups.map(([p, pairs]) => [names[p]!, pairs] as const))
    for (const f of [...names, 'unknown'])
      for (const c of [1, 2, 7, 9]) {
        const a = viaTable.slotOf(f)
        const b = viaMap.slotOf(f)
        expect(a === undefined ? undefined : viaTable.weightOf(a, c)).toBe(b === undefined ? undefined : viaMap.weightOf(b, c))
      }
    expect(viaTable.slotOf('b')).toBeUndefined()
    expect([...viaTable.entries()]).toEqual([...viaMap.entries()])
  })

  it('falls back to a map of its own when positions are not ascending', () => {
    const odd = FeatureIndex.fromTableGroups(table, [groups[2]!, groups[0]!])
    expect(odd.weightOf(odd.slotOf('s2:el')!, 1)).toBe(2)
    expect(odd.weightOf(odd.slotOf('p1:g')!, 2)).toBe(0.25)
  })
})
