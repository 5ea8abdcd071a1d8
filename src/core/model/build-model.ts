// Building a model: learn from the tables, keep the best few tables of every bare lemma, index all forms.

import { corpusEvidence } from '../inflect/corpus-evidence.ts'
import { type InflectionModel, learnFromLexicon } from '../inflect/learn.ts'
import { predictTables } from '../inflect/predict.ts'
import type { Entry } from '../lexicon/entry.ts'
import { buildLexicon, type LexEntry } from '../lexicon/lexicon.ts'
import { buildFormIndex, roundScore } from '../lookup/build-index.ts'
import {
  DEFAULT_MODEL_OPTIONS,
  type KeptTable,
  keptCells,
  type Model,
  type ModelOptions,
  sameCells,
} from './model.ts'
import { roundModelWeights } from './weights-codec.ts'

/**
 * Learn a model from dictionary entries (tables and bare lemmas).
 * @example buildModel([{ lemma: 'Tag', upos: 'NOUN', feats: '_', forms: [...] }, { lemma: 'Mantel', upos: 'NOUN', feats: '_' }])
 */
export function buildModel(
  entries: Iterable<Entry>,
  opts: Partial<ModelOptions> = {},
  corpus?: CorpusCounts,
): Model {
  const options = { ...DEFAULT_MODEL_OPTIONS, ...opts }
  const learned = learnFromLexicon(buildLexicon(entries), options.learn)
  if (!corpus) return modelFromInflection(learned, options)
  learned.corpus = corpusEvidence(corpus.counts, learned.lexicon)
  const model = modelFromInflection(learned, options)
  model.corpusTokens = corpus.tokens
  return model
}

/** Form counts of a raw-text corpus (see `formfold learn --corpus`). */
export interface CorpusCounts {
  counts: Map<string, number>
  tokens: number
}

/**
 * How many bare lemmas have a different best table because of the corpus (the model against itself
 * without its corpus).
 * @example corpusChangedLemmas(model) // 37
 */
export function corpusChangedLemmas(model: Model): number {
  const { corpus, ...rest } = model.inflection
  if (!corpus) return 0
  const plain = { ...rest }
  let changed = 0
  model.inflection.lexicon.entries.forEach((e, i) => {
    const best = model.kept[i]?.[0]
    if (!best) return
    const before = predictTables(plain, e.lemma, e.upos, e.inherent, 1)[0]
    const after = keptCells(model.inflection, e.lemma, best)
    if (before && !sameCells(before.cells, after)) changed++
  })
  return changed
}

/**
 * Complete a learned inflection model: round its weights (the model then predicts exactly as its file
 * will), keep the best tables of each bare lemma, build the index.
 * @example modelFromInflection(learnInflection(entries)).index.formCount // 18912
 */
export function modelFromInflection(learned: InflectionModel, opts: Partial<ModelOptions> = {}): Model {
  const options = { ...DEFAULT_MODEL_OPTIONS, ...opts }
  const inflection = roundModelWeights(learned, options.weightDecimals)
  return assembleModel(inflection, keepAll(inflection, options), options)
}

/**
 * The kept tables of every bare lemma of a rounded model (null for a table, and for an entry `pick` leaves out).
 * @example keepAll(inflection, DEFAULT_MODEL_OPTIONS)[7] // [{ paradigm: 3, score: 0.91, cells: null }]
 */
export function keepAll(
  inflection: InflectionModel,
  options: ModelOptions,
  pick: (e: LexEntry) => boolean = () => true,
): (KeptTable[] | null)[] {
  return inflection.lexicon.entries.map((e) => (e.cells || !pick(e) ? null : keepTables(inflection, e, options)))
}

/**
 * Add bare lemmas to a model without learning again (a dictionary that lists words but not their
 * tables). Lemmas the model already has under the same UPOS are left as they are.
 * @example listLemmas(model, [{ lemma: 'Mantel', upos: 'NOUN', feats: '_' }]).index.get('Mänteln')
 */
export function listLemmas(model: Model, lemmas: Iterable<Pick<Entry, 'lemma' | 'upos' | 'feats'>>): Model {
  const { lexicon, book } = model.inflection
  const have = new Set(lexicon.entries.map((e) => `${e.lemma}\t${e.upos}`))
  const added: LexEntry[] = []
  for (const l of lemmas) {
    const key = `${l.lemma}\t${l.upos}`
    if (have.has(key)) continue
    have.add(key)
    added.push({ lemma: l.lemma, upos: l.upos, inherent: l.feats || '_', cells: null })
  }
  const inflection: InflectionModel = {
    ...model.inflection,
    lexicon: { ...lexicon, entries: [...lexicon.entries, ...added] },
    book: { ...book, memberOf: [...book.memberOf, ...added.map(() => -1)] },
  }
  const kept = [...model.kept, ...added.map((e) => keepTables(inflection, e, model.options))]
  return assembleModel(inflection, kept, model.options)
}

/** The index over an inflection model and its kept tables (also what reading a model file ends with). */
export function assembleModel(
  inflection: InflectionModel,
  kept: (KeptTable[] | null)[],
  options: ModelOptions,
): Model {
  const entries = inflection.lexicon.entries
  const index = buildFormIndex(
    inflection,
    (i) =>
      (kept[i] ?? []).map((t) => ({
        paradigm: t.paradigm,
        score: t.score,
        cells: keptCells(inflection, entries[i]!.lemma, t),
        completes: t.completes === true,
      })),
    options.completion,
  )
  return { inflection, kept, index, options }
}

/** The best tables of a bare lemma: at most `tablesPerLemma`, none below `tableFloor` except the best. */
function keepTables(inflection: InflectionModel, e: LexEntry, opts: ModelOptions): KeptTable[] {
  const ids = paradigmIndex(inflection)
  const limit =
    opts.completion > 0 ? Math.max(opts.tablesPerLemma, opts.completionTables) : opts.tablesPerLemma
  const tables = predictTables(inflection, e.lemma, e.upos, e.inherent, limit)
  const out: KeptTable[] = []
  let licensing = 0
  for (const t of tables) {
    const score = roundScore(t.score)
    const completes =
      licensing >= opts.tablesPerLemma || (licensing > 0 && (score < opts.tableFloor || score <= 0))
    if (completes && opts.completion <= 0) break
    const kept: KeptTable = { paradigm: ids.get(t.paradigm)!, score, cells: null }
    if (completes) kept.completes = true
    else licensing++
    if (!sameCells(keptCells(inflection, e.lemma, kept), t.cells))
      kept.cells = t.cells.map((c) => ({ key: c.key, forms: [...c.forms] }))
    out.push(kept)
  }
  return out
}

const idCache = new WeakMap<object, Map<string, number>>()

function paradigmIndex(inflection: InflectionModel): Map<string, number> {
  let m = idCache.get(inflection.book.paradigms)
  if (!m) {
    m = new Map(inflection.book.paradigms.map((p, i) => [p.id, i]))
    idCache.set(inflection.book.paradigms, m)
  }
  return m
}
