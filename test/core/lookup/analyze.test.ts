// analyze(): what it promises about the forms of a German handbook dictionary (tables from memory).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../../src/core/inflect/expand.ts'
import { analyzeForm } from '../../../src/core/lookup/analyze.ts'
import { compareCandidates } from '../../../src/core/lookup/candidate.ts'
import { guessForm } from '../../../src/core/lookup/guess.ts'
import { buildModel } from '../../../src/core/model/build-model.ts'
import { decodeModel } from '../../../src/core/model/decode-model.ts'
import { encodeModel } from '../../../src/core/model/encode-model.ts'
import { germanBareLemmas, germanModel, germanTables } from './fixtures/german.ts'

const germanModelWithout = (lemma: string) =>
  buildModel([...germanTables, ...germanBareLemmas.filter((e) => e.lemma !== lemma)])

const model = germanModel()
const entries = model.inflection.lexicon.entries
const has = (form: string, a: { lemma: string; upos: string; feats: string }, opts = {}) =>
  analyzeForm(model, form, opts).candidates.find(
    (c) => c.lemma === a.lemma && c.upos === a.upos && c.feats === a.feats,
  )

/** Guess with no bounds, so that every analysis the guesser can reach is listed. */
const unbounded = { top: 10_000, minScore: 0, guesser: { hypotheses: 10_000, lemmas: 10_000, mass: 1 } }

describe('analyze returns what expand emits', () => {
  it.each(entries.map((e) => [e.lemma, e.upos, e.cells ? 'attested' : 'predicted'] as const))(
    'every form of %s (%s) comes back %s with its exact analysis',
    (lemma, upos, source) => {
      const table = expandLemma(model.inflection, lemma, upos)!
      for (const f of table.forms)
        expect(has(f.form, { lemma, upos, feats: f.feats }), f.form).toMatchObject({ source })
    },
  )

  it('every form of a lemma the model never saw comes back when no table lists it (property)', () => {
    const noun = fc.tuple(
      fc.constantFrom('Br', 'Kl', 'Pf', 'Gr', 'Schl', 'Dr'),
      fc.constantFrom('a', 'i', 'o', 'ei', 'au'),
      fc.constantFrom('mp', 'nd', 'ck', 'ng', 'lk'),
      fc.constantFrom('', 'e'),
    )
    const verb = fc.tuple(
      fc.constantFrom('br', 'kl', 'pf', 'gr', 'schl', 'dr'),
      fc.constantFrom('a', 'o', 'ei', 'au'),
      fc.constantFrom('mp', 'ck', 'lk', 'ch'),
      fc.constant('en'),
    )
    const lemma = fc.oneof(
      noun.map((p) => [p.join(''), 'NOUN'] as const),
      verb.map((p) => [p.join(''), 'VERB'] as const),
    )
    fc.assert(
      fc.property(lemma, ([l, upos]) => {
        fc.pre(!entries.some((e) => e.lemma === l))
        for (const f of expandLemma(model.inflection, l, upos)!.forms) {
          if (analyzeForm(model, f.form, { guess: false }).candidates.length > 0) continue
          expect(
            has(f.form, { lemma: l, upos, feats: f.feats }, unbounded),
            `${l} ${f.feats} ${f.form}`,
          ).toMatchObject({ source: 'guessed' })
        }
      }),
      { numRuns: 40, seed: 7 },
    )
  })
})

describe('sources', () => {
  const attested = entries.filter((e) => e.cells).flatMap((e) => e.cells!.flatMap((c) => c.forms))

  it('never reports an attested form as guessed, in any case (property)', () => {
    // Spellings whose case can be undone (upper-case ß is SS, which lower-cases to ss, another spelling).
    const undoable = attested.filter((f) => f.toUpperCase().toLowerCase() === f.toLowerCase())
    const spelling = fc.tuple(
      fc.constantFrom(...undoable),
      fc.constantFrom('same', 'upper', 'lower', 'title'),
    )
    fc.assert(
      fc.property(spelling, ([form, how]) => {
        const token =
          how === 'upper'
            ? form.toUpperCase()
            : how === 'lower'
              ? form.toLowerCase()
              : how === 'title'
                ? form[0]!.toUpperCase() + form.slice(1)
                : form
        const got = analyzeForm(model, token).candidates
        expect(got.filter((c) => c.source === 'guessed')).toEqual([])
        expect(got.some((c) => c.source === 'attested')).toBe(true)
      }),
      { numRuns: 300, seed: 3 },
    )
  })

  it('keeps one candidate per analysis, the attested one over a predicted one', () => {
    for (const form of attested) {
      const got = analyzeForm(model, form).candidates
      const keys = got.map((c) => `${c.lemma}|${c.upos}|${c.feats}`)
      expect(new Set(keys).size).toBe(keys.length)
    }
  })
})

describe('order', () => {
  const back = decodeModel(encodeModel(model))
  const tokens = fc.oneof(
    fc.constantFrom(...model.index.forms()),
    fc
      .tuple(fc.constantFrom(...model.index.forms()), fc.constantFrom('n', 'e', 's', 'st', 'ern'))
      .map(([f, s]) => f + s),
    fc.string({ maxLength: 8 }),
  )

  it('is sorted by score, then source, then lemma, UPOS and FEATS, and the same after a round trip (property)', () => {
    fc.assert(
      fc.property(tokens, (token) => {
        const a = analyzeForm(model, token)
        expect([...a.candidates].sort(compareCandidates)).toEqual(a.candidates)
        expect(analyzeForm(back, token)).toEqual(a)
        expect(analyzeForm(model, token)).toEqual(a)
      }),
      { numRuns: 150, seed: 11 },
    )
  })
})

describe('normalization in analyze', () => {
  it.each([
    ['HUNDE', ['titlecase'], 'Hund'],
    ['hunde', ['titlecase'], 'Hund'],
    ['Machen', ['lowercase'], 'machen'],
    ['Ma\u0308ntel', ['nfc'], 'Mantel'],
  ])('%s is found as %j, lemma %s', (token, normalized, lemma) => {
    const a = analyzeForm(model, token)
    expect(a.normalized).toEqual(normalized)
    expect(a.candidates[0]).toMatchObject({ lemma, source: 'attested' })
  })

  it('folds diacritics only when asked', () => {
    expect(analyzeForm(model, 'Vatern').candidates.every((c) => c.source === 'guessed')).toBe(true)
    const folded = analyzeForm(model, 'Vatern', { foldDiacritics: true })
    expect(folded.normalized).toEqual(['folded'])
    expect(folded.candidates).toEqual([
      {
        lemma: 'Vater',
        upos: 'NOUN',
        feats: 'Case=Dat|Number=Plur',
        source: 'attested',
        score: 1,
        paradigm: expect.any(String),
      },
    ])
  })
})

describe('bounds and preferences', () => {
  it('cuts predicted and guessed candidates at top and minScore, never attested ones', () => {
    const all = analyzeForm(model, 'Rosen', unbounded).candidates
    const cut = analyzeForm(model, 'Rosen', { top: 2, minScore: 0.2 }).candidates
    expect(cut).toEqual(all.filter((c) => c.score >= 0.2).slice(0, 2))
    expect(analyzeForm(model, 'Tage', { top: 0, minScore: 1 }).candidates.length).toBe(3)
  })

  it('has the guesser prefer a lemma the dictionary lists without a table', () => {
    const unlisted = germanModelWithout('Rose')
    const guesses = (m: typeof model) => guessForm(m, [{ key: 'Rosen', how: 'exact' }])
    const score = (m: typeof model) =>
      guesses(m).find((c) => c.lemma === 'Rose' && c.feats === 'Case=Dat|Number=Plur')?.score ?? 0
    expect(score(model)).toBeGreaterThan(score(unlisted))
    expect(guesses(model)[0]).toMatchObject({ lemma: 'Rose', upos: 'NOUN' })
  })
})
