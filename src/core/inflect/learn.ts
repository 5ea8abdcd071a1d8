// Learning: lexicon → paradigm book → ranker that assigns paradigms to lemmas from their shape.
import type { Entry } from '../lexicon/entry.ts'
import { buildLexicon, type LexEntry, type Lexicon } from '../lexicon/lexicon.ts'
import {
  type Alternations,
  DEFAULT_TWIN_OPTIONS,
  learnAlternations,
  mirror,
  type TwinOptions,
} from './alternations.ts'
import { CandidateFinder } from './candidates.ts'
import { type CellRuleModel, learnCellRules } from './cell-rules.ts'
import { modifierFilterOf } from './compound-prefix.ts'
import type { CorpusEvidence } from './corpus-evidence.ts'
import { type EditFactors, learnEditFactors } from './edit-factor.ts'
import { sampleByClass } from './example-sample.ts'
import { extractParadigms, type ParadigmBook, reproducesWith, type StemKind } from './extract.ts'
import { DEFAULT_FEATURE_OPTIONS, type FeatureOptions, lemmaFeatures } from './features.ts'
import { withPrior } from './prior.ts'
import {
  DEFAULT_RANKER_OPTIONS,
  type RankerExample,
  type RankerOptions,
  type RankerWeights,
} from './ranker.ts'
import { ExampleCoder } from './ranker-coding.ts'
import { trainCoded } from './ranker-train.ts'
import { chooseStemKind } from './stem-choice.ts'
import { tiedClasses, withTwins } from './twins.ts'

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
  cellRanker: { supportMin: 3 },
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
    ? chooseStemKind(lexicon, (lex, k) => learnFromLexicon(lex, { ...options, stems: k }), options.stemSample ?? 400)
    : (options.stems ?? 'lcs')
}

/** As learnInflection, from a lexicon already built. */
export function learnFromLexicon(
  lexicon: Lexicon,
  options: LearnOptions = DEFAULT_LEARN_OPTIONS,
): InflectionModel {
  const learned = extractParadigms(lexicon, stemKindOf(lexicon, options))
  const alternations = learnAlternations(learned.paradigms, options.twins)
  const own: string[][] = learned.paradigms.map(() => [])
  learned.memberOf.forEach((p, i) => {
    if (p >= 0) own[p]!.push(lexicon.entries[i]!.lemma)
  })
  const twinned = withTwins(learned.paradigms, own, alternations)
  const book: ParadigmBook = { paradigms: twinned.paradigms, memberOf: learned.memberOf }
  const finder = new CandidateFinder(book.paradigms, twinned.members, alternations, options.twins)
  const classOf = options.twins?.tie ? tiedClasses(book.paradigms, alternations) : undefined
  const twinOf = new Map(
    book.paradigms.flatMap((p, i) => (p.twinOf === undefined ? [] : [[p.twinOf, i] as const])),
  )
  const tables = lexicon.entries.flatMap((e, i) => (e.cells ? [i] : []))
  const picked = sampleByClass(
    tables.map((i) => book.memberOf[i]!),
    options.ranker.maxExamples ?? 0,
    options.ranker.seed,
  )
  const modifiers = options.compounds && modifierFilterOf(lexicon.entries, options.compounds.minHead)
  const example = (e: LexEntry, own: number): RankerExample => {
    const found = finder.find(e.lemma, e.upos, own)
    const gold: number[] = []
    found.forEach((c, k) => {
      if (c.paradigm === own || reproducesWith(book.paradigms[c.paradigm]!, e, c.stems)) gold.push(k)
    })
    return {
      local: lemmaFeatures(e.lemma, e.inherent, options.features),
      candidates: found.map((c) => classOf?.[c.paradigm] ?? c.paradigm),
      shared: found.map((c) => c.shared),
      gold,
    }
  }
  const coder = new ExampleCoder()
  for (const t of picked) coder.add(example(lexicon.entries[tables[t]!]!, book.memberOf[tables[t]!]!))
  // A table whose paradigm has a twin, mirrored, is what the twin's members would look like: training on
  // these copies teaches the ranker when a twin applies (they are never entries of the model).
  if (options.twins?.mirrorTables) {
    for (const t of picked) {
      const e = lexicon.entries[tables[t]!]!
      const twin = twinOf.get(book.memberOf[tables[t]!]!)
      const copy = twin === undefined ? null : mirrorEntry(e, alternations[e.upos]!)
      // A copy whose harmony letters the swap left on both sides would contradict the harmony features.
      const consistent = copy && (!options.twins.harmony || finder.oneSide(copy.lemma, copy.upos))
      if (consistent) coder.add(example(copy, twin!))
    }
  }
  const weights = trainCoded(coder.done(), withPrior(options.ranker, coder.added, options.prior))
  if (classOf) weights.classOf = classOf
  const cells =
    options.combine.cellWeight > 0 || options.combine.cellMix > 0
      ? learnCellRules(
          lexicon,
          options.features,
          { ...options.ranker, ...options.cellRanker },
          alternations,
          options.twins,
          options.prior,
          modifiers,
        )
      : []
  const edits = options.edits && learnEditFactors(lexicon.entries, book.paradigms, book.memberOf, options.ranker)
  return { lexicon, book, alternations, weights, finder, cells, options, ...(edits && { edits }) }
}

/** An entry with a letter swap applied to its lemma and forms, or null when the swap leaves its lemma alone. */
export function mirrorEntry(e: LexEntry, swap: Readonly<Record<string, string>>): LexEntry | null {
  const lemma = mirror(e.lemma, swap)
  if (lemma === e.lemma || !e.cells) return null
  return {
    ...e,
    lemma,
    cells: e.cells.map((c) => ({ key: c.key, forms: c.forms.map((f) => mirror(f, swap)) })),
  }
}
