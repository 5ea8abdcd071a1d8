// The word-initial edit factor: participle ge- from the lemma's start and end, and its product with rankers.
import { describe, expect, it } from 'vitest'
import {
  cellLeadProbability,
  editDistribution,
  editFeatures,
  learnEditFactors,
  reweigh,
} from '../../../src/core/inflect/edit-factor.ts'
import { learnInflection } from '../../../src/core/inflect/learn.ts'
import { predictLemma } from '../../../src/core/inflect/predict.ts'
import type { Entry } from '../../../src/core/lexicon/entry.ts'
import { modelFromInflection } from '../../../src/core/model/build-model.ts'
import { decodeModel } from '../../../src/core/model/decode-model.ts'
import { encodeModel } from '../../../src/core/model/encode-model.ts'

const PART = 'Tense=Past|VerbForm=Part'
const INF = 'VerbForm=Inf'
const PRES3 = 'Mood=Ind|Number=Sing|Person=3|Tense=Pres|VerbForm=Fin'

/** A weak verb's infinitive, 3rd singular and participle: ge- unless `bare` (standard German grammar). */
function weak(lemma: string, bare: boolean): Entry {
  const stem = lemma.slice(0, -2)
  const forms = [
    { form: lemma, feats: INF },
    { form: `${stem}t`, feats: PRES3 },
    { form: `${bare ? '' : 'ge'}${stem}t`, feats: PART },
  ]
  return { lemma, upos: 'VERB', feats: '_', forms }
}

// Inseparable prefixes (be-, ver-, er-) and -ieren verbs take no ge- in the participle; other weak verbs do
// (the participle rule of German grammar handbooks, e.g. Duden Grammatik, from memory).
const plain = ['machen', 'sagen', 'legen', 'lohnen', 'kaufen', 'holen', 'hören', 'leben', 'loben', 'zahlen']
const prefixed = ['bemalen', 'besagen', 'verkaufen', 'erholen', 'bezahlen', 'verlegen', 'erleben', 'belohnen']
const ieren = ['studieren', 'probieren', 'parkieren', 'regieren', 'notieren']
const entries = [
  ...plain.map((l) => weak(l, false)),
  ...prefixed.map((l) => weak(l, true)),
  ...ieren.map((l) => weak(l, true)),
]

describe('edit factor', () => {
  it('sees the first and last letters only', () => {
    expect(editFeatures('belegen')).toEqual(
      ['b', 'p1:b', 'p2:be', 'p3:bel', 'p4:bele', 'p5:beleg'].concat([
        's1:n',
        's2:en',
        's3:gen',
        's4:egen',
        's5:legen',
      ]),
    )
  })

  it('learns that be-/ver-/er- and -ieren verbs have no ge- participle', () => {
    const model = learnInflection(entries)
    const f = model.edits!.byUpos.get('VERB')!
    const noGe = (lemma: string) => cellLeadProbability(f, editDistribution(f, lemma), PART, '')
    expect(noGe('belehren')).toBeGreaterThan(0.5)
    expect(noGe('verlangen')).toBeGreaterThan(0.5)
    expect(noGe('markieren')).toBeGreaterThan(0.5)
    expect(noGe('lehren')).toBeLessThan(0.5)
    const best = (lemma: string) =>
      predictLemma(model, lemma, 'VERB').cells.find((c) => c.key === PART)!.forms[0]!.form
    expect(best('belegen')).toBe('belegt')
    expect(best('lehren')).toBe('gelehrt')
  })

  it('is learned again, the same, when a model file is read', () => {
    const learned = learnInflection(entries)
    const read = decodeModel(encodeModel(modelFromInflection(learned))).inflection
    const a = learned.edits!.byUpos.get('VERB')!
    const b = read.edits!.byUpos.get('VERB')!
    expect([...b.weights.local]).toEqual([...a.weights.local])
    expect(read.edits!.classOf).toEqual(learned.edits!.classOf)
    expect(editDistribution(b, 'bereden')).toEqual(editDistribution(a, 'bereden'))
  })

  it('is absent when the paradigms do not differ in their initial edits', () => {
    const nouns = learnEditFactors(
      [{ lemma: 'Tag', upos: 'NOUN', cells: [] }],
      [{ id: 'NOUN-1', upos: 'NOUN', lemma: [0], openPrefix: false, cells: [], members: 1, examples: [] }],
      [0],
      learnInflection(entries).options.ranker,
    )
    expect(nouns.byUpos.size).toBe(0)
  })

  it('reweighs a distribution as a normalized product', () => {
    const p = reweigh([0.6, 0.4], [0.1, 0.9], 1)
    expect(p[0]).toBeCloseTo(0.06 / 0.42)
    expect(p[0]! + p[1]!).toBeCloseTo(1)
    expect(reweigh([0.6, 0.4], [0.1, 0.9], 0)).toEqual([0.6, 0.4])
  })
})
