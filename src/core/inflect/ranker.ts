// A log-linear ranker over candidate classes (paradigms, or one cell's rules): per-class shape weights
// plus weights shared by all classes (analogy strength, stem fit), trained by AdaGrad on the
// log-likelihood of the set of classes that are correct (several may be: their probabilities add up).

/** One training item: candidate classes, their shared features, and which candidates are correct. */
export interface RankerExample {
  local: string[]
  candidates: number[]
  shared: string[][]
  gold: number[]
}

/** Learned weights: `local` "feature\u0000class" → weight; `shared` feature → weight. */
export interface RankerWeights {
  local: Map<string, number>
  shared: Map<string, number>
}

export interface RankerOptions {
  epochs: number
  rate: number
  l2: number
  seed: number
}

export const DEFAULT_RANKER_OPTIONS: RankerOptions = { epochs: 12, rate: 0.3, l2: 3e-3, seed: 1 }

/**
 * Probabilities of the candidates (softmax of their scores).
 * @example scoreCandidates(w, ['b','s1:n'], [3, 7], [['sfx:2'], ['sfx:0']]) // [0.9, 0.1]
 */
export function scoreCandidates(w: RankerWeights, local: string[], candidates: number[], shared: string[][]): number[] {
  const s = candidates.map((c, i) => {
    let v = 0
    for (const f of local) v += w.local.get(`${f}\u0000${c}`) ?? 0
    for (const f of shared[i]!) v += w.shared.get(f) ?? 0
    return v
  })
  return softmax(s)
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
  local: Int32Array
  cand: Int32Array
  shared: Int32Array[]
  gold: Uint8Array
}

/** Train the ranker; examples are visited in a seeded shuffled order, so runs are identical. */
export function trainRanker(examples: RankerExample[], opts: RankerOptions = DEFAULT_RANKER_OPTIONS): RankerWeights {
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
  let nClasses = 0
  const coded: Coded[] = []
  for (const ex of examples) {
    if (ex.candidates.length < 2 || ex.gold.length === 0) continue
    const gold = new Uint8Array(ex.candidates.length)
    for (const g of ex.gold) gold[g] = 1
    for (const c of ex.candidates) nClasses = Math.max(nClasses, c + 1)
    coded.push({
      local: Int32Array.from(ex.local, (f) => id(localIds, f)),
      cand: Int32Array.from(ex.candidates),
      shared: ex.shared.map((fs) => Int32Array.from(fs, (f) => id(sharedIds, f))),
      gold,
    })
  }
  const nLocal = localIds.size * nClasses
  const wl = new Float64Array(nLocal)
  const gl = new Float64Array(nLocal)
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
      const n = ex.cand.length
      const scores = new Float64Array(n)
      for (let i = 0; i < n; i++) {
        const c = ex.cand[i]!
        let v = 0
        for (const f of ex.local) v += wl[f * nClasses + c]!
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
        const c = ex.cand[i]!
        for (const f of ex.local) {
          const k = f * nClasses + c
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
  for (const [f, fi] of localIds) {
    for (let c = 0; c < nClasses; c++) {
      const v = wl[fi * nClasses + c]!
      if (v !== 0) out.local.set(`${f}\u0000${c}`, v)
    }
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
