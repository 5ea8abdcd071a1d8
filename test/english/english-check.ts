// The English real-text check: dictionary-only coverage against the model's, on Brown, by the same rules.
import type { Analyzer, Candidate, CoverageReport } from '../../src/core/constrain/index.ts'
import { constrainCorpus } from '../../src/core/constrain/index.ts'
import type { Entry } from '../../src/core/lexicon/entry.ts'
import { analyzeForm } from '../../src/core/lookup/analyze.ts'
import { lookupTiers } from '../../src/core/lookup/normalize.ts'
import { buildModel, type CorpusCounts } from '../../src/core/model/build-model.ts'
import type { Model } from '../../src/core/model/model.ts'
import { brownSentences, brownTokens, loadBrownMapping } from '../fixtures/english/brown-corpus.ts'
import type { EnglishDictionary } from '../fixtures/english/english-lexicon.ts'

/** Gold tags left out of every figure, as the check is defined (punctuation, numbers, symbols). */
export const EXCLUDED_GOLD = ['PUNCT', 'NUM', 'SYM'] as const

/** The figures of the check, each over tokens whose gold UPOS is not PUNCT, NUM or SYM. */
export interface EnglishFigures {
  tokens: number
  coverageBefore: number
  coverageAfter: number
  recallBefore: number
  recallAfter: number
  ambiguityAfter: number
  singleTagShare: number
}

/**
 * The raw dictionary as an analyzer: lemma strings and closed-class forms, looked up under the same
 * spellings as the model's lookup (case and apostrophe variants), nothing predicted or guessed.
 * @example dictionaryAnalyzer(dictionary)('Jury', { sentenceInitial: false })[0].upos // 'NOUN'
 */
export function dictionaryAnalyzer(dictionary: EnglishDictionary): Analyzer {
  const byForm = new Map<string, Candidate[]>()
  const add = (form: string, c: Candidate) => {
    const list = byForm.get(form)
    if (list) list.push(c)
    else byForm.set(form, [c])
  }
  for (const e of dictionary.lemmas) add(e.lemma, candidate(e, e.feats))
  for (const e of dictionary.closedClass) for (const f of e.forms ?? []) add(f.form, candidate(e, f.feats))
  return (form) => {
    for (const tier of lookupTiers(form)) {
      const found = tier.flatMap((k) => byForm.get(k.key) ?? [])
      if (found.length > 0) return found
    }
    return []
  }
}

function candidate(e: Entry, feats: string): Candidate {
  return { lemma: e.lemma, upos: e.upos, feats, source: 'attested', score: 1 }
}

/**
 * The model's lookup as an analyzer (attested, predicted, then guessed candidates, lookup's defaults),
 * told where the token stands (a capital inside a sentence may mark a name).
 * @example modelAnalyzer(model)('Rhode', { sentenceInitial: false }) // […, { lemma: 'Rhode', upos: 'PROPN', … }]
 */
export function modelAnalyzer(model: Model): Analyzer {
  return (form, ctx) => analyzeForm(model, form, { sentenceInitial: ctx.sentenceInitial }).candidates
}

/**
 * Learn the model of the check: every table, the closed-class words, the lemmas; with `corpus`, raw-text
 * form counts that choose between a bare lemma's candidate tables (as `formfold learn --corpus`).
 * @example const model = englishModel(await englishDictionary())
 */
export function englishModel(
  dictionary: EnglishDictionary,
  lemmas: readonly Entry[] = dictionary.lemmas,
  corpus?: CorpusCounts,
): Model {
  return buildModel([...dictionary.tables, ...dictionary.closedClass, ...lemmas], {}, corpus)
}

/**
 * Form counts of Brown files read as raw text (every token, its tag ignored).
 * @example brownCounts(brownFiles()).tokens // 1,161,192: every token of Brown
 */
export function brownCounts(files: readonly string[]): CorpusCounts {
  const counts = new Map<string, number>()
  let tokens = 0
  for (const sentence of brownSentences(files, loadBrownMapping()))
    for (const t of sentence) {
      counts.set(t.form, (counts.get(t.form) ?? 0) + 1)
      tokens++
    }
  return { counts, tokens }
}

/**
 * The model's predicted-only forms (no table lists them) and how many of them a corpus has.
 * @example const { forms, attested } = predictedAttestation(model, brownCounts(files).counts)
 */
export function predictedAttestation(
  model: Model,
  counts: ReadonlyMap<string, number>,
): { forms: number; attested: number } {
  let forms = 0
  let attested = 0
  for (const form of model.index.forms()) {
    if (model.index.get(form)?.some((a) => a.source === 'attested')) continue
    forms++
    if (counts.has(form)) attested++
  }
  return { forms, attested }
}

/**
 * Constrain Brown files with both analyzers and report the figures of the check.
 * @example const figures = await measureEnglish(files, dictionaryAnalyzer(d), modelAnalyzer(model))
 */
export async function measureEnglish(
  files: readonly string[],
  before: Analyzer,
  after: Analyzer,
): Promise<{ figures: EnglishFigures; before: CoverageReport; after: CoverageReport }> {
  const mapping = loadBrownMapping()
  const options = { level: 'upos', excludeGold: EXCLUDED_GOLD, top: 30 } as const
  const a = (await constrainCorpus(brownTokens(brownSentences(files, mapping)), before, options)).report
  const b = (await constrainCorpus(brownTokens(brownSentences(files, mapping)), after, options)).report
  return {
    figures: {
      tokens: b.tokens.total,
      coverageBefore: a.tokens.coverage,
      coverageAfter: b.tokens.coverage,
      recallBefore: a.gold?.recall ?? 0,
      recallAfter: b.gold?.recall ?? 0,
      ambiguityAfter: b.ambiguity,
      singleTagShare: b.singleTagShare,
    },
    before: a,
    after: b,
  }
}

/**
 * Bare lemmas that can matter for a sample: those whose spelling, less its last two letters, begins
 * some sample form (English inflects at the end, so another lemma's forms cannot be the sample's).
 * Learning is left whole (every table); only the bare lemmas, whose tables cost the time, are thinned.
 * @example lemmasForSample(d.lemmas, ['taking']).some((e) => e.lemma === 'take') // true
 */
export function lemmasForSample(lemmas: readonly Entry[], forms: Iterable<string>): Entry[] {
  const prefixes = new Set<string>()
  for (const form of forms) {
    const lower = form.toLowerCase()
    for (let i = 1; i <= lower.length; i++) prefixes.add(lower.slice(0, i))
  }
  return lemmas.filter((e) => {
    const lower = e.lemma.toLowerCase()
    return prefixes.has(lower.slice(0, Math.max(1, lower.length - 2)))
  })
}
