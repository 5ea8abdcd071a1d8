// A bounded training set for a ranker: beyond a cap, a seeded sample stratified by the gold class, so every
// class keeps examples in proportion (and the rare ones at least one), and training cost stops growing with
// the lexicon once the weights have enough evidence.
import { mulberry32 } from './ranker.ts'

/**
 * The indices (ascending) of at most `max` training items, given each item's own class (all of them when
 * `max` ≤ 0 or there are no more). Each class keeps ⌈count × max / total⌉ of its items, chosen by a seeded
 * shuffle; classes are then trimmed largest first (down to one item, then the smallest classes go) until
 * the cap holds.
 * @example sampleByClass([0, 0, 0, 1], 2, 1) // e.g. [1, 3]: one of class 0, the one of class 1
 */
export function sampleByClass(classes: readonly number[], max: number, seed: number): number[] {
  if (max <= 0 || classes.length <= max) return classes.map((_, i) => i)
  const byClass = new Map<number, number[]>()
  classes.forEach((c, i) => {
    const list = byClass.get(c)
    if (list) list.push(i)
    else byClass.set(c, [i])
  })
  const rand = mulberry32(seed)
  const groups = [...byClass.entries()].sort((a, b) => a[0] - b[0])
  const quota = groups.map(([, list]) => Math.ceil((list.length * max) / classes.length))
  let over = quota.reduce((a, b) => a + b, 0) - max
  const bySize = groups.map((_, g) => g).sort((a, b) => quota[b]! - quota[a]! || a - b)
  for (let k = 0, trimmed = true; over > 0; k++) {
    if (k === bySize.length) {
      if (!trimmed) break
      k = 0
      trimmed = false
    }
    const g = bySize[k]!
    if (quota[g]! > 1) {
      quota[g]!--
      over--
      trimmed = true
    }
  }
  // More classes than the cap: the smallest classes go.
  for (let k = bySize.length - 1; over > 0; k--, over--) quota[bySize[k]!] = 0
  const keep: number[] = []
  groups.forEach(([, list], g) => {
    const order = [...list]
    for (let i = order.length - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1))
      ;[order[i], order[j]] = [order[j]!, order[i]!]
    }
    keep.push(...order.slice(0, quota[g]))
  })
  return keep.sort((a, b) => a - b)
}
