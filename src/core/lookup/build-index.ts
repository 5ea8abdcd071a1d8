// Building the form index: every attested form, and every form of the tables kept for bare lemmas, scored.
import type { InflectionModel } from '../inflect/learn.ts'
import { mergeFeats } from '../lexicon/feats.ts'
import type { Cell } from '../lexicon/lexicon.ts'
import { FormIndexBuilder, type MemoryFormIndex } from './memory-index.ts'

/** One table kept for a bare lemma: its paradigm (index in the book), its probability, its cells. */
export interface LemmaTable {
  paradigm: number
  score: number
  cells: readonly Cell[]
  /** Licenses no form itself; only adds cells to forms the licensing tables have (see `completion`). */
  completes?: boolean
}

/**
 * Index a model. Attested forms get score 1 and the entry's own paradigm. A bare lemma's forms come from
 * its kept tables (best first): a form's score in a cell is the summed probability of the tables that put
 * it there, its paradigm that of the best such table. `tablesOf(i)` gives entry i's kept tables; with
 * `completion` > 0 the tables that only complete add the other cells of forms already licensed.
 * @example buildFormIndex(model, (i) => kept[i] ?? []).get('Mäntel')?.[0]?.source // 'predicted'
 */
export function buildFormIndex(
  model: Pick<InflectionModel, 'lexicon' | 'book'>,
  tablesOf: (entry: number) => readonly LemmaTable[],
  completion = 0,
): MemoryFormIndex {
  const builder = new FormIndexBuilder()
  const feats = new Map<string, string>()
  const bundle = (inherent: string, cell: string): string => {
    const k = `${inherent}\u0000${cell}`
    let f = feats.get(k)
    if (f === undefined) {
      f = mergeFeats(inherent, cell)
      feats.set(k, f)
    }
    return f
  }
  const { entries } = model.lexicon
  for (let i = 0; i < entries.length; i++) {
    const e = entries[i]!
    if (e.cells) {
      const p = model.book.memberOf[i] ?? -1
      for (const c of e.cells) {
        const f = bundle(e.inherent, c.key)
        for (const form of c.forms) builder.add(form, i, f, 'attested', 1, p)
      }
      continue
    }
    const tables = tablesOf(i)
    const merged = licensed(tables.filter((t) => !t.completes))
    if (completion > 0) complete(merged, tables, completion)
    for (const [key, m] of merged)
      builder.add(
        m.form,
        i,
        bundle(e.inherent, key.slice(0, key.indexOf('\u0000'))),
        'predicted',
        roundScore(m.score),
        m.paradigm,
      )
  }
  return builder.build(
    entries,
    model.book.paradigms.map((p) => p.id),
  )
}

type Licensed = Map<string, { form: string; score: number; paradigm: number }>

/** (cell, form) → summed score of the tables that put the form in the cell, and the best one's paradigm. */
function licensed(tables: readonly LemmaTable[]): Licensed {
  const merged: Licensed = new Map()
  for (const t of tables) {
    for (const c of t.cells) {
      for (const form of c.forms) {
        const k = `${c.key}\u0000${form}`
        const m = merged.get(k)
        if (m) m.score += t.score
        else merged.set(k, { form, score: t.score, paradigm: t.paradigm })
      }
    }
  }
  return merged
}

/**
 * A listed lemma whose paradigm is uncertain: each form its kept tables license also gets the other cells
 * where any of its tables puts it, scored by that cell's share of those tables, smoothed by `smoothing`.
 */
function complete(merged: Licensed, tables: readonly LemmaTable[], smoothing: number): void {
  const forms = new Set([...merged.values()].map((m) => m.form))
  const all = licensed(tables)
  const inTable = new Map<string, number>()
  for (const t of tables) {
    const here = new Set(t.cells.flatMap((c) => c.forms.filter((f) => forms.has(f))))
    for (const f of here) inTable.set(f, (inTable.get(f) ?? 0) + t.score)
  }
  for (const [k, m] of all) {
    if (merged.has(k) || !forms.has(m.form)) continue
    const share = (inTable.get(m.form)! > 0 ? m.score / inTable.get(m.form)! : 0) + smoothing
    merged.set(k, { form: m.form, score: share / (1 + smoothing), paradigm: m.paradigm })
  }
}

/** Scores are kept to 4 decimals everywhere (so a model and its file agree exactly). */
export function roundScore(x: number): number {
  return Math.min(1, Math.round(x * 1e4) / 1e4)
}
