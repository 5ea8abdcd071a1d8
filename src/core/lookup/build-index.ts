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
}

/**
 * Index a model. Attested forms get score 1 and the entry's own paradigm. A bare lemma's forms come from
 * its kept tables (best first): a form's score in a cell is the summed probability of the tables that put
 * it there, its paradigm that of the best such table. `tablesOf(i)` gives entry i's kept tables.
 * @example buildFormIndex(model, (i) => kept[i] ?? []).get('Mäntel')?.[0]?.source // 'predicted'
 */
export function buildFormIndex(
  model: Pick<InflectionModel, 'lexicon' | 'book'>,
  tablesOf: (entry: number) => readonly LemmaTable[],
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
    const merged = new Map<string, { form: string; feats: string; score: number; paradigm: number }>()
    for (const t of tablesOf(i)) {
      for (const c of t.cells) {
        const f = bundle(e.inherent, c.key)
        for (const form of c.forms) {
          const k = `${f}\u0000${form}`
          const m = merged.get(k)
          if (m) m.score += t.score
          else merged.set(k, { form, feats: f, score: t.score, paradigm: t.paradigm })
        }
      }
    }
    for (const m of merged.values())
      builder.add(m.form, i, m.feats, 'predicted', roundScore(m.score), m.paradigm)
  }
  return builder.build(
    entries,
    model.book.paradigms.map((p) => p.id),
  )
}

/** Scores are kept to 4 decimals everywhere (so a model and its file agree exactly). */
export function roundScore(x: number): number {
  return Math.min(1, Math.round(x * 1e4) / 1e4)
}
