// Choosing the ranker's regularization from the training tables alone, by deterministic cross-validation
// over the tables, for small lexicons (where the right strength matters most and the choice is cheap).
import type { Lexicon } from '../lexicon/lexicon.ts'
import type { InflectionModel, LearnOptions } from './learn.ts'
import { predictLemma } from './predict.ts'

/** Folds of the cross-validation that chooses the regularization (common practice: a few). */
const FOLDS = 3
/** Below this many tables there is too little to hold out; the first candidate is used. */
const MIN_TABLES = 60
/** Above this many tables the choice costs too much learning time; the first candidate is used. */
export const MAX_TUNED_TABLES = 1000

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
 * Pick the L2 strength among `grid` that predicts held-out training tables best (share of cells right).
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
  if (grid.length === 1 || tables.length < MIN_TABLES || tables.length > MAX_TUNED_TABLES) return grid[0]!
  const fold = (lemma: string) => stableHash(lemma) % FOLDS
  let best = grid[0]!
  let bestScore = -1
  for (const l2 of grid) {
    let right = 0
    let cells = 0
    for (let k = 0; k < FOLDS; k++) {
      const train: Lexicon = { ...lex, entries: lex.entries.filter((e) => !(e.cells && fold(e.lemma) === k)) }
      const model = learn(train, { ...options, ranker: { ...options.ranker, l2 } })
      for (const e of tables) {
        if (fold(e.lemma) !== k) continue
        const predicted = new Map(predictLemma(model, e.lemma, e.upos, e.inherent).cells.map((c) => [c.key, c.forms[0]?.form]))
        for (const c of e.cells!) {
          cells++
          if (c.forms.includes(predicted.get(c.key) ?? '')) right++
        }
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
