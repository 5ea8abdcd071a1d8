// Learning: lexicon → paradigm book → ranker that assigns paradigms to lemmas from their shape.
import type { Entry } from '../lexicon/entry.ts'
import { buildLexicon, type Lexicon } from '../lexicon/lexicon.ts'
import {
  type Alternations,
  DEFAULT_TWIN_OPTIONS,
  learnAlternations,
  type TwinOptions,
} from './alternations.ts'
import { CandidateFinder } from './candidates.ts'
import { type CellRuleModel, learnCellRules } from './cell-rules.ts'
import { modifierFilterOf } from './compound-prefix.ts'
import type { CorpusEvidence } from './corpus-evidence.ts'
import { type EditFactors, learnEditFactors } from './edit-factor.ts'
import { extractParadigms, type ParadigmBook, type StemKind } from './extract.ts'
import { DEFAULT_FEATURE_OPTIONS, type FeatureOptions } from './features.ts'
import { DEFAULT_RANKER_OPTIONS, type RankerOptions, type RankerWeights } from './ranker.ts'
import { chooseStemKind } from './stem-choice.ts'
import { trainTableRanker } from './table-ranker.ts'
import { withTwins } from './twins.ts'

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
  /** What the per-cell rule rankers do differently from the table ranker (absent: nothing). */
  cellRanker?: Partial<RankerOptions>
  combine: CombineOptions
  /** Learned letter alternations and twin paradigms (absent in files written before them: off). */
  twins?: TwinOptions
  /**
   * L2 strength over a whole training set: a ranker trained on n examples uses at least `prior / n` as its
   * per-example `ranker.l2` (prior.ts; absent in older files: plain `ranker.l2`).
   */
  prior?: number
  /**
   * How tables are cut into stems and endings (extract.ts): 'lcs', 'prefix', or 'choose' (stem-choice.ts:
   * internal cross-validation on at most `stemSample` training tables). Absent: 'lcs'.
   */
  stems?: StemKind | 'choose'
  stemSample?: number
  /**
   * The word-initial edit factor (edit-factor.ts): its probability, raised to `weight`, multiplies each
   * candidate's at prediction (absent: off). Measured on DDN13 German verbs (dev): table 0.905 → 0.920.
   */
  edits?: { weight: number }
  /**
   * In the cell rankers, a lemma ending in a known lemma of at least `minHead` letters has no prefix
   * features (compound-prefix.ts; absent: off). Measured on DDN13 (dev): German nouns 0.780 → 0.795 table,
   * verbs 0.9728 → 0.9754 form. In the table ranker too it raised the English Brown-sample ambiguity.
   */
  compounds?: { minHead: number }
}

export const DEFAULT_LEARN_OPTIONS: LearnOptions = {
  features: DEFAULT_FEATURE_OPTIONS,
  ranker: DEFAULT_RANKER_OPTIONS,
  // The cell rankers keep a wrong rule's feature too once 3 examples offer it: with gold support alone
  // npm German verb forms fell 0.9823 → 0.9805 (5,000 train tables); with this 0.9819, 3× fewer weights.
  // From 3,000 examples (where `supportFrom` and `pruneFrom` apply) they make 6 passes, not 12: npm German
  // (20,000 train tables, 1,000 test nouns / 794 verbs) nouns 0.959 → 0.962 table, 0.9830 → 0.9847 form, verbs
  // 0.821 → 0.831, 0.9860 → 0.9865 (4 passes: 0.963 / 0.9854, 0.829 / 0.9865); half the training time.
  // DDN13 trains no cell ranker that large (on all cells 4 passes cost fi-verb 0.870 → 0.865 on dev).
  cellRanker: { supportMin: 3, largeEpochs: 6, fewerEpochsFrom: 3000 },
  combine: { cellWeight: 10, tableFloor: 0.001, cellFloor: 0.001, meanPower: 1, cellMix: 0.5 },
  twins: DEFAULT_TWIN_OPTIONS,
  prior: 10,
  stems: 'choose',
  stemSample: 400,
  edits: { weight: 1 },
  compounds: { minHead: 3 },
}

/** What learning produces: the lexicon, its paradigm book, and the weights that choose among paradigms. */
export interface InflectionModel {
  lexicon: Lexicon
  /** The paradigms learned from tables, then their twins (`twinOf` set; no entry is a member of one). */
  book: ParadigmBook
  /** Per UPOS, the letter swap learned from the book (see alternations.ts). */
  alternations: Alternations
  weights: RankerWeights
  finder: CandidateFinder
  /** One rule ranker per (UPOS, cell). */
  cells: CellRuleModel[]
  /** Form counts of the user's corpus, when one was given: evidence between candidate tables. */
  corpus?: CorpusEvidence
  /** Per UPOS whose paradigms differ in their initial edits, the factor choosing them (edit-factor.ts). */
  edits?: EditFactors
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

/**
 * How learning with `options` cuts this lexicon's tables into stems and endings (the choice of `stems`).
 * @example extractParadigms(lexicon, stemKindOf(lexicon)) // the book learnFromLexicon starts from
 */
export function stemKindOf(lexicon: Lexicon, options: LearnOptions = DEFAULT_LEARN_OPTIONS): StemKind {
  return options.stems === 'choose'
    ? chooseStemKind(
        lexicon,
        (lex, k) => learnFromLexicon(lex, { ...options, stems: k }),
        options.stemSample ?? 400,
      )
    : (options.stems ?? 'lcs')
}

/** As learnInflection, from a lexicon already built. */
export function learnFromLexicon(
  lexicon: Lexicon,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
): InflectionModel {
  const start = startLearning(lexicon, options)
  const { book, finder } = twinBook(lexicon, start, options)
  const weights = trainTableRanker(lexicon, book, finder, start.alternations, options)
  const cells = learnCells(lexicon, start.alternations, options)
  const edits = learnEdits(lexicon, book, options)
  const { alternations } = start
  return { lexicon, book, alternations, weights, finder, cells, options, ...(edits && { edits }) }
}

/** The first step of learning: the tables cut into paradigms (before twins), and the letter swap they show. */
export interface LearnStart {
  learned: ParadigmBook
  alternations: Alternations
}

/**
 * Cut the lexicon's tables into paradigms (as `options.stems` says) and learn the letter swap of each UPOS.
 * @example startLearning(lexicon).learned.paradigms.length // 136
 */
export function startLearning(lexicon: Lexicon, options: LearnOptions = DEFAULT_LEARN_OPTIONS): LearnStart {
  const learned = extractParadigms(lexicon, stemKindOf(lexicon, options))
  return { learned, alternations: learnAlternations(learned.paradigms, options.twins) }
}

/**
 * The book of learned paradigms and their twins, the candidate finder over it, and each paradigm's member
 * lemmas (a twin's mirrored), from which another thread builds the same finder.
 * @example twinBook(lexicon, startLearning(lexicon)).finder.find('Mantel', 'NOUN').length // 3
 */
export function twinBook(
  lexicon: Lexicon,
  { learned, alternations }: LearnStart,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
): { book: ParadigmBook; finder: CandidateFinder; members: string[][] } {
  const own: string[][] = learned.paradigms.map(() => [])
  learned.memberOf.forEach((p, i) => {
    if (p >= 0) own[p]!.push(lexicon.entries[i]!.lemma)
  })
  const twinned = withTwins(learned.paradigms, own, alternations)
  const book: ParadigmBook = { paradigms: twinned.paradigms, memberOf: learned.memberOf }
  const finder = new CandidateFinder(book.paradigms, twinned.members, alternations, options.twins)
  return { book, finder, members: twinned.members }
}

/**
 * The per-cell rule rankers of the lexicon's UPOS tags, or of `only` those (each UPOS is learned on its own, so
 * parallel learning may split the work by UPOS).
 */
export function learnCells(
  lexicon: Lexicon,
  alternations: Alternations,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
  only?: ReadonlySet<string>,
): CellRuleModel[] {
  if (options.combine.cellWeight <= 0 && options.combine.cellMix <= 0) return []
  const modifiers = options.compounds && modifierFilterOf(lexicon.entries, options.compounds.minHead)
  const cellKeys = only
    ? Object.fromEntries(Object.entries(lexicon.cellKeys).filter(([u]) => only.has(u)))
    : lexicon.cellKeys
  return learnCellRules(
    { ...lexicon, cellKeys },
    options.features,
    { ...options.ranker, ...options.cellRanker },
    alternations,
    options.twins,
    options.prior,
    modifiers,
  )
}

/** The word-initial edit factors of the book (absent unless `options.edits`). */
export function learnEdits(
  lexicon: Lexicon,
  book: ParadigmBook,
  options: LearnOptions,
): EditFactors | undefined {
  return options.edits && learnEditFactors(lexicon.entries, book.paradigms, book.memberOf, options.ranker)
}
