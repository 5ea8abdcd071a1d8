// The model: what learning a lexicon yields (paradigms, ranker, entries with their tables) plus the form index.
import { DEFAULT_LEARN_OPTIONS, type InflectionModel, type LearnOptions } from '../inflect/learn.ts'
import { applyParadigm } from '../inflect/paradigm.ts'
import { type Cell, sameCells } from '../lexicon/lexicon.ts'
import type { FormIndex } from '../lookup/form-index.ts'

/**
 * A table kept for a bare lemma. `cells` is null when its paradigm, applied to the lemma, gives it.
 * A table that `completes` licenses no form of its own: it only adds cells to forms the others license.
 */
export interface KeptTable {
  paradigm: number
  score: number
  cells: Cell[] | null
  completes?: true
}

export interface ModelOptions {
  learn: LearnOptions
  /** At most this many predicted tables are kept per bare lemma (recall: its few best tables license forms). */
  tablesPerLemma: number
  /** Tables less probable than this are not kept; the best one always is. */
  tableFloor: number
  /**
   * Weights are rounded to this many decimals, so the file and the model in memory are the same. 2 scores
   * as 4 did on the DDN13 dev sets (German train → dev, Finnish dev folds: every table figure equal, forms
   * within 0.0003) and stores each weight in about one byte less.
   */
  weightDecimals: number
  /**
   * A form a bare lemma's kept tables license also gets the other cells where its next-best tables (up to
   * `completionTables` in all) put it, each with its share of those tables smoothed by this much (0: off).
   */
  completion: number
  completionTables: number
}

/** Defaults chosen on the DDN13 German dev sets (see the lookup notes in FORMAT.md). */
export const DEFAULT_MODEL_OPTIONS: ModelOptions = {
  learn: DEFAULT_LEARN_OPTIONS,
  tablesPerLemma: 3,
  tableFloor: 0.1,
  weightDecimals: 2,
  completion: 0.02,
  completionTables: 4,
}

/**
 * A learned model. `kept[i]` belongs to `inflection.lexicon.entries[i]`: null for an entry with a table,
 * else its kept predicted tables, best first (empty when no paradigm applies).
 * @example buildModel(entries).index.get('Mäntel')?.[0] // { lemma: 'Mantel', source: 'predicted', ... }
 */
export interface Model {
  inflection: InflectionModel
  kept: (KeptTable[] | null)[]
  index: FormIndex
  options: ModelOptions
  /** Tokens of the corpus the model was learned with, when one was given. */
  corpusTokens?: number
}

/**
 * The cells of a kept table.
 * @example keptCells(model.inflection, 'Mantel', model.kept[7][0])[2].forms // ['Mäntel']
 */
export function keptCells(inflection: Pick<InflectionModel, 'book'>, lemma: string, t: KeptTable): Cell[] {
  if (t.cells) return t.cells
  const p = inflection.book.paradigms[t.paradigm]!
  const forms = applyParadigm(p, lemma) ?? []
  return p.cells.map((c, i) => ({ key: c.key, forms: forms[i] ?? [] }))
}

/** Same cells in the same order with the same variants in the same order (lexicon.ts). */
export { sameCells }
