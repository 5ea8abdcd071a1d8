// Reversed cell patterns: from a form, the lemmas that some paradigm's cell could have made it from.
import type { InflectionModel } from '../inflect/learn.ts'
import { matchAll, type Paradigm } from '../inflect/paradigm.ts'
import { fillPattern, type Pattern, patternKey } from '../inflect/pattern.ts'
import { RulePrior } from './rule-prior.ts'

/** One way back: a cell pattern of some paradigms (or cell rules) and the lemma pattern beside it. */
export interface ReverseRule {
  id: number
  upos: string
  cell: Pattern
  lemma: Pattern
  openPrefix: boolean
}

/** A lemma a form may come from; `prior` is P(rewrite | form's ending), summed over the rewrites leading there. */
export interface LemmaHypothesis {
  lemma: string
  upos: string
  prior: number
}

/** Guessing does not chase more stem splits than this per rule (matchAll's own bound also applies). */
const MAX_SPLITS = 8

/** The identity of a rewrite: UPOS, open prefix, lemma pattern, cell pattern. */
export function rewriteKey(upos: string, openPrefix: boolean, lemma: Pattern, cell: Pattern): string {
  return `${upos}\u0001${openPrefix ? 1 : 0}\u0001${patternKey(lemma)}\u0001${patternKey(cell)}`
}

/**
 * The cell patterns of a model's paradigms and per-cell rules, indexed by their final literal so that a
 * form only meets the rules whose ending it has, with how often each rewrite made forms of that ending.
 * @example new ReverseRules(model).hypotheses('Mänteln')[0] // { lemma: 'Mantel', upos: 'NOUN', prior: 0.7 }
 */
export class ReverseRules {
  readonly rules: ReverseRule[] = []
  private readonly byKey = new Map<string, ReverseRule>()
  private readonly byEnding = new Map<string, ReverseRule[]>()
  private readonly longestEnding: number
  private readonly prior: RulePrior

  constructor(model: Pick<InflectionModel, 'book' | 'cells' | 'lexicon'>) {
    const add = (p: Paradigm) => {
      for (const c of p.cells) {
        for (const f of c.forms) {
          const key = rewriteKey(p.upos, p.openPrefix, p.lemma, f)
          if (this.byKey.has(key)) continue
          const r = { id: this.rules.length, upos: p.upos, cell: f, lemma: p.lemma, openPrefix: p.openPrefix }
          this.rules.push(r)
          this.byKey.set(key, r)
        }
      }
    }
    for (const p of model.book.paradigms) add(p)
    for (const m of model.cells ?? []) for (const r of m.rules) add(r)
    let longest = 0
    for (const r of this.rules) {
      const last = r.cell[r.cell.length - 1]
      const ending = typeof last === 'string' ? last : ''
      longest = Math.max(longest, ending.length)
      const list = this.byEnding.get(ending)
      if (list) list.push(r)
      else this.byEnding.set(ending, [r])
    }
    this.longestEnding = longest
    this.prior = new RulePrior(
      model,
      (upos, open, lemma, cell) => this.byKey.get(rewriteKey(upos, open, lemma, cell))?.id,
    )
  }

  /**
   * The lemmas `form` may be an inflected form of, most probable rewrite first (ties: lemma, then UPOS).
   * @example rules.hypotheses('gesagt').map((h) => h.lemma) // ['sagen', 'gesagen', ...]
   */
  hypotheses(form: string): LemmaHypothesis[] {
    const routes: { rule: ReverseRule; lemma: string }[] = []
    for (let k = 0; k <= Math.min(this.longestEnding, form.length); k++) {
      const rules = this.byEnding.get(form.slice(form.length - k))
      if (!rules) continue
      for (const r of rules) {
        const splits = matchAll(r.cell, r.openPrefix, form)
        const seen = new Set<string>()
        for (let s = 0; s < splits.length && s < MAX_SPLITS; s++) {
          const lemma = fillPattern(r.lemma, splits[s]!)
          if (lemma === '' || seen.has(lemma)) continue
          seen.add(lemma)
          routes.push({ rule: r, lemma })
        }
      }
    }
    const probs = this.prior.probabilities(
      form,
      routes.map((x) => x.rule.id),
    )
    const found = new Map<string, LemmaHypothesis>()
    routes.forEach(({ rule, lemma }, i) => {
      const key = `${lemma}\t${rule.upos}`
      const h = found.get(key)
      if (h) h.prior += probs[i]!
      else found.set(key, { lemma, upos: rule.upos, prior: probs[i]! })
    })
    return [...found.values()].sort(
      (a, b) =>
        b.prior - a.prior || (a.lemma < b.lemma ? -1 : a.lemma > b.lemma ? 1 : a.upos < b.upos ? -1 : 1),
    )
  }
}
