// Which ranker weights exist: with supported features (the common practice of maximum-entropy taggers:
// only (feature, class) pairs seen with a correct class get a weight) a ranker trained on enough examples
// keeps no weight for a wrong candidate's feature, unless enough examples offer that pair; a small ranker
// keeps every pair it touches. Properties over generated examples (fast-check).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { DEFAULT_RANKER_OPTIONS, type RankerExample } from '../../../src/core/inflect/ranker.ts'
import { trainRanker } from '../../../src/core/inflect/ranker-train.ts'

const example = (local: string[], candidates: number[], gold: number[]): RankerExample => ({
  local,
  candidates,
  shared: candidates.map(() => []),
  gold,
})

/** Pairs "feature\0class" seen with a correct class, and how many examples offer each pair. */
function pairs(examples: RankerExample[]) {
  const supported = new Set<string>()
  const offered = new Map<string, number>()
  for (const ex of examples) {
    if (ex.candidates.length < 2 || ex.gold.length === 0) continue
    for (const f of ex.local)
      ex.candidates.forEach((c, i) => {
        const key = `${f}\u0000${c}`
        if (ex.gold.includes(i)) supported.add(key)
        offered.set(key, (offered.get(key) ?? 0) + 1)
      })
  }
  return { supported, offered }
}

const examples = fc.array(
  fc
    .record({
      local: fc.uniqueArray(fc.constantFrom('s1:a', 's1:e', 's2:en', 's2:er', 'p1:g', 'len:5'), { minLength: 1 }),
      candidates: fc.uniqueArray(fc.integer({ min: 0, max: 6 }), { minLength: 2, maxLength: 4 }),
    })
    .chain((r) =>
      fc.integer({ min: 0, max: r.candidates.length - 1 }).map((g) => example(r.local, r.candidates, [g])),
    ),
  { minLength: 1, maxLength: 40 },
)

describe('supported ranker features', () => {
  it('keeps only pairs seen with a correct class once a ranker has enough examples', () => {
    fc.assert(
      fc.property(examples, (exs) => {
        const w = trainRanker(exs, { ...DEFAULT_RANKER_OPTIONS, support: 'gold', supportMin: 0, supportFrom: 1, prune: 0 })
        const { supported } = pairs(exs)
        for (const key of w.local.keys()) expect(supported.has(key)).toBe(true)
      }),
      { numRuns: 60 },
    )
  })

  it('keeps a pair that enough examples offer, gold or not', () => {
    fc.assert(
      fc.property(examples, (exs) => {
        const w = trainRanker(exs, { ...DEFAULT_RANKER_OPTIONS, support: 'gold', supportMin: 3, supportFrom: 1, prune: 0 })
        const { supported, offered } = pairs(exs)
        for (const key of w.local.keys()) expect(supported.has(key) || offered.get(key)! >= 3).toBe(true)
      }),
      { numRuns: 60 },
    )
  })

  it('keeps every touched pair in a ranker below supportFrom examples', () => {
    const exs = [example(['s1:e'], [0, 1], [0]), example(['s1:e'], [0, 1], [0]), example(['s1:a'], [0, 1], [1])]
    const small = trainRanker(exs, { ...DEFAULT_RANKER_OPTIONS, support: 'gold', supportFrom: 10, prune: 0 })
    const large = trainRanker(exs, { ...DEFAULT_RANKER_OPTIONS, support: 'gold', supportFrom: 1, prune: 0 })
    // The wrong class's weight for s1:e (a pair never seen with a correct class) exists only in the small one.
    expect(small.local.get('s1:e\u00001')).toBeLessThan(0)
    expect(large.local.has('s1:e\u00001')).toBe(false)
    expect(large.local.get('s1:e\u00000')).toBeGreaterThan(0)
    // Both rank the examples' gold classes first.
    for (const w of [small, large]) {
      const score = (f: string, c: number) => w.local.get(`${f}\u0000${c}`) ?? 0
      expect(score('s1:e', 0)).toBeGreaterThan(score('s1:e', 1))
      expect(score('s1:a', 1)).toBeGreaterThan(score('s1:a', 0))
    }
  })

  it('drops weights under prune in a ranker of at least pruneFrom examples, and only there', () => {
    fc.assert(
      fc.property(examples, (exs) => {
        const opts = { ...DEFAULT_RANKER_OPTIONS, support: 'all' as const, prune: 0.06 }
        const pruned = trainRanker(exs, { ...opts, pruneFrom: 1 })
        const kept = trainRanker(exs, { ...opts, pruneFrom: 1000 })
        for (const v of pruned.local.values()) expect(Math.abs(v)).toBeGreaterThanOrEqual(0.06)
        for (const [k, v] of kept.local) if (Math.abs(v) >= 0.06) expect(pruned.local.get(k)).toBe(v)
      }),
      { numRuns: 40 },
    )
  })
})
