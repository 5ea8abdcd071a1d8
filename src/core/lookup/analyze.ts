// Analysis of one token: normalize, look up in the form index, guess when nothing is indexed; bound and sort.
import { boundCandidates, type Candidate, mergeCandidates } from './candidate.ts'
import type { IndexedAnalysis } from './form-index.ts'
import { DEFAULT_GUESS_OPTIONS, type GuessOptions, guessForm } from './guess.ts'
import type { LookupModel } from './lookup-context.ts'
import { type LookupKey, lookupTiers, type NormalizeOptions, titleCase } from './normalize.ts'

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
  candidates: readonly Candidate[]
}

const EXACT: readonly string[] = Object.freeze(['exact'])

/**
 * Analyze a token: its candidate (lemma, UPOS, FEATS) analyses, each attested, predicted or guessed, scored.
 * @example analyzeForm(model, 'Mänteln').candidates[0] // { lemma: 'Mantel', upos: 'NOUN', feats: 'Case=Dat|Number=Plur', source: 'predicted', ... }
 */
export function analyzeForm(model: LookupModel, form: string, opts: AnalyzeOptions = {}): FormAnalysis {
  const top = opts.top ?? DEFAULT_TOP
  const minScore = opts.minScore ?? DEFAULT_MIN_SCORE
  // Fast path: an indexed token is NFC already, and its first tier is itself with its lower and title case.
  const direct = model.index.get(form)
  if (direct) {
    const lower = form.toLowerCase()
    const others = lower === form ? undefined : caseHits(model, form, lower)
    if (!others) return { form, normalized: EXACT, candidates: bound(direct, top, minScore) }
    return {
      form,
      normalized: others.how,
      candidates: boundCandidates(mergeCandidates([direct, ...others.hits]), top, minScore),
    }
  }

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

/** The indexed lower- and title-case forms of an indexed token (tier 1 of `lookupTiers`), if any. */
function caseHits(
  model: LookupModel,
  form: string,
  lower: string,
): { how: string[]; hits: (readonly IndexedAnalysis[])[] } | undefined {
  const l = model.index.get(lower)
  // A token that is already in title case (the usual capitalized one) has no other title-case form.
  const title = sameTail(form, lower) ? form : titleCase(form)
  const t = title !== form && title !== lower ? model.index.get(title) : undefined
  if (!l && !t) return undefined
  const how = ['exact']
  const hits: (readonly IndexedAnalysis[])[] = []
  if (l) {
    how.push('lowercase')
    hits.push(l)
  }
  if (t) {
    how.push('titlecase')
    hits.push(t)
  }
  return { how, hits }
}

/** Do two strings agree after their first character (no allocation)? */
function sameTail(a: string, b: string): boolean {
  if (a.length !== b.length) return false
  for (let i = 1; i < a.length; i++) if (a.charCodeAt(i) !== b.charCodeAt(i)) return false
  return true
}

/** The index's own answer when nothing needs cutting (the common case), else its bounded copy. */
function bound(sorted: readonly IndexedAnalysis[], top: number, minScore: number): readonly Candidate[] {
  let predicted = 0
  for (const c of sorted) {
    if (c.source === 'attested') continue
    if (c.score < minScore || ++predicted > top) return boundCandidates(sorted, top, minScore)
  }
  return sorted
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
