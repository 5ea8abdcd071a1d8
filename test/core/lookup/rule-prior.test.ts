// The guesser's rewrite prior, frozen into an ending trie, against a plain reading of its definition: counts
// of each rewrite per form ending (up to 7 letters) with Dirichlet backoff to the shorter ending. Model: the
// German handbook tables written from memory (test/core/lookup/fixtures/german.ts).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { matchStems } from '../../../src/core/inflect/paradigm.ts'
import { fillPattern } from '../../../src/core/inflect/pattern.ts'
import { ReverseRules, rewriteKey } from '../../../src/core/lookup/reverse-rules.ts'
import { germanModel } from './fixtures/german.ts'

const model = germanModel()
const rules = new ReverseRules(model.inflection)
const idOf = new Map(rules.rules.map((r) => [rewriteKey(r.upos, r.openPrefix, r.lemma, r.cell), r.id]))

/** Counts per ending as maps, straight from the definition (rule-prior.ts, its header). */
function reference() {
  const counts = new Map<string, Map<number, number>>()
  const totals = new Map<string, number>()
  let maxId = 0
  const { entries } = model.inflection.lexicon
  entries.forEach((e, i) => {
    const p = model.inflection.book.paradigms[model.inflection.book.memberOf[i] ?? -1]
    const stems = p && e.cells ? matchStems(p, e.lemma) : null
    if (!p || !stems) return
    const cells = new Map(e.cells!.map((c) => [c.key, c.forms]))
    for (const c of p.cells)
      for (const pattern of c.forms) {
        const form = fillPattern(pattern, stems)
        const id = idOf.get(rewriteKey(p.upos, p.openPrefix, p.lemma, pattern))
        if (id === undefined || !cells.get(c.key)?.includes(form)) continue
        maxId = Math.max(maxId, id)
        for (let k = 0; k <= Math.min(7, form.length); k++) {
          const end = form.slice(form.length - k)
          const m = counts.get(end) ?? new Map<number, number>()
          m.set(id, (m.get(id) ?? 0) + 1)
          counts.set(end, m)
          totals.set(end, (totals.get(end) ?? 0) + 1)
        }
      }
  })
  return (form: string, id: number) => {
    let p = 1 / (maxId + 1)
    for (let k = 0; k <= Math.min(7, form.length); k++) {
      const end = form.slice(form.length - k)
      const n = totals.get(end)
      if (!n) break
      p = ((counts.get(end)!.get(id) ?? 0) + 2 * p) / (n + 2)
    }
    return p
  }
}

describe('the rewrite prior', () => {
  const expected = reference()
  const prior = (rules as unknown as { prior: { probabilities(f: string, ids: number[]): number[] } }).prior
  const forms = model.inflection.lexicon.entries.flatMap((e) => e.cells?.flatMap((c) => c.forms) ?? [])

  it('gives every rewrite of the dictionary\'s own forms the probability its definition gives', () => {
    const ids = rules.rules.map((r) => r.id)
    expect(forms.length).toBeGreaterThan(100)
    for (const f of forms) expect(prior.probabilities(f, ids)).toEqual(ids.map((id) => expected(f, id)))
  })

  it('does so for made-up words too, endings seen or not', () => {
    const letter = fc.constantFrom(...'aeinrstuäöüßgm')
    fc.assert(
      fc.property(fc.string({ unit: letter, maxLength: 10 }), fc.nat(rules.rules.length - 1), (w, id) => {
        expect(prior.probabilities(w, [id])).toEqual([expected(w, id)])
      }),
      { numRuns: 400 },
    )
  })
})
