// Prediction: the ranked candidate tables of a lemma, and its expanded table with a score per cell.
import { lemmaFeatures } from './features.ts'
import type { InflectionModel } from './learn.ts'
import { fillPattern } from './pattern.ts'
import { scoreCandidates } from './ranker.ts'

/** One predicted table: a score and the forms of each cell (variants in order). */
export interface PredictedTable {
  paradigm: string
  score: number
  cells: { key: string; forms: string[] }[]
}

/**
 * The distinct tables the model proposes for a lemma, best first. Paradigms that give the same forms are
 * one table (their probabilities add up); the paradigm named is the most probable of them.
 * @example predictTables(model, 'Mantel', 'NOUN')[0].cells[2] // { key: 'Case=Nom|Number=Plur', forms: ['Mäntel'] }
 */
export function predictTables(model: InflectionModel, lemma: string, upos: string, inherent = '_', limit = 5): PredictedTable[] {
  const found = model.finder.find(lemma, upos)
  if (found.length === 0) return []
  const probs = scoreCandidates(
    model.weights,
    lemmaFeatures(lemma, inherent, model.options.features),
    found.map((c) => c.paradigm),
    found.map((c) => c.shared),
  )
  const tables = new Map<string, { table: PredictedTable; best: number }>()
  found.forEach((c, i) => {
    const p = model.book.paradigms[c.paradigm]!
    const cells = p.cells.map((cell) => ({ key: cell.key, forms: cell.forms.map((f) => fillPattern(f, c.stems)) }))
    if (cells.some((cell) => cell.forms.some((f) => f.length === 0))) return
    const key = cells.map((cell) => `${cell.key}=${cell.forms.join(',')}`).join('\n')
    const prob = probs[i]!
    const t = tables.get(key)
    if (!t) tables.set(key, { table: { paradigm: p.id, score: prob, cells }, best: prob })
    else {
      t.table.score += prob
      if (prob > t.best) {
        t.best = prob
        t.table.paradigm = p.id
      }
    }
  })
  const ranked = [...tables.values()].map((t) => t.table)
  const z = ranked.reduce((a, t) => a + t.score, 0)
  for (const t of ranked) t.score = z > 0 ? t.score / z : 0
  ranked.sort((a, b) => b.score - a.score || (a.paradigm < b.paradigm ? -1 : 1))
  return ranked.slice(0, limit)
}

/** A cell's forms with the probability that each is right (summed over the candidate tables). */
export interface ScoredCell {
  key: string
  forms: { form: string; score: number }[]
}

/**
 * Per-cell view of the candidate tables: for each cell, every proposed form with its total probability.
 * The best form of a cell is its most probable one, which may differ from the best table's.
 */
export function cellMarginals(tables: PredictedTable[]): ScoredCell[] {
  const cells = new Map<string, Map<string, number>>()
  for (const t of tables) {
    for (const c of t.cells) {
      const m = cells.get(c.key) ?? new Map<string, number>()
      cells.set(c.key, m)
      for (const f of c.forms) m.set(f, (m.get(f) ?? 0) + t.score)
    }
  }
  return [...cells].map(([key, m]) => ({
    key,
    forms: [...m].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).map(([form, score]) => ({ form, score })),
  }))
}
