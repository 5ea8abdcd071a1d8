// The type constraint of one form: the analyses lookup licenses for it, and the tags they allow.
import { type Analyzer, type Candidate, type CandidateSource, SOURCE_ORDER, sourceRank } from './analyzer.ts'

/** `upos`: the allowed tags are UPOS; `full`: `UPOS|FEATS` (the analysis without its lemma). */
export type ConstraintLevel = 'upos' | 'full'

/** How candidates become a constraint. Defaults keep every candidate lookup returns. */
export interface ConstrainOptions {
  level: ConstraintLevel
  /** Drop predicted and guessed candidates scoring below this (attested ones always count). */
  minScore?: number
  /** Sources that may constrain a form; a form whose candidates all come from others is unconstrained. */
  sources?: readonly CandidateSource[]
  /** Keep only the candidates of a form's best source (attested before predicted before guessed). */
  bestSourceOnly?: boolean
}

/** One analysis of a form: a candidate without its paradigm. */
export interface Analysis {
  lemma: string
  upos: string
  feats: string
  source: CandidateSource
  score: number
}

/** The constraint of one form type. `allowed: null` means unconstrained: the tagger allows every tag. */
export interface TypeConstraint {
  form: string
  /** Corpus tokens of the form (0 for the whole-lexicon file). */
  count: number
  /** Best source among the analyses kept; `none` when none was kept. */
  source: CandidateSource | 'none'
  /** Allowed tags, sorted, without repeats; null when unconstrained. */
  allowed: string[] | null
  /** The analyses behind `allowed`, best source first, then by score. */
  analyses: Analysis[]
}

const WORD_LETTER = /\p{L}/u

/** Which contexts a form occurred in; lookup is asked once per context seen. */
export interface FormContexts {
  plain: boolean
  initial: boolean
}

/**
 * The tag an analysis allows at a level.
 * @example tagOf({ upos: 'NOUN', feats: 'Number=Plur' }, 'full') // 'NOUN|Number=Plur'
 */
export function tagOf(analysis: { upos: string; feats: string }, level: ConstraintLevel): string {
  return level === 'upos' ? analysis.upos : `${analysis.upos}|${analysis.feats}`
}

/**
 * The constraint of a form: the union of lookup's candidates over the contexts it occurred in, filtered
 * by the options, one analysis per (lemma, UPOS, FEATS) with its best source and score. Guesses count
 * only for forms with a letter: a token of punctuation or digits that no table lists stays unconstrained.
 * @example
 * constrainForm(analyzer, 'vessat', { plain: true, initial: false }, { level: 'upos' }, 12)
 * // { form: 'vessat', count: 12, source: 'predicted', allowed: ['NOUN'], analyses: [...] }
 */
export function constrainForm(
  analyzer: Analyzer,
  form: string,
  contexts: FormContexts,
  options: ConstrainOptions,
  count: number,
): TypeConstraint {
  const found: Candidate[] = []
  if (contexts.plain || !contexts.initial) found.push(...analyzer(form, { sentenceInitial: false }))
  if (contexts.initial) found.push(...analyzer(form, { sentenceInitial: true }))
  // A guess rewrites a word's letters; for a token with none (punctuation, digits) it is noise.
  const guessable = WORD_LETTER.test(form)
  const analyses = keptAnalyses(guessable ? found : found.filter((c) => c.source !== 'guessed'), options)
  if (analyses.length === 0) return { form, count, source: 'none', allowed: null, analyses }
  const allowed = [...new Set(analyses.map((a) => tagOf(a, options.level)))].sort()
  return { form, count, source: analyses[0]!.source, allowed, analyses }
}

function keptAnalyses(candidates: readonly Candidate[], options: ConstrainOptions): Analysis[] {
  const sources = new Set(options.sources ?? SOURCE_ORDER)
  const minScore = options.minScore ?? 0
  const byKey = new Map<string, Analysis>()
  for (const c of candidates) {
    if (!sources.has(c.source)) continue
    if (c.source !== 'attested' && c.score < minScore) continue
    const key = `${c.lemma}\t${c.upos}\t${c.feats}`
    const seen = byKey.get(key)
    if (!seen) {
      byKey.set(key, { lemma: c.lemma, upos: c.upos, feats: c.feats, source: c.source, score: c.score })
      continue
    }
    if (sourceRank(c.source) < sourceRank(seen.source)) seen.source = c.source
    if (c.score > seen.score) seen.score = c.score
  }
  let analyses = [...byKey.values()].sort(
    (a, b) =>
      sourceRank(a.source) - sourceRank(b.source) ||
      b.score - a.score ||
      compare(a.upos, b.upos) ||
      compare(a.lemma, b.lemma) ||
      compare(a.feats, b.feats),
  )
  if (options.bestSourceOnly && analyses.length > 0) {
    const best = analyses[0]!.source
    analyses = analyses.filter((a) => a.source === best)
  }
  return analyses
}

function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}

/** How files write an unconstrained form's allowed tags: every tag allowed. */
export const UNCONSTRAINED_MARK = '*'

/** Separator of the allowed tags when written as one field (`,`; `;` at full level, whose FEATS hold commas). */
export function allowedSeparator(level: ConstraintLevel): string {
  return level === 'upos' ? ',' : ';'
}

/**
 * Allowed tags as one field: joined with the level's separator, or `*` when unconstrained.
 * @example formatAllowed(['NOUN', 'VERB'], 'upos') // 'NOUN,VERB'
 */
export function formatAllowed(allowed: readonly string[] | null, level: ConstraintLevel): string {
  return allowed ? allowed.join(allowedSeparator(level)) : UNCONSTRAINED_MARK
}
