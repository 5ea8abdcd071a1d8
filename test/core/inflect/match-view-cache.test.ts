// The candidate search finds a lemma's ways to match a lemma pattern once and scores them per rule (rules of
// many cells share patterns but not stem shapes), and looks a lemma up once per shared suffix index. These
// properties check that the shared work gives exactly what a search of its own would: matchStems (the
// reference search of paradigm.ts) for the stems and their fit, and a fresh index for the suffix figures,
// whatever order the rules and lemmas come in.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { CandidateFinder } from '../../../src/core/inflect/candidates.ts'
import { fitOfMatch, matchView, viewStems } from '../../../src/core/inflect/match-view.ts'
import { matchStems, type Paradigm, type StemShape, stemFit } from '../../../src/core/inflect/paradigm.ts'
import type { Pattern } from '../../../src/core/inflect/pattern.ts'
import { SuffixIndex } from '../../../src/core/inflect/suffix-index.ts'

const letters = fc.constantFrom('a', 'e', 'n', 'r', 'ä', 't')
const word = fc.array(letters, { minLength: 1, maxLength: 9 }).map((l) => l.join(''))
const literal = fc.array(letters, { minLength: 1, maxLength: 2 }).map((l) => l.join(''))

/** Lemma patterns of 2–3 stems with literals between them (and maybe around them). */
const pattern: fc.Arbitrary<Pattern> = fc
  .tuple(fc.option(literal), literal, fc.option(literal), fc.boolean())
  .map(([head, mid, tail, three]) => {
    const p: Pattern = []
    if (head) p.push(head)
    p.push(0, mid, 1)
    if (three) p.push('a', 2)
    if (tail) p.push(tail)
    return p
  })

const shape: fc.Arbitrary<StemShape> = fc
  .tuple(fc.array(word, { maxLength: 4 }), fc.nat(4), fc.nat(4))
  .map(([seen, lo, span]) => ({
    seen,
    first: seen.map((s) => s[0]!).join(''),
    last: seen.map((s) => s[s.length - 1]!).join(''),
    minLength: lo,
    maxLength: lo + span,
  }))

function rule(lemma: Pattern, shapes: StemShape[] | undefined, openPrefix = false): Paradigm {
  return {
    id: 'r',
    upos: 'NOUN',
    lemma,
    openPrefix,
    cells: [],
    members: 1,
    examples: [],
    ...(shapes && { shapes }),
  }
}

describe('shared matching of one lemma against rules with one pattern', () => {
  it('gives each rule the stems and fit its own search would', () => {
    fc.assert(
      fc.property(
        pattern,
        fc.array(
          fc.tuple(
            fc.option(fc.array(shape, { minLength: 3, maxLength: 3 }), { nil: undefined }),
            fc.boolean(),
          ),
          { minLength: 1, maxLength: 4 },
        ),
        fc.array(word, { minLength: 1, maxLength: 5 }),
        (lemma, shapeSets, words) => {
          // Rules with and without an open prefix (an empty first stem allowed) in one run.
          const rules = shapeSets.map(([s, open]) => rule(lemma, s, open))
          const views = rules.map(matchView)
          // Interleaved: each word against every rule, then the first rule again after another word.
          for (const w of [...words, words[0]!]) {
            rules.forEach((r, i) => {
              const got = viewStems(views[i]!, w)
              const want = matchStems(r, w)
              expect(got).toEqual(want)
              if (got) expect(fitOfMatch(got, views[i]!)).toBe(stemFit(got, r.shapes))
            })
          }
        },
      ),
      { numRuns: 300 },
    )
  })

  it('finds the Mantel/Mäntel split of a handbook umlaut rule (German a → ä plural, from memory)', () => {
    // Two rules with one pattern: stems 'M' + 'ntel' (members like Mantel) or 'K' + 'nal' (Kanal).
    const mantel = rule(
      [0, 'a', 1],
      [
        { seen: ['M'], first: 'M', last: 'M', minLength: 1, maxLength: 1 },
        { seen: ['ntel'], first: 'n', last: 'l', minLength: 4, maxLength: 4 },
      ],
    )
    const twoA = rule(
      [0, 'a', 1],
      [
        { seen: ['Kan'], first: 'K', last: 'n', minLength: 3, maxLength: 3 },
        { seen: ['l'], first: 'l', last: 'l', minLength: 1, maxLength: 1 },
      ],
    )
    expect(viewStems(matchView(mantel), 'Kanal')).toEqual(['K', 'nal'])
    expect(viewStems(matchView(twoA), 'Kanal')).toEqual(['Kan', 'l'])
    expect(viewStems(matchView(mantel), 'Kanal')).toEqual(['K', 'nal'])
  })
})

describe('one lemma looked up once per shared suffix index', () => {
  it('gives the figures of a fresh index, for rules sharing a member list and for others', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(word, { minLength: 1, maxLength: 6 }), { minLength: 1, maxLength: 3 }),
        fc.array(word, { minLength: 1, maxLength: 5 }),
        (lists, words) => {
          // Each list serves two rules (as cells that split the tables alike do); single-stem rules.
          const rules = lists.flatMap(() => [rule([0], undefined), rule([0, 'e'], undefined)])
          const members = lists.flatMap((l) => [l, l])
          const finder = new CandidateFinder(rules, members)
          for (const w of [...words, words[0]!]) {
            const found = finder.find(w, 'NOUN')
            for (const c of found) {
              const fresh = new SuffixIndex(members[c.paradigm]!.map((m) => m.toLowerCase()))
              expect(c.sfx).toBe(fresh.longestShared(w.toLowerCase(), false).length)
            }
            expect(found.map((c) => c.paradigm)).toEqual(
              rules.flatMap((r, i) => (matchStems(r, w) ? [i] : [])),
            )
          }
        },
      ),
      { numRuns: 200 },
    )
  })
})
