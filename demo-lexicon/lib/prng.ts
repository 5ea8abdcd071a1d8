// A small seeded pseudo-random generator (mulberry32) and the draws the generator needs.

/** A seeded random source: same seed, same sequence. */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number
  /** Uniform integer in [0, n). */
  int(n: number): number
  /** One element, uniformly. */
  pick<T>(items: readonly T[]): T
  /** True with probability p. */
  chance(p: number): boolean
  /** A shuffled copy. */
  shuffle<T>(items: readonly T[]): T[]
}

/**
 * mulberry32 (Tommy Ettinger's 32-bit generator, public domain), wrapped with helpers.
 * @example
 * const rng = makeRng(42)
 * rng.pick(['a', 'b']) // same answer every run
 */
export function makeRng(seed: number): Rng {
  let state = seed >>> 0
  const next = (): number => {
    state = (state + 0x6d2b79f5) >>> 0
    let t = state
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
  const int = (n: number): number => Math.floor(next() * n)
  return {
    next,
    int,
    pick: (items) => {
      if (items.length === 0) throw new Error('pick from an empty list')
      return items[int(items.length)]!
    },
    chance: (p) => next() < p,
    shuffle: (items) => {
      const out = [...items]
      for (let i = out.length - 1; i > 0; i--) {
        const j = int(i + 1)
        ;[out[i], out[j]] = [out[j]!, out[i]!]
      }
      return out
    },
  }
}

/**
 * Draws items with Zipf-like weights 1/(rank + offset), rank = position in `items`.
 * @example
 * const draw = zipfSampler(makeRng(1), ['common', 'rarer', 'rarest'], 2)
 * draw() // usually 'common'
 */
export function zipfSampler<T>(rng: Rng, items: readonly T[], offset: number): () => T {
  const cumulative: number[] = []
  let total = 0
  for (let i = 0; i < items.length; i++) {
    total += 1 / (i + offset)
    cumulative.push(total)
  }
  return () => {
    const x = rng.next() * total
    let lo = 0
    let hi = cumulative.length - 1
    while (lo < hi) {
      const mid = (lo + hi) >> 1
      if (cumulative[mid]! > x) hi = mid
      else lo = mid + 1
    }
    return items[lo]!
  }
}
