// The lookup half of the evaluation protocol: recall and ambiguity of analyze() on a held-out lexicon.
import { type InflectionModel, learnFromLexicon } from '../inflect/learn.ts'
import type { Entry } from '../lexicon/entry.ts'
import { mergeFeats } from '../lexicon/feats.ts'
import { buildLexicon, type Lexicon } from '../lexicon/lexicon.ts'
import { listLemmas, modelFromInflection } from '../model/build-model.ts'
import type { Model, ModelOptions } from '../model/model.ts'
import { type AnalyzeOptions, analyzeForm } from './analyze.ts'

/** The figures of the protocol (DESIGN.md, "Evaluation protocol"). */
export interface LookupMetrics {
  /** TEST's lemmas unknown to the model: share of gold (form, lemma, UPOS, FEATS) rows among analyze(form). */
  unseenRecall: number
  /** …and the mean number of candidates per distinct TEST form. */
  unseenMeanCandidates: number
  /** TEST's lemmas listed as bare lemmas: the same recall… */
  listedRecall: number
  /** …and gold analyses returned / analyses returned, over distinct TEST forms. */
  listedPrecision: number
  /** Mean number of gold analyses per distinct TEST form (the language's own syncretism). */
  goldMeanAnalyses: number
}

export interface LookupMetricsOptions {
  model?: Partial<ModelOptions>
  analyze?: AnalyzeOptions
}

/**
 * Measure lookup on TEST after learning from TRAIN's tables only (bare lemmas of TRAIN are ignored).
 * The listed setting tells the model each TEST lemma and its UPOS, nothing more.
 * @example lookupMetrics(trainEntries, buildLexicon(testEntries)).unseenRecall // 0.95
 */
export function lookupMetrics(
  train: Lexicon | readonly Entry[] | InflectionModel,
  test: Lexicon,
  opts: LookupMetricsOptions = {},
): LookupMetrics {
  const unseen = modelFromInflection(learned(train, opts), opts.model)
  const gold = new Map<string, Set<string>>()
  let rows = 0
  for (const e of test.entries) {
    for (const c of e.cells ?? []) {
      const analysis = `${e.lemma}\t${e.upos}\t${mergeFeats(e.inherent, c.key)}`
      for (const form of c.forms) {
        const set = gold.get(form) ?? new Set<string>()
        gold.set(form, set)
        if (!set.has(analysis)) rows++
        set.add(analysis)
      }
    }
  }
  const a = score(unseen, gold, opts.analyze)
  const listed = listLemmas(
    unseen,
    test.entries.filter((e) => e.cells).map((e) => ({ lemma: e.lemma, upos: e.upos, feats: '_' })),
  )
  const b = score(listed, gold, opts.analyze)
  const forms = Math.max(1, gold.size)
  return {
    unseenRecall: a.found / Math.max(1, rows),
    unseenMeanCandidates: a.returned / forms,
    listedRecall: b.found / Math.max(1, rows),
    listedPrecision: b.returned > 0 ? b.found / b.returned : 0,
    goldMeanAnalyses: rows / forms,
  }
}

function learned(
  train: Lexicon | readonly Entry[] | InflectionModel,
  opts: LookupMetricsOptions,
): InflectionModel {
  if ('finder' in train) return train
  const learn = opts.model?.learn
  if ('cellKeys' in train)
    return learnFromLexicon({ ...train, entries: train.entries.filter((e) => e.cells) }, learn)
  return learnFromLexicon(buildLexicon(train.filter((e) => e.forms)), learn)
}

function score(
  model: Model,
  gold: Map<string, Set<string>>,
  opts: AnalyzeOptions | undefined,
): { found: number; returned: number } {
  let found = 0
  let returned = 0
  for (const [form, analyses] of gold) {
    const candidates = analyzeForm(model, form, opts).candidates
    returned += candidates.length
    for (const c of candidates) if (analyses.has(`${c.lemma}\t${c.upos}\t${c.feats}`)) found++
  }
  return { found, returned }
}
