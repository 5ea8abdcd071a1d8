// Analysis of one token: normalize, look up in the form index, guess when nothing is indexed; bound and sort.
import { boundCandidates, type Candidate, mergeCandidates } from './candidate.ts'
import type { FormIndex, IndexedAnalysis } from './form-index.ts'
import { DEFAULT_GUESS_OPTIONS, type GuessOptions, guessForm } from './guess.ts'
import { guessName, nameCandidate } from './guess-name.ts'
import type { LookupModel } from './lookup-context.ts'
import { type LookupKey, lookupTiers, type NormalizeOptions, titleCase } from './normalize.ts'

export interface AnalyzeOptions extends NormalizeOptions {
  /** At most this many predicted or guessed candidates (attested ones are never cut). */
  top?: number
  /** Predicted and guessed candidates scoring below this are dropped. */
  minScore?: number
  /**
   * When to guess: `true` (default) when no spelling of the token is indexed; `'unattested'` also when
   * the index only predicts it (a bare lemma's kept tables may have missed the form's cell); `false` never.
   */
  guess?: boolean | 'unattested'
  guesser?: Partial<GuessOptions>
  /**
   * Where the token stands: `false` inside a sentence, `true` at its start; absent: unknown, treated as
   * possibly initial. Only name guesses use it (a capital inside a sentence says more; see guess-name.ts).
   */
  sentenceInitial?: boolean
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

/** An indexed token's default-bounded answer. */
type Answer = { how: readonly string[]; candidates: readonly Candidate[] }
const answered = new WeakMap<FormIndex, Map<string, Answer>>()
// The last index asked for, held weakly: a model dropped by its owner must not stay alive through this.
let lastIndex: WeakRef<FormIndex> | undefined
let lastAnswers: Map<string, Answer> | undefined

/** The answers kept for an index (the last one asked for is remembered, so one model costs no lookup). */
function answersOf(index: FormIndex): Map<string, Answer> {
  if (lastIndex?.deref() === index) return lastAnswers!
  let answers = answered.get(index)
  if (!answers) {
    answers = new Map()
    answered.set(index, answers)
  }
  lastIndex = new WeakRef(index)
  lastAnswers = answers
  return answers
}

/**
 * The first tier of an indexed token, keyed by the index's (shared, immutable) answer for it: null when
 * no other case of the token is indexed, else the merged answer. Computed once per form.
 */
const firstTiers = new WeakMap<
  readonly IndexedAnalysis[],
  { how: readonly string[]; candidates: readonly Candidate[] } | null
>()

/**
 * Analyze a token: its candidate (lemma, UPOS, FEATS) analyses, each attested, predicted or guessed, scored.
 * @example analyzeForm(model, 'Mänteln').candidates[0] // { lemma: 'Mantel', upos: 'NOUN', feats: 'Case=Dat|Number=Plur', source: 'predicted', ... }
 */
export function analyzeForm(model: LookupModel, form: string, opts: AnalyzeOptions = {}): FormAnalysis {
  const top = opts.top ?? DEFAULT_TOP
  const minScore = opts.minScore ?? DEFAULT_MIN_SCORE
  // The common case, a token indexed as written: its answer depends only on the index's answer for it,
  // so with the default bounds it is computed once per index and form, then found in one hash step.
  const defaults = top === DEFAULT_TOP && minScore === DEFAULT_MIN_SCORE && opts.guess !== 'unattested'
  const memo = defaults ? answersOf(model.index) : undefined
  const known = memo?.get(form)
  if (known) return { form, normalized: known.how, candidates: known.candidates }
  const direct = model.index.get(form)
  if (direct && opts.guess !== 'unattested') {
    const hit = lookupIndex(model, form, opts, direct)!
    const answer = { how: hit.how, candidates: bound(hit.candidates, top, minScore) }
    memo?.set(form, answer)
    return { form, normalized: answer.how, candidates: answer.candidates }
  }
  const found = lookupIndex(model, form, opts, direct)
  const guesser = opts.guesser ? { ...DEFAULT_GUESS_OPTIONS, ...opts.guesser } : DEFAULT_GUESS_OPTIONS
  // A token indexed in exactly this spelling is never offered a name guess (see nameCandidate).
  const name =
    !direct &&
    opts.guess !== false &&
    guesser.names &&
    nameCandidate(model, form, opts.sentenceInitial, found?.candidates)
      ? guessName(model, form)
      : undefined
  const named: Candidate[] = name ? [{ ...name, source: 'guessed', paradigm: null }] : []
  if (found && (opts.guess !== 'unattested' || found.candidates.some((c) => c.source === 'attested'))) {
    if (!name) return { form, normalized: found.how, candidates: bound(found.candidates, top, minScore) }
    const how = [...new Set([...found.how, 'exact'])]
    return {
      form,
      normalized: how,
      candidates: boundCandidates(mergeCandidates([found.candidates, named]), top, minScore),
    }
  }
  if (opts.guess === false) return { form, normalized: [], candidates: [] }
  const guesses = guessForm(model, lookupTiers(form, opts)[0] ?? [], minScore, guesser)
  const how = [...new Set([...(found?.how ?? []), ...guesses.map((g) => g.how), ...(name ? ['exact'] : [])])]
  // With a name guess beside them, the guesser's analyses share what the name leaves.
  const rest = name ? 1 - name.score : 1
  const guessed = guesses.map(
    (g): Candidate => ({
      lemma: g.lemma,
      upos: g.upos,
      feats: g.feats,
      source: 'guessed',
      score: name ? Number((g.score * rest).toPrecision(4)) : g.score,
      paradigm: g.paradigm,
    }),
  )
  return {
    form,
    normalized: how,
    candidates: boundCandidates(mergeCandidates([found?.candidates ?? [], guessed, named]), top, minScore),
  }
}

/** The index's answer for a token: the first tier of its spellings that is indexed, merged and sorted. */
function lookupIndex(
  model: LookupModel,
  form: string,
  opts: NormalizeOptions,
  direct: readonly IndexedAnalysis[] | undefined,
): { how: readonly string[]; candidates: readonly Candidate[] } | undefined {
  // Fast path: an indexed token is NFC already, and its first tier is itself with its lower and title case.
  if (direct) {
    if (!hasCapitals(form)) return { how: EXACT, candidates: direct }
    let first = firstTiers.get(direct)
    if (first === undefined) {
      const others = caseHits(model, form, form.toLowerCase())
      first = others
        ? {
            how: Object.freeze(others.how),
            candidates: Object.freeze(mergeCandidates([direct, ...others.hits])),
          }
        : null
      firstTiers.set(direct, first)
    }
    return first ?? { how: EXACT, candidates: direct }
  }
  for (const tier of lookupTiers(form, opts)) {
    const found: (readonly IndexedAnalysis[])[] = []
    const how: string[] = []
    for (const k of tier) {
      const hits = lookupKey(model, k)
      if (hits.length === 0) continue
      found.push(...hits)
      if (!how.includes(k.how)) how.push(k.how)
    }
    if (found.length > 0) return { how, candidates: mergeCandidates(found) }
  }
  return undefined
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

/** Does lower-casing change the string? A scan without allocation for ASCII, `toLowerCase` beyond it. */
function hasCapitals(form: string): boolean {
  for (let i = 0; i < form.length; i++) {
    const c = form.charCodeAt(i)
    if (c >= 65 && c <= 90) return true
    if (c >= 128) return form !== form.toLowerCase()
  }
  return false
}

/** Do two strings agree after their first character (no allocation)? */
function sameTail(a: string, b: string): boolean {
  if (a.length !== b.length) return false
  for (let i = 1; i < a.length; i++) if (a.charCodeAt(i) !== b.charCodeAt(i)) return false
  return true
}

/** The index's own answer when nothing needs cutting (the common case), else its bounded copy. */
function bound(sorted: readonly Candidate[], top: number, minScore: number): readonly Candidate[] {
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
