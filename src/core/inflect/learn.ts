// Learning: lexicon → paradigm book → ranker that assigns paradigms to lemmas from their shape.
import type { Entry } from '../lexicon/entry.ts'
import { buildLexicon, type Lexicon } from '../lexicon/lexicon.ts'
import { CandidateFinder } from './candidates.ts'
import { type CellRuleModel, learnCellRules } from './cell-rules.ts'
import type { CorpusEvidence } from './corpus-evidence.ts'
import { sampleByClass } from './example-sample.ts'
import { extractParadigms, type ParadigmBook, reproduces } from './extract.ts'
import { DEFAULT_FEATURE_OPTIONS, type FeatureOptions, lemmaFeatures } from './features.ts'
import {
  DEFAULT_RANKER_OPTIONS,
  type RankerExample,
  type RankerOptions,
  type RankerWeights,
  trainRanker,
} from './ranker.ts'

/** How the whole-table ranker and the per-cell rule rankers are combined (see predict.ts). */
export interface CombineOptions {
  /** Weight of the per-cell log-probabilities, summed over cells and divided by the cell count. */
  cellWeight: number
  /** Floor probabilities, so one unseen choice does not veto a table. */
  tableFloor: number
  cellFloor: number
  /** The cell sum is divided by (cells ** meanPower): 1 is a mean, 0 a plain sum. */
  meanPower: number
  /** Share of a cell's form probability taken from its own rule ranker rather than from the tables. */
  cellMix: number
}

export interface LearnOptions {
  features: FeatureOptions
  ranker: RankerOptions
  combine: CombineOptions
}

export const DEFAULT_LEARN_OPTIONS: LearnOptions = {
  features: DEFAULT_FEATURE_OPTIONS,
  ranker: DEFAULT_RANKER_OPTIONS,
  combine: { cellWeight: 10, tableFloor: 0.001, cellFloor: 0.001, meanPower: 1, cellMix: 0.5 },
}

/** What learning produces: the lexicon, its paradigm book, and the weights that choose among paradigms. */
export interface InflectionModel {
  lexicon: Lexicon
  book: ParadigmBook
  weights: RankerWeights
  finder: CandidateFinder
  /** One rule ranker per (UPOS, cell). */
  cells: CellRuleModel[]
  /** Form counts of the user's corpus, when one was given: evidence between candidate tables. */
  corpus?: CorpusEvidence
  options: LearnOptions
}

/**
 * Learn paradigms from the tables of a lexicon and train the paradigm ranker.
 * @example learnInflection(entries).book.paradigms.length // 136
 */
export function learnInflection(
  entries: Iterable<Entry>,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
): InflectionModel {
  const lexicon = buildLexicon(entries)
  return learnFromLexicon(lexicon, options)
}

/** As learnInflection, from a lexicon already built. */
export function learnFromLexicon(
  lexicon: Lexicon,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
): InflectionModel {
  const book = extractParadigms(lexicon)
  const members: string[][] = book.paradigms.map(() => [])
  book.memberOf.forEach((p, i) => {
    if (p >= 0) members[p]!.push(lexicon.entries[i]!.lemma)
  })
  const finder = new CandidateFinder(book.paradigms, members)
  const tables = lexicon.entries.flatMap((e, i) => (e.cells ? [i] : []))
  const picked = sampleByClass(
    tables.map((i) => book.memberOf[i]!),
    options.ranker.maxExamples ?? 0,
    options.ranker.seed,
  )
  const examples = picked.map((t): RankerExample => {
    const i = tables[t]!
    const e = lexicon.entries[i]!
    const own = book.memberOf[i]!
    const found = finder.find(e.lemma, e.upos, own)
    const gold: number[] = []
    found.forEach((c, k) => {
      if (c.paradigm === own || reproduces(book.paradigms[c.paradigm]!, e)) gold.push(k)
    })
    return {
      local: lemmaFeatures(e.lemma, e.inherent, options.features),
      candidates: found.map((c) => c.paradigm),
      shared: found.map((c) => c.shared),
      gold,
    }
  })
  const weights = trainRanker(examples, options.ranker)
  const cells =
    options.combine.cellWeight > 0 || options.combine.cellMix > 0
      ? learnCellRules(lexicon, options.features, options.ranker)
      : []
  return { lexicon, book, weights, finder, cells, options }
}
