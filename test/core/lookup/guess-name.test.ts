// Name guesses on the German handbook dictionary (tables from memory), where nouns are capitalized too.
import { describe, expect, it } from 'vitest'
import { analyzeForm } from '../../../src/core/lookup/analyze.ts'
import { nameShare } from '../../../src/core/lookup/guess-name.ts'
import { buildModel } from '../../../src/core/model/build-model.ts'
import { germanBareLemmas, germanModel, germanTables } from './fixtures/german.ts'

// Invented place names, listed as bare PROPN lemmas (a gazetteer beside the dictionary).
const NAMES = ['Velmora', 'Tarsk', 'Odrin', 'Kaluma', 'Presk', 'Wendaro', 'Imbrug', 'Sollast']
const withNames = buildModel([
  ...germanTables,
  ...germanBareLemmas,
  ...NAMES.map((lemma) => ({ lemma, upos: 'PROPN', feats: '_' })),
])
const names = (model: typeof withNames, form: string, sentenceInitial?: boolean, on = true) =>
  analyzeForm(model, form, { sentenceInitial, guesser: { names: on } }).candidates.filter(
    (c) => c.upos === 'PROPN',
  )

describe('name guesses', () => {
  it('score the share of names among the capitalized lemmas, add-one smoothed', () => {
    const lemmas = withNames.inflection.lexicon.entries.filter((e) => /^\p{Lu}/u.test(e.lemma))
    const expected = (NAMES.length + 1) / (lemmas.length + 2)
    expect(nameShare(withNames)).toBeCloseTo(expected, 10)
    expect(names(withNames, 'Kordal', false)).toEqual([
      {
        lemma: 'Kordal',
        upos: 'PROPN',
        feats: '_',
        source: 'guessed',
        score: Number(expected.toPrecision(4)),
        paradigm: null,
      },
    ])
  })

  it('are never offered where the dictionary lists no names: the noun guesses stay as they were', () => {
    const model = germanModel()
    expect(nameShare(model)).toBe(0)
    const on = analyzeForm(model, 'Klumpen', { sentenceInitial: false }).candidates
    const off = analyzeForm(model, 'Klumpen', { sentenceInitial: false, guesser: { names: false } })
    expect(on).toEqual(off.candidates)
    expect(on[0]).toMatchObject({ lemma: 'Klumpe', upos: 'NOUN' })
  })

  it('scale the other guesses of an unknown token by what the name leaves', () => {
    const off = analyzeForm(withNames, 'Klumpen', { guesser: { names: false } }).candidates
    const on = analyzeForm(withNames, 'Klumpen').candidates
    const share = nameShare(withNames)
    const noun = (cs: typeof on) => cs.find((c) => c.lemma === 'Klumpe' && c.upos === 'NOUN')!.score
    expect(noun(on)).toBeCloseTo(noun(off) * (1 - share), 3)
    expect(on.filter((c) => c.upos === 'PROPN')).toHaveLength(1)
  })

  it('are offered inside a sentence beside a predicted lower-case word, not at a possible sentence start', () => {
    // "kochen" is a bare lemma: its forms are predicted, never attested.
    expect(names(withNames, 'Kochen', false)).toHaveLength(1)
    expect(names(withNames, 'Kochen', true)).toEqual([])
    expect(names(withNames, 'Kochen')).toEqual([])
  })

  it('are not offered for a spelling the index has, nor beside an attested form, nor when turned off', () => {
    expect(names(withNames, 'Rose', false)).toEqual([])
    const attested = germanTables.find((e) => e.upos === 'VERB')!.forms![1]!.form
    const capital = attested[0]!.toUpperCase() + attested.slice(1)
    expect(names(withNames, capital, false)).toEqual([])
    expect(names(withNames, 'Kordal', false, false)).toEqual([])
    expect(names(withNames, 'kordal', false)).toEqual([])
  })
})
