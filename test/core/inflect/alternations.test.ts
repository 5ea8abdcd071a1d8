// Letter alternations and twin paradigms. Finnish vowel harmony, from memory of a grammar handbook: the
// inessive -ssa/-ssä, elative -sta/-stä, adessive -lla/-llä and partitive -a/-ä follow the lemma's vowels.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { DEFAULT_TWIN_OPTIONS, learnAlternations, mirror } from '../../../src/core/inflect/alternations.ts'
import { extractParadigms } from '../../../src/core/inflect/extract.ts'
import { DEFAULT_LEARN_OPTIONS, learnInflection } from '../../../src/core/inflect/learn.ts'
import { applyParadigm, paradigmShapeKey } from '../../../src/core/inflect/paradigm.ts'
import { predictTables } from '../../../src/core/inflect/predict.ts'
import { twinParadigms, withTwins } from '../../../src/core/inflect/twins.ts'
import { rowsToEntries } from '../../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'
import { buildModel } from '../../../src/core/model/build-model.ts'
import { decodeModel } from '../../../src/core/model/decode-model.ts'
import { encodeModel } from '../../../src/core/model/encode-model.ts'

const CELLS = ['Case=Nom', 'Case=Ine', 'Case=Ela', 'Case=Ade', 'Case=Par']
const table = (forms: string[]) =>
  forms.map((form, i) => ({ lemma: forms[0]!, form, upos: 'NOUN', feats: CELLS[i]! }))

// From memory: talo, auto (back) and kylä, metsä (front); nainen (back) and ihminen (front); puhelin (back).
const rows = [
  ...table(['talo', 'talossa', 'talosta', 'talolla', 'taloa']),
  ...table(['auto', 'autossa', 'autosta', 'autolla', 'autoa']),
  ...table(['kylä', 'kylässä', 'kylästä', 'kylällä', 'kylää']),
  ...table(['metsä', 'metsässä', 'metsästä', 'metsällä', 'metsää']),
  ...table(['nainen', 'naisessa', 'naisesta', 'naisella', 'naista']),
  ...table(['ihminen', 'ihmisessä', 'ihmisestä', 'ihmisellä', 'ihmistä']),
  ...table(['puhelin', 'puhelimessa', 'puhelimesta', 'puhelimella', 'puhelinta']),
]

/** This small handbook sample has two back/front paradigm pairs; the default asks for three. */
const LEARN = { ...DEFAULT_LEARN_OPTIONS, twins: { ...DEFAULT_TWIN_OPTIONS, minPairs: 2 } }

describe('learnAlternations (Finnish vowel harmony, from memory)', () => {
  const book = extractParadigms(buildLexicon(rowsToEntries(rows)))

  it('learns a↔ä from the two back/front paradigm pairs', () => {
    expect(learnAlternations(book.paradigms, { ...DEFAULT_TWIN_OPTIONS, minPairs: 2 })).toEqual({
      NOUN: { a: 'ä', ä: 'a' },
    })
    expect(learnAlternations(book.paradigms, { ...DEFAULT_TWIN_OPTIONS, minPairs: 3 })).toEqual({})
  })

  it('mirrors only the paradigm that has no front counterpart, and the twin fits a front lemma', () => {
    const twins = twinParadigms(book.paradigms, { NOUN: { a: 'ä', ä: 'a' } })
    expect(twins).toHaveLength(1)
    expect(twins[0]!.members).toBe(0)
    expect(book.paradigms[twins[0]!.twinOf!]!.examples).toEqual(['puhelin'])
    // elin (an organ) takes the front endings, from memory: elimessä, elimestä, elimellä, elintä.
    const forms = applyParadigm(twins[0]!, 'elin')!
    const byCell = Object.fromEntries(twins[0]!.cells.map((c, i) => [c.key, forms[i]]))
    expect(CELLS.map((k) => byCell[k])).toEqual([
      ['elin'],
      ['elimessä'],
      ['elimestä'],
      ['elimellä'],
      ['elintä'],
    ])
  })

  it('offers the twin as a predicted table for a front lemma of the class', () => {
    const model = learnInflection(rowsToEntries(rows), LEARN)
    const forms = predictTables(model, 'elin', 'NOUN', '_', 8).map(
      (t) => t.cells.find((c) => c.key === CELLS[1])?.forms[0],
    )
    expect(forms).toContain('elimessä')
    expect(
      model.lexicon.entries.every(
        (_, i) => model.book.paradigms[model.book.memberOf[i]!]!.twinOf === undefined,
      ),
    ).toBe(true)
  })
})

describe('learnAlternations rejects stem-vowel classes (German umlaut-like, invented)', () => {
  it('does not keep a vowel that pairs with several partners', () => {
    // Stem vowels a, o and u umlauted in the plural (Blatt/Blätter-like): the three mirrored classes pair
    // a/o, a/u and o/u (and ä/ö, ä/ü, ö/ü) alike, so no letter has one partner.
    const mk = (lemma: string, pl: string) => [
      { lemma, form: lemma, upos: 'NOUN', feats: 'Number=Sing' },
      { lemma, form: pl, upos: 'NOUN', feats: 'Number=Plur' },
    ]
    const umlaut: Record<string, string> = { a: 'ä', o: 'ö', u: 'ü' }
    const vowelRows = ['a', 'o', 'u'].flatMap((v) =>
      ['bl', 'kr', 'sn', 'tr'].flatMap((c, j) =>
        mk(`${c}${v}${'dfgk'[j]}`, `${c}${umlaut[v]}${'dfgk'[j]}er`),
      ),
    )
    const book = extractParadigms(buildLexicon(rowsToEntries(vowelRows)))
    expect(
      learnAlternations(book.paradigms, { ...DEFAULT_TWIN_OPTIONS, minPairs: 1, dominance: 0 }),
    ).not.toEqual({})
    expect(learnAlternations(book.paradigms, { ...DEFAULT_TWIN_OPTIONS, minPairs: 1 })).toEqual({})
  })
})

describe('twins in the model file', () => {
  it('are not stored, are derived again on reading, and the file is byte-identical', () => {
    const entries = [...rowsToEntries(rows), { lemma: 'elin', upos: 'NOUN', feats: '_' }]
    const model = buildModel(entries, { learn: LEARN })
    expect(model.inflection.book.paradigms.some((p) => p.twinOf !== undefined)).toBe(true)
    const text = encodeModel(model)
    expect(JSON.parse(text).paradigms.some((p: { id: string }) => p.id.endsWith('-twin'))).toBe(false)
    const back = decodeModel(text)
    expect(back.inflection.book.paradigms.map((p) => p.id)).toEqual(
      model.inflection.book.paradigms.map((p) => p.id),
    )
    expect(encodeModel(back)).toBe(text)
    expect(encodeModel(buildModel(entries, { learn: LEARN }))).toBe(text)
    expect(predictTables(back.inflection, 'elin', 'NOUN')).toEqual(
      predictTables(model.inflection, 'elin', 'NOUN'),
    )
  })
})

describe('twins (properties)', () => {
  const letters = fc.constantFrom('a', 'ä', 'o', 'ö', 'k', 't', 's', 'n', 'i')
  const word = fc.array(letters, { minLength: 1, maxLength: 4 }).map((l) => l.join(''))
  const lexicon = fc.array(
    fc.tuple(word, word, fc.array(word, { minLength: 4, maxLength: 4 }), fc.boolean()),
    { minLength: 1, maxLength: 12 },
  )

  it('never duplicate a paradigm, always mirror their original, and learning is deterministic', () => {
    fc.assert(
      fc.property(lexicon, (specs) => {
        const r = specs.flatMap(([stem, end, suffixes, front], k) => {
          const swap = { a: 'ä', ä: 'a', o: 'ö', ö: 'o' }
          const lemma = `${stem}${k}${end}`
          return table([lemma, ...suffixes.map((s) => stem + k + (front ? mirror(s, swap) : s))])
        })
        const book = extractParadigms(buildLexicon(rowsToEntries(r)))
        const opts = { ...DEFAULT_TWIN_OPTIONS, minPairs: 1 }
        const alt = learnAlternations(book.paradigms, opts)
        expect(learnAlternations(book.paradigms, opts)).toEqual(alt)
        const members = book.paradigms.map((p) => p.examples)
        const { paradigms } = withTwins(book.paradigms, members, alt)
        expect(withTwins(book.paradigms, members, alt).paradigms).toEqual(paradigms)
        const keys = paradigms.map((p) => paradigmShapeKey(p.upos, p.lemma, p.openPrefix, p.cells))
        expect(new Set(keys).size).toBe(keys.length)
        for (const [x, y] of Object.entries(alt.NOUN ?? {})) expect(alt.NOUN![y]).toBe(x)
        for (const t of paradigms.filter((p) => p.twinOf !== undefined)) {
          const o = paradigms[t.twinOf!]!
          expect(o.twinOf).toBeUndefined()
          expect(
            t.cells.map((c) =>
              c.forms.map((f) => f.map((x) => (typeof x === 'string' ? mirror(x, alt.NOUN!) : x))),
            ),
          ).toEqual(o.cells.map((c) => c.forms))
        }
      }),
      { numRuns: 60, seed: 7 },
    )
  })
})
