// Analysis of one token: normalize, look up in the form index, guess when nothing is indexed; bound and sort.
import { boundCandidates, type Candidate, mergeCandidates } from './candidate.ts'
import type { IndexedAnalysis } from './form-index.ts'
import { DEFAULT_GUESS_OPTIONS, type GuessOptions, guessForm } from './guess.ts'
import type { LookupModel } from './lookup-context.ts'
import { type LookupKey, lookupTiers, type NormalizeOptions } from './normalize.ts'

export interface AnalyzeOptions extends NormalizeOptions {
  /** At most this many predicted or guessed candidates (attested ones are never cut). */
  top?: number
  /** Predicted and guessed candidates scoring below this are dropped. */
  minScore?: number
  /** Guess when no spelling of the token is indexed (default true). */
  guess?: boolean
  guesser?: Partial<GuessOptions>
}

export const DEFAULT_TOP = 16
export const DEFAULT_MIN_SCORE = 0.01

/**
 * The answer for one token. `normalized` names the lookups that gave candidates (`exact`, `nfc`,
 * `lowercase`, `titlecase`, `quotes…`, `folded…`), in the order tried; it is empty when none did.
 */
export interface FormAnalysis {
  form: string
  normalized: readonly string[]
  candidates: Candidate[]
}

const EXACT: readonly string[] = Object.freeze(['exact'])

/**
 * Analyze a token: its candidate (lemma, UPOS, FEATS) analyses, each attested, predicted or guessed, scored.
 * @example analyzeForm(model, 'Mänteln').candidates[0] // { lemma: 'Mantel', upos: 'NOUN', feats: 'Case=Dat|Number=Plur', source: 'predicted', ... }
 */
export function analyzeForm(model: LookupModel, form: string, opts: AnalyzeOptions = {}): FormAnalysis {
  const top = opts.top ?? DEFAULT_TOP
  const minScore = opts.minScore ?? DEFAULT_MIN_SCORE
  // Fast path: an indexed lower-case token needs no other spelling (its title case is only a fallback).
  const direct = model.index.get(form)
  if (direct && form === form.toLowerCase())
    return { form, normalized: EXACT, candidates: boundCandidates(direct, top, minScore) }

  const tiers = lookupTiers(form, opts)
  for (const tier of tiers) {
    const found: (readonly IndexedAnalysis[])[] = []
    const how: string[] = []
    for (const k of tier) {
      const hits = lookupKey(model, k)
      if (hits.length === 0) continue
      found.push(...hits)
      if (!how.includes(k.how)) how.push(k.how)
    }
    if (found.length > 0)
      return { form, normalized: how, candidates: boundCandidates(mergeCandidates(found), top, minScore) }
  }
  if (opts.guess === false) return { form, normalized: [], candidates: [] }
  const guesser = { ...DEFAULT_GUESS_OPTIONS, ...opts.guesser }
  const guesses = guessForm(model, tiers[0] ?? [], minScore, guesser)
  const how = [...new Set(guesses.map((g) => g.how))]
  const found = [
    guesses.map(
      (g): Candidate => ({
        lemma: g.lemma,
        upos: g.upos,
        feats: g.feats,
        source: 'guessed',
        score: g.score,
        paradigm: g.paradigm,
      }),
    ),
  ]
  return { form, normalized: how, candidates: boundCandidates(mergeCandidates(found), top, minScore) }
}

function lookupKey(model: LookupModel, k: LookupKey): (readonly IndexedAnalysis[])[] {
  if (!k.folded) {
    const hits = model.index.get(k.key)
    return hits ? [hits] : []
  }
  const out: (readonly IndexedAnalysis[])[] = []
  for (const f of model.index.folded(k.key)) {
    const hits = model.index.get(f)
    if (hits) out.push(hits)
  }
  return out
}
