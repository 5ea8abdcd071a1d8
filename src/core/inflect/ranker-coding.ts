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

/**
 * Buffers of finished lists, for later lists to grow into. A typed array's memory lies outside the JS heap, and
 * V8 answers every 64 MB or so of such memory allocated with a full collection of the whole heap: coding a
 * large cell's examples afresh each time (growing by doubling, then copying out) made a dictionary-sized
 * learning spend a third of its cell-ranker time in those collections. Bounded; contents never matter.
 */
const SPARE: Int32Array[] = []
const SPARE_MAX = 16

/** A buffer of at least `minLength` (a spare one when there is one; its contents are arbitrary). */
export function spareBuffer(minLength: number): Int32Array {
  let best = -1
  for (let i = 0; i < SPARE.length; i++)
    if (SPARE[i]!.length >= minLength && (best < 0 || SPARE[i]!.length < SPARE[best]!.length)) best = i
  if (best < 0) return new Int32Array(Math.max(minLength, 1024))
  const b = SPARE[best]!
  SPARE[best] = SPARE[SPARE.length - 1]!
  SPARE.pop()
  return b
}

/** Return a buffer no longer used, for a later list (the pool keeps the largest 16). */
export function giveBack(b: Int32Array): void {
  if (b.length < 1024) return
  if (SPARE.length < SPARE_MAX) {
    SPARE.push(b)
    return
  }
  let small = 0
  for (let i = 1; i < SPARE.length; i++) if (SPARE[i]!.length < SPARE[small]!.length) small = i
  if (SPARE[small]!.length < b.length) SPARE[small] = b
}

/** A growable Int32Array, grown into spare buffers and giving its own back when done. */
class IntList {
  data = spareBuffer(1024)
  length = 0
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = spareBuffer(this.data.length * 2)
      next.set(this.data)
      giveBack(this.data)
      this.data = next
    }
    this.data[this.length++] = v
  }
  /** The values, copied out; the list is not to be used after. */
  done(): Int32Array {
    const out = this.data.slice(0, this.length)
    giveBack(this.data)
    this.data = EMPTY
    return out
  }
}

const EMPTY = new Int32Array(0)

/**
 * (feature id, class) → weight slot, by open addressing (a Map keyed by a combined number is far slower);
 * each entry's feature, class and slot lie side by side, so a probe touches one cache line.
 */
class PairSlots {
  /** Entry h at 3h: feature (-1: empty), class, slot (a spare buffer may be longer: only 3 << bits are used). */
  private table = spareBuffer(3 << 12).fill(-1, 0, 3 << 12)
  private bits = 12
  readonly feature = new IntList()
  readonly cls = new IntList()

  slot(f: number, c: number): number {
    const t = this.table
    const mask = (1 << this.bits) - 1
    let h = pairHash(f, c, this.bits)
    for (; t[3 * h] !== -1; h = (h + 1) & mask) if (t[3 * h] === f && t[3 * h + 1] === c) return t[3 * h + 2]!
    const s = this.feature.length
    this.feature.push(f)
    this.cls.push(c)
    if (2 * (s + 1) > 1 << this.bits) {
      this.grow()
      this.put(f, c, s)
    } else {
      t[3 * h] = f
      t[3 * h + 1] = c
      t[3 * h + 2] = s
    }
    return s
  }

  private put(f: number, c: number, s: number): void {
    const t = this.table
    const mask = (1 << this.bits) - 1
    let h = pairHash(f, c, this.bits)
    while (t[3 * h] !== -1) h = (h + 1) & mask
    t[3 * h] = f
    t[3 * h + 1] = c
    t[3 * h + 2] = s
  }

  /** Give the table back (see SPARE); the slots are not to be used after. */
  release(): void {
    giveBack(this.table)
    this.table = EMPTY
  }

  private grow(): void {
    this.bits++
    giveBack(this.table)
    this.table = spareBuffer(3 << this.bits).fill(-1, 0, 3 << this.bits)
    for (let s = 0; s < this.feature.length - 1; s++) this.put(this.feature.data[s]!, this.cls.data[s]!, s)
  }
}

/** The top `bits` bits of a multiplicative hash of (feature, class). */
function pairHash(f: number, c: number, bits: number): number {
  return (Math.imul(f, 0x9e3779b1) ^ Math.imul(c, 0x85ebca77)) >>> (32 - bits)
}

/**
 * Codes the trainable examples of one training set as they are made (fewer than two candidates or no gold
 * one: nothing to learn, left out), so their feature strings need not outlive them.
 * @example const c = new ExampleCoder(); c.add({ local: ['b'], candidates: [3, 7], shared: [['x'], ['y']], gold: [0] }); c.done().pairCount // 2
 */
export class ExampleCoder {
  private readonly localIds = new Map<string, number>()
  private readonly sharedIds = new Map<string, number>()
  private readonly pairs = new PairSlots()
  private readonly start = new IntList()
  private readonly width = new IntList()
  private readonly candStart = new IntList()
  private readonly ids = new IntList()
  private readonly gold = new IntList()
  private readonly local: number[] = []
  private maxCandidates = 0
  /** Examples given, the ones left out included (the training-set size an L2 prior is spread over). */
  added = 0

  /** Code one example. */
  add(ex: RankerExample): void {
    this.added++
    if (ex.candidates.length < 2 || ex.gold.length === 0) return
    const n = ex.candidates.length
    if (n > this.maxCandidates) this.maxCandidates = n
    const { local, ids, gold } = this
    this.start.push(this.candStart.length)
    this.width.push(ex.local.length)
    local.length = 0
    for (const f of ex.local) local.push(intern(this.localIds, f))
    const g0 = gold.length
    for (let i = 0; i < n; i++) gold.push(0)
    for (const g of ex.gold) gold.data[g0 + g] = 1
    // (Slot numbers only name weights: the trained weights come out in (feature, class) order whatever they are.)
    for (let i = 0; i < n; i++) {
      this.candStart.push(ids.length)
      const c = ex.candidates[i]!
      for (let j = 0; j < local.length; j++) ids.push(this.pairs.slot(local[j]!, c))
      for (const f of ex.shared[i]!) ids.push(intern(this.sharedIds, f))
    }
  }

  /** The coded examples (the coder is not to be used after). */
  done(): CodedExamples {
    this.start.push(this.candStart.length)
    this.candStart.push(this.ids.length)
    const coded: CodedExamples = {
      start: this.start.done(),
      width: this.width.done(),
      candStart: this.candStart.done(),
      ids: this.ids.done(),
      gold: Uint8Array.from(this.gold.done()),
      maxCandidates: this.maxCandidates,
      pairCount: this.pairs.feature.length,
      pairFeature: this.pairs.feature.done(),
      pairClass: this.pairs.cls.done(),
      localNames: [...this.localIds.keys()],
      sharedNames: [...this.sharedIds.keys()],
    }
    this.pairs.release()
    return coded
  }
}

function intern(m: Map<string, number>, k: string): number {
  let v = m.get(k)
  if (v === undefined) {
    v = m.size
    m.set(k, v)
  }
  return v
}
