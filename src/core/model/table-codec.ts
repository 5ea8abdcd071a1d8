// Tables in the model file: an attested table as the paradigm that reproduces it, raw forms otherwise.
import { applyParadigm, matchAll, type Paradigm } from '../inflect/paradigm.ts'
import { fillPattern } from '../inflect/pattern.ts'
import type { Cell, LexEntry } from '../lexicon/lexicon.ts'
import { ProblemError } from '../lexicon/problem.ts'
import { type KeptTable, sameCells } from './model.ts'

/** A cell reference: the index of its key in the UPOS's cell list (or the key itself if it is not listed). */
type CellRef = number | string
/** Raw cells: `[cell, form, form…]` per cell, in the table's order. */
export type RawCells = [CellRef, ...string[]][]

/**
 * The table slot of an entry record (see FORMAT.md): `p` (paradigm p applied to the lemma gives the table),
 * `{p, s}` (paradigm p with these stems), `{p, m, d}` (paradigm p's table without cells m, cells d replaced),
 * `{p, f}` (raw cells; p = its paradigm or -1), or for a bare lemma
 * the array of kept tables `[p, score×10⁴]` / `[p, score×10⁴, rawCells]` / `[p, score×10⁴, {d: rawCells}]`
 * (only the cells that differ from paradigm p's table of the lemma), with a trailing 1 for a table that
 * only completes the cells of forms the others license.
 */
export type TableJson =
  | number
  | { p: number; s: string[] }
  | { p: number; f: RawCells }
  | { p: number; m: number[]; d: RawCells }
  | [number, number, ...(RawCells | Differing | 1)[]][]

/** Since 2.0: a kept table as the cells where it differs from its paradigm's table of the lemma. */
interface Differing {
  d: RawCells
}

/** Encode the table of an attested entry, the most compact way that reproduces it exactly. */
export function encodeAttested(
  e: LexEntry,
  p: number,
  paradigms: readonly Paradigm[],
  cellKeys: readonly string[],
): TableJson {
  const cells = e.cells!
  const par = paradigms[p]
  if (par) {
    const forms = applyParadigm(par, e.lemma)
    if (
      forms &&
      sameCells(
        cells,
        par.cells.map((c, i) => ({ key: c.key, forms: forms[i]! })),
      )
    )
      return p
    for (const stems of matchAll(par.lemma, par.openPrefix, e.lemma)) {
      const filled = par.cells.map((c) => ({ key: c.key, forms: c.forms.map((f) => fillPattern(f, stems)) }))
      if (sameCells(cells, filled)) return { p, s: stems }
    }
    const raw = { p, f: encodeCells(cells, cellKeys) }
    const partial = encodePartial(cells, baseCells(e.lemma, par), cellKeys)
    // The shorter of the two (a table with most cells missing is shorter as its forms).
    return partial && JSON.stringify(partial).length < JSON.stringify(raw.f).length ? { p, ...partial } : raw
  }
  return { p: -1, f: encodeCells(cells, cellKeys) }
}

/**
 * A table as paradigm p's table of the lemma without some cells (`m`, positions in the paradigm's cells)
 * and with others replaced (`d`) — a defective table, or one with other variants — when its cells are
 * the paradigm's in the paradigm's order. Null when they are not.
 */
function encodePartial(
  cells: readonly Cell[],
  base: Cell[] | null,
  cellKeys: readonly string[],
): { m: number[]; d: RawCells } | null {
  if (!base) return null
  const missing: number[] = []
  const differing: Cell[] = []
  let at = 0
  base.forEach((b, i) => {
    const c = cells[at]
    if (c?.key !== b.key) {
      missing.push(i)
      return
    }
    if (!sameCells([c], [b])) differing.push(c)
    at++
  })
  return at === cells.length ? { m: missing, d: encodeCells(differing, cellKeys) } : null
}

/**
 * Encode the kept tables of a bare lemma. A table mixed from cell predictions is written as the cells where
 * it differs from its paradigm's table of the lemma, when both have the same cells in the same order.
 * @example encodeKept([{ paradigm: 3, score: 0.9, cells: null }], keys, 'Rose', paradigms) // [[3, 9000]]
 */
export function encodeKept(
  kept: readonly KeptTable[],
  cellKeys: readonly string[],
  lemma = '',
  paradigms: readonly Paradigm[] = [],
): TableJson {
  return kept.map((t) => {
    const out: [number, number, ...(RawCells | Differing | 1)[]] = [t.paradigm, Math.round(t.score * 1e4)]
    if (t.cells) {
      const base = baseCells(lemma, paradigms[t.paradigm])
      const alike = base?.length === t.cells.length && base.every((c, i) => c.key === t.cells![i]!.key)
      if (alike) out.push({ d: encodeCells(t.cells.filter((c, i) => !sameCells([c], [base[i]!])), cellKeys) })
      else out.push(encodeCells(t.cells, cellKeys))
    }
    if (t.completes) out.push(1)
    return out
  })
}

/** Paradigm p's table of the lemma (null when it does not apply). */
function baseCells(lemma: string, par: Paradigm | undefined): Cell[] | null {
  const forms = par && applyParadigm(par, lemma)
  return par && forms ? par.cells.map((c, i) => ({ key: c.key, forms: forms[i]! })) : null
}

function encodeCells(cells: readonly Cell[], cellKeys: readonly string[]): RawCells {
  return cells.map((c) => {
    const i = cellKeys.indexOf(c.key)
    return [i >= 0 ? i : c.key, ...c.forms]
  })
}

/** What an entry's table slot decodes to: its cells and paradigm (attested) or its kept tables (bare lemma). */
export type DecodedTable = { cells: Cell[]; paradigm: number } | { kept: KeptTable[] }

/** Decode a table slot; a slot that does not fit its lemma throws a `bad-model` problem. */
export function decodeTable(
  lemma: string,
  t: TableJson,
  paradigms: readonly Paradigm[],
  cellKeys: readonly string[],
): DecodedTable {
  if (Array.isArray(t)) {
    return {
      kept: t.map((k) => {
        if (!paradigms[k[0]]) throw bad(`${lemma}: no paradigm ${k[0]}`)
        const raw = k.find((x): x is RawCells => Array.isArray(x))
        const diff = k.find((x): x is Differing => typeof x === 'object' && !Array.isArray(x))
        let cells = raw ? decodeCells(raw, cellKeys) : null
        if (diff) {
          const base = baseCells(lemma, paradigms[k[0]])
          if (!base || !Array.isArray(diff.d)) throw bad(`${lemma}: paradigm ${k[0]} does not apply`)
          const changed = new Map(decodeCells(diff.d, cellKeys).map((c) => [c.key, c]))
          cells = base.map((c) => changed.get(c.key) ?? c)
        }
        const table: KeptTable = { paradigm: k[0], score: k[1] / 1e4, cells }
        if (k.slice(2).includes(1)) table.completes = true
        return table
      }),
    }
  }
  if (typeof t === 'number') {
    const par = paradigms[t]
    const forms = par && applyParadigm(par, lemma)
    if (!par || !forms) throw bad(`${lemma}: paradigm ${t} does not apply`)
    return { paradigm: t, cells: par.cells.map((c, i) => ({ key: c.key, forms: forms[i]! })) }
  }
  if (t && 's' in t && Array.isArray(t.s)) {
    const par = paradigms[t.p]
    if (!par) throw bad(`${lemma}: no paradigm ${t.p}`)
    return {
      paradigm: t.p,
      cells: par.cells.map((c) => ({ key: c.key, forms: c.forms.map((f) => fillPattern(f, t.s)) })),
    }
  }
  if (t && 'f' in t && Array.isArray(t.f)) return { paradigm: t.p, cells: decodeCells(t.f, cellKeys) }
  if (t && 'm' in t && Array.isArray(t.m) && Array.isArray(t.d)) {
    const base = baseCells(lemma, paradigms[t.p])
    if (!base) throw bad(`${lemma}: paradigm ${t.p} does not apply`)
    const missing = new Set(t.m)
    const changed = new Map(decodeCells(t.d, cellKeys).map((c) => [c.key, c]))
    return {
      paradigm: t.p,
      cells: base.flatMap((c, i) => (missing.has(i) ? [] : [changed.get(c.key) ?? c])),
    }
  }
  throw bad(`${lemma}: unreadable table`)
}

function decodeCells(raw: RawCells, cellKeys: readonly string[]): Cell[] {
  return raw.map(([ref, ...forms]) => {
    const key = typeof ref === 'number' ? cellKeys[ref] : ref
    if (key === undefined) throw bad(`no cell ${ref}`)
    return { key, forms }
  })
}

function bad(message: string): ProblemError {
  return new ProblemError({ code: 'bad-model', message: `model file: ${message}` })
}
