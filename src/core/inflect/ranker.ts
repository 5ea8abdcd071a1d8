// A log-linear ranker over candidate classes (paradigms, or one cell's rules): per-class shape weights
// plus weights shared by all classes (analogy strength, stem fit), trained by AdaGrad on the
// log-likelihood of the set of classes that are correct (several may be: their probabilities add up).

/** One training item: candidate classes, their shared features, and which candidates are correct. */
export interface RankerExample {
  local: string[]
  /** Candidate classes as their local weights know them (see `RankerWeights.classOf`). */
  candidates: number[]
  shared: string[][]
  gold: number[]
}

/** Learned weights: `local` "feature\u0000class" → weight; `shared` feature → weight. */
export interface RankerWeights {
  local: Map<string, number>
  shared: Map<string, number>
  /**
   * The class whose local weights a candidate uses, when several share them (a paradigm and its twin, see
   * twins.ts); absent or out of range: its own. Not stored: rebuilt with the twins.
   */
  classOf?: readonly number[]
}

export interface RankerOptions {
  epochs: number
  rate: number
  l2: number
  seed: number
  /** Callers train on at most this many examples (a sample stratified by class, see example-sample.ts); 0 = all. */
  maxExamples: number
  /**
   * Lemma-shape weights smaller than this in magnitude are dropped after training (0: none), in a ranker
   * trained on at least `pruneFrom` examples: there most small weights are nudges from single examples, and
   * dropping them shrinks the model and regularizes; a small lexicon needs every weight it has. Measured on
   * npm German verbs and nouns (5,000 train tables each, with supported features): 0.06 gave 0.802 / 0.9828
   * and 0.959 / 0.9821 (table / form) against 0.800 / 0.9819 and 0.959 / 0.9825 without, 38% fewer cell
   * weights; 0.12 gave 0.799 / 0.9826 and 0.958 / 0.9815. (0.2 from 1,000 examples moved the DDN13 German
   * figures within noise, −1 to −7 points on Finnish and Spanish dev at larger values.)
   */
  prune: number
  pruneFrom: number
  /**
   * Which (lemma-shape feature, class) pairs get a weight: `all` every pair some example offers (the
   * candidates' features, gold or not), `gold` only pairs seen with a correct class — the supported feature
   * set of maximum-entropy practice (common practice). `gold` keeps far fewer weights, since most offered
   * pairs are a wrong candidate's feature in a single example. Measured (npm German verbs, 5,000 train
   * tables, 794 test): `all` 0.792 table / 0.9823 form with 1.33M table-ranker weights, `gold` 0.800 / 0.9805
   * with 42k, and learning took half the time; DDN13 dev sets within a point either way.
   */
  support?: 'all' | 'gold'
  /** With `gold` support, a pair offered by at least this many examples is kept too (0: never). */
  supportMin?: number
  /**
   * `gold` support applies to rankers trained on at least this many examples; smaller ones keep `all`
   * (at 1,000 npm German verb tables `gold` cost 0.4 table / 0.6 form points, at 5,000 it gained).
   */
  supportFrom?: number
  /** Lemma-shape features seen in fewer examples than this get no weights (0 or 1: all do). */
  minFeature?: number
}

export const DEFAULT_RANKER_OPTIONS: RankerOptions = {
  epochs: 12,
  rate: 0.3,
  l2: 3e-3,
  seed: 1,
  maxExamples: 6000,
  prune: 0.06,
  pruneFrom: 3000,
  support: 'gold',
  supportMin: 0,
  supportFrom: 3000,
}

/**
 * Probabilities of the candidates (softmax of their scores).
 * @example scoreCandidates(w, ['b','s1:n'], [3, 7], [['sfx:2'], ['sfx:0']]) // [0.9, 0.1]
 */
export function scoreCandidates(
  w: RankerWeights,
  local: string[],
  candidates: number[],
  shared: string[][],
): number[] {
  const byFeature = featureIndex(w)
  const s = new Float64Array(candidates.length)
  const cls = w.classOf ? candidates.map((c) => w.classOf![c] ?? c) : candidates
  for (const f of local) {
    const classes = byFeature.get(f)
    if (!classes) continue
    for (let i = 0; i < candidates.length; i++) s[i]! += classes.get(cls[i]!) ?? 0
  }
  for (let i = 0; i < candidates.length; i++) for (const f of shared[i]!) s[i]! += w.shared.get(f) ?? 0
  return softmax(s)
}

const featureIndexes = new WeakMap<Map<string, number>, Map<string, Map<number, number>>>()
const featureIndexSources = new WeakMap<Map<string, number>, () => Map<string, Map<number, number>>>()

/**
 * Say how to build the feature index of a weights map without reading the map (a model file's weights are
 * stored feature by feature, so its reader can build it directly and leave the map itself undecoded).
 * @example provideFeatureIndex(w.local, () => new Map([['s1:e', new Map([[3, 0.5]])]]))
 */
export function provideFeatureIndex(local: Map<string, number>, build: () => Map<string, Map<number, number>>): void {
  featureIndexSources.set(local, build)
}

/** `w.local` regrouped as feature → class → weight (built once per weights map, then reused). */
function featureIndex(w: RankerWeights): Map<string, Map<number, number>> {
  let index = featureIndexes.get(w.local)
  if (index) return index
  const source = featureIndexSources.get(w.local)
  if (source) {
    index = source()
    featureIndexes.set(w.local, index)
    return index
  }
  index = new Map()
  for (const [key, v] of w.local) {
    const cut = key.lastIndexOf('\u0000')
    const f = key.slice(0, cut)
    let classes = index.get(f)
    if (!classes) {
      classes = new Map()
      index.set(f, classes)
    }
    classes.set(Number(key.slice(cut + 1)), v)
  }
  featureIndexes.set(w.local, index)
  return index
}

function softmax(s: ArrayLike<number>): number[] {
  let max = Number.NEGATIVE_INFINITY
  for (let i = 0; i < s.length; i++) max = Math.max(max, s[i]!)
  const e: number[] = []
  let z = 0
  for (let i = 0; i < s.length; i++) {
    const x = Math.exp(s[i]! - max)
    e.push(x)
    z += x
  }
  return e.map((x) => x / z)
}

interface Coded {
  /** Weight slot of (local feature j, candidate i) at j * candidates + i. */
  slots: Int32Array
  nLocal: number
  shared: Int32Array[]
  gold: Uint8Array
}

/**
 * Train the ranker; examples are visited in a seeded shuffled order, so runs are identical. Weights are kept
 * only for the (feature, class) pairs some example can touch, so memory grows with the examples, not with
 * features × classes.
 */
export function trainRanker(
  examples: RankerExample[],
  opts: RankerOptions = DEFAULT_RANKER_OPTIONS,
): RankerWeights {
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
  const pairSlots = new Map<number, number>() // feature id * 2^21 + class → slot
  const pairOf: number[] = []
  const usable = examples.filter((ex) => ex.candidates.length >= 2 && ex.gold.length > 0)
  const goldOnly = opts.support === 'gold' && usable.length >= (opts.supportFrom ?? 0)
  const supported = goldOnly ? new Set<number>() : undefined
  if (supported) {
    const min = opts.supportMin ?? 0
    const offered = new Map<number, number>()
    for (const ex of usable)
      for (const f of ex.local) {
        const fi = id(localIds, f)
        for (const g of ex.gold) supported.add(fi * 2097152 + ex.candidates[g]!)
        if (min > 0)
          for (const c of ex.candidates) {
            const pair = fi * 2097152 + c
            const k = (offered.get(pair) ?? 0) + 1
            offered.set(pair, k)
            if (k === min) supported.add(pair)
          }
      }
  }
  const minFeature = opts.minFeature ?? 0
  const featureCount = new Map<string, number>()
  if (minFeature > 1) for (const ex of usable) for (const f of ex.local) featureCount.set(f, (featureCount.get(f) ?? 0) + 1)
  const coded: Coded[] = []
  for (const ex of usable) {
    const n = ex.candidates.length
    const gold = new Uint8Array(n)
    for (const g of ex.gold) gold[g] = 1
    const slots = new Int32Array(ex.local.length * n)
    ex.local.forEach((f, j) => {
      const fi = id(localIds, f)
      for (let i = 0; i < n; i++) {
        const pair = fi * 2097152 + ex.candidates[i]!
        let slot = pairSlots.get(pair)
        if (slot === undefined) {
          if ((supported && !supported.has(pair)) || (minFeature > 1 && featureCount.get(f)! < minFeature)) slot = -1
          else {
            slot = pairOf.length
            pairOf.push(pair)
          }
          pairSlots.set(pair, slot)
        }
        slots[j * n + i] = slot
      }
    })
    coded.push({
      slots,
      nLocal: ex.local.length,
      shared: ex.shared.map((fs) => Int32Array.from(fs, (f) => id(sharedIds, f))),
      gold,
    })
  }
  const wl = new Float64Array(pairOf.length)
  const gl = new Float64Array(pairOf.length)
  const ws = new Float64Array(sharedIds.size)
  const gs = new Float64Array(sharedIds.size)
  const rand = mulberry32(opts.seed)
  const order = coded.map((_, i) => i)
  const { rate, l2 } = opts
  for (let epoch = 0; epoch < opts.epochs; epoch++) {
    for (let i = order.length - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1))
      ;[order[i], order[j]] = [order[j]!, order[i]!]
    }
    for (const idx of order) {
      const ex = coded[idx]!
      const n = ex.gold.length
      const scores = new Float64Array(n)
      for (let i = 0; i < n; i++) {
        let v = 0
        for (let j = 0; j < ex.nLocal; j++) {
          const k = ex.slots[j * n + i]!
          if (k >= 0) v += wl[k]!
        }
        for (const f of ex.shared[i]!) v += ws[f]!
        scores[i] = v
      }
      const p = softmax(scores)
      let zg = 0
      for (let i = 0; i < n; i++) if (ex.gold[i]) zg += p[i]!
      if (zg <= 0) continue
      for (let i = 0; i < n; i++) {
        const grad = p[i]! - (ex.gold[i] ? p[i]! / zg : 0)
        if (Math.abs(grad) < 1e-6) continue
        for (let j = 0; j < ex.nLocal; j++) {
          const k = ex.slots[j * n + i]!
          if (k < 0) continue
          const g = grad + l2 * wl[k]!
          gl[k]! += g * g
          wl[k]! -= (rate * g) / Math.sqrt(gl[k]! + 1e-8)
        }
        for (const f of ex.shared[i]!) {
          const g = grad + l2 * ws[f]!
          gs[f]! += g * g
          ws[f]! -= (rate * g) / Math.sqrt(gs[f]! + 1e-8)
        }
      }
    }
  }
  const out: RankerWeights = { local: new Map(), shared: new Map() }
  const prune = coded.length >= (opts.pruneFrom ?? 0) ? (opts.prune ?? 0) : 0
  const names = [...localIds.keys()]
  const bySlot = pairOf.map((_, s) => s).sort((a, b) => pairOf[a]! - pairOf[b]!) // feature order, then class
  for (const s of bySlot) {
    const v = wl[s]!
    if (v !== 0 && Math.abs(v) >= prune) out.local.set(`${names[Math.floor(pairOf[s]! / 2097152)]}\u0000${pairOf[s]! % 2097152}`, v)
  }
  for (const [f, fi] of sharedIds) if (ws[fi] !== 0) out.shared.set(f, ws[fi]!)
  return out
}

/** A small seeded generator (mulberry32), so training is deterministic everywhere. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}
