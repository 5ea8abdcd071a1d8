// The model file stores what rankers share once: feature names in one list, and a cell whose rule ranker
// repeats an earlier cell's as a reference to it (German handbook tables from memory, see
// test/core/lookup/fixtures). Reading gives the same predictions and refuses a reference to no earlier cell.
import { describe, expect, it } from 'vitest'
import { predictTables } from '../../../src/core/inflect/predict.ts'
import { decodeModel, readModel } from '../../../src/core/model/decode-model.ts'
import { encodeModel } from '../../../src/core/model/encode-model.ts'
import { DEMO_MODEL_TEXT } from '../../../src/http/demo-model.generated.ts'
import { germanModel } from '../lookup/fixtures/german.ts'

describe('shared parts of the model file', () => {
  const model = germanModel()
  const text = encodeModel(model)
  const json = JSON.parse(text)

  it('names every ranker feature once, sorted, and rankers refer to them by position', () => {
    const names: string[] = json.featureNames
    expect(names.length).toBeGreaterThan(10)
    expect([...names].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0))).toEqual(names)
    expect(new Set(names).size).toBe(names.length)
    expect(typeof json.weights.features).toBe('string')
    const back = decodeModel(text)
    const before = [...model.inflection.weights.local].sort()
    expect([...back.inflection.weights.local].sort()).toEqual(before)
  })

  it('writes the members of each rule from the tables learning grouped, as cutting every table again finds them', () => {
    expect(model.inflection.cells.every((c) => c.memberTables)).toBe(true)
    const cut = { ...model.inflection, cells: model.inflection.cells.map(({ memberTables: _, ...c }) => c) }
    expect(encodeModel({ ...model, inflection: cut })).toBe(text)
    // A model read from its file knows them too, so writing it again gives the same file.
    const back = decodeModel(text)
    expect(back.inflection.cells.every((c) => c.memberTables)).toBe(true)
    expect(encodeModel(back)).toBe(text)
  })

  it('writes a cell whose weights repeat an earlier cell as that cell, and reads both alike', () => {
    const refs = json.cellRules.flatMap((c: { weights: unknown }, i: number) =>
      typeof c.weights === 'number' ? [[i, c.weights]] : [],
    )
    // Cells made alike from every table (here the cells equal to the lemma) train the same ranker.
    expect(refs.length).toBeGreaterThan(0)
    const back = decodeModel(text)
    for (const [i, j] of refs) {
      expect(j).toBeLessThan(i)
      expect([...back.inflection.cells[i]!.weights.local].sort()).toEqual(
        [...model.inflection.cells[i]!.weights.local].sort(),
      )
      expect(back.inflection.cells[i]!.weights.local).toBe(back.inflection.cells[j]!.weights.local)
    }
    for (const [lemma, upos] of [
      ['Rose', 'NOUN'],
      ['trinken', 'VERB'],
      ['Kabel', 'NOUN'],
    ] as const)
      expect(predictTables(back.inflection, lemma, upos, '_', 4)).toEqual(
        predictTables(model.inflection, lemma, upos, '_', 4),
      )
  })

  it('writes a mixed predicted table as the cells where it differs from its paradigm, and reads it back', () => {
    // The embedded demo model (the invented language of demo-lexicon/) has such tables; the German
    // fixture has none.
    const demo = decodeModel(DEMO_MODEL_TEXT)
    const demoJson = JSON.parse(DEMO_MODEL_TEXT)
    const mixed = demo.kept.flatMap((k, i) => (k?.some((t) => t.cells) ? [i] : []))
    expect(mixed.length).toBeGreaterThan(10)
    let written = 0
    for (const i of mixed) {
      const slot = demoJson.entries[i][3] as unknown[][]
      const diffs = slot.flatMap((t) => t.filter((x) => x && typeof x === 'object' && 'd' in x)) as {
        d: unknown[]
      }[]
      const cells = demo.kept[i]!.find((t) => t.cells)!.cells!
      // Only the differing cells are written: fewer than the table has.
      for (const d of diffs) expect(d.d.length).toBeLessThan(cells.length)
      written += diffs.length
    }
    expect(written).toBeGreaterThan(10)
    expect(encodeModel(demo)).toBe(DEMO_MODEL_TEXT)
  })

  it('refuses a reference to a cell that is not earlier', () => {
    const broken = JSON.parse(text)
    const i = broken.cellRules.findIndex((c: { weights: unknown }) => typeof c.weights === 'number')
    broken.cellRules[i].weights = i
    const r = readModel(JSON.stringify(broken))
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.problem.message).toMatch(/cellRules\[\d+\]\.weights refers to no earlier cell/)
  })

  it('refuses feature positions past the end of featureNames', () => {
    const broken = JSON.parse(text)
    broken.featureNames = broken.featureNames.slice(0, 3)
    const r = readModel(JSON.stringify(broken))
    expect(r.ok).toBe(false)
  })
})
