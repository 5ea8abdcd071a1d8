// Fuzz targets for the pure core: learning, the model file, expansion, prediction and lookup on random tables.
import fc from 'fast-check'
import { type Entry, expandLemma, predictTables, rowsToEntries } from '../../src/core/index.ts'
import { analyzeForm } from '../../src/core/lookup/analyze.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import type { Model } from '../../src/core/model/model.ts'
import { feats, lexicon, type Row, upos, word } from './arbitraries.ts'
import { check, type FuzzTarget } from './target.ts'

type Lexicon = { tables: Row[][]; bare: { lemma: string; upos: string; feats: string }[] }

/** The entries a reader would give for a random lexicon: table rows grouped, then the bare lemmas. */
function entriesOf(lex: Lexicon): Entry[] {
  return [...rowsToEntries(lex.tables.flat()), ...lex.bare]
}

/** Rows in another order of equal priority: tables and rows permuted, the variants of a cell kept in order. */
function reorder(rows: Row[], order: number[]): Row[] {
  const cell = (r: Row) => `${r.lemma}\t${r.upos}\t${r.feats}`
  const queues = new Map<string, Row[]>()
  for (const r of rows) queues.set(cell(r), [...(queues.get(cell(r)) ?? []), r])
  const picked = order.slice(0, rows.length).map((i) => rows[i % rows.length]!)
  const permuted = [...new Set(picked), ...rows.filter((r) => !picked.includes(r))]
  return permuted.map((r) => queues.get(cell(r))!.shift()!)
}

const isProbability = (x: number) => Number.isFinite(x) && x >= 0 && x <= 1 + 1e-9

/** A query: a random lemma, or one of the lexicon's own (with a table or bare), with a UPOS and inherent FEATS. */
const query = (lex: Lexicon) =>
  fc.record({
    lemma: fc.oneof(
      word,
      fc.constantFrom(...lex.tables.map((t) => t[0]!.lemma), ...lex.bare.map((b) => b.lemma)),
    ),
    upos: fc.oneof(upos, fc.constantFrom(...lex.tables.map((t) => t[0]!.upos))),
    inherent: fc.oneof(fc.constant('_'), feats),
  })

/** Check one expansion, one prediction and one lookup of a model. */
function checkQueries(model: Model, q: { lemma: string; upos: string; inherent: string }): void {
  const table = expandLemma(model.inflection, q.lemma, q.upos, q.inherent, { alternatives: 2 })
  if (table) {
    check(
      table.forms.length > 0 && isProbability(table.score),
      () => `empty or mis-scored table ${JSON.stringify(table)}`,
    )
    for (const f of table.forms)
      check(f.form !== '' && isProbability(f.score), () => `bad form ${JSON.stringify(f)}`)
  }
  const predicted = predictTables(model.inflection, q.lemma, q.upos, q.inherent, 5)
  let total = 0
  predicted.forEach((t, i) => {
    check(isProbability(t.score), () => `score ${t.score}`)
    check(i === 0 || t.score <= predicted[i - 1]!.score + 1e-12, 'tables not best first')
    total += t.score
  })
  check(total <= 1 + 1e-6, () => `table probabilities sum to ${total}`)
  for (const form of [q.lemma, ...(table?.forms.slice(0, 3).map((f) => f.form) ?? [])]) {
    for (const c of analyzeForm(model, form).candidates)
      check(isProbability(c.score), () => `candidate ${JSON.stringify(c)}`)
  }
}

export const coreTargets: FuzzTarget[] = [
  {
    name: 'core: learn, write and read a model',
    checks:
      'buildModel on random tables and bare lemmas; the file reads back to the same file; every attested row is in the lexicon',
    cost: 4,
    property: () =>
      fc.asyncProperty(lexicon, async (lex) => {
        const model = buildModel(entriesOf(lex))
        const text = encodeModel(model)
        check(encodeModel(decodeModel(text)) === text, 'decode(encode(model)) writes a different file')
        const rows = new Set(
          model.inflection.lexicon.entries.flatMap((e) =>
            (e.cells ?? []).flatMap((c) => c.forms.map((f) => `${e.lemma}\t${e.upos}\t${f}`)),
          ),
        )
        for (const r of lex.tables.flat())
          check(rows.has(`${r.lemma}\t${r.upos}\t${r.form}`), () => `row dropped: ${JSON.stringify(r)}`)
      }),
  },
  {
    name: 'core: order of equal-priority rows',
    checks:
      'the model file is byte-identical whatever the order of tables, rows and bare lemmas (variants of a cell keep theirs)',
    cost: 8,
    property: () =>
      fc.asyncProperty(lexicon, fc.array(fc.nat(), { maxLength: 40 }), async (lex, order) => {
        const shuffled: Lexicon = {
          tables: [reorder(lex.tables.flat(), order)],
          bare: [...lex.bare].reverse(),
        }
        const a = encodeModel(buildModel(entriesOf(lex)))
        const b = encodeModel(buildModel([...entriesOf(shuffled)].reverse()))
        check(a === b, 'reordering equal-priority input changed the model file')
      }),
  },
  {
    name: 'core: expand, predict and analyze',
    checks:
      'expandLemma, predictTables and analyzeForm on random, huge and combining-mark lemmas: probabilities in [0, 1], best first, summing to at most 1',
    cost: 4,
    property: () =>
      fc.asyncProperty(
        lexicon.chain((lex) =>
          fc.tuple(fc.constant(lex), fc.array(query(lex), { minLength: 1, maxLength: 4 })),
        ),
        async ([lex, queries]) => {
          const model = buildModel(entriesOf(lex))
          for (const q of queries) checkQueries(model, q)
        },
      ),
  },
]
