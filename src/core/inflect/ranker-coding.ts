// Ranker examples coded for training: feature strings become integer ids, and every candidate's weight slots
// and shared features lie in one flat Int32Array, so the training epochs touch no strings, maps or objects.
import type { RankerExample } from './ranker.ts'

/** The trainable examples (≥ 2 candidates, ≥ 1 gold) of a training set, flat. */
export interface CodedExamples {
  /** Example e's candidates are candidates start[e] … start[e + 1] - 1 (global candidate numbers). */
  start: Int32Array
  /** Example e's number of local features. */
  width: Int32Array
  /** Candidate c's ids are ids[candStart[c]] …: its local weight slots (width of its example), then shared ids. */
  candStart: Int32Array
  ids: Int32Array
  /** 1 where the candidate is correct. */
  gold: Uint8Array
  maxCandidates: number
  /** Weight slot s belongs to (local feature pairFeature[s], class pairClass[s]). */
  pairCount: number
  pairFeature: Int32Array
  pairClass: Int32Array
  localNames: string[]
  sharedNames: string[]
}

/** A growable Int32Array. */
class IntList {
  data = new Int32Array(1024)
  length = 0
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = new Int32Array(this.data.length * 2)
      next.set(this.data)
      this.data = next
    }
    this.data[this.length++] = v
  }
  done(): Int32Array {
    return this.data.slice(0, this.length)
  }
}

/** (feature id, class) → weight slot, by open addressing (a Map keyed by a combined number is far slower). */
class PairSlots {
  private keysF = new Int32Array(1 << 12).fill(-1)
  private keysC = new Int32Array(1 << 12)
  private values = new Int32Array(1 << 12)
  readonly feature = new IntList()
  readonly cls = new IntList()

  slot(f: number, c: number): number {
    let mask = this.keysF.length - 1
    let h = (Math.imul(f, 0x9e3779b1) ^ Math.imul(c, 0x85ebca77)) & mask
    while (this.keysF[h] !== -1) {
      if (this.keysF[h] === f && this.keysC[h] === c) return this.values[h]!
      h = (h + 1) & mask
    }
    const s = this.feature.length
    this.feature.push(f)
    this.cls.push(c)
    if (2 * (s + 1) > this.keysF.length) {
      this.grow()
      mask = this.keysF.length - 1
      h = (Math.imul(f, 0x9e3779b1) ^ Math.imul(c, 0x85ebca77)) & mask
      while (this.keysF[h] !== -1) h = (h + 1) & mask
    }
    this.keysF[h] = f
    this.keysC[h] = c
    this.values[h] = s
    return s
  }

  private grow(): void {
    const size = this.keysF.length * 2
    const mask = size - 1
    const kf = new Int32Array(size).fill(-1)
    const kc = new Int32Array(size)
    const vs = new Int32Array(size)
    for (let s = 0; s < this.feature.length - 1; s++) {
      const f = this.feature.data[s]!
      const c = this.cls.data[s]!
      let h = (Math.imul(f, 0x9e3779b1) ^ Math.imul(c, 0x85ebca77)) & mask
      while (kf[h] !== -1) h = (h + 1) & mask
      kf[h] = f
      kc[h] = c
      vs[h] = s
    }
    this.keysF = kf
    this.keysC = kc
    this.values = vs
  }
}

/**
 * Code the trainable examples (fewer than two candidates or no gold one: nothing to learn, left out).
 * Slots are numbered in order of first use, as the training reads them.
 * @example codeExamples([{ local: ['b'], candidates: [3, 7], shared: [['x'], ['y']], gold: [0] }]).pairCount // 2
 */
export function codeExamples(examples: readonly RankerExample[]): CodedExamples {
  const localIds = new Map<string, number>()
  const sharedIds = new Map<string, number>()
  const id = (m: Map<string, number>, k: string) => {
    let v = m.get(k)
    if (v === undefined) {
      v = m.size
      m.set(k, v)
    }
    return v
  }
  const pairs = new PairSlots()
  const start = new IntList()
  const width = new IntList()
  const candStart = new IntList()
  const ids = new IntList()
  const gold: number[] = []
  let maxCandidates = 0
  let cand = 0
  const local: number[] = []
  for (const ex of examples) {
    if (ex.candidates.length < 2 || ex.gold.length === 0) continue
    const n = ex.candidates.length
    if (n > maxCandidates) maxCandidates = n
    start.push(cand)
    width.push(ex.local.length)
    local.length = 0
    for (const f of ex.local) local.push(id(localIds, f))
    const g0 = gold.length
    for (let i = 0; i < n; i++) gold.push(0)
    for (const g of ex.gold) gold[g0 + g] = 1
    // Slots are numbered feature by feature (then candidate), as they were first met.
    const slotOf = new Int32Array(local.length * n)
    for (let j = 0; j < local.length; j++)
      for (let i = 0; i < n; i++) slotOf[j * n + i] = pairs.slot(local[j]!, ex.candidates[i]!)
    for (let i = 0; i < n; i++) {
      candStart.push(ids.length)
      for (let j = 0; j < local.length; j++) ids.push(slotOf[j * n + i]!)
      for (const f of ex.shared[i]!) ids.push(id(sharedIds, f))
    }
    cand += n
  }
  start.push(cand)
  candStart.push(ids.length)
  return {
    start: start.done(),
    width: width.done(),
    candStart: candStart.done(),
    ids: ids.done(),
    gold: Uint8Array.from(gold),
    maxCandidates,
    pairCount: pairs.feature.length,
    pairFeature: pairs.feature.done(),
    pairClass: pairs.cls.done(),
    localNames: [...localIds.keys()],
    sharedNames: [...sharedIds.keys()],
  }
}
