// How likely each rewrite is for a form, from the endings of the dictionary's own forms.
// Suffix-conditioned counts with Dirichlet (MacKay & Peto 1995) backoff from longer to shorter endings,
// in the manner of suffix-based guessing of unknown words (Samuelsson 1993; Brants 2000, TnT).
import { findSorted } from '../inflect/feature-index.ts'
import type { InflectionModel } from '../inflect/learn.ts'
import { matchStems } from '../inflect/paradigm.ts'
import { fillPattern, type Pattern } from '../inflect/pattern.ts'

/** Longest ending looked at (common practice for suffix guessers: 5–10 letters). */
const MAX_ENDING = 7
/** Pseudo-count given to the shorter ending's distribution at each step. */
const BACKOFF = 2

type RuleId = (upos: string, openPrefix: boolean, lemma: Pattern, cell: Pattern) => number | undefined

/** Rule ids are packed with an ending's number into one map key while counting. */
const RULE_SPAN = 2 ** 24

/**
 * Counts, per form ending, of the rewrite that made each attested form from its lemma. The endings form a
 * trie read from a form's last letter; once counted it is frozen into typed arrays (children of a node are
 * consecutive, sorted by letter; a node's counts are consecutive, sorted by rule), about a tenth of what a
 * map of counts per ending holds.
 * @example new RulePrior(model, idOf).probabilities('Mänteln', [3, 9]) // [0.8, 0.05]
 */
export class RulePrior {
  /** Children of node n are nodes first[n] … first[n + 1] − 1; node 0 is the empty ending. */
  private readonly first: Int32Array
  /** The UTF-16 unit on the edge into each node (the letter the ending adds in front). */
  private readonly unit: Uint16Array
  /** Forms counted with each ending. */
  private readonly totals: Int32Array
  /** Node n's counts are pairRule/pairCount[pairAt[n]] … [pairAt[n + 1] − 1], by rule id. */
  private readonly pairAt: Int32Array
  private readonly pairRule: Int32Array
  private readonly pairCount: Int32Array
  private readonly nRules: number

  constructor(model: Pick<InflectionModel, 'book' | 'lexicon'>, idOf: RuleId) {
    let maxId = 0
    const { entries } = model.lexicon
    const growing = new GrowingTrie()
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
          if (id >= RULE_SPAN) throw new Error(`more than ${RULE_SPAN} rewrites`)
          maxId = Math.max(maxId, id)
          growing.count(form, id)
        }
      }
    }
    this.nRules = maxId + 1
    const frozen = growing.freeze()
    this.first = frozen.first
    this.unit = frozen.unit
    this.totals = frozen.totals
    this.pairAt = frozen.pairAt
    this.pairRule = frozen.pairRule
    this.pairCount = frozen.pairCount
  }

  /**
   * P(rewrite | form) for each given rewrite: from the empty ending to the longest one seen, each
   * ending's counts are smoothed towards the shorter ending's estimate.
   */
  probabilities(form: string, ids: readonly number[]): number[] {
    // The endings of the form that were seen, shortest first.
    const path: number[] = []
    for (let k = 0, node = 0; k <= Math.min(MAX_ENDING, form.length); k++) {
      if (k > 0) node = this.child(node, form.charCodeAt(form.length - k))
      if (node < 0 || !this.totals[node]) break
      path.push(node)
    }
    return ids.map((id) => {
      let p = 1 / Math.max(1, this.nRules)
      for (const node of path) p = (this.countOf(node, id) + BACKOFF * p) / (this.totals[node]! + BACKOFF)
      return p
    })
  }

  private child(node: number, u: number): number {
    return findSorted(this.unit, this.first[node]!, this.first[node + 1]!, u)
  }

  private countOf(node: number, id: number): number {
    const k = findSorted(this.pairRule, this.pairAt[node]!, this.pairAt[node + 1]!, id)
    return k < 0 ? 0 : this.pairCount[k]!
  }
}

/** The ending trie while counting: nodes by ending text, counts by (node, rule) in one map. */
class GrowingTrie {
  private readonly nodeOf = new Map<string, number>([['', 0]])
  private readonly parent: number[] = [-1]
  private readonly unitOf: number[] = [0]
  private readonly totals: number[] = [0]
  private readonly counts = new Map<number, number>()

  count(form: string, id: number): void {
    let node = 0
    for (let k = 0; k <= Math.min(MAX_ENDING, form.length); k++) {
      if (k > 0) {
        const end = form.slice(form.length - k)
        let next = this.nodeOf.get(end)
        if (next === undefined) {
          next = this.parent.length
          this.nodeOf.set(end, next)
          this.parent.push(node)
          this.unitOf.push(end.charCodeAt(0))
          this.totals.push(0)
        }
        node = next
      }
      this.totals[node]!++
      const key = node * RULE_SPAN + id
      this.counts.set(key, (this.counts.get(key) ?? 0) + 1)
    }
  }

  /** Renumber breadth-first with children by letter, and lay the counts out per node by rule. */
  freeze() {
    const n = this.parent.length
    const children: number[][] = Array.from({ length: n }, () => [])
    for (let v = 1; v < n; v++) children[this.parent[v]!]!.push(v)
    const order = [0]
    const first = new Int32Array(n + 1)
    for (let i = 0; i < order.length; i++) {
      first[i] = order.length
      const kids = children[order[i]!]!.sort((a, b) => this.unitOf[a]! - this.unitOf[b]!)
      for (const c of kids) order.push(c)
    }
    first[n] = n
    const renumber = new Int32Array(n)
    order.forEach((v, i) => {
      renumber[v] = i
    })
    const pairs: [number, number, number][] = []
    for (const [key, c] of this.counts) pairs.push([renumber[Math.floor(key / RULE_SPAN)]!, key % RULE_SPAN, c])
    pairs.sort((a, b) => a[0] - b[0] || a[1] - b[1])
    const pairAt = new Int32Array(n + 1)
    for (const [v] of pairs) pairAt[v + 1]!++
    for (let v = 0; v < n; v++) pairAt[v + 1]! += pairAt[v]!
    return {
      first,
      unit: Uint16Array.from(order, (v) => this.unitOf[v]!),
      totals: Int32Array.from(order, (v) => this.totals[v]!),
      pairAt,
      pairRule: Int32Array.from(pairs, (x) => x[1]),
      pairCount: Int32Array.from(pairs, (x) => x[2]),
    }
  }
}
