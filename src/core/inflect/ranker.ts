// A log-linear ranker over candidate classes (paradigms, or one cell's rules): per-class shape weights
// plus weights shared by all classes (analogy strength, stem fit), trained by AdaGrad on the
// log-likelihood of the set of classes that are correct (several may be: their probabilities add up);
// training is in ranker-train.ts.
import { FeatureIndex } from './feature-index.ts'

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
   * A cell's rule ranker trains on at most max(`cellFloor`, `cellPerRule` × its rule count) examples (and
   * `maxExamples`); absent or 0: no such bound. A cell with few rules learns its choice from far fewer
   * tables than the cap, and this is a saving for large lexicons only: with a floor of 1,000 the DDN13 dev
   * figures were within a lemma (de-noun 0.775 → 0.780), but a 2,364-table set then learned most cells from
   * fewer than half its tables, so the floor is 3,000, the size from which the other large-lexicon
   * approximations (`supportFrom`, `pruneFrom`) apply too: below it every table counts.
   */
  cellPerRule?: number
  cellFloor?: number
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
  /**
   * A ranker trained on at least `fewerEpochsFrom` examples makes `largeEpochs` passes instead of `epochs`
   * (absent: always `epochs`). Set for the cell rankers (learn.ts), where a large set's many updates per pass
   * made 12 passes fit it too closely.
   */
  largeEpochs?: number
  fewerEpochsFrom?: number
}

/**
 * The options a ranker trains on `n` examples with (fewer passes over a large set, see `largeEpochs`).
 * @example epochsFor({ ...DEFAULT_RANKER_OPTIONS, largeEpochs: 6, fewerEpochsFrom: 3000 }, 5000).epochs // 6
 */
export function epochsFor(o: RankerOptions, n: number): RankerOptions {
  return o.largeEpochs !== undefined && n >= (o.fewerEpochsFrom ?? 0) ? { ...o, epochs: o.largeEpochs } : o
}

export const DEFAULT_RANKER_OPTIONS: RankerOptions = {
  epochs: 12,
  rate: 0.3,
  l2: 3e-3,
  seed: 1,
  maxExamples: 6000,
  cellPerRule: 100,
  cellFloor: 3000,
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
  const n = candidates.length
  // Scores in a scratch buffer reused across calls (a fresh typed array per call is memory outside the heap).
  if (n > scoreScratch.length) scoreScratch = new Float64Array(2 * n)
  const s = scoreScratch
  s.fill(0, 0, n)
  const cls = w.classOf ? candidates.map((c) => w.classOf![c] ?? c) : candidates
  const at = positionsByClass(cls)
  const { start, cls: classOfWeight, weight } = byFeature
  for (const f of local) {
    const slot = byFeature.slotOf(f)
    if (slot === undefined) continue
    const from = start[slot]!
    const to = start[slot + 1]!
    // Whichever is fewer: the feature's classes, or the candidates (each score still sums in feature order).
    if (to - from < n) {
      for (let k = from; k < to; k++) {
        const c = classOfWeight[k]!
        if (c >= at.stamp.length || at.stamp[c] !== at.call) continue
        const v = weight[k]!
        for (let i = at.head[c]!; i >= 0; i = at.next[i]!) s[i]! += v
      }
    } else {
      for (let i = 0; i < n; i++) {
        const v = byFeature.weightOf(slot, cls[i]!)
        if (v !== undefined) s[i]! += v
      }
    }
  }
  for (let i = 0; i < n; i++) for (const f of shared[i]!) s[i]! += w.shared.get(f) ?? 0
  return softmax(s, n)
}

let scoreScratch = new Float64Array(256)

/** Candidate positions by class, in scratch arrays reused across calls (valid where stamp[c] === call). */
const scratch = { call: 0, stamp: new Int32Array(64), head: new Int32Array(64), next: new Int32Array(64) }

function positionsByClass(cls: readonly number[]): typeof scratch {
  const at = scratch
  at.call = (at.call + 1) | 0
  if (at.call === 0) {
    at.stamp.fill(-1)
    at.call = 1
  }
  let max = 0
  for (const c of cls) if (c > max) max = c
  if (max >= at.stamp.length) {
    at.stamp = new Int32Array(2 * (max + 1))
    at.head = new Int32Array(2 * (max + 1))
  }
  if (cls.length > at.next.length) at.next = new Int32Array(2 * cls.length)
  for (let i = cls.length - 1; i >= 0; i--) {
    const c = cls[i]!
    at.next[i] = at.stamp[c] === at.call ? at.head[c]! : -1
    at.head[c] = i
    at.stamp[c] = at.call
  }
  return at
}

const featureIndexes = new WeakMap<Map<string, number>, FeatureIndex>()
const featureIndexSources = new WeakMap<Map<string, number>, () => FeatureIndex>()

/**
 * Say how to build the feature index of a weights map without reading the map (a model file's weights are
 * stored feature by feature, so its reader can build it directly and leave the map itself undecoded).
 * @example provideFeatureIndex(w.local, () => FeatureIndex.fromGroups([['s1:e', [[3, 0.5]]]]))
 */
export function provideFeatureIndex(local: Map<string, number>, build: () => FeatureIndex): void {
  featureIndexSources.set(local, build)
}

/** `w.local` regrouped as feature → class → weight (built once per weights map, then reused). */
function featureIndex(w: RankerWeights): FeatureIndex {
  let index = featureIndexes.get(w.local)
  if (index) return index
  const source = featureIndexSources.get(w.local)
  if (source) {
    index = source()
    featureIndexes.set(w.local, index)
    return index
  }
  const groups = new Map<string, [number, number][]>()
  for (const [key, v] of w.local) {
    const cut = key.lastIndexOf('\u0000')
    const f = key.slice(0, cut)
    let classes = groups.get(f)
    if (!classes) {
      classes = []
      groups.set(f, classes)
    }
    classes.push([Number(key.slice(cut + 1)), v])
  }
  index = FeatureIndex.fromGroups(groups)
  featureIndexes.set(w.local, index)
  return index
}

/** Softmax of the first `n` scores. */
function softmax(s: ArrayLike<number>, n: number): number[] {
  let max = Number.NEGATIVE_INFINITY
  for (let i = 0; i < n; i++) max = Math.max(max, s[i]!)
  const e: number[] = []
  let z = 0
  for (let i = 0; i < n; i++) {
    const x = Math.exp(s[i]! - max)
    e.push(x)
    z += x
  }
  for (let i = 0; i < n; i++) e[i] = e[i]! / z
  return e
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
