// What analysis needs besides the index, derived once per model: reversed rules, dictionary facts, caches.
import type { InflectionModel } from '../inflect/learn.ts'
import type { PredictedTable } from '../inflect/predict.ts'
import type { FormIndex } from './form-index.ts'
import { ReverseRules } from './reverse-rules.ts'
import { ByEntry } from '../lexicon/entry.ts'

/** What analysis reads: the inflection model (paradigms, rankers, lexicon) and the form index. */
export interface LookupModel {
  inflection: InflectionModel
  index: FormIndex
}

/** A bounded map that forgets the least recently set key first. */
export class BoundedCache<V> {
  private readonly map = new Map<string, V>()
  constructor(private readonly limit: number) {}

  get(key: string): V | undefined {
    return this.map.get(key)
  }

  set(key: string, value: V): V {
    if (this.map.size >= this.limit) this.map.delete(this.map.keys().next().value!)
    this.map.set(key, value)
    return value
  }
}

/** Dictionary facts and caches for one model. */
export interface LookupContext {
  reverse: ReverseRules
  /** Each bare lemma the dictionary lists → its inherent features. */
  listed: ByEntry<string>
  /** Each entry with a table → the cells it has (entries alike share one set: read only). */
  attested: ByEntry<ReadonlySet<string>>
  /** Per UPOS: the share of its lemmas that start with a capital (smoothed). */
  capitalShare: Map<string, number>
  tables: BoundedCache<PredictedTable[]>
}

const contexts = new WeakMap<InflectionModel, LookupContext>()
const CACHE_LIMIT = 4096

/**
 * The lookup context of a model, built on first use.
 * @example lookupContext(model).listed.has('Mantel', 'NOUN') // true for a bare lemma of the dictionary
 */
export function lookupContext(model: LookupModel): LookupContext {
  let ctx = contexts.get(model.inflection)
  if (ctx) return ctx
  const listed = new ByEntry<string>()
  const attested = new ByEntry<ReadonlySet<string>>()
  const caps = new Map<string, [number, number]>()
  // Tables of one UPOS mostly have the same cells: entries with the same cells share one (never changed) set.
  const cellSets = new Map<string, Set<string>>()
  for (const e of model.inflection.lexicon.entries) {
    const cells = e.cells
    if (cells) {
      const keys = cells.map((c) => c.key)
      const id = keys.join('\u0001')
      let set = cellSets.get(id)
      if (!set) {
        set = new Set(keys)
        cellSets.set(id, set)
      }
      attested.set(e.lemma, e.upos, set)
    } else listed.set(e.lemma, e.upos, e.inherent)
    const c = caps.get(e.upos) ?? [0, 0]
    if (isCapitalized(e.lemma)) c[0]++
    c[1]++
    caps.set(e.upos, c)
  }
  const capitalShare = new Map([...caps].map(([u, [cap, n]]) => [u, (cap + 1) / (n + 2)]))
  ctx = {
    reverse: new ReverseRules(model.inflection),
    listed,
    attested,
    capitalShare,
    tables: new BoundedCache(CACHE_LIMIT),
  }
  contexts.set(model.inflection, ctx)
  return ctx
}

/** Does the word start with an upper-case letter? */
export function isCapitalized(word: string): boolean {
  const first = word.charAt(0)
  return first !== first.toLowerCase()
}
