// A ranker's weights grouped by feature, in flat typed arrays: what scoring reads, feature by feature.

/**
 * A model's one list of feature names (a model file's `featureNames`) and each name's position in it,
 * shared by every ranker read from that file.
 */
export interface NameTable {
  names: readonly string[]
  position: ReadonlyMap<string, number>
}

/**
 * Feature → its classes and weights. Slot s of a feature holds classes `cls[start[s]] …` up to
 * `start[s + 1]` (ascending) and their weights at the same positions: 12 bytes a weight, where a map of
 * maps would cost a map per feature. A ranker read from a file finds its slots through the model's name
 * table (4 bytes a feature: the names' positions, ascending); one built in memory keeps a map of its own.
 * @example FeatureIndex.fromGroups([['s1:e', [[3, 0.5]]]]).weightOf(0, 3) // 0.5
 */
export class FeatureIndex {
  private constructor(
    /** Feature → its slot, or null when the slots are found through `table`. */
    private readonly slots: ReadonlyMap<string, number> | null,
    private readonly table: NameTable | null,
    /** With a table: the position of each slot's name in it, ascending. */
    private readonly positions: Int32Array | null,
    readonly start: Int32Array,
    readonly cls: Int32Array,
    readonly weight: Float64Array,
  ) {}

  /** Build from (feature, its (class, weight) pairs) groups; a feature given twice keeps its last group. */
  static fromGroups(groups: Iterable<readonly [string, Iterable<readonly [number, number]>]>): FeatureIndex {
    const byFeature = new Map<string, (readonly [number, number])[]>()
    for (const [f, pairs] of groups) byFeature.set(f, [...pairs].sort((a, b) => a[0] - b[0]))
    const slot = new Map<string, number>()
    for (const f of byFeature.keys()) slot.set(f, slot.size)
    const { start, cls, weight } = layOut([...byFeature.values()])
    return new FeatureIndex(slot, null, null, start, cls, weight)
  }

  /**
   * Build from groups given by the position of their feature in `table`, positions strictly ascending (a
   * model file's layout); otherwise as fromGroups.
   * @example FeatureIndex.fromTableGroups(table, [[4, [[3, 0.5]]]]).slotOf(table.names[4]) // 0
   */
  static fromTableGroups(
    table: NameTable,
    groups: Iterable<readonly [number, Iterable<readonly [number, number]>]>,
  ): FeatureIndex {
    const list = [...groups].map(([p, pairs]) => [p, [...pairs].sort((a, b) => a[0] - b[0])] as const)
    const ascending = list.every(([p], i) => i === 0 || p > list[i - 1]![0])
    if (!ascending) return FeatureIndex.fromGroups(list.map(([p, pairs]) => [table.names[p]!, pairs] as const))
    const { start, cls, weight } = layOut(list.map((g) => g[1]))
    return new FeatureIndex(null, table, Int32Array.from(list, (g) => g[0]), start, cls, weight)
  }

  /** The slot of feature `f`, or undefined when this ranker has no weight for it. */
  slotOf(f: string): number | undefined {
    if (this.slots) return this.slots.get(f)
    const p = this.table!.position.get(f)
    if (p === undefined) return undefined
    const k = findSorted(this.positions!, 0, this.positions!.length, p)
    return k < 0 ? undefined : k
  }

  /** The weight of class `c` in slot `s`, or undefined (binary search). */
  weightOf(s: number, c: number): number | undefined {
    const k = findSorted(this.cls, this.start[s]!, this.start[s + 1]!, c)
    return k < 0 ? undefined : this.weight[k]
  }

  /** Every (feature, class, weight), feature by feature in slot order, classes ascending. */
  *entries(): Generator<readonly [string, number, number]> {
    const n = this.start.length - 1
    const names = this.slots ? [...this.slots.keys()] : null
    for (let s = 0; s < n; s++) {
      const f = names ? names[s]! : this.table!.names[this.positions![s]!]!
      for (let k = this.start[s]!; k < this.start[s + 1]!; k++) yield [f, this.cls[k]!, this.weight[k]!] as const
    }
  }
}

/**
 * Where `x` is in the ascending run `a[from]` … `a[to − 1]`, or −1 (binary search).
 * @example findSorted(Int32Array.of(2, 5, 9), 0, 3, 5) // 1
 */
export function findSorted(a: ArrayLike<number>, from: number, to: number, x: number): number {
  let lo = from
  let hi = to - 1
  while (lo <= hi) {
    const m = (lo + hi) >> 1
    const y = a[m]!
    if (y === x) return m
    if (y < x) lo = m + 1
    else hi = m - 1
  }
  return -1
}

/** The slots' (class, weight) pairs end to end, and where each slot starts. */
function layOut(slots: readonly (readonly (readonly [number, number])[])[]) {
  const start = new Int32Array(slots.length + 1)
  let total = 0
  for (const pairs of slots) total += pairs.length
  const cls = new Int32Array(total)
  const weight = new Float64Array(total)
  let at = 0
  slots.forEach((pairs, s) => {
    start[s] = at
    for (const [c, w] of pairs) {
      cls[at] = c
      weight[at++] = w
    }
  })
  start[slots.length] = at
  return { start, cls, weight }
}
