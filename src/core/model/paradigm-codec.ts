// Paradigms in the model file: cells by their index in the UPOS's cell list, stem shapes as tuples.
import type { Paradigm } from '../inflect/paradigm.ts'
import type { Pattern } from '../inflect/pattern.ts'
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
