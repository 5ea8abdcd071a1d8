// The L2 prior spread over a ranker's training examples (maximum a posteriori with one Gaussian prior).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { withPrior } from '../../../src/core/inflect/prior.ts'
import { DEFAULT_RANKER_OPTIONS } from '../../../src/core/inflect/ranker.ts'

describe('withPrior', () => {
  const opts = { ...DEFAULT_RANKER_OPTIONS, l2: 0.003 }

  it('raises l2 to prior / n for a small training set and keeps it for a large one', () => {
    expect(withPrior(opts, 200, 10).l2).toBeCloseTo(0.05)
    expect(withPrior(opts, 5000, 10)).toBe(opts)
  })

  it('is off without a prior or examples', () => {
    expect(withPrior(opts, 100, undefined)).toBe(opts)
    expect(withPrior(opts, 100, 0)).toBe(opts)
    expect(withPrior(opts, 0, 10)).toBe(opts)
  })

  it('never lowers l2, never touches other options, and falls as n grows (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 100000 }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (n, prior) => {
          const a = withPrior(opts, n, prior)
          expect(a.l2).toBeGreaterThanOrEqual(opts.l2)
          expect({ ...a, l2: opts.l2 }).toEqual(opts)
          expect(withPrior(opts, n + 1, prior).l2).toBeLessThanOrEqual(a.l2)
        },
      ),
    )
  })
})
