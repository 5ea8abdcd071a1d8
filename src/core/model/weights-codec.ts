// Ranker weights in the model file: rounded to fixed decimals, stored sparsely as one base64 VLQ string.
// Base64 VLQ is the integer encoding of Source Map Revision 3 (signed, 5 bits per character); `vlq` implements it.
import { decode, encode } from 'vlq'
import type { InflectionModel } from '../inflect/learn.ts'
import { FeatureIndex, type NameTable } from '../inflect/feature-index.ts'
import { provideFeatureIndex, type RankerWeights } from '../inflect/ranker.ts'
import { LazyMap } from './lazy-map.ts'

/**
 * The file form. `features` sorted: the names themselves, or (since 2.0) a VLQ string of ascending
 * positions in the model's `featureNames`, delta-coded, so rankers sharing a feature store its name once;
 * `local` is, per feature in that order, the number of its classes and then (class − previous class,
 * weight × scale) pairs; `shared` feature → weight × scale.
 */
export interface WeightsJson {
  scale: number
  features: string[] | string
  local: string
  shared: Record<string, number>
}

/**
 * Every local feature name of some weights, sorted: the model's one list of feature names.
 * @example featureNames([w]) // ['p1:a', 's1:e', …]
 */
export function featureNames(all: readonly RankerWeights[]): string[] {
  const names = new Set<string>()
  for (const w of all) for (const k of w.local.keys()) names.add(k.slice(0, k.lastIndexOf('\u0000')))
  return [...names].sort(byCodeUnit)
}

/** The feature names of one ranker's file form, looked up in the model's list when stored as positions. */
function namesOf(json: Pick<WeightsJson, 'features'>, names: readonly string[] | undefined): string[] {
  if (Array.isArray(json.features)) return json.features
  if (!names) throw new Error('weights: feature positions without the model featureNames')
  let at = 0
  return decode(json.features).map((d) => {
    at += d
    const name = names[at]
    if (name === undefined) throw new Error(`weights: no feature name ${at}`)
    return name
  })
}

/**
 * Round every weight to `decimals` places and drop those that become 0 (they change nothing).
 * @example roundWeights({ local: new Map([['b\u00003', 0.123456]]), shared: new Map() }, 4).local.get('b\u00003') // 0.1235
 */
export function roundWeights(
  w: RankerWeights,
  decimals: number,
  done: Map<Map<string, number>, Map<string, number>> = new Map(),
): RankerWeights {
  const scale = 10 ** decimals
  // Cells that share a weights map (see cell-rules.ts) share its rounded copy too: rounded once.
  const round = (m: Map<string, number>) => {
    const seen = done.get(m)
    if (seen) return seen
    const out = new Map<string, number>()
    for (const [k, v] of m) {
      const r = Math.round(v * scale)
      if (r !== 0) out.set(k, r / scale)
    }
    done.set(m, out)
    return out
  }
  return { ...w, local: round(w.local), shared: round(w.shared) }
}

/**
 * An inflection model with every weight rounded (the table ranker and each cell's rule ranker).
 * @example roundModelWeights(learned, 3).weights.local.size <= learned.weights.local.size // true
 */
export function roundModelWeights(m: InflectionModel, decimals: number): InflectionModel {
  const done = new Map<Map<string, number>, Map<string, number>>()
  return {
    ...m,
    weights: roundWeights(m.weights, decimals),
    cells: m.cells.map((c) => ({ ...c, weights: roundWeights(c.weights, decimals, done) })),
  }
}

/**
 * Write rounded weights sparsely: features sorted, each feature's classes ascending and delta-coded.
 * @example encodeWeights(w, 3).local // 'EGqBC…'
 */
export function encodeWeights(
  w: RankerWeights,
  decimals: number,
  names?: ReadonlyMap<string, number>,
): WeightsJson {
  const scale = 10 ** decimals
  const byFeature = new Map<string, [number, number][]>()
  for (const [k, v] of w.local) {
    const cut = k.lastIndexOf('\u0000')
    const f = k.slice(0, cut)
    let list = byFeature.get(f)
    if (!list) {
      list = []
      byFeature.set(f, list)
    }
    list.push([Number(k.slice(cut + 1)), Math.round(v * scale)])
  }
  const features = [...byFeature.keys()].sort(byCodeUnit)
  const ints: number[] = []
  for (const f of features) {
    const list = byFeature.get(f)!.sort((a, b) => a[0] - b[0])
    ints.push(list.length)
    let prev = 0
    for (const [c, v] of list) {
      ints.push(c - prev, v)
      prev = c
    }
  }
  const shared: Record<string, number> = {}
  for (const f of [...w.shared.keys()].sort(byCodeUnit)) shared[f] = Math.round(w.shared.get(f)! * scale)
  if (!names) return { scale, features, local: encode(ints), shared }
  let prev = 0
  const positions = features.map((f) => {
    const at = names.get(f)
    if (at === undefined) throw new Error(`weights: feature ${f} is not in the model featureNames`)
    const d = at - prev
    prev = at
    return d
  })
  return { scale, features: encode(positions), local: encode(ints), shared }
}

/**
 * Read weights back; a weight is its integer divided by `scale`, which gives the rounded double exactly.
 * @example decodeWeights(encodeWeights(w, 3)).local.get('s2:el\u00003') // 0.152
 */
export function decodeWeights(json: WeightsJson, names?: readonly string[]): RankerWeights {
  // The local weights are most of a model file: they are decoded when the ranker first needs them. Only
  // their own fields are kept for that (the shared weights' record would otherwise stay alive beside them).
  const file = { scale: json.scale, features: json.features, local: json.local }
  const local = new LazyMap<string, number>(function* () {
    for (const [f, c, w] of localByFeature(file, names).entries()) yield [`${f}\u0000${c}`, w] as const
  })
  // Ranking reads weights feature by feature: that index is built straight from the file's layout.
  provideFeatureIndex(local, () => localByFeature(file, names))
  const shared = new Map<string, number>()
  for (const f of Object.keys(json.shared)) shared.set(f, json.shared[f]! / json.scale)
  return { local, shared }
}

/** The local weights of a file grouped by feature, in the file's order (its layout, decoded). */
function localByFeature(
  json: Pick<WeightsJson, 'scale' | 'features' | 'local'>,
  names?: readonly string[],
): FeatureIndex {
  const ints = decode(json.local)
  let at = 0
  const classesOf = () => {
    const n = ints[at++]!
    const classes: [number, number][] = []
    let c = 0
    for (let k = 0; k < n; k++) {
      c += ints[at++]!
      classes.push([c, ints[at++]! / json.scale])
    }
    return classes
  }
  if (typeof json.features === 'string' && names) {
    // Positions in the model's names: the ranker finds its slots through the model's one name table.
    const table = nameTableOf(names)
    let p = 0
    const groups = decode(json.features).map((d) => {
      p += d
      if (names[p] === undefined) throw new Error(`weights: no feature name ${p}`)
      return [p, classesOf()] as const
    })
    return FeatureIndex.fromTableGroups(table, groups)
  }
  return FeatureIndex.fromGroups(namesOf(json, names).map((f) => [f, classesOf()] as const))
}

const nameTables = new WeakMap<readonly string[], NameTable>()

/** The name table of a model's feature names, made once per list. */
function nameTableOf(names: readonly string[]): NameTable {
  let t = nameTables.get(names)
  if (!t) {
    t = { names, position: new Map(names.map((f, i) => [f, i])) }
    nameTables.set(names, t)
  }
  return t
}

function byCodeUnit(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}
