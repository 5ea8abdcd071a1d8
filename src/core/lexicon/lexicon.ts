// The lexicon: entries merged by (lemma, upos), cells split from inherent features, cell inventories per UPOS.
import { type Entry, entryKey } from './entry.ts'
import { compareFeatureKeys, type FeatMap, formatFeats, mergeFeats, parseFeats, pickFeats } from './feats.ts'
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
  // Bundles repeat in every table: each is parsed once (the maps are shared, so only read), and so is each
  // merge of an entry's features with a row's and each row bundle's cell key.
  const parsed = new Map<string, FeatMap>()
  const parse = (f: string): FeatMap => {
    let m = parsed.get(f)
    if (!m) {
      m = parseFeats(f)
      parsed.set(f, m)
    }
    return m
  }
  // Two levels (a context, then a row's bundle): the bundles are the reader's shared strings, so a lookup
  // hashes nothing new, where one joined key per row would be a new string to hash.
  const memo = new Map<string, Map<string, string>>()
  const cached = (context: string, feats: string, make: () => string): string => {
    let inner = memo.get(context)
    if (!inner) {
      inner = new Map()
      memo.set(context, inner)
    }
    let v = inner.get(feats)
    if (v === undefined) {
      v = make()
      inner.set(feats, v)
    }
    return v
  }
  // Each bundle's feature names, listed once.
  const namesOf = new Map<string, string[]>()
  const names = (f: string): string[] => {
    let n = namesOf.get(f)
    if (!n) {
      n = Object.keys(parse(f))
      namesOf.set(f, n)
    }
    return n
  }
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
      const full = e.forms.map((f) => ({
        form: f.form,
        feats:
          e.feats === '_'
            ? mergeFeats(e.feats, f.feats)
            : cached(`m\u0000${e.feats}`, f.feats, () => mergeFeats(e.feats, f.feats)),
      }))
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
    // A name varies when some row's value differs from the first row's (absent counts as a value); rows
    // with the first row's bundle cannot differ, and a name known to vary needs no more looking.
    const first = rows[0]!.feats
    const firstMap = parse(first)
    for (const r of rows) {
      if (r.feats === first) continue
      const m = parse(r.feats)
      for (const n of names(r.feats)) if (!set.has(n) && !sameValues(m[n], firstMap[n])) set.add(n)
      for (const n of names(first)) if (!set.has(n) && !sameValues(m[n], firstMap[n])) set.add(n)
    }
  }

  const entries: LexEntry[] = []
  // Per UPOS, its cell keys in order of first appearance (sorted below).
  const keySets = new Map<string, Set<string>>()
  for (const { entry, rows } of merged.values()) {
    const infl = varying.get(entry.upos) ?? new Set<string>()
    if (rows.length === 0) {
      entries.push({ lemma: entry.lemma, upos: entry.upos, inherent: entry.feats, cells: null })
      continue
    }
    let inherent = parse(entry.feats)
    const maps = rows.map((r) => parse(r.feats))
    for (const n of Object.keys(maps[0]!)) {
      if (infl.has(n)) continue
      const val = maps[0]![n]!
      if (maps.every((m) => sameValues(m[n], val))) inherent = { ...inherent, [n]: maps[0]![n]! }
    }
    const inherentNames = new Set(Object.keys(inherent))
    const keySig = `k\u0000${entry.upos}\u0000${[...inherentNames].join('|')}\u0000`
    const cells: Cell[] = []
    const index = new Map<string, Cell>()
    let known = keySets.get(entry.upos)
    if (!known) {
      known = new Set()
      keySets.set(entry.upos, known)
    }
    for (const r of rows) {
      const key = cached(keySig, r.feats, () => {
        const keep = new Set(Object.keys(parse(r.feats)).filter((n) => !inherentNames.has(n) || infl.has(n)))
        return pickFeats(r.feats, keep)
      })
      let cell = index.get(key)
      if (!cell) {
        cell = { key, forms: [] }
        index.set(key, cell)
        cells.push(cell)
        known.add(key)
      }
      if (!cell.forms.includes(r.form)) cell.forms.push(r.form)
    }
    entries.push({ lemma: entry.lemma, upos: entry.upos, inherent: formatFeats(inherent), cells })
  }
  // Canonical order, so the order of input rows never changes a model: entries by UPOS then lemma (code
  // points), cells by their FEATS (UD order); variant forms keep the source's order (its preference).
  entries.sort((a, b) => cmp(a.upos, b.upos) || cmp(a.lemma, b.lemma))
  // Each UPOS's cell keys are sorted once; a table's cells then sort by their key's place there (the same
  // order: compareFeatureKeys is total, and a table has each key once).
  const cellKeys: Record<string, string[]> = {}
  const ranks = new Map<string, Map<string, number>>()
  for (const [upos, known] of keySets) {
    cellKeys[upos] = [...known].sort(compareFeatureKeys)
    ranks.set(upos, new Map(cellKeys[upos]!.map((k, i) => [k, i])))
  }
  for (const e of entries) {
    if (!e.cells || e.cells.length < 2) continue
    const rank = ranks.get(e.upos)!
    e.cells.sort((a, b) => rank.get(a.key)! - rank.get(b.key)!)
  }
  const sortedCellKeys: Record<string, string[]> = {}
  for (const upos of Object.keys(cellKeys).sort(cmp)) sortedCellKeys[upos] = cellKeys[upos]!
  const inflectional: Record<string, string[]> = {}
  for (const upos of [...varying.keys()].sort(cmp))
    inflectional[upos] = [...varying.get(upos)!].sort(compareFeatureKeys)
  return { entries, cellKeys: sortedCellKeys, inflectional, problems }
}

/** Whether two feature values lists are the same (both absent counts as the same). */
function sameValues(a: readonly string[] | undefined, b: readonly string[] | undefined): boolean {
  if (a === b) return true
  if (!a || !b || a.length !== b.length) return false
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false
  return true
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

/** Same cells in the same order with the same variants in the same order. */
export function sameCells(a: readonly { key: string; forms: readonly string[] }[], b: typeof a): boolean {
  if (a.length !== b.length) return false
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!
    const y = b[i]!
    if (x.key !== y.key || x.forms.length !== y.forms.length) return false
    for (let k = 0; k < x.forms.length; k++) if (x.forms[k] !== y.forms[k]) return false
  }
  return true
}
