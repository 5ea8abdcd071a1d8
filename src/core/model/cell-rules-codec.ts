// The per-cell rule rankers in the model file: rules, weights and each rule's member lemmas.
import { decode, encode } from 'vlq'
import type { Alternations, TwinOptions } from '../inflect/alternations.ts'
import { CandidateFinder } from '../inflect/candidates.ts'
import type { CellRuleModel } from '../inflect/cell-rules.ts'
import { paradigmShapeKey } from '../inflect/paradigm.ts'
import { extractPattern } from '../inflect/pattern.ts'
import { tiedClasses, withTwins } from '../inflect/twins.ts'
import type { LexEntry } from '../lexicon/lexicon.ts'
import { ProblemError } from '../lexicon/problem.ts'
import { decodeParadigm, encodeParadigm, type ParadigmJson } from './paradigm-codec.ts'
import { decodeWeights, encodeWeights, type WeightsJson } from './weights-codec.ts'

/** One cell's rule ranker: `members` is, per rule, its member count and the delta-coded entry indices (VLQ). */
export interface CellRulesJson {
  upos: string
  cell: number | string
  rules: ParadigmJson[]
  weights: WeightsJson
  members: string
}

/**
 * Write one cell's rule ranker. A rule's members are the tables whose lemma → form rewrite in this cell
 * has the rule's shape; they are found again here and checked against the rule's member count.
 * @example encodeCellRules(model.cells[0], entries, cellKeys, 4).rules.length // 12
 */
export function encodeCellRules(
  m: CellRuleModel,
  entries: readonly LexEntry[],
  cellKeys: readonly string[],
  decimals: number,
): CellRulesJson {
  // Twin rules are not written: reading derives them again from the rules (see twins.ts).
  const seen = m.rules.filter((r) => r.twinOf === undefined)
  const shapeOf = new Map(seen.map((r, i) => [paradigmShapeKey(r.upos, r.lemma, r.openPrefix, r.cells), i]))
  const members: number[][] = seen.map(() => [])
  entries.forEach((e, i) => {
    if (e.upos !== m.upos || !e.cells) return
    const cell = e.cells.find((c) => c.key === m.key)
    if (!cell) return
    const tp = extractPattern(e.lemma, [cell.forms[0]!])
    const r = shapeOf.get(
      paradigmShapeKey(m.upos, tp.lemma, tp.openPrefix, [{ key: m.key, forms: [tp.forms[0]!] }]),
    )
    if (r !== undefined) members[r]!.push(i)
  })
  seen.forEach((r, i) => {
    if (members[i]!.length !== r.members) {
      throw new Error(`cell rule ${r.id}: found ${members[i]!.length} members, the rule says ${r.members}`)
    }
  })
  const ints: number[] = []
  for (const list of members) {
    ints.push(list.length)
    let prev = 0
    for (const i of list) {
      ints.push(i - prev)
      prev = i
    }
  }
  const at = cellKeys.indexOf(m.key)
  return {
    upos: m.upos,
    cell: at >= 0 ? at : m.key,
    rules: seen.map((r) => encodeParadigm(r, cellKeys)),
    weights: encodeWeights(m.weights, decimals),
    members: encode(ints),
  }
}

/**
 * Read one cell's rule ranker; its candidate finder is rebuilt from the rules and their member lemmas.
 * @example decodeCellRules(json, entries, cellKeys).finder.find('Mantel', 'NOUN').length // 3
 */
export function decodeCellRules(
  json: CellRulesJson,
  entries: readonly LexEntry[],
  cellKeys: readonly string[],
  alternations: Alternations = {},
  twinOptions?: TwinOptions,
): CellRuleModel {
  const key = typeof json.cell === 'number' ? cellKeys[json.cell] : json.cell
  if (key === undefined)
    throw new ProblemError({ code: 'bad-model', message: `model file: no cell ${json.cell}` })
  const seen = json.rules.map((r) => decodeParadigm(r, cellKeys))
  const ints = decode(json.members)
  let at = 0
  const lemmas = seen.map(() => {
    const n = ints[at++]!
    const list: string[] = []
    let i = 0
    for (let k = 0; k < n; k++) {
      i += ints[at++]!
      const e = entries[i]
      if (!e) throw new ProblemError({ code: 'bad-model', message: `model file: no entry ${i}` })
      list.push(e.lemma)
    }
    return list
  })
  const twinned = withTwins(seen, lemmas, alternations)
  const weights = decodeWeights(json.weights)
  if (twinOptions?.tie) weights.classOf = tiedClasses(twinned.paradigms, alternations)
  return {
    upos: json.upos,
    key,
    rules: twinned.paradigms,
    weights,
    finder: new CandidateFinder(twinned.paradigms, twinned.members, alternations, twinOptions),
  }
}
