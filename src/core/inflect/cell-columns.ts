// The tables of one UPOS by cell: each cell key's column of cells (one per table, or none), and a cheap
// way to tell two columns apart, so syncretic cells are found without building a string per column.
import type { Cell, LexEntry } from '../lexicon/lexicon.ts'

/**
 * Per cell key (in `keys` order), each table's cell of that key (undefined where the table lacks it).
 * @example cellColumns(tables, ['Case=Acc|Number=Plur', 'Case=Nom|Number=Plur'])[1][0].forms // ['Tage']
 */
export function cellColumns(tables: readonly LexEntry[], keys: readonly string[]): (Cell | undefined)[][] {
  const at = new Map(keys.map((k, i) => [k, i]))
  const columns = keys.map(() => new Array<Cell | undefined>(tables.length).fill(undefined))
  tables.forEach((e, t) => {
    for (const c of e.cells ?? []) {
      const i = at.get(c.key)
      // The first cell of a key, as a search by key finds it.
      if (i !== undefined && columns[i]![t] === undefined) columns[i]![t] = c
    }
  })
  return columns
}

/**
 * A hash of a column's forms (FNV-1a over lengths and first and last code units; equal columns hash alike).
 * @example columnHash(cellColumns(tables, keys)[0]) // 2166136261 for an empty column
 */
export function columnHash(column: readonly (Cell | undefined)[]): number {
  let h = 0x811c9dc5
  for (const c of column) {
    if (!c) {
      h = Math.imul(h ^ 0x2, 0x01000193)
      continue
    }
    for (const f of c.forms) {
      h = Math.imul(h ^ f.length, 0x01000193)
      h = Math.imul(h ^ f.charCodeAt(0), 0x01000193)
      h = Math.imul(h ^ f.charCodeAt(f.length - 1), 0x01000193)
    }
    h = Math.imul(h ^ 0x3, 0x01000193)
  }
  return h
}

/**
 * Whether two columns have the same forms in every table (the same variants in the same order, or both none).
 * @example sameColumn(columns[0], columns[0]) // true
 */
export function sameColumn(a: readonly (Cell | undefined)[], b: readonly (Cell | undefined)[]): boolean {
  if (a.length !== b.length) return false
  for (let t = 0; t < a.length; t++) {
    const x = a[t]
    const y = b[t]
    if (x === y) continue
    if (!x || !y || x.forms.length !== y.forms.length) return false
    for (let k = 0; k < x.forms.length; k++) if (x.forms[k] !== y.forms[k]) return false
  }
  return true
}
