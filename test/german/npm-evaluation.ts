// Learn on the train side of a German npm set and score the test side, per the evaluation protocol.
import {
  type InflectionScores,
  learnForEvaluation,
  scoreInflection,
} from '../../src/core/evaluate/evaluate.ts'
import type { InflectionModel } from '../../src/core/inflect/learn.ts'
import type { TableRow } from '../../src/core/lexicon/entry.ts'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'
import { type GermanSet, loadGermanNpm } from '../support/german-npm.ts'
import { type LemmaSplit, splitByLemma } from './lemma-split.ts'

/** Share of lemmas on the test side of every German npm split. */
export const TEST_SHARE = 0.1
/** Test lemmas scored: the ones with the smallest hashes on the test side (a deterministic sample). */
export const TEST_SAMPLE = 300

export interface SetEvaluation {
  split: LemmaSplit
  model: InflectionModel
  scores: InflectionScores
}

/**
 * Learn from `trainSample` train lemmas of a set and score the test sample.
 * @example evaluateGermanSet('nouns', { trainSample: 4000 }).scores.tableAccuracy // 0.93
 */
export function evaluateGermanSet(set: GermanSet, opts: { trainSample: number }): SetEvaluation {
  const split = splitByLemma(loadGermanNpm(set).rows, {
    testShare: TEST_SHARE,
    maxTrain: opts.trainSample,
    maxTest: TEST_SAMPLE,
  })
  const model = learnForEvaluation(buildLexicon(rowsToEntries(split.train)))
  const scores = scoreInflection(model, buildLexicon(rowsToEntries(split.test)))
  return { split, model, scores }
}

/**
 * Score the same model on some cells of the test tables only (it predicts the cells a test table has).
 * @example scoreOnCells(run, (feats) => !feats.includes('Mood=Imp')).cells // 8100
 */
export function scoreOnCells(run: SetEvaluation, keepCell: (feats: string) => boolean): InflectionScores {
  const rows: TableRow[] = run.split.test.filter((r) => keepCell(r.feats))
  return scoreInflection(run.model, buildLexicon(rowsToEntries(rows)))
}
