// Lexicon entries packed into one string and a few integer arrays: what another thread receives in
// milliseconds, where copying millions of small objects takes seconds.
import type { Cell, LexEntry } from './lexicon.ts'

/** Entries end to end: every lemma, inherent FEATS and form in `text`, the structure in integers. */
export interface PackedEntries {
  /** Lemma, inherent FEATS, then each cell's forms, entry after entry. */
  text: string
  /** Where each string of `text` ends. */
  ends: Int32Array
  names: string[]
  /** Per entry: its UPOS (in `names`) and its cell count (-1: a lemma-only entry). */
  upos: Int32Array
  cells: Int32Array
  /** Per cell: its key (in `names`) and its form count. */
  cellKey: Int32Array
  cellForms: Int32Array
}

/**
 * Pack entries (their order kept).
 * @example unpackEntries(packEntries(lexicon.entries)) // equal to lexicon.entries
 */
export function packEntries(entries: readonly LexEntry[]): PackedEntries {
  const parts: string[] = []
  const ends: number[] = []
  let at = 0
  const put = (s: string) => {
    parts.push(s)
    at += s.length
    ends.push(at)
  }
  const ids = new Map<string, number>()
  const id = (s: string) => {
    let v = ids.get(s)
    if (v === undefined) {
      v = ids.size
      ids.set(s, v)
    }
    return v
  }
  const upos = new Int32Array(entries.length)
  const cells = new Int32Array(entries.length)
  const cellKey: number[] = []
  const cellForms: number[] = []
  entries.forEach((e, i) => {
    put(e.lemma)
    put(e.inherent)
    upos[i] = id(e.upos)
    cells[i] = e.cells ? e.cells.length : -1
    for (const c of e.cells ?? []) {
      cellKey.push(id(c.key))
      cellForms.push(c.forms.length)
      for (const f of c.forms) put(f)
    }
  })
  return {
    text: parts.join(''),
    ends: Int32Array.from(ends),
    names: [...ids.keys()],
    upos,
    cells,
    cellKey: Int32Array.from(cellKey),
    cellForms: Int32Array.from(cellForms),
  }
}

/** The entries of a pack, as they were given to packEntries. */
export function unpackEntries(p: PackedEntries): LexEntry[] {
  let s = 0
  let from = 0
  const next = () => {
    const to = p.ends[s++]!
    const v = p.text.slice(from, to)
    from = to
    return v
  }
  let c = 0
  const out: LexEntry[] = []
  for (let i = 0; i < p.upos.length; i++) {
    const lemma = next()
    const inherent = next()
    const n = p.cells[i]!
    let cells: Cell[] | null = null
    if (n >= 0) {
      cells = []
      for (let k = 0; k < n; k++, c++) {
        const forms: string[] = []
        for (let f = 0; f < p.cellForms[c]!; f++) forms.push(next())
        cells.push({ key: p.names[p.cellKey[c]!]!, forms })
      }
    }
    out.push({ lemma, upos: p.names[p.upos[i]!]!, inherent, cells })
  }
  return out
}
