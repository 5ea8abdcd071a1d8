// Candidate tables grouped by their forms: paradigms that give a lemma the same table are one table.
import { sameCells } from '../lexicon/lexicon.ts'

/** A table as prediction makes it: cells in order, each with its variants in order. */
type Cells = readonly { key: string; forms: readonly string[] }[]

/**
 * Values by table, found through a hash of the forms and then compared cell by cell, so no key string is
 * built per candidate (a verb's table has dozens of cells and a lemma a hundred candidate paradigms).
 * @example const g = new TableGroups<number>(); g.set(cells, 1); g.get(cells) // 1
 */
export class TableGroups<V> {
  private readonly byHash = new Map<number, { cells: Cells; value: V }[]>()

  /** The value stored for a table with the same cells (keys and variants, in order), if any. */
  get(cells: Cells): V | undefined {
    const list = this.byHash.get(tableHash(cells))
    if (list) for (const t of list) if (sameCells(t.cells, cells)) return t.value
    return undefined
  }

  /** Store a value for a table (one not stored yet). */
  set(cells: Cells, value: V): void {
    const h = tableHash(cells)
    const list = this.byHash.get(h)
    if (list) list.push({ cells, value })
    else this.byHash.set(h, [{ cells, value }])
  }
}

/**
 * FNV-1a over each form's length and last two code units, with the cell boundaries: tables of different
 * paradigms differ in some ending (equal hashes are compared in full; cell keys are compared only).
 */
function tableHash(cells: Cells): number {
  let h = 0x811c9dc5
  for (const c of cells) {
    for (const f of c.forms) {
      const n = f.length
      h = Math.imul(h ^ n, 0x01000193)
      h = Math.imul(h ^ f.charCodeAt(n - 1), 0x01000193)
      h = Math.imul(h ^ f.charCodeAt(n - 2), 0x01000193)
    }
    h = Math.imul(h ^ 0x1e, 0x01000193)
  }
  return h
}

/**
 * Whether two tables have the same cells with the same first variant in each (what the cell rankers score).
 * @example sameFirstForms([{ key: 'a', forms: ['x', 'y'] }], [{ key: 'a', forms: ['x'] }]) // true
 */
export function sameFirstForms(a: Cells, b: Cells): boolean {
  if (a.length !== b.length) return false
  for (let i = 0; i < a.length; i++)
    if (a[i]!.key !== b[i]!.key || a[i]!.forms[0] !== b[i]!.forms[0]) return false
  return true
}
