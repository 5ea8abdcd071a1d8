// Writing a model file: versioned JSON, deterministic (no clocks, fixed key order, rounded numbers), compact.
import type { LearnOptions } from '../inflect/learn.ts'
import { type CellRulesJson, encodeAllCellRules } from './cell-rules-codec.ts'
import { type CorpusJson, encodeCorpus } from './corpus-codec.ts'
import type { Model } from './model.ts'
import { encodeParadigm, type ParadigmJson } from './paradigm-codec.ts'
import { encodeAttested, encodeKept, type TableJson } from './table-codec.ts'
import { encodeWeights, featureNames, type WeightsJson } from './weights-codec.ts'

export const MODEL_FORMAT = 'formfold-model'
/** Major changes break old readers; minor ones only add what old readers may ignore. */
export const MODEL_VERSION = '2.0'

/** The whole file (FORMAT.md documents every field). */
export interface ModelJson {
  format: typeof MODEL_FORMAT
  version: string
  options: {
    tablesPerLemma: number
    tableFloor: number
    weightDecimals: number
    completion?: number
    completionTables?: number
    learn: LearnOptions
  }
  upos: string[]
  cellKeys: Record<string, string[]>
  inflectional: Record<string, string[]>
  feats: string[]
  paradigms: ParadigmJson[]
  /** Since 2.0: every ranker's local feature names, sorted; rankers store positions in it. */
  featureNames: string[]
  weights: WeightsJson
  cellRules: CellRulesJson[]
  entries: [string, number, number, TableJson][]
  /** Since 1.1: corpus counts that rerank candidate tables (absent when learned without a corpus). */
  corpus?: CorpusJson
}

/**
 * Serialize a model. The same model always gives the same text, byte for byte.
 * @example JSON.parse(encodeModel(model)).version // '1.0'
 */
export function encodeModel(model: Model): string {
  const { lexicon, book, weights } = model.inflection
  const upos = [...new Set([...Object.keys(lexicon.cellKeys), ...lexicon.entries.map((e) => e.upos)])]
  const uposId = new Map(upos.map((u, i) => [u, i]))
  const feats = ['_']
  const featsId = new Map([['_', 0]])
  const cellsOf = (u: string) => lexicon.cellKeys[u] ?? []
  const entries = lexicon.entries.map((e, i): [string, number, number, TableJson] => {
    let f = featsId.get(e.inherent)
    if (f === undefined) {
      f = feats.length
      feats.push(e.inherent)
      featsId.set(e.inherent, f)
    }
    const table = e.cells
      ? encodeAttested(e, book.memberOf[i] ?? -1, book.paradigms, cellsOf(e.upos))
      : encodeKept(model.kept[i] ?? [], cellsOf(e.upos), e.lemma, book.paradigms)
    return [e.lemma, uposId.get(e.upos)!, f, table]
  })
  const { tablesPerLemma, tableFloor, weightDecimals, completion, completionTables, learn } = model.options
  const names = featureNames([weights, ...model.inflection.cells.map((c) => c.weights)])
  const nameAt = new Map(names.map((n, i) => [n, i]))
  const json: ModelJson = {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    options: { tablesPerLemma, tableFloor, weightDecimals, completion, completionTables, learn },
    upos,
    cellKeys: lexicon.cellKeys,
    inflectional: lexicon.inflectional,
    feats,
    // Twins are not written: reading the file derives them again from the book (see twins.ts).
    paradigms: book.paradigms.flatMap((p) =>
      p.twinOf === undefined ? [encodeParadigm(p, cellsOf(p.upos))] : [],
    ),
    featureNames: names,
    weights: encodeWeights(weights, weightDecimals, nameAt),
    cellRules: encodeAllCellRules(model.inflection.cells, lexicon.entries, cellsOf, weightDecimals, nameAt),
    entries,
  }
  const corpus = encodeCorpus(model.inflection, model.corpusTokens ?? 0)
  if (corpus) json.corpus = corpus
  return JSON.stringify(json)
}
