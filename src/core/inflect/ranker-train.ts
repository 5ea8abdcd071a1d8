// Training the log-linear ranker (ranker.ts): examples coded once into flat typed arrays, then AdaGrad
// epochs over them in a seeded order (Duchi, Hazan & Singer 2011, JMLR), so runs are identical.
import { mulberry32, type RankerExample, type RankerOptions, type RankerWeights } from './ranker.ts'
import { type CodedExamples, ExampleCoder } from './ranker-coding.ts'

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
  const wl = new Float64Array(c.pairCount)
  const gl = new Float64Array(c.pairCount)
  const ws = new Float64Array(c.sharedNames.length)
  const gs = new Float64Array(c.sharedNames.length)
  const rand = mulberry32(opts.seed)
  const order = Array.from({ length: count }, (_, i) => i)
  const { rate, l2 } = opts
  const { start, gold } = c
  // Slots outside the supported set (see RankerOptions.support) stay 0: never updated, never written, so they
  // are left out of the candidates' slot lists (adding a zero weight changes no score).
  const { candStart, localCount, ids } = trainable(c, supportedSlots(c, opts, count))
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
      // Candidate i's ids start at candStart[c0 + i]: its local weight slots (localCount), then its shared features.
      let max = Number.NEGATIVE_INFINITY
      for (let i = 0; i < n; i++) {
        const base = candStart[c0 + i]!
        const l1 = base + localCount[c0 + i]!
        let v = 0
        for (let k = base; k < l1; k++) v += wl[ids[k]!]!
        const s1 = candStart[c0 + i + 1]!
        for (let k = l1; k < s1; k++) v += ws[ids[k]!]!
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
        const base = candStart[c0 + i]!
        const l1 = base + localCount[c0 + i]!
        for (let j = base; j < l1; j++) {
          const k = ids[j]!
          const g = grad + l2 * wl[k]!
          gl[k]! += g * g
          wl[k]! -= (rate * g) / Math.sqrt(gl[k]! + 1e-8)
        }
        const s1 = candStart[c0 + i + 1]!
        for (let s = l1; s < s1; s++) {
          const f = ids[s]!
          const g = grad + l2 * ws[f]!
          gs[f]! += g * g
          ws[f]! -= (rate * g) / Math.sqrt(gs[f]! + 1e-8)
        }
      }
    }
  }
  const out: RankerWeights = { local: new Map(), shared: new Map() }
  const prune = count >= (opts.pruneFrom ?? 0) ? (opts.prune ?? 0) : 0
  const { pairFeature, pairClass, localNames } = c
  const kept: number[] = []
  for (let s = 0; s < c.pairCount; s++) if (wl[s] !== 0 && Math.abs(wl[s]!) >= prune) kept.push(s)
  kept.sort((a, b) => pairFeature[a]! - pairFeature[b]! || pairClass[a]! - pairClass[b]!) // feature order, then class
  for (const s of kept) out.local.set(`${localNames[pairFeature[s]!]}\u0000${pairClass[s]}`, wl[s]!)
  c.sharedNames.forEach((f, fi) => {
    if (ws[fi] !== 0) out.shared.set(f, ws[fi]!)
  })
  return out
}

/**
 * The candidates' id lists with the slots that may not learn left out: candidate c's ids start at
 * candStart[c], its first localCount[c] are its local weight slots, the rest up to candStart[c + 1] its
 * shared features. Without a mask, the coded lists as they are.
 */
function trainable(
  c: CodedExamples,
  allowed: Uint8Array | null,
): { candStart: Int32Array; localCount: Int32Array; ids: Int32Array } {
  const cands = c.candStart.length - 1
  const localCount = new Int32Array(cands)
  const examples = c.start.length - 1
  for (let e = 0; e < examples; e++) localCount.fill(c.width[e]!, c.start[e]!, c.start[e + 1]!)
  if (!allowed) return { candStart: c.candStart, localCount, ids: c.ids }
  const candStart = new Int32Array(cands + 1)
  const ids = new Int32Array(c.ids.length)
  let at = 0
  for (let k = 0; k < cands; k++) {
    candStart[k] = at
    const base = c.candStart[k]!
    const l1 = base + localCount[k]!
    for (let j = base; j < l1; j++) if (allowed[c.ids[j]!]) ids[at++] = c.ids[j]!
    localCount[k] = at - candStart[k]!
    for (let j = l1; j < c.candStart[k + 1]!; j++) ids[at++] = c.ids[j]!
  }
  candStart[cands] = at
  return { candStart, localCount, ids: ids.subarray(0, at) }
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
