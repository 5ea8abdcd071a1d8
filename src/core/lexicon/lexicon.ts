// The lexicon: entries merged by (lemma, upos), cells split from inherent features, cell inventories per UPOS.
import { type Entry, entryKey } from './entry.ts'
import { compareFeatureKeys, formatFeats, mergeFeats, parseFeats, pickFeats } from './feats.ts'
import type { Problem } from './problem.ts'

/** One cell of a table: its cell FEATS (inflectional features only) and its forms (variants in input order). */
export interface Cell {
  key: string
  forms: string[]
}

/** A lexicon entry after merging: `cells` is null for a lemma-only entry. */
export interface LexEntry {
  lemma: string
  upos: string
  inherent: string
  cells: Cell[] | null
}

export interface Lexicon {
  entries: LexEntry[]
  /** UPOS → cell keys, sorted as FEATS are (case-insensitive). */
  cellKeys: Record<string, string[]>
  /** UPOS → the features that vary within some table of that UPOS (the inflectional ones). */
  inflectional: Record<string, string[]>
  problems: Problem[]
}

/**
 * Merge entries into a lexicon. Rules (documented in the README):
 * - rows for the same (lemma, upos) from any source are one table; identical rows count once;
 * - a feature is inflectional for a UPOS if it varies inside at least one table of that UPOS; the features
 *   constant over a table and not inflectional are its inherent features (so a noun with no plural keeps
 *   Number in its cells);
 * - two JSON entries giving different tables for the same lemma are both kept (their rows are unioned)
 *   and reported as a `conflict`, so nothing is lost silently; so are two different values of one
 *   inherent feature (`Gender=Fem` and `Gender=Masc` give `Gender=Fem,Masc`);
 * - the order is canonical (entries by UPOS then lemma, cells by FEATS; variants keep the source's order),
 *   so reordering input rows never changes the result.
 * @example buildLexicon([{lemma:'Aal',upos:'NOUN',feats:'_'}]).entries[0].cells // null
 */
export function buildLexicon(input: Iterable<Entry>): Lexicon {
  const problems: Problem[] = []
  const merged = new Map<string, { entry: Entry; rows: { form: string; feats: string }[]; tables: number }>()
  for (const e of input) {
    const key = entryKey(e.lemma, e.upos)
    let m = merged.get(key)
    if (!m) {
      m = { entry: e, rows: [], tables: 0 }
      merged.set(key, m)
    } else if (e.feats !== '_' && m.entry.feats !== e.feats) {
      // Sources disagreeing on an inherent feature keep both values, whatever their order (reported).
      const { feats, clashes } = unionFeats(m.entry.feats, e.feats)
      m.entry = { ...m.entry, feats }
      if (clashes.length > 0) {
        problems.push({
          code: 'conflict',
          file: e.file,
          line: e.line,
          message: `${e.lemma} (${e.upos}) is listed again with other ${clashes.join(', ')}; both values are kept (${feats})`,
        })
      }
    }
    if (e.forms) {
      const full = e.forms.map((f) => ({ form: f.form, feats: mergeFeats(e.feats, f.feats) }))
      if (m.tables > 0 && e.line !== undefined && !sameRows(m.rows, full)) {
        problems.push({
          code: 'conflict',
          file: e.file,
          line: e.line,
          message: `${e.lemma} (${e.upos}) has a second, different table; the rows of both are kept as variants`,
        })
      }
      m.tables++
      m.rows.push(...full)
    }
  }

  // Which features vary inside a table, per UPOS.
  const varying = new Map<string, Set<string>>()
  for (const { entry, rows } of merged.values()) {
    if (rows.length === 0) continue
    const set = varying.get(entry.upos) ?? new Set<string>()
    varying.set(entry.upos, set)
    const maps = rows.map((r) => parseFeats(r.feats))
    const names = new Set(maps.flatMap((m) => Object.keys(m)))
    for (const n of names) {
      const first = maps[0]![n]?.join(',')
      if (maps.some((m) => m[n]?.join(',') !== first)) set.add(n)
    }
  }

  const entries: LexEntry[] = []
  const cellKeys: Record<string, string[]> = {}
  for (const { entry, rows } of merged.values()) {
    const infl = varying.get(entry.upos) ?? new Set<string>()
    if (rows.length === 0) {
      entries.push({ lemma: entry.lemma, upos: entry.upos, inherent: entry.feats, cells: null })
      continue
    }
    let inherent = parseFeats(entry.feats)
    const maps = rows.map((r) => parseFeats(r.feats))
    for (const n of Object.keys(maps[0]!)) {
      if (infl.has(n)) continue
      const val = maps[0]![n]!.join(',')
      if (maps.every((m) => m[n]?.join(',') === val)) inherent = { ...inherent, [n]: maps[0]![n]! }
    }
    const inherentNames = new Set(Object.keys(inherent))
    const cells: Cell[] = []
    const index = new Map<string, Cell>()
    const keys = (cellKeys[entry.upos] ??= [])
    for (const r of rows) {
      const map = parseFeats(r.feats)
      const keep = new Set(Object.keys(map).filter((n) => !inherentNames.has(n) || infl.has(n)))
      const key = pickFeats(r.feats, keep)
      let cell = index.get(key)
      if (!cell) {
        cell = { key, forms: [] }
        index.set(key, cell)
        cells.push(cell)
        if (!keys.includes(key)) keys.push(key)
      }
      if (!cell.forms.includes(r.form)) cell.forms.push(r.form)
    }
    entries.push({ lemma: entry.lemma, upos: entry.upos, inherent: formatFeats(inherent), cells })
  }
  // Canonical order, so the order of input rows never changes a model: entries by UPOS then lemma (code
  // points), cells by their FEATS (UD order); variant forms keep the source's order (its preference).
  entries.sort((a, b) => cmp(a.upos, b.upos) || cmp(a.lemma, b.lemma))
  for (const e of entries) e.cells?.sort((a, b) => compareFeatureKeys(a.key, b.key))
  for (const upos of Object.keys(cellKeys)) cellKeys[upos]!.sort(compareFeatureKeys)
  const sortedCellKeys: Record<string, string[]> = {}
  for (const upos of Object.keys(cellKeys).sort(cmp)) sortedCellKeys[upos] = cellKeys[upos]!
  const inflectional: Record<string, string[]> = {}
  for (const upos of [...varying.keys()].sort(cmp))
    inflectional[upos] = [...varying.get(upos)!].sort(compareFeatureKeys)
  return { entries, cellKeys: sortedCellKeys, inflectional, problems }
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}

/** Union of two canonical bundles; a feature with other values in each gets all of them (named in `clashes`). */
function unionFeats(a: string, b: string): { feats: string; clashes: string[] } {
  const map = parseFeats(a)
  const clashes: string[] = []
  for (const [name, values] of Object.entries(parseFeats(b))) {
    const have = map[name]
    if (have && have.join(',') !== values.join(',')) clashes.push(name)
    map[name] = [...new Set([...(have ?? []), ...values])].sort(compareFeatureKeys)
  }
  return { feats: formatFeats(map), clashes }
}

function sameRows(a: { form: string; feats: string }[], b: { form: string; feats: string }[]): boolean {
  const key = (r: { form: string; feats: string }) => `${r.feats}\t${r.form}`
  const sa = new Set(a.map(key))
  return b.every((r) => sa.has(key(r))) && new Set(b.map(key)).size === sa.size
}
