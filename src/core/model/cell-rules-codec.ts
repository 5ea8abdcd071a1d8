// The per-cell rule rankers in the model file: rules, weights and each rule's member lemmas.
import { decode, encode } from 'vlq'
import type { Alternations, TwinOptions } from '../inflect/alternations.ts'
import { CandidateFinder } from '../inflect/candidates.ts'
import type { CellRuleModel } from '../inflect/cell-rules.ts'
import { type Paradigm, paradigmShapeKey } from '../inflect/paradigm.ts'
import { extractPattern } from '../inflect/pattern.ts'
import { tiedClasses, withTwins } from '../inflect/twins.ts'
import type { LexEntry } from '../lexicon/lexicon.ts'
import { ProblemError } from '../lexicon/problem.ts'
import { decodeParadigm, encodeParadigm, type ParadigmJson } from './paradigm-codec.ts'
import type { RankerWeights } from '../inflect/ranker.ts'
import { decodeWeights, encodeWeights, type WeightsJson } from './weights-codec.ts'

/**
 * One cell's rule ranker: `members` is, per rule, its member count and the delta-coded entry indices (VLQ).
 * Since 2.0 `weights` or `members` may be the position of an earlier cell whose weights or members are the
 * same (cells that split the tables alike learn identical rankers: most German adjective cells do).
 */
export interface CellRulesJson {
  upos: string
  cell: number | string
  rules: ParadigmJson[]
  weights: WeightsJson | number
  members: string | number
}

/**
 * Write every cell's rule ranker, each repeated weights or members list as a reference to its first cell.
 * @example encodeAllCellRules(model.cells, entries, cellsOf, 4)[5].weights // 2 (the same as cell 2's)
 */
export function encodeAllCellRules(
  cells: readonly CellRuleModel[],
  entries: readonly LexEntry[],
  cellsOf: (upos: string) => readonly string[],
  decimals: number,
  names?: ReadonlyMap<string, number>,
): CellRulesJson[] {
  const firstWeights = new Map<string, number>()
  const firstMembers = new Map<string, number>()
  // Cells that share a finder were learned as one (the same forms in every table): the same member lists.
  const membersOf = new Map<CellRuleModel['finder'], string>()
  const numbers = entryNumbers(entries)
  return cells.map((c, i) => {
    const json = encodeCellRules(
      c,
      entries,
      cellsOf(c.upos),
      decimals,
      names,
      membersOf.get(c.finder),
      numbers,
    )
    membersOf.set(c.finder, json.members as string)
    const w = JSON.stringify(json.weights)
    const at = firstWeights.get(w)
    if (at === undefined) firstWeights.set(w, i)
    else json.weights = at
    const m = firstMembers.get(json.members as string)
    if (m === undefined) firstMembers.set(json.members as string, i)
    else json.members = m
    return json
  })
}

/**
 * Read every cell's rule ranker; cells that refer to an earlier cell's weights share its decoded weights.
 * @example decodeAllCellRules(json.cellRules, entries, cellsOf).length // 27
 */
export function decodeAllCellRules(
  list: readonly CellRulesJson[],
  entries: readonly LexEntry[],
  cellsOf: (upos: string) => readonly string[],
  alternations: Alternations = {},
  twinOptions?: TwinOptions,
  featureNames?: readonly string[],
): CellRuleModel[] {
  const decoded: RankerWeights[] = []
  // Cells with the same members share the lemma lists, so their candidate finders share suffix indexes.
  const memberLists = new Map<string, MemberLists>()
  const earlier = (v: number, i: number, what: string): CellRulesJson => {
    const target = list[v]
    if (!Number.isInteger(v) || v < 0 || v >= i || !target)
      throw new ProblemError({
        code: 'bad-model',
        message: `model file: cellRules[${i}].${what} refers to no earlier cell`,
      })
    return target
  }
  return list.map((json, i) => {
    const members =
      typeof json.members === 'number' ? earlier(json.members, i, 'members').members : json.members
    let weights = json.weights
    let shared: RankerWeights | undefined
    if (typeof weights === 'number') {
      earlier(weights, i, 'weights')
      const w = decoded[weights]!
      shared = { local: w.local, shared: w.shared }
      weights = EMPTY
    }
    const m = decodeCellRules(
      { ...json, members, weights },
      entries,
      cellsOf(json.upos),
      alternations,
      twinOptions,
      featureNames,
      shared,
      memberLists,
    )
    decoded.push(m.weights)
    return m
  })
}

const EMPTY: WeightsJson = { scale: 1, features: [], local: '', shared: {} }

/**
 * Write one cell's rule ranker. A rule's members are the tables whose lemma → form rewrite in this cell
 * has the rule's shape; they are found again here and checked against the rule's member count, unless
 * `members` gives them as written for a cell that shares this one's finder.
 * @example encodeCellRules(model.cells[0], entries, cellKeys, 4).rules.length // 12
 */
export function encodeCellRules(
  m: CellRuleModel,
  entries: readonly LexEntry[],
  cellKeys: readonly string[],
  decimals: number,
  names?: ReadonlyMap<string, number>,
  members?: string,
  numbers?: ReadonlyMap<LexEntry, number>,
): CellRulesJson {
  // Twin rules are not written: reading derives them again from the rules (see twins.ts).
  const seen = m.rules.filter((r) => r.twinOf === undefined)
  const at = cellKeys.indexOf(m.key)
  return {
    upos: m.upos,
    cell: at >= 0 ? at : m.key,
    rules: seen.map((r) => encodeParadigm(r, cellKeys)),
    weights: encodeWeights(m.weights, decimals, names),
    members: members ?? encodeMembers(m, seen, entries, numbers),
  }
}

/** Each entry's number in the list. */
function entryNumbers(entries: readonly LexEntry[]): Map<LexEntry, number> {
  const numbers = new Map<LexEntry, number>()
  entries.forEach((e, i) => numbers.set(e, i))
  return numbers
}

/**
 * The member tables of each rule, as ascending entry numbers, delta-coded (checked against the counts): from
 * the model's `memberTables` when it has them for these entries, else found again by cutting each table.
 */
function encodeMembers(
  m: CellRuleModel,
  seen: readonly Paradigm[],
  entries: readonly LexEntry[],
  numbers?: ReadonlyMap<LexEntry, number>,
): string {
  const known = m.memberTables && m.memberTables.length === seen.length ? m.memberTables : undefined
  const members = (known && numbered(known, numbers ?? entryNumbers(entries))) ?? cutMembers(m, seen, entries)
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
  return encode(ints)
}

/**
 * The entry numbers of each rule's member tables; undefined when one of them is not among the entries, or they
 * are not in the entries' order (the delta coding needs them ascending).
 */
function numbered(tables: readonly (readonly LexEntry[])[], numbers: ReadonlyMap<LexEntry, number>) {
  const out: number[][] = []
  for (const list of tables) {
    const nums: number[] = []
    for (const e of list) {
      const n = numbers.get(e)
      if (n === undefined || n <= (nums.at(-1) ?? -1)) return undefined
      nums.push(n)
    }
    out.push(nums)
  }
  return out
}

/** The members of each rule found again: the tables whose lemma → form rewrite in the cell has its shape. */
function cutMembers(m: CellRuleModel, seen: readonly Paradigm[], entries: readonly LexEntry[]): number[][] {
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
  return members
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
  featureNames?: readonly string[],
  sharedWeights?: RankerWeights,
  memberLists?: Map<string, MemberLists>,
): CellRuleModel {
  const key = typeof json.cell === 'number' ? cellKeys[json.cell] : json.cell
  if (key === undefined)
    throw new ProblemError({ code: 'bad-model', message: `model file: no cell ${json.cell}` })
  const seen = json.rules.map((r) => decodeParadigm(r, cellKeys))
  if (typeof json.members !== 'string' || typeof json.weights === 'number')
    throw new ProblemError({
      code: 'bad-model',
      message: 'model file: a cell refers to another; read it with decodeAllCellRules',
    })
  const tables = memberLists?.get(json.members) ?? memberEntries(json.members, seen.length, entries)
  memberLists?.set(json.members, tables)
  const lemmas = tables.lemmas
  const twinned = withTwins(seen, lemmas, alternations)
  const weights = sharedWeights ?? decodeWeights(json.weights, featureNames)
  if (twinOptions?.tie) weights.classOf = tiedClasses(twinned.paradigms, alternations)
  return {
    upos: json.upos,
    key,
    rules: twinned.paradigms,
    weights,
    finder: new CandidateFinder(twinned.paradigms, twinned.members, alternations, twinOptions),
    memberTables: tables.entries,
  }
}

/** The member tables of each of `n` rules, and their lemmas, from a cell's `members` string. */
function memberEntries(members: string, n: number, entries: readonly LexEntry[]): MemberLists {
  const ints = decode(members)
  let at = 0
  const out: MemberLists = { entries: [], lemmas: [] }
  for (let r = 0; r < n; r++) {
    const count = ints[at++]!
    const list: LexEntry[] = []
    let i = 0
    for (let k = 0; k < count; k++) {
      i += ints[at++]!
      const e = entries[i]
      if (!e) throw new ProblemError({ code: 'bad-model', message: `model file: no entry ${i}` })
      list.push(e)
    }
    out.entries.push(list)
    out.lemmas.push(list.map((e) => e.lemma))
  }
  return out
}

/** Per rule, its member tables and their lemmas. */
interface MemberLists {
  entries: LexEntry[][]
  lemmas: string[][]
}
