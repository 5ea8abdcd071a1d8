// Training the log-linear ranker (ranker.ts): examples coded once into flat typed arrays, then AdaGrad
// epochs over them in a seeded order (Duchi, Hazan & Singer 2011, JMLR), so runs are identical.
import { mulberry32, type RankerExample, type RankerOptions, type RankerWeights } from './ranker.ts'
import { type CodedExamples, ExampleCoder, giveBack, spareBuffer } from './ranker-coding.ts'

/**
 * Train the ranker; examples are visited in a seeded shuffled order, so runs are identical. Weights are kept
 * only for the (feature, class) pairs some example can touch, so memory grows with the examples, not with
 * features × classes.
 * @example trainRanker([{ local: ['b'], candidates: [0, 1], shared: [['sfx:2'], ['sfx:0']], gold: [0] }], opts).shared.get('sfx:2') // > 0
 */
export function trainRanker(examples: RankerExample[], opts: RankerOptions): RankerWeights {
  const coder = new ExampleCoder()
  for (const ex of examples) coder.add(ex)
  return trainCoded(coder.done(), opts)
}

/**
 * Train on examples coded as they were made (see ExampleCoder), as trainRanker does.
 * @example const c = new ExampleCoder(); for (const ex of examples) c.add(ex); trainCoded(c.done(), opts)
 */
export function trainCoded(c: CodedExamples, opts: RankerOptions): RankerWeights {
  const count = c.start.length - 1
  // Each weight lies beside its squared-gradient sum (weight at 2k, sum at 2k + 1): an update reads one cache
  // line, not two. The local pair slots come first, then the shared features (see trainable).
  const w = weightScratch(2 * (c.pairCount + c.sharedNames.length))
  const rand = mulberry32(opts.seed)
  const order = Array.from({ length: count }, (_, i) => i)
  const { rate, l2 } = opts
  const { start, gold } = c
  // Slots outside the supported set (see RankerOptions.support) stay 0: never updated, never written, so they
  // are left out of the candidates' slot lists (adding a zero weight changes no score).
  const { candStart, ids, buffers } = trainable(c, supportedSlots(c, opts, count))
  const scores = new Float64Array(c.maxCandidates)
  const p = new Float64Array(c.maxCandidates)
  for (let epoch = 0; epoch < opts.epochs; epoch++) {
    for (let i = order.length - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1))
      const t = order[i]!
      order[i] = order[j]!
      order[j] = t
    }
    for (let o = 0; o < count; o++) {
      const idx = order[o]!
      const c0 = start[idx]!
      const n = start[idx + 1]! - c0
      // Candidate i's ids start at candStart[c0 + i]: its local weight slots, then its shared features.
      let max = Number.NEGATIVE_INFINITY
      for (let i = 0; i < n; i++) {
        const s1 = candStart[c0 + i + 1]!
        let v = 0
        for (let k = candStart[c0 + i]!; k < s1; k++) v += w[ids[k]!]!
        scores[i] = v
        if (v > max) max = v
      }
      let z = 0
      for (let i = 0; i < n; i++) {
        const x = Math.exp(scores[i]! - max)
        p[i] = x
        z += x
      }
      let zg = 0
      for (let i = 0; i < n; i++) {
        p[i] = p[i]! / z
        if (gold[c0 + i]) zg += p[i]!
      }
      if (zg <= 0) continue
      for (let i = 0; i < n; i++) {
        const grad = p[i]! - (gold[c0 + i] ? p[i]! / zg : 0)
        if (Math.abs(grad) < 1e-6) continue
        const s1 = candStart[c0 + i + 1]!
        for (let j = candStart[c0 + i]!; j < s1; j++) {
          const k = ids[j]!
          const g = grad + l2 * w[k]!
          const sum = w[k + 1]! + g * g
          w[k + 1] = sum
          w[k]! -= (rate * g) / Math.sqrt(sum + 1e-8)
        }
      }
    }
  }
  for (const b of buffers) giveBack(b)
  const out: RankerWeights = { local: new Map(), shared: new Map() }
  const prune = count >= (opts.pruneFrom ?? 0) ? (opts.prune ?? 0) : 0
  const { pairFeature, pairClass, localNames } = c
  const kept: number[] = []
  for (let s = 0; s < c.pairCount; s++) if (w[2 * s] !== 0 && Math.abs(w[2 * s]!) >= prune) kept.push(s)
  kept.sort((a, b) => pairFeature[a]! - pairFeature[b]! || pairClass[a]! - pairClass[b]!) // feature order, then class
  for (const s of kept) out.local.set(`${localNames[pairFeature[s]!]}\u0000${pairClass[s]}`, w[2 * s]!)
  c.sharedNames.forEach((f, fi) => {
    const v = w[2 * (c.pairCount + fi)]!
    if (v !== 0) out.shared.set(f, v)
  })
  return out
}

/** The weights under training, in one buffer reused by every training (zeroed; see SPARE in ranker-coding.ts). */
let weightBuffer = new Float64Array(1024)

function weightScratch(n: number): Float64Array {
  if (weightBuffer.length < n) weightBuffer = new Float64Array(Math.max(n, 2 * weightBuffer.length))
  return weightBuffer.subarray(0, n).fill(0)
}

/**
 * The candidates' id lists as positions in the interleaved weight array, with the slots that may not learn
 * left out: candidate c's ids are ids[candStart[c]] up to candStart[c + 1], its local weight slots first
 * (slot s at 2s), then its shared features (feature f at 2 (pairCount + f)). Without a mask every local slot.
 * They lie in spare buffers (`buffers`, to be given back after training; see ranker-coding.ts).
 */
function trainable(
  c: CodedExamples,
  allowed: Uint8Array | null,
): { candStart: Int32Array; ids: Int32Array; buffers: Int32Array[] } {
  const cands = c.candStart.length - 1
  const candStart = spareBuffer(cands + 1)
  const ids = spareBuffer(c.ids.length)
  const sharedAt = 2 * c.pairCount
  const examples = c.start.length - 1
  let at = 0
  for (let e = 0; e < examples; e++) {
    const width = c.width[e]!
    for (let k = c.start[e]!; k < c.start[e + 1]!; k++) {
      candStart[k] = at
      const base = c.candStart[k]!
      const l1 = base + width
      for (let j = base; j < l1; j++) {
        const slot = c.ids[j]!
        if (!allowed || allowed[slot]) ids[at++] = 2 * slot
      }
      for (let j = l1; j < c.candStart[k + 1]!; j++) ids[at++] = sharedAt + 2 * c.ids[j]!
    }
  }
  candStart[cands] = at
  return { candStart, ids: ids.subarray(0, at), buffers: [candStart, ids] }
}

/**
 * With `gold` support on a ranker of at least `supportFrom` examples: per weight slot, whether it may learn —
 * its feature was seen with a correct class, or `supportMin` (> 0) candidates offered it. Null: every slot.
 */
function supportedSlots(c: CodedExamples, opts: RankerOptions, count: number): Uint8Array | null {
  if (opts.support !== 'gold' || count < (opts.supportFrom ?? 0)) return null
  const allowed = new Uint8Array(c.pairCount)
  const min = opts.supportMin ?? 0
  const offered = min > 0 ? new Uint32Array(c.pairCount) : null
  const { start, width, ids, candStart, gold } = c
  for (let e = 0; e < count; e++) {
    const c0 = start[e]!
    const n = start[e + 1]! - c0
    const nl = width[e]!
    for (let i = 0; i < n; i++) {
      const base = candStart[c0 + i]!
      for (let j = 0; j < nl; j++) {
        const k = ids[base + j]!
        if (gold[c0 + i]) allowed[k] = 1
        else if (offered && ++offered[k]! >= min) allowed[k] = 1
      }
    }
  }
  return allowed
}

/**
 * Weights already trained, by their coded training set: cells whose rule choice falls the same way for
 * every table (German nominative, accusative and genitive plural; most adjective cells) make identical
 * training sets, and training is deterministic, so each distinct set is trained once.
 * @example const memo = new TrainMemo(); memo.train(coded, opts) // trains; the same set again gives the same weights
 */
export class TrainMemo {
  private readonly seen = new Map<
    number,
    { coded: CodedExamples; opts: RankerOptions; weights: RankerWeights }[]
  >()

  /**
   * As trainCoded, or the weights of an identical set trained before with the same options (their maps are
   * shared: weights are never changed after training).
   */
  train(coded: CodedExamples, opts: RankerOptions): RankerWeights {
    const h = fingerprint(coded)
    const list = this.seen.get(h) ?? []
    const hit = list.find((s) => sameOptions(s.opts, opts) && sameCoded(s.coded, coded))
    if (hit) return { local: hit.weights.local, shared: hit.weights.shared }
    const weights = trainCoded(coded, opts)
    list.push({ coded, opts, weights })
    this.seen.set(h, list)
    return weights
  }
}

function sameOptions(a: RankerOptions, b: RankerOptions): boolean {
  return a === b || JSON.stringify(a) === JSON.stringify(b)
}

const arrays = (c: CodedExamples) => [c.start, c.width, c.candStart, c.ids, c.pairFeature, c.pairClass]

function fingerprint(c: CodedExamples): number {
  let h = 0x811c9dc5
  for (const a of arrays(c)) {
    h = Math.imul(h ^ a.length, 0x01000193)
    for (let i = 0; i < a.length; i++) h = Math.imul(h ^ a[i]!, 0x01000193)
  }
  for (let i = 0; i < c.gold.length; i++) h = Math.imul(h ^ c.gold[i]!, 0x01000193)
  return h
}

function sameCoded(a: CodedExamples, b: CodedExamples): boolean {
  const same = (x: ArrayLike<number | string>, y: ArrayLike<number | string>) => {
    if (x.length !== y.length) return false
    for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return false
    return true
  }
  const xs = arrays(a)
  const ys = arrays(b)
  return (
    xs.every((x, i) => same(x, ys[i]!)) &&
    same(a.gold, b.gold) &&
    same(a.localNames, b.localNames) &&
    same(a.sharedNames, b.sharedNames)
  )
}
