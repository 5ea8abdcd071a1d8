// The L2 prior of a ranker, scaled to its training set: a fixed prior over the whole set is a per-example
// penalty of prior / n, so a ranker trained on few tables is regularized harder than one trained on many.
import type { RankerOptions } from './ranker.ts'

/**
 * Ranker options with `l2` raised to `prior / n` for a ranker trained on `n` examples (never lowered;
 * `prior` 0 or absent: unchanged). The ranker applies `l2` at each example's update, so a prior on the whole
 * training objective (maximum a posteriori with one Gaussian prior) is spread over its n examples.
 * @example withPrior({ ...DEFAULT_RANKER_OPTIONS, l2: 0.003 }, 100, 5).l2 // 0.05
 */
export function withPrior(opts: RankerOptions, n: number, prior: number | undefined): RankerOptions {
  if (!prior || prior <= 0 || n <= 0) return opts
  const l2 = prior / n
  return l2 > opts.l2 ? { ...opts, l2 } : opts
}
