// The bounded training sample: stratified by class, seeded, capped.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { sampleByClass } from '../../../src/core/inflect/example-sample.ts'

describe('sampleByClass', () => {
  it('keeps everything under the cap', () => {
    expect(sampleByClass([3, 1, 3], 5, 1)).toEqual([0, 1, 2])
    expect(sampleByClass([3, 1, 3], 0, 1)).toEqual([0, 1, 2])
  })

  it('keeps each class in proportion, a rare one at least once', () => {
    const classes = [...Array(900).fill(0), ...Array(90).fill(1), ...Array(10).fill(2)]
    const kept = sampleByClass(classes, 100, 7)
    expect(kept.length).toBe(100)
    const count = (c: number) => kept.filter((i) => classes[i] === c).length
    expect(count(0)).toBeGreaterThanOrEqual(88)
    expect(count(1)).toBeGreaterThanOrEqual(8)
    expect(count(2)).toBeGreaterThanOrEqual(1)
  })

  it('is capped, ascending, duplicate-free and deterministic (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -1, max: 20 }), { maxLength: 300 }),
        fc.integer({ min: 1, max: 60 }),
        (classes, max) => {
          const kept = sampleByClass(classes, max, 3)
          expect(kept.length).toBe(Math.min(max, classes.length))
          expect(new Set(kept).size).toBe(kept.length)
          expect([...kept].sort((a, b) => a - b)).toEqual(kept)
          expect(sampleByClass(classes, max, 3)).toEqual(kept)
          // every class of the input that fits under the cap keeps at least one item
          const present = new Set(classes)
          if (present.size <= max) expect(new Set(kept.map((i) => classes[i]))).toEqual(present)
        },
      ),
    )
  })
})
