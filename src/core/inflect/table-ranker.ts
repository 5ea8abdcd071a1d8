// The whole-table ranker: which paradigm a lemma's shape chooses, trained on the tables (and their mirror images).
import type { LexEntry, Lexicon } from '../lexicon/lexicon.ts'
import { type Alternations, mirror } from './alternations.ts'
import type { CandidateFinder } from './candidates.ts'
import { sampleByClass } from './example-sample.ts'
import { type ParadigmBook, reproducesWith } from './extract.ts'
import { lemmaFeatures } from './features.ts'
import type { LearnOptions } from './learn.ts'
import { withPrior } from './prior.ts'
import { epochsFor, type RankerExample, type RankerWeights } from './ranker.ts'
import { ExampleCoder } from './ranker-coding.ts'
import { trainCoded } from './ranker-train.ts'
import { tiedClasses } from './twins.ts'

/**
 * Train the whole-table ranker, which chooses a lemma's paradigm from its shape.
 * @example trainTableRanker(lexicon, book, finder, alternations, options).shared.get('whole') // > 0
 */
export function trainTableRanker(
  lexicon: Lexicon,
  book: ParadigmBook,
  finder: CandidateFinder,
  alternations: Alternations,
  options: LearnOptions,
): RankerWeights {
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
  const weights = trainCoded(coder.done(), epochsFor(withPrior(options.ranker, coder.added, options.prior), coder.added))
  if (classOf) weights.classOf = classOf
  return weights
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
