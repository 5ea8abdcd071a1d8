// A ranker's weights grouped by feature, in flat typed arrays: what scoring reads, feature by feature.

/**
 * Feature → its classes and weights. Slot s of a feature holds classes `cls[start[s]] …` up to
 * `start[s + 1]` (ascending) and their weights at the same positions: 12 bytes a weight and one map entry a
 * feature, where a map of maps would cost a map per feature (most of a large model's memory once it ranks).
 * @example FeatureIndex.fromGroups([['s1:e', [[3, 0.5]]]]).weightOf(0, 3) // 0.5
 */
export class FeatureIndex {
  private constructor(
    /** Feature → its slot. */
    readonly slot: ReadonlyMap<string, number>,
    readonly start: Int32Array,
    readonly cls: Int32Array,
    readonly weight: Float64Array,
  ) {}

  /** Build from (feature, its (class, weight) pairs) groups; a feature given twice keeps its last group. */
  static fromGroups(groups: Iterable<readonly [string, Iterable<readonly [number, number]>]>): FeatureIndex {
    const byFeature = new Map<string, (readonly [number, number])[]>()
    for (const [f, pairs] of groups) byFeature.set(f, [...pairs].sort((a, b) => a[0] - b[0]))
    const slot = new Map<string, number>()
    const start = new Int32Array(byFeature.size + 1)
    let total = 0
    for (const pairs of byFeature.values()) total += pairs.length
    const cls = new Int32Array(total)
    const weight = new Float64Array(total)
    let at = 0
    for (const [f, pairs] of byFeature) {
      start[slot.size] = at
      slot.set(f, slot.size)
      for (const [c, w] of pairs) {
        cls[at] = c
        weight[at++] = w
      }
    }
    start[slot.size] = at
    return new FeatureIndex(slot, start, cls, weight)
  }

  /** The weight of class `c` in slot `s`, or undefined (binary search). */
  weightOf(s: number, c: number): number | undefined {
    let a = this.start[s]!
    let b = this.start[s + 1]! - 1
    while (a <= b) {
      const m = (a + b) >> 1
      const x = this.cls[m]!
      if (x === c) return this.weight[m]
      if (x < c) a = m + 1
      else b = m - 1
    }
    return undefined
  }

  /** Every (feature, class, weight), feature by feature in slot order, classes ascending. */
  *entries(): Generator<readonly [string, number, number]> {
    for (const [f, s] of this.slot)
      for (let k = this.start[s]!; k < this.start[s + 1]!; k++) yield [f, this.cls[k]!, this.weight[k]!] as const
  }
}
