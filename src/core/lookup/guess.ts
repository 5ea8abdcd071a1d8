// The guesser: analyses of a form no table lists, by reversing cell patterns and checking forward.
// A form's candidate lemmas come from reversed rewrites, weighed by how often each rewrite made forms with
// this ending; each is then inflected forward by the ranker: P(lemma | form) ∝ P(rewrite | ending) ·
// P(form ∈ table(lemma))^forward · the dictionary's preferences (listed lemmas, capitalization per UPOS).
import { lemmaFeatures } from '../inflect/features.ts'
import { fillPattern } from '../inflect/pattern.ts'
import { type PredictedTable, predictTables } from '../inflect/predict.ts'
import { scoreCandidates } from '../inflect/ranker.ts'
import { entryKey } from '../lexicon/entry.ts'
import { mergeFeats } from '../lexicon/feats.ts'
import {
  BoundedCache,
  isCapitalized,
  type LookupContext,
  type LookupModel,
  lookupContext,
} from './lookup-context.ts'

/** One guessed analysis; `score` estimates P(this analysis | form). */
export interface GuessedAnalysis {
  lemma: string
  upos: string
  feats: string
  score: number
  paradigm: string | null
}

export interface GuessOptions {
  /** Candidate lemmas checked with the fast ranker (the most supported reversals). */
  hypotheses: number
  /** Candidate lemmas whose tables are predicted in full (at most this many lemmas are answered). */
  lemmas: number
  /** Lemmas are answered, best first, until their probabilities add up to this much. */
  mass: number
  /** How much more likely a lemma the dictionary lists (without a table) is than an unknown one. */
  listedBoost: number
  /** Added to each cell's share before renormalizing: the ranker is often sure of the wrong cell. */
  cellSmoothing: number
  /** Exponent of the forward check P(form ∈ table(lemma)) beside the rewrite prior (0: ignore it). */
  forward: number
  /**
   * Offer a PROPN guess (lemma = token) for a capitalized token the index lacks in that spelling, scored
   * by the dictionary's share of names among its capitalized lemmas (guess-name.ts).
   */
  names: boolean
}

export const DEFAULT_GUESS_OPTIONS: GuessOptions = {
  hypotheses: 12,
  lemmas: 4,
  mass: 0.97,
  listedBoost: 1_000_000,
  cellSmoothing: 0.02,
  forward: 0,
  names: true,
}

interface QuickFit {
  cands: { paradigm: number; stems: string[]; prob: number }[]
}

/** Weight kept by a lemma whose whole-paradigm ranking does not make the form. */
const QUICK_MISS = 0.01

const quickCaches = new WeakMap<LookupContext, BoundedCache<QuickFit>>()

/** A spelling to guess from, and how it was derived from the token. */
export interface GuessKey {
  key: string
  how: string
}

/**
 * Guess the analyses of a token from one or more spellings of it (its case variants compete in one
 * distribution, so the dictionary's capitalization decides between them): best first, each with
 * P(analysis | token) and the spelling it came from; those below `floor` are dropped.
 * @example guessForm(model, [{ key: 'Mänteln', how: 'exact' }])[0] // { lemma: 'Mantel', feats: 'Case=Dat|Number=Plur', score: 0.9, ... }
 */
export function guessForm(
  model: LookupModel,
  keys: readonly GuessKey[],
  floor = 0,
  opts: GuessOptions = DEFAULT_GUESS_OPTIONS,
): (GuessedAnalysis & { how: string })[] {
  const ctx = lookupContext(model)
  const hyps = keys.flatMap((k) =>
    ctx.reverse.hypotheses(k.key).map((h) => {
      const cap = ctx.capitalShare.get(h.upos) ?? 0.5
      const inherent = ctx.listed.get(h.lemma, h.upos)
      const listed = inherent !== undefined
      const prior = h.prior * (listed ? opts.listedBoost : 1) * (isCapitalized(h.lemma) ? cap : 1 - cap)
      return { ...h, form: k.key, how: k.how, inherent: inherent ?? '_', listed, prior, weight: 0 }
    }),
  )
  hyps.sort(
    (a, b) => b.prior - a.prior || cmp(a.lemma, b.lemma) || cmp(a.upos, b.upos) || cmp(a.form, b.form),
  )
  // The fast ranker knows whole paradigms only; a form it cannot make may still come from a table
  // composed cell by cell, so such a lemma is held back, not dropped.
  // Lemmas the dictionary lists are always weighed, however rare the rewrite that leads to them.
  const weighed = hyps.filter((h, i) => i < opts.hypotheses || (h.listed && i < opts.hypotheses * 4))
  for (const h of weighed) {
    const q = quickFit(model, ctx, h.lemma, h.upos, h.inherent)
    let inTable = 0
    for (const c of q.cands) if (madeBy(model, c.paradigm, c.stems, h.form)) inTable += c.prob
    h.weight = h.prior * (inTable > 0 ? inTable ** opts.forward : QUICK_MISS)
  }
  weighed.sort(
    (a, b) => b.weight - a.weight || cmp(a.lemma, b.lemma) || cmp(a.upos, b.upos) || cmp(a.form, b.form),
  )
  // The few best lemmas are inflected in full, so a guess agrees with what expanding that lemma gives;
  // a form only improbable tables make falls back to the fast ranker's view of the cells. Lemmas whose
  // tables do not make the form at all give way to the next ones.
  const cells: {
    w: (typeof weighed)[number]
    marginal: Map<string, { score: number; paradigm: string }>
    inTable: number
  }[] = []
  for (let i = 0; i < weighed.length && cells.length < opts.lemmas && i < opts.lemmas * 3; i++) {
    const w = weighed[i]!
    const found = fullFit(model, ctx, w.lemma, w.upos, w.inherent, w.form)
    w.weight = found.inTable > 0 ? w.prior * found.inTable ** opts.forward : 0
    if (found.inTable > 0) cells.push({ w, ...found })
  }
  const z = weighed.reduce((a, w) => a + w.weight, 0)
  cells.sort((a, b) => b.w.weight - a.w.weight || cmp(a.w.lemma, b.w.lemma) || cmp(a.w.upos, b.w.upos))
  const out: (GuessedAnalysis & { how: string })[] = []
  let mass = 0
  for (const { w, marginal, inTable } of cells) {
    if (inTable <= 0 || (opts.mass < 1 && mass >= opts.mass)) break
    mass += w.weight / z
    const has = ctx.attested.get(w.lemma, w.upos)
    for (const [cell, m] of marginal) {
      if (has?.has(cell)) continue
      // Four significant digits: tidy answers that still rank improbable guesses apart.
      const share = (Math.min(1, m.score / inTable) + opts.cellSmoothing) / (1 + opts.cellSmoothing)
      const score = Number(((w.weight / z) * share).toPrecision(4))
      if (score < floor || score <= 0) continue
      out.push({
        lemma: w.lemma,
        upos: w.upos,
        feats: mergeFeats(w.inherent, cell),
        score,
        paradigm: m.paradigm,
        how: w.how,
      })
    }
  }
  return out
}

/** Where a form sits in a lemma's predicted tables (or, if none makes it, in its whole-paradigm candidates). */
function fullFit(
  model: LookupModel,
  ctx: LookupContext,
  lemma: string,
  upos: string,
  inherent: string,
  form: string,
) {
  const key = entryKey(lemma, upos)
  const tables =
    ctx.tables.get(key) ?? ctx.tables.set(key, predictTables(model.inflection, lemma, upos, inherent, 32))
  const found = formCells(tables, form)
  if (found.inTable > 0) return found
  const paradigms = model.inflection.book.paradigms
  const quick = quickFit(model, ctx, lemma, upos, inherent).cands.map((c) => {
    const p = paradigms[c.paradigm]!
    const cells = p.cells.map((x) => ({ key: x.key, forms: x.forms.map((f) => fillPattern(f, c.stems)) }))
    return { paradigm: p.id, score: c.prob, cells }
  })
  return formCells(quick, form)
}

/** Where a form sits in scored tables: per cell, the tables' summed score and the best one's paradigm. */
function formCells(
  tables: readonly PredictedTable[],
  form: string,
): { marginal: Map<string, { score: number; paradigm: string }>; inTable: number } {
  const marginal = new Map<string, { score: number; paradigm: string }>()
  let inTable = 0
  for (const t of tables) {
    let here = false
    for (const c of t.cells) {
      if (!c.forms.includes(form)) continue
      here = true
      const m = marginal.get(c.key)
      if (m) m.score += t.score
      else marginal.set(c.key, { score: t.score, paradigm: t.paradigm })
    }
    if (here) inTable += t.score
  }
  return { marginal, inTable }
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}

function quickFit(
  model: LookupModel,
  ctx: LookupContext,
  lemma: string,
  upos: string,
  inherent: string,
): QuickFit {
  let cache = quickCaches.get(ctx)
  if (!cache) {
    cache = new BoundedCache<QuickFit>(16384)
    quickCaches.set(ctx, cache)
  }
  const key = `${lemma}\t${upos}\t${inherent}`
  const hit = cache.get(key)
  if (hit) return hit
  const inf = model.inflection
  const found = inf.finder.find(lemma, upos)
  const probs =
    found.length === 0
      ? []
      : scoreCandidates(
          inf.weights,
          lemmaFeatures(lemma, inherent, inf.options.features),
          found.map((c) => c.paradigm),
          found.map((c) => c.shared),
        )
  const cands = found.map((c, i) => ({ paradigm: c.paradigm, stems: c.stems, prob: probs[i]! }))
  return cache.set(key, { cands })
}

function madeBy(model: LookupModel, paradigm: number, stems: string[], form: string): boolean {
  for (const c of model.inflection.book.paradigms[paradigm]!.cells)
    for (const f of c.forms) if (fillPattern(f, stems) === form) return true
  return false
}
