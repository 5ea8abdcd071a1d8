// The model file: a round trip predicts exactly as before, the text is deterministic and compact, and a
// reader refuses what it cannot read (German handbook tables from memory, see test/core/lookup/fixtures).
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../../src/core/inflect/expand.ts'
import { predictTables } from '../../../src/core/inflect/predict.ts'
import { buildModel } from '../../../src/core/model/build-model.ts'
import { decodeModel, readModel } from '../../../src/core/model/decode-model.ts'
import { encodeModel, MODEL_FORMAT, MODEL_VERSION } from '../../../src/core/model/encode-model.ts'
import { germanBareLemmas, germanModel, germanTables } from '../lookup/fixtures/german.ts'

const probes: [string, string][] = [
  ['Rose', 'NOUN'],
  ['Schuh', 'NOUN'],
  ['Kabel', 'NOUN'],
  ['Wurm', 'NOUN'],
  ['kochen', 'VERB'],
  ['zeigen', 'VERB'],
  ['klingen', 'VERB'],
  ['trinken', 'VERB'],
  ['Tag', 'NOUN'],
]

function indexContent(m: ReturnType<typeof germanModel>) {
  return [...m.index.forms()].map((f) => [f, m.index.get(f)])
}

describe('model file', () => {
  const model = germanModel()
  const text = encodeModel(model)
  const back = decodeModel(text)

  it('names its format and version first', () => {
    const json = JSON.parse(text)
    expect(Object.keys(json).slice(0, 2)).toEqual(['format', 'version'])
    expect(json.format).toBe(MODEL_FORMAT)
    expect(json.version).toBe(MODEL_VERSION)
  })

  it.each(probes)('predicts the tables of %s (%s) exactly as before the round trip', (lemma, upos) => {
    expect(predictTables(back.inflection, lemma, upos, '_', 8)).toEqual(
      predictTables(model.inflection, lemma, upos, '_', 8),
    )
    expect(expandLemma(back.inflection, lemma, upos)).toEqual(expandLemma(model.inflection, lemma, upos))
  })

  it('rebuilds the same form index', () => {
    expect(back.index.formCount).toBe(model.index.formCount)
    expect(indexContent(back)).toEqual(indexContent(model))
  })

  it('writes the same text again after reading it', () => {
    expect(encodeModel(back)).toBe(text)
  })

  it('gives byte-identical text for the same input, built twice', () => {
    expect(encodeModel(buildModel([...germanTables, ...germanBareLemmas]))).toBe(text)
  })

  it('stores a table its paradigm reproduces as the paradigm alone, a table with most cells missing as raw forms', () => {
    // A table with gaps joins the full paradigm that reproduces the cells it has; the paradigm alone would
    // give cells the dictionary never listed, so the file keeps its forms.
    const gapped = {
      lemma: 'holen',
      upos: 'VERB',
      feats: '_',
      forms: [
        { form: 'holen', feats: 'VerbForm=Inf' },
        { form: 'holt', feats: 'Mood=Ind|Number=Sing|Person=3|Tense=Pres|VerbForm=Fin' },
      ],
    }
    const m = buildModel([...germanTables, gapped])
    const entries: [string, number, number, unknown][] = JSON.parse(encodeModel(m)).entries
    expect(typeof entries.find((e) => e[0] === 'machen')![3]).toBe('number')
    const raw = entries.find((e) => e[0] === 'holen')![3] as { f: [number, ...string[]][] }
    expect(raw.f.map((c) => c.slice(1)).sort()).toEqual([['holen'], ['holt']])
    const back = decodeModel(encodeModel(m)).inflection.lexicon.entries.find((e) => e.lemma === 'holen')
    expect(back!.cells).toEqual(m.inflection.lexicon.entries.find((e) => e.lemma === 'holen')!.cells)
  })

  it('stores a table that lacks a few of its paradigm cells as the paradigm and the missing cells', () => {
    const machen = germanTables.find((e) => e.lemma === 'machen')!
    const forms = machen.forms!
    // wachen, like machen, without its 1st person singular present.
    const wachen = {
      ...machen,
      lemma: 'wachen',
      forms: forms.filter((f) => f.form !== 'mache').map((f) => ({ ...f, form: f.form.replace('mach', 'wach') })),
    }
    const m = buildModel([...germanTables, wachen])
    const json = JSON.parse(encodeModel(m))
    const slot = json.entries.find((e: unknown[]) => e[0] === 'wachen')[3]
    expect(slot.m).toHaveLength(forms.filter((f) => f.form === 'mache').length)
    expect(slot.d).toEqual([])
    const back = decodeModel(encodeModel(m)).inflection.lexicon.entries.find((e) => e.lemma === 'wachen')
    expect(back!.cells).toEqual(m.inflection.lexicon.entries.find((e) => e.lemma === 'wachen')!.cells)
  })

  it('keeps the predicted tables of bare lemmas with their scores', () => {
    const i = back.inflection.lexicon.entries.findIndex((e) => e.lemma === 'Rose')
    expect(back.inflection.lexicon.entries[i]!.cells).toBeNull()
    expect(back.kept[i]).toEqual(model.kept[i])
    expect(back.kept[i]![0]!.score).toBeGreaterThan(0)
  })
})

describe('reading a model file', () => {
  const text = encodeModel(germanModel())
  const withVersion = (v: string) => text.replace(`"version":"${MODEL_VERSION}"`, `"version":"${v}"`)

  it('refuses a newer major version with a bad-model problem', () => {
    const r = readModel(withVersion('3.0'))
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.problem.code).toBe('bad-model')
    expect(r.problem.message).toBe(
      `model file: format version 3.0 is newer than this reader (${MODEL_VERSION}); upgrade formfold to read it`,
    )
    expect(() => decodeModel(withVersion('3.0'))).toThrow(/newer than this reader/)
  })

  it('reads a newer minor version of the same major', () => {
    expect(readModel(withVersion('2.7')).ok).toBe(true)
  })

  it.each([
    ['not JSON', '{"format":'],
    ['another format', '{"format":"something-else","version":"1.0"}'],
    ['a model without entries', `{"format":"${MODEL_FORMAT}","version":"1.0"}`],
  ])('refuses %s', (_name, bad) => {
    const r = readModel(bad)
    expect(r.ok ? 'read' : r.problem.code).toBe('bad-model')
  })
})
