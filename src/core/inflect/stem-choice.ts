// Choosing how tables are cut into stem and endings, from the training tables alone: internal two-fold
// cross-validation of the learner with each kind, on a bounded, evenly spread sample of the tables.
import type { Lexicon } from '../lexicon/lexicon.ts'
import type { StemKind } from './extract.ts'
import type { InflectionModel } from './learn.ts'
import { predictLemma } from './predict.ts'

/** The kinds tried, in order of preference when they tie. */
export const STEM_KINDS: readonly StemKind[] = ['lcs', 'prefix']

/**
 * The stem kind whose models reproduce more held-out tables when learning on one half of (a sample of at
 * most `maxTables`) training tables and predicting the other half, and the reverse. Ties keep the first kind.
 * Deterministic: folds alternate over the tables in lexicon order.
 * @example chooseStemKind(lexicon, (lex, kind) => learnFromLexicon(lex, { ...opts, stems: kind }), 400) // 'prefix'
 */
export function chooseStemKind(
  lexicon: Lexicon,
  learn: (lex: Lexicon, kind: StemKind) => InflectionModel,
  maxTables: number,
): StemKind {
  const tables = lexicon.entries.filter((e) => e.cells)
  const step = Math.max(1, tables.length / Math.max(1, maxTables))
  const sample = []
  for (let x = 0; Math.floor(x) < tables.length && sample.length < maxTables; x += step)
    sample.push(tables[Math.floor(x)]!)
  const folds = [sample.filter((_, i) => i % 2 === 0), sample.filter((_, i) => i % 2 === 1)]
  if (folds[1]!.length === 0) return STEM_KINDS[0]!
  let best = STEM_KINDS[0]!
  let bestRight = -1
  let bestForms = -1
  for (const kind of STEM_KINDS) {
    let right = 0
    let forms = 0
    for (const [k, fold] of folds.entries()) {
      const model = learn({ ...lexicon, entries: fold }, kind)
      for (const e of folds[1 - k]!) {
        const n = cellsRight(model, e)
        forms += n
        if (n === e.cells!.length) right++
      }
    }
    if (right > bestRight || (right === bestRight && forms > bestForms))
      [best, bestRight, bestForms] = [kind, right, forms]
  }
  return best
}

/** How many cells of a table get one of the table's forms as the model's most probable form. */
function cellsRight(model: InflectionModel, e: Lexicon['entries'][number]): number {
  const { cells } = predictLemma(model, e.lemma, e.upos, e.inherent, 1)
  const best = new Map(cells.map((c) => [c.key, c.forms[0]?.form]))
  return e.cells!.filter((c) => c.forms.includes(best.get(c.key) ?? '\u0000')).length
}
