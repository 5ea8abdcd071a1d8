// How likely each rewrite is for a form, from the endings of the dictionary's own forms.
// Suffix-conditioned counts with Dirichlet (MacKay & Peto 1995) backoff from longer to shorter endings,
// in the manner of suffix-based guessing of unknown words (Samuelsson 1993; Brants 2000, TnT).
import type { InflectionModel } from '../inflect/learn.ts'
import { matchStems } from '../inflect/paradigm.ts'
import { fillPattern, type Pattern } from '../inflect/pattern.ts'

/** Longest ending looked at (common practice for suffix guessers: 5–10 letters). */
const MAX_ENDING = 7
/** Pseudo-count given to the shorter ending's distribution at each step. */
const BACKOFF = 2

type RuleId = (upos: string, openPrefix: boolean, lemma: Pattern, cell: Pattern) => number | undefined

/**
 * Counts, per form ending, of the rewrite that made each attested form from its lemma.
 * @example new RulePrior(model, idOf).probabilities('Mänteln', [3, 9]) // [0.8, 0.05]
 */
export class RulePrior {
  private readonly counts = new Map<string, Map<number, number>>()
  private readonly totals = new Map<string, number>()
  private readonly nRules: number

  constructor(model: Pick<InflectionModel, 'book' | 'lexicon'>, idOf: RuleId) {
    let maxId = 0
    const { entries } = model.lexicon
    for (let i = 0; i < entries.length; i++) {
      const e = entries[i]!
      const p = model.book.paradigms[model.book.memberOf[i] ?? -1]
      if (!e.cells || !p) continue
      const stems = matchStems(p, e.lemma)
      if (!stems) continue
      const cells = new Map(e.cells.map((c) => [c.key, c.forms]))
      for (const c of p.cells) {
        const forms = cells.get(c.key)
        if (!forms) continue
        for (const pattern of c.forms) {
          const form = fillPattern(pattern, stems)
          const id = idOf(p.upos, p.openPrefix, p.lemma, pattern)
          if (id === undefined || !forms.includes(form)) continue
          maxId = Math.max(maxId, id)
          this.count(form, id)
        }
      }
    }
    this.nRules = maxId + 1
  }

  private count(form: string, id: number): void {
    for (let k = 0; k <= Math.min(MAX_ENDING, form.length); k++) {
      const end = `${k}:${form.slice(form.length - k)}`
      let m = this.counts.get(end)
      if (!m) {
        m = new Map()
        this.counts.set(end, m)
      }
      m.set(id, (m.get(id) ?? 0) + 1)
      this.totals.set(end, (this.totals.get(end) ?? 0) + 1)
    }
  }

  /**
   * P(rewrite | form) for each given rewrite: from the empty ending to the longest one seen, each
   * ending's counts are smoothed towards the shorter ending's estimate.
   */
  probabilities(form: string, ids: readonly number[]): number[] {
    return ids.map((id) => {
      let p = 1 / Math.max(1, this.nRules)
      for (let k = 0; k <= Math.min(MAX_ENDING, form.length); k++) {
        const end = `${k}:${form.slice(form.length - k)}`
        const n = this.totals.get(end)
        if (!n) break
        p = ((this.counts.get(end)!.get(id) ?? 0) + BACKOFF * p) / (n + BACKOFF)
      }
      return p
    })
  }
}
