// The rewrite rules of every cell of one UPOS, grouped, from one pass over the tables: a table's forms are
// cut into stem and endings once each, however many cells they fill (German nouns repeat a form in half
// their cells, adjectives in most), where cutting cell by cell would align each form again.
import type { Cell, LexEntry } from '../lexicon/lexicon.ts'
import type { Paradigm } from './paradigm.ts'
import { extractPattern, patternKey, type TablePattern } from './pattern.ts'
import { StemTally } from './stem-tally.ts'

/** One rule of a cell: the tables whose lemma → form rewrite has its shape. */
export interface RuleGroup {
  rule: Paradigm
  index: number
  lemmas: string[]
  stems: StemTally
}

/** A cell's rules by shape key (`order`: first seen first), and per table having the cell, its rule and number. */
export interface CellGroups {
  groups: Map<string, RuleGroup>
  order: string[]
  /** Per item (a table with the cell, in table order): the index of its rule, and its table's number. */
  own: number[]
  itemTable: number[]
}

/** A form's pattern with the parts of its shape key (paradigm.ts: paradigmShapeKey of one cell, one form). */
interface Cut {
  tp: TablePattern
  head: string
  form: string
}

/**
 * Group the tables' rewrite rules of the cells `wanted` (indices into `keys` and `columns`), as grouping
 * each cell alone by paradigmShapeKey of its one-form rule does.
 * @example groupCells('NOUN', tables, columns, keys, [0])[0].order.length // the rules of cell keys[0]
 */
export function groupCells(
  upos: string,
  tables: readonly LexEntry[],
  columns: readonly (readonly (Cell | undefined)[])[],
  keys: readonly string[],
  wanted: readonly number[],
): CellGroups[] {
  const out: CellGroups[] = wanted.map(() => ({ groups: new Map(), order: [], own: [], itemTable: [] }))
  // This table's distinct forms and their cuts (reused from table to table).
  const forms: string[] = []
  const cuts: Cut[] = []
  for (const [t, e] of tables.entries()) {
    forms.length = 0
    cuts.length = 0
    for (const [w, ki] of wanted.entries()) {
      const cell = columns[ki]![t]
      if (!cell) continue
      const form = cell.forms[0]!
      let j = forms.indexOf(form)
      if (j < 0) {
        j = forms.length
        forms.push(form)
        const tp = extractPattern(e.lemma, [form])
        const head = `${upos}\u0005${tp.openPrefix ? 1 : 0}\u0005${patternKey(tp.lemma)}\u0005`
        cuts.push({ tp, head, form: patternKey(tp.forms[0]!) })
      }
      const { tp, head, form: formKey } = cuts[j]!
      const key = keys[ki]!
      // paradigmShapeKey(upos, tp.lemma, tp.openPrefix, [{ key, forms: [tp.forms[0]] }]), from its parts.
      const shape = `${head}${key}=${formKey}`
      const c = out[w]!
      let g = c.groups.get(shape)
      if (!g) {
        g = {
          rule: {
            id: '',
            upos,
            lemma: tp.lemma,
            openPrefix: tp.openPrefix,
            cells: [{ key, forms: [tp.forms[0]!] }],
            members: 0,
            examples: [],
          },
          index: c.order.length,
          lemmas: [],
          stems: new StemTally(),
        }
        c.groups.set(shape, g)
        c.order.push(shape)
      }
      g.lemmas.push(e.lemma)
      g.stems.add(tp.stems)
      c.own.push(g.index)
      c.itemTable.push(t)
    }
  }
  return out
}
