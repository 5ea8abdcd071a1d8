// The evaluation protocol: learn from TRAIN's tables, predict each TEST lemma's table from (lemma, upos) alone.
import type { Lexicon } from '../lexicon/lexicon.ts'
import { type LearnOptions, learnFromLexicon, type InflectionModel, DEFAULT_LEARN_OPTIONS } from '../inflect/learn.ts'
import { predictLemma } from '../inflect/predict.ts'

/** The inflection half of the protocol's figures. */
export interface InflectionScores {
  formAccuracy: number
  tableAccuracy: number
  top3TableAccuracy: number
  lemmas: number
  cells: number
}

/**
 * Score a model on test tables: top-1 form per cell (the most probable form over the candidate tables),
 * whole tables, and whether the gold table is among the 3 best predicted tables.
 * @example scoreInflection(model, testLexicon).tableAccuracy // 0.915
 */
export function scoreInflection(model: InflectionModel, test: Lexicon): InflectionScores {
  let cells = 0
  let formsRight = 0
  let tablesRight = 0
  let top3 = 0
  let lemmas = 0
  for (const e of test.entries) {
    if (!e.cells) continue
    lemmas++
    const { tables, cells: scored } = predictLemma(model, e.lemma, e.upos, e.inherent, 8)
    const best = new Map(scored.map((c) => [c.key, c.forms[0]?.form]))
    let all = true
    for (const c of e.cells) {
      cells++
      const f = best.get(c.key)
      if (f !== undefined && c.forms.includes(f)) formsRight++
      else all = false
    }
    if (all) tablesRight++
    const inTop3 = tables.slice(0, 3).some((t) => {
      const m = new Map(t.cells.map((c) => [c.key, c.forms[0]]))
      return e.cells!.every((c) => {
        const f = m.get(c.key)
        return f !== undefined && c.forms.includes(f)
      })
    })
    if (inTop3) top3++
  }
  return {
    formAccuracy: cells ? formsRight / cells : 0,
    tableAccuracy: lemmas ? tablesRight / lemmas : 0,
    top3TableAccuracy: lemmas ? top3 / lemmas : 0,
    lemmas,
    cells,
  }
}

/** Learn from the train lexicon's tables only (lemma-only entries are ignored, as the protocol says). */
export function learnForEvaluation(train: Lexicon, options: LearnOptions = DEFAULT_LEARN_OPTIONS): InflectionModel {
  const tablesOnly: Lexicon = { ...train, entries: train.entries.filter((e) => e.cells) }
  return learnFromLexicon(tablesOnly, options)
}
