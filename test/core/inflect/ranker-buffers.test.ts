// Ranker training reuses its coding and weight buffers from one training to the next (ranker-coding.ts);
// the weights must not depend on what trained before. Property over generated examples (fast-check): a set
// trained alone, and again after larger and smaller sets, gives identical weights.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { DEFAULT_RANKER_OPTIONS, type RankerExample } from '../../../src/core/inflect/ranker.ts'
import { trainRanker } from '../../../src/core/inflect/ranker-train.ts'

const exampleArb: fc.Arbitrary<RankerExample> = fc
  .record({
    local: fc.uniqueArray(fc.constantFrom('b', 's1:e', 's2:en', 's1:n', 'p1:g', 'len:5'), { minLength: 1 }),
    candidates: fc.uniqueArray(fc.integer({ min: 0, max: 40 }), { minLength: 1, maxLength: 6 }),
  })
  .chain(({ local, candidates }) =>
    fc.record({
      local: fc.constant(local),
      candidates: fc.constant(candidates),
      shared: fc.constant(candidates.map((c) => [`sfx:${c % 3}`])),
      gold: fc.subarray(candidates.map((_, i) => i), { minLength: 1 }),
    }),
  )

const entries = (w: ReturnType<typeof trainRanker>) => ({ local: [...w.local], shared: [...w.shared] })

describe('ranker buffers reused between trainings', () => {
  it('gives the same weights whatever was trained before', () => {
    fc.assert(
      fc.property(
        fc.array(exampleArb, { minLength: 1, maxLength: 30 }),
        fc.array(exampleArb, { minLength: 200, maxLength: 600 }),
        (set, big) => {
          const opts = { ...DEFAULT_RANKER_OPTIONS, epochs: 3 }
          const alone = entries(trainRanker(set, opts))
          trainRanker(big, opts) // grows the buffers past this set's needs, with other contents
          expect(entries(trainRanker(set, opts))).toEqual(alone)
          trainRanker(set.slice(0, 1), opts)
          expect(entries(trainRanker(set, opts))).toEqual(alone)
        },
      ),
      { numRuns: 25, seed: 7 },
    )
  })
})
