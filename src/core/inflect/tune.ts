// Choosing the ranker's regularization from the training tables alone: a deterministic held-out slice
// of the tables is predicted under each candidate strength, and the best one is used for the final model.
import type { Lexicon } from '../lexicon/lexicon.ts'
import type { InflectionModel, LearnOptions } from './learn.ts'
import { predictLemma } from './predict.ts'

/** Share of tables held out for choosing the regularization (common practice: one tenth). */
const HOLDOUT_SHARE = 0.1
/** Below this many tables there is too little to hold out; the first candidate is used. */
const MIN_TABLES = 60

/** A stable 32-bit hash (FNV-1a) of a string, for deterministic splits. */
export function stableHash(s: string): number {
  let h = 0x811c9dc5
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i)
    h = Math.imul(h, 0x01000193) >>> 0
  }
  return h
}

/**
 * Pick the L2 strength among `grid` that predicts held-out training tables best (cells right, then tables).
 * `learn` is the learner itself, passed in so this module does not depend on it.
 * @example chooseL2(lexicon, options, [1e-3, 1e-2], learnOnce) // 0.01
 */
export function chooseL2(
  lex: Lexicon,
  options: LearnOptions,
  grid: readonly number[],
  learn: (lex: Lexicon, options: LearnOptions) => InflectionModel,
): number {
  const tables = lex.entries.filter((e) => e.cells)
  if (grid.length === 1 || tables.length < MIN_TABLES) return grid[0]!
  const isHeld = (lemma: string) => stableHash(lemma) % 1000 < HOLDOUT_SHARE * 1000
  const train: Lexicon = { ...lex, entries: lex.entries.filter((e) => !(e.cells && isHeld(e.lemma))) }
  const held = tables.filter((e) => isHeld(e.lemma))
  let best = grid[0]!
  let bestScore = -1
  for (const l2 of grid) {
    // The whole-table ranker alone is enough to compare strengths, and much cheaper than the cell rankers.
    const combine = { ...options.combine, cellWeight: 0, cellMix: 0 }
    const model = learn(train, { ...options, combine, ranker: { ...options.ranker, l2 } })
    let right = 0
    let cells = 0
    for (const e of held) {
      const predicted = new Map(predictLemma(model, e.lemma, e.upos, e.inherent).cells.map((c) => [c.key, c.forms[0]?.form]))
      for (const c of e.cells!) {
        cells++
        if (c.forms.includes(predicted.get(c.key) ?? '')) right++
      }
    }
    const score = cells ? right / cells : 0
    if (score > bestScore + 1e-9) {
      best = l2
      bestScore = score
    }
  }
  return best
}
