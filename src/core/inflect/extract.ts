// Paradigm book: every full table becomes an abstract pattern; tables sharing one merge into a paradigm.
// Pattern extraction follows Ahlberg, Forsberg & Hulden (2014), EACL (longest-common-subsequence paradigms).
import type { LexEntry, Lexicon } from '../lexicon/lexicon.ts'
import { matchStems, type Paradigm, type ParadigmCell, paradigmShapeKey, type StemShape } from './paradigm.ts'
import { extractPattern, fillPattern, type Pattern, prefixPattern } from './pattern.ts'

/** A cell present in at least this share of a UPOS's tables belongs to its full inventory (common practice). */
const FULL_CELL_SHARE = 0.5
const SHAPE_SAMPLE = 24

/** How a table's stem variables are found: LCS (Ahlberg et al. 2014) or one prefix stem (prefixPattern). */
export type StemKind = 'lcs' | 'prefix'

export interface ParadigmBook {
  paradigms: Paradigm[]
  /** For each lexicon entry: the index of its paradigm, or -1 (lemma-only entries). */
  memberOf: number[]
}

interface Group {
  upos: string
  lemma: Pattern
  openPrefix: boolean
  cells: ParadigmCell[]
  key: string
  members: number[]
  stems: string[][]
  gapped: boolean
}

/**
 * Learn the paradigm book of a lexicon. A table with gaps joins the largest full paradigm that reproduces
 * every cell it has (a missing cell is unknown, not different); only when none does is it a paradigm of its own.
 * `stems: 'prefix'` takes each table's prefix-stem pattern where it has one (prefixPattern), else its LCS one.
 * @example extractParadigms(lexicon).paradigms[0].members // 412
 */
export function extractParadigms(lex: Lexicon, stems: StemKind = 'lcs'): ParadigmBook {
  const full = fullInventories(lex)
  const groups = new Map<string, Group>()
  lex.entries.forEach((e, idx) => {
    if (!e.cells) return
    const flat = e.cells.flatMap((c) => c.forms)
    const tp = (stems === 'prefix' ? prefixPattern(e.lemma, flat) : null) ?? extractPattern(e.lemma, flat)
    let k = 0
    const cells: ParadigmCell[] = e.cells.map((c) => ({ key: c.key, forms: c.forms.map(() => tp.forms[k++]!) }))
    const key = paradigmShapeKey(e.upos, tp.lemma, tp.openPrefix, cells)
    let g = groups.get(key)
    if (!g) {
      const have = new Set(cells.map((c) => c.key))
      const gapped = (full.get(e.upos) ?? []).some((c) => !have.has(c))
      g = { upos: e.upos, lemma: tp.lemma, openPrefix: tp.openPrefix, cells, key, members: [], stems: [], gapped }
      groups.set(key, g)
    }
    g.members.push(idx)
    g.stems.push(tp.stems)
  })

  const fullGroups = [...groups.values()].filter((g) => !g.gapped)
  const bySize = (a: Group, b: Group) => b.members.length - a.members.length || (a.key < b.key ? -1 : 1)
  fullGroups.sort(bySize)
  for (const g of [...groups.values()].filter((x) => x.gapped)) {
    const stay: number[] = []
    const stayStems: string[][] = []
    g.members.forEach((idx, i) => {
      const entry = lex.entries[idx]!
      const home = fullGroups.find((f) => f.upos === g.upos && reproduces(f, entry))
      if (home) {
        home.members.push(idx)
        home.stems.push([])
      } else {
        stay.push(idx)
        stayStems.push(g.stems[i]!)
      }
    })
    g.members = stay
    g.stems = stayStems
  }

  const kept = [...groups.values()].filter((g) => g.members.length > 0)
  const order = new Map(Object.keys(lex.cellKeys).map((u, i) => [u, i]))
  kept.sort((a, b) => (order.get(a.upos)! - order.get(b.upos)!) || bySize(a, b))
  const memberOf = new Array<number>(lex.entries.length).fill(-1)
  const counters = new Map<string, number>()
  const paradigms = kept.map((g, i): Paradigm => {
    const n = (counters.get(g.upos) ?? 0) + 1
    counters.set(g.upos, n)
    for (const m of g.members) memberOf[m] = i
    const cellOrder = lex.cellKeys[g.upos] ?? []
    const cells = [...g.cells].sort((a, b) => cellOrder.indexOf(a.key) - cellOrder.indexOf(b.key))
    return {
      id: `${g.upos}-${n}`,
      upos: g.upos,
      lemma: g.lemma,
      openPrefix: g.openPrefix,
      cells,
      members: g.members.length,
      examples: g.members.slice(0, 3).map((m) => lex.entries[m]!.lemma),
      shapes: stemShapes(g.stems.filter((s) => s.length > 0)),
    }
  })
  return { paradigms, memberOf }
}

/** Does the paradigm give exactly this entry's forms in every cell the entry has? */
export function reproduces(
  p: Pick<Paradigm, 'lemma' | 'openPrefix' | 'cells' | 'shapes'>,
  entry: LexEntry,
): boolean {
  if (!entry.cells) return false
  const stems = matchStems(p, entry.lemma)
  return stems !== null && reproducesWith(p, entry, stems)
}

const cellIndexes = new WeakMap<readonly ParadigmCell[], Map<string, number>>()

/**
 * As reproduces, with the stems the paradigm gives the entry's lemma already known (a candidate's): cell by
 * cell, stopping at the first that differs.
 * @example reproducesWith(p, entry, finder.find(entry.lemma, entry.upos)[0].stems) // true
 */
export function reproducesWith(
  p: Pick<Paradigm, 'cells'>,
  entry: LexEntry,
  stems: readonly string[],
): boolean {
  if (!entry.cells) return false
  let index = cellIndexes.get(p.cells)
  if (!index) {
    index = new Map()
    for (let i = p.cells.length - 1; i >= 0; i--) index.set(p.cells[i]!.key, i)
    cellIndexes.set(p.cells, index)
  }
  for (const cell of entry.cells) {
    const i = index.get(cell.key)
    if (i === undefined) return false
    const patterns = p.cells[i]!.forms
    if (patterns.length !== cell.forms.length) return false
    for (const f of patterns) if (!cell.forms.includes(fillPattern(f, stems))) return false
  }
  return true
}

function fullInventories(lex: Lexicon): Map<string, string[]> {
  const counts = new Map<string, Map<string, number>>()
  const tables = new Map<string, number>()
  for (const e of lex.entries) {
    if (!e.cells) continue
    tables.set(e.upos, (tables.get(e.upos) ?? 0) + 1)
    const m = counts.get(e.upos) ?? new Map<string, number>()
    counts.set(e.upos, m)
    for (const c of e.cells) m.set(c.key, (m.get(c.key) ?? 0) + 1)
  }
  const out = new Map<string, string[]>()
  for (const [upos, m] of counts) {
    const n = tables.get(upos)!
    out.set(upos, [...m].filter(([, c]) => c >= FULL_CELL_SHARE * n).map(([k]) => k))
  }
  return out
}

/** Summaries of what the members had in each stem variable. */
export function stemShapes(stems: string[][]): StemShape[] {
  const nvars = stems[0]?.length ?? 0
  const shapes: StemShape[] = []
  for (let v = 0; v < nvars; v++) {
    const freq = new Map<string, number>()
    let first = ''
    let last = ''
    let minLength = Number.POSITIVE_INFINITY
    let maxLength = 0
    for (const s of stems) {
      const x = s[v] ?? ''
      freq.set(x, (freq.get(x) ?? 0) + 1)
      if (x && !first.includes(x[0]!)) first += x[0]
      if (x && !last.includes(x[x.length - 1]!)) last += x[x.length - 1]
      minLength = Math.min(minLength, x.length)
      maxLength = Math.max(maxLength, x.length)
    }
    const seen = [...freq].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).slice(0, SHAPE_SAMPLE).map(([s]) => s)
    shapes.push({ seen, first: [...first].sort().join(''), last: [...last].sort().join(''), minLength, maxLength })
  }
  return shapes
}
