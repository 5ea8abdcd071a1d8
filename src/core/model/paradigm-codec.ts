// Paradigms in the model file: cells by their index in the UPOS's cell list, stem shapes as tuples.
import type { Paradigm } from '../inflect/paradigm.ts'
import { type Pattern, patternKey } from '../inflect/pattern.ts'
import { ProblemError } from '../lexicon/problem.ts'

/** A paradigm (or a cell rule) in the file: cells as `[cell, pattern…]`, shapes as `[seen, first, last, min, max]`. */
export interface ParadigmJson {
  id: string
  upos: string
  lemma: Pattern
  openPrefix: boolean
  cells: [number | string, ...Pattern[]][]
  members: number
  examples: string[]
  shapes: [string[], string, string, number, number][]
}

/**
 * Write a paradigm; a cell key not in `cellKeys` is written out in full.
 * @example encodeParadigm(p, ['Case=Nom|Number=Sing']).cells[0] // [0, [0]]
 */
export function encodeParadigm(p: Paradigm, cellKeys: readonly string[]): ParadigmJson {
  return {
    id: p.id,
    upos: p.upos,
    lemma: p.lemma,
    openPrefix: p.openPrefix,
    cells: p.cells.map((c) => {
      const i = cellKeys.indexOf(c.key)
      return [i >= 0 ? i : c.key, ...c.forms]
    }),
    members: p.members,
    examples: p.examples,
    shapes: (p.shapes ?? []).map((s) => [s.seen, s.first, s.last, s.minLength, s.maxLength]),
  }
}

/**
 * Read a paradigm back (the inverse of `encodeParadigm`).
 * @example decodeParadigm(encodeParadigm(p, keys), keys) // deep-equals p
 */
export function decodeParadigm(p: ParadigmJson, cellKeys: readonly string[]): Paradigm {
  return {
    id: p.id,
    upos: p.upos,
    lemma: p.lemma,
    openPrefix: p.openPrefix,
    cells: p.cells.map(([ref, ...forms]) => {
      const key = typeof ref === 'number' ? cellKeys[ref] : ref
      if (key === undefined) {
        throw new ProblemError({
          code: 'bad-model',
          message: `model file: paradigm ${p.id} names no cell ${ref}`,
        })
      }
      return { key, forms }
    }),
    members: p.members,
    examples: p.examples,
    shapes: p.shapes.map(([seen, first, last, minLength, maxLength]) => ({
      seen,
      first,
      last,
      minLength,
      maxLength,
    })),
  }
}

/**
 * Let cells with the same forms share one frozen list of them, and equal patterns one frozen pattern: a
 * dictionary-sized book read from a file has tens of thousands of cells but far fewer distinct rewrites
 * (the whole German model: 62,000 cells, 16 MB before, about a third after). Read paradigms are never
 * changed; freezing makes any attempt throw.
 * @example shareCellForms(book.paradigms); book.paradigms[0].cells[0].forms === book.paradigms[1].cells[0].forms // when alike
 */
export function shareCellForms(paradigms: Iterable<Paradigm>): void {
  const patterns = new Map<string, Pattern>()
  const lists = new Map<string, Pattern[]>()
  const shared = (f: Pattern, key: string) => {
    let q = patterns.get(key)
    if (!q) patterns.set(key, (q = Object.freeze([...f]) as Pattern))
    return q
  }
  for (const p of paradigms) {
    for (const c of p.cells) {
      const keys = c.forms.map(patternKey)
      const id = keys.join('\u0003')
      let list = lists.get(id)
      if (!list) lists.set(id, (list = Object.freeze(c.forms.map((f, i) => shared(f, keys[i]!))) as Pattern[]))
      c.forms = list
    }
  }
}
