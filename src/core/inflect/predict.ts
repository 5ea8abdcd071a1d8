// Prediction: the ranked candidate tables of a lemma, and its expanded table with a score per cell.
import { cellFormDistribution } from './cell-rules.ts'
import { rerankByCorpus } from './corpus-evidence.ts'
import { editDistribution, reweigh } from './edit-factor.ts'
import { modifierFilterOf } from './compound-prefix.ts'
import { lemmaFeatures } from './features.ts'
import type { InflectionModel } from './learn.ts'
import { fillPattern } from './pattern.ts'
import { scoreCandidates } from './ranker.ts'
import { sameFirstForms, TableGroups } from './table-groups.ts'

/** One predicted table: a score and the forms of each cell (variants in order). */
export interface PredictedTable {
  paradigm: string
  score: number
  /** True for the table composed cell by cell (no single paradigm gives it; `paradigm` is the nearest). */
  composed?: boolean
  /** Corpus evidence for this table (its distinctive forms the corpus attests), when a corpus was given. */
  evidence?: number
  cells: { key: string; forms: string[] }[]
}

/**
 * The distinct tables the model proposes for a lemma, best first. Paradigms that give the same forms are
 * one table (their probabilities add up); the paradigm named is the most probable of them.
 * @example predictTables(model, 'Mantel', 'NOUN')[0].cells[2] // { key: 'Case=Nom|Number=Plur', forms: ['Mäntel'] }
 */
export function predictTables(model: InflectionModel, lemma: string, upos: string, inherent = '_', limit = 5): PredictedTable[] {
  return rankTables(model, lemma, upos, inherent, limit).tables
}

function rankTables(
  model: InflectionModel,
  lemma: string,
  upos: string,
  inherent: string,
  limit: number,
): { tables: PredictedTable[]; dists: Map<string, Map<string, number>> } {
  const found = model.finder.find(lemma, upos)
  if (found.length === 0) return { tables: [], dists: new Map() }
  const probs = scoreCandidates(
    model.weights,
    lemmaFeatures(lemma, inherent, model.options.features),
    found.map((c) => c.paradigm),
    found.map((c) => c.shared),
  )
  const factor = model.edits?.byUpos.get(upos)
  if (factor) {
    const d = editDistribution(factor, lemma)
    reweigh(probs, found.map((c) => d[model.edits!.classOf[c.paradigm]!]!), model.options.edits?.weight ?? 1)
  }
  // Paradigms that give the same forms are one table (grouped by forms, in order of first appearance).
  const groups = new TableGroups<{ table: PredictedTable; best: number }>()
  const tables: { table: PredictedTable; best: number }[] = []
  found.forEach((c, i) => {
    const p = model.book.paradigms[c.paradigm]!
    const cells = p.cells.map((cell) => ({ key: cell.key, forms: cell.forms.map((f) => fillPattern(f, c.stems)) }))
    if (cells.some((cell) => cell.forms.some((f) => f.length === 0))) return
    const prob = probs[i]!
    const t = groups.get(cells)
    if (!t) {
      const entry = { table: { paradigm: p.id, score: prob, cells }, best: prob }
      groups.set(cells, entry)
      tables.push(entry)
    } else {
      t.table.score += prob
      if (prob > t.best) {
        t.best = prob
        t.table.paradigm = p.id
      }
    }
  })
  let ranked = tables.map((t) => t.table)
  const z = ranked.reduce((a, t) => a + t.score, 0)
  for (const t of ranked) t.score = z > 0 ? t.score / z : 0
  const dists = cellDistributions(model, lemma, upos, inherent)
  if (dists.size > 0) ranked = combineWithCells(model, upos, ranked, dists)
  if (model.corpus && ranked.length > 1) {
    const { scores, evidence } = rerankByCorpus(
      model.corpus,
      ranked.map((t) => ({ score: t.score, cells: t.cells.map((c) => ({ key: c.key, form: c.forms[0] ?? '' })) })),
    )
    ranked = ranked.map((t, i) => ({ ...t, score: scores[i]!, evidence: evidence[i]! }))
  }
  ranked.sort((a, b) => b.score - a.score || (a.paradigm < b.paradigm ? -1 : 1))
  return { tables: ranked.slice(0, limit), dists }
}

/** A lemma's prediction: ranked candidate tables and, per cell, each form's probability. */
export interface LemmaPrediction {
  tables: PredictedTable[]
  cells: ScoredCell[]
}

/**
 * Predict a lemma: its candidate tables, and per cell the probability of each form — the tables' marginal
 * mixed with the cell's own rule ranker (`combine.cellMix`), so a cell can follow its own evidence.
 * @example predictLemma(model, 'begründen', 'VERB').cells.find((c) => c.key === 'Tense=Past|VerbForm=Part')!.forms[0].form // 'begründet'
 */
export function predictLemma(model: InflectionModel, lemma: string, upos: string, inherent = '_', limit = 5): LemmaPrediction {
  const { tables, dists } = rankTables(model, lemma, upos, inherent, Math.max(limit, 8))
  const mix = model.options.combine.cellMix
  const marg = cellMarginals(tables)
  const order = model.lexicon.cellKeys[upos] ?? []
  const keys = [...new Set([...marg.map((c) => c.key), ...dists.keys()])].sort((a, b) => order.indexOf(a) - order.indexOf(b))
  const byKey = new Map(marg.map((c) => [c.key, c]))
  const cells: ScoredCell[] = keys.map((key) => {
    const m = new Map<string, number>()
    const fromTables = byKey.get(key)
    const own = corpusWeighted(model, dists.get(key), otherForms(tables[0], key))
    const wt = own ? 1 - mix : 1
    for (const f of fromTables?.forms ?? []) m.set(f.form, (m.get(f.form) ?? 0) + wt * f.score)
    if (own) for (const [f, p] of own) m.set(f, (m.get(f) ?? 0) + (fromTables ? mix : 1) * p)
    return { key, forms: [...m].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).map(([form, score]) => ({ form, score })) }
  })
  return { tables: tables.slice(0, limit), cells }
}

/** The forms a table puts in cells other than `key` (their attestation is explained there). */
function otherForms(table: PredictedTable | undefined, key: string): Set<string> {
  return new Set(table?.cells.flatMap((c) => (c.key === key ? [] : c.forms)) ?? [])
}

/**
 * A cell's own distribution reweighted by corpus evidence for its distinctive forms (as tables are); forms
 * the best table already has in other cells are no evidence for this one.
 */
function corpusWeighted(
  model: InflectionModel,
  d: Map<string, number> | undefined,
  neutral: ReadonlySet<string>,
): Map<string, number> | undefined {
  if (!d || !model.corpus || d.size < 2) return d
  const forms = [...d.keys()]
  const { scores } = rerankByCorpus(
    model.corpus,
    forms.map((f) => ({ score: d.get(f)!, cells: [{ key: '', form: f }] })),
    neutral,
  )
  return new Map(forms.map((f, i) => [f, scores[i]!]))
}

/**
 * A lemma's shape features as the cell rankers were trained on them (a compound's without its prefixes).
 * @example localFeatures(model, 'Gitarrenbauer', 'NOUN', '_').some((f) => f.startsWith('p1:')) // false when Bauer is known
 */
export function localFeatures(model: InflectionModel, lemma: string, upos: string, inherent: string): string[] {
  const f = lemmaFeatures(lemma, inherent, model.options.features)
  const c = model.options.compounds
  return c ? modifierFilterOf(model.lexicon.entries, c.minHead).apply(lemma, upos, f) : f
}

function cellDistributions(model: InflectionModel, lemma: string, upos: string, inherent: string): Map<string, Map<string, number>> {
  const dists = new Map<string, Map<string, number>>()
  if (model.options.combine.cellWeight <= 0 && model.options.combine.cellMix <= 0) return dists
  const local = localFeatures(model, lemma, upos, inherent)
  const factor = model.edits?.byUpos.get(upos)
  const weight = model.options.edits?.weight ?? 1
  const edit = factor && { factor, dist: editDistribution(factor, lemma), weight }
  // Syncretic cells learned as one share their finder (see cell-rules.ts): one distribution serves them all.
  const byFinder = new Map<object, Map<string, number>>()
  for (const m of model.cells) {
    if (m.upos !== upos) continue
    const known = byFinder.get(m.finder)
    // Shared, not copied: nothing changes a distribution once made.
    const d = known ?? cellFormDistribution(m, lemma, inherent, model.options.features, local, edit)
    if (!known) byFinder.set(m.finder, d)
    if (d.size > 0) dists.set(m.key, d)
  }
  return dists
}

/**
 * Rescore the whole-table candidates with the per-cell rule rankers (a product of experts), and add the
 * table made of each cell's most probable form, which may combine choices no single training table had.
 */
function combineWithCells(
  model: InflectionModel,
  upos: string,
  tables: PredictedTable[],
  dists: Map<string, Map<string, number>>,
): PredictedTable[] {
  const { cellWeight, tableFloor, cellFloor } = model.options.combine
  const cellOrder = model.lexicon.cellKeys[upos] ?? []
  const composed: PredictedTable = {
    paradigm: tables[0]?.paradigm ?? '',
    score: 0,
    composed: true,
    cells: cellOrder.filter((k) => dists.has(k)).map((key) => ({ key, forms: [argmax(dists.get(key)!)] })),
  }
  const all = tables.some((t) => sameFirstForms(t.cells, composed.cells)) ? tables : [...tables, composed]
  const logits = all.map((t) => {
    let sum = 0
    let n = 0
    for (const c of t.cells) {
      const d = dists.get(c.key)
      if (!d) continue
      sum += Math.log((d.get(c.forms[0]!) ?? 0) + cellFloor)
      n++
    }
    return Math.log(Math.max(t.score, tableFloor)) + (n > 0 ? (cellWeight * sum) / n ** model.options.combine.meanPower : 0)
  })
  const max = Math.max(...logits)
  const e = logits.map((x) => Math.exp(x - max))
  const zz = e.reduce((a, b) => a + b, 0)
  // The tables are this prediction's own objects (made in rankTables): rescored in place.
  all.forEach((t, i) => {
    t.score = e[i]! / zz
  })
  return all
}

function argmax(d: Map<string, number>): string {
  let best = ''
  let bp = -1
  for (const [f, p] of d) if (p > bp || (p === bp && f < best)) [best, bp] = [f, p]
  return best
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
