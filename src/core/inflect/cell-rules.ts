// Cell rules: for one cell, the lemma → form rewrite of every training table, grouped, and a ranker over them.
// Factoring a table into its cells lets a lemma combine choices seen in different tables (a prefix from one
// class, a stem change from another), as in the aligned edit rules of Durrett & DeNero (2013), NAACL.
import type { Cell, LexEntry, Lexicon } from '../lexicon/lexicon.ts'
import { type Alternations, mirror, type TwinOptions } from './alternations.ts'
import { CandidateFinder } from './candidates.ts'
import { cellColumns, columnHash, sameColumn } from './cell-columns.ts'
import { type CellGroups, groupCells } from './cell-groups.ts'
import type { ModifierFilter } from './compound-prefix.ts'
import { type EditFactor, reweigh, ruleLeadP } from './edit-factor.ts'
import { sampleByClass } from './example-sample.ts'
import { type FeatureOptions, lemmaFeatures } from './features.ts'
import type { Paradigm } from './paradigm.ts'
import { fillPattern } from './pattern.ts'
import { withPrior } from './prior.ts'
import {
  epochsFor,
  type RankerExample,
  type RankerOptions,
  type RankerWeights,
  scoreCandidates,
} from './ranker.ts'
import { ExampleCoder } from './ranker-coding.ts'
import { TrainMemo } from './ranker-train.ts'
import { tiedClasses, withTwins } from './twins.ts'

/** The rules of one cell of one UPOS, with the weights that choose among them. */
export interface CellRuleModel {
  upos: string
  key: string
  /** The rules seen in tables, then their twins (see twins.ts). */
  rules: Paradigm[]
  weights: RankerWeights
  /** Finds the candidate rules. Syncretic cells share it, and cells sharing it have the same rules and weights. */
  finder: CandidateFinder
  /**
   * Per rule seen in tables (the rules without `twinOf`, in order), its member tables in lexicon order, when
   * known (learning and reading a model file know them): writing the model then need not cut every table again.
   */
  memberTables?: readonly (readonly LexEntry[])[]
}

/**
 * Learn one rule model per (UPOS, cell) from the lexicon's tables.
 * @example learnCellRules(lexicon, features, ranker).length // 27 for German verbs
 */
export function learnCellRules(
  lex: Lexicon,
  features: FeatureOptions,
  ranker: RankerOptions,
  alternations: Alternations = {},
  twinOptions?: TwinOptions,
  prior?: number,
  modifiers?: ModifierFilter,
): CellRuleModel[] {
  const out: CellRuleModel[] = []
  for (const [upos, keys] of Object.entries(lex.cellKeys)) {
    const tables = lex.entries.filter((e) => e.upos === upos && e.cells)
    // A table's lemma features are the same in every cell: made once (and once for its mirror image).
    const localOf: string[][] = []
    const mirroredOf: string[][] = []
    const memo = new TrainMemo()
    // A cell with the same forms as an earlier one in every table (German nominative = accusative plural)
    // has the same rules, examples and weights: copied under its own key rather than learned again.
    const columns = cellColumns(tables, keys)
    const bySignature = new Map<number, { column: (Cell | undefined)[]; key: string }[]>()
    // Per cell key: the earlier key whose column it repeats, or itself when it is learned.
    const learnedAs = keys.map((key, ki) => {
      const column = columns[ki]!
      const signature = columnHash(column)
      const alike = bySignature.get(signature)?.find((m) => sameColumn(m.column, column))
      if (alike) return alike.key
      const same = bySignature.get(signature)
      if (same) same.push({ column, key })
      else bySignature.set(signature, [{ column, key }])
      return key
    })
    const wanted = keys.flatMap((key, ki) => (learnedAs[ki] === key ? [ki] : []))
    const grouped: (CellGroups | undefined)[] = groupCells(upos, tables, columns, keys, wanted)
    // Rules of cells that split the tables alike have the same member lemmas: one list for them all, so
    // their finders share one suffix index (and a lemma's search through it, see CandidateFinder.find).
    const lists = new Map<string, string[]>()
    const oneList = (members: string[]) => {
      const key = members.join('\u0000')
      const known = lists.get(key)
      if (known) return known
      lists.set(key, members)
      return members
    }
    const modelOf = new Map<string, CellRuleModel>()
    for (const [ki, key] of keys.entries()) {
      const alike = modelOf.get(learnedAs[ki]!)
      if (alike) {
        out.push(relabel(alike, key))
        continue
      }
      const column = columns[ki]!
      const { groups, own, order, itemTable } = grouped[wanted.indexOf(ki)]!
      grouped[wanted.indexOf(ki)] = undefined // its tallies are not needed once its rules are made
      // The tables with this cell, by number (their lemma and forms are read from them when needed).
      const item = (i: number) => {
        const t = itemTable[i]!
        const e = tables[t]!
        return { lemma: e.lemma, inherent: e.inherent, forms: column[t]!.forms, t }
      }
      const seen = order.map((s, i) => {
        const g = groups.get(s)!
        return {
          ...g.rule,
          id: `${upos}:${key}:${i + 1}`,
          members: g.lemmas.length,
          examples: g.lemmas.slice(0, 3),
          shapes: g.stems.shapes(),
        }
      })
      const twinned = withTwins(
        seen,
        order.map((s) => groups.get(s)!.lemmas),
        alternations,
      )
      const rules = twinned.paradigms
      const finder = new CandidateFinder(rules, twinned.members.map(oneList), alternations, twinOptions)
      const classOf = twinOptions?.tie ? tiedClasses(rules, alternations) : undefined
      const picked = sampleByClass(own, cellCap(ranker, order.length), ranker.seed)
      const coder = new ExampleCoder()
      const example = (
        it: { lemma: string; inherent: string; forms: string[] },
        rule: number,
        local: string[],
      ): RankerExample => {
        const found = finder.find(it.lemma, upos, rule)
        const gold: number[] = []
        found.forEach((c, k) => {
          if (it.forms.includes(fillPattern(rules[c.paradigm]!.cells[0]!.forms[0]!, c.stems))) gold.push(k)
        })
        return {
          local,
          candidates: found.map((c) => classOf?.[c.paradigm] ?? c.paradigm),
          shared: found.map((c) => c.shared),
          gold,
        }
      }
      for (const i of picked) {
        const it = item(i)
        localOf[it.t] ??= modifiers
          ? modifiers.apply(it.lemma, upos, lemmaFeatures(it.lemma, it.inherent, features))
          : lemmaFeatures(it.lemma, it.inherent, features)
        coder.add(example(it, own[i]!, localOf[it.t]!))
      }
      const swap = alternations[upos]
      if (swap && twinOptions?.mirrorCells) {
        const twinOf = new Map(
          rules.flatMap((r, i) => (r.twinOf === undefined ? [] : [[r.twinOf, i] as const])),
        )
        for (const i of picked) {
          const it = item(i)
          const twin = twinOf.get(own[i]!)
          const lemma = mirror(it.lemma, swap)
          if (twin === undefined || lemma === it.lemma) continue
          mirroredOf[it.t] ??= lemmaFeatures(lemma, it.inherent, features)
          const copy = { lemma, inherent: it.inherent, forms: it.forms.map((f) => mirror(f, swap)) }
          coder.add(example(copy, twin, mirroredOf[it.t]!))
        }
      }
      const weights = memo.train(coder.done(), epochsFor(withPrior(ranker, coder.added, prior), coder.added))
      if (classOf) weights.classOf = classOf
      const memberTables: LexEntry[][] = order.map(() => [])
      own.forEach((r, i) => memberTables[r]!.push(tables[itemTable[i]!]!))
      const model = { upos, key, rules, weights, finder, memberTables }
      modelOf.set(key, model)
      out.push(model)
    }
  }
  return out
}

/** How many tables a cell's ranker trains on at most, given its rule count (0: all). */
function cellCap(o: RankerOptions, rules: number): number {
  const max = o.maxExamples ?? 0
  if (!o.cellPerRule) return max
  const bound = Math.max(o.cellFloor ?? 0, o.cellPerRule * rules)
  return max > 0 ? Math.min(max, bound) : bound
}

/** A cell model under another cell's key: rule ids and cell keys renamed, weight maps and finder shared. */
function relabel(m: CellRuleModel, key: string): CellRuleModel {
  const from = `${m.upos}:${m.key}:`
  const to = `${m.upos}:${key}:`
  const rules = m.rules.map((r) => ({
    ...r,
    id: to + r.id.slice(from.length),
    cells: r.cells.map((c) => ({ ...c, key })),
  }))
  const weights: RankerWeights = { local: m.weights.local, shared: m.weights.shared }
  if (m.weights.classOf) weights.classOf = [...m.weights.classOf]
  return {
    upos: m.upos,
    key,
    rules,
    weights,
    finder: m.finder,
    ...(m.memberTables && { memberTables: m.memberTables }),
  }
}

/**
 * The probability of each form of one cell for a lemma, best first (`local`: the lemma's features, when made
 * already; `edit`: the edit factor's distribution for the lemma, and its weight, see edit-factor.ts).
 */
export function cellFormDistribution(
  m: CellRuleModel,
  lemma: string,
  inherent: string,
  features: FeatureOptions,
  local: string[] = lemmaFeatures(lemma, inherent, features),
  edit?: { factor: EditFactor; dist: readonly number[]; weight: number },
): Map<string, number> {
  const found = m.finder.find(lemma, m.upos)
  const dist = new Map<string, number>()
  if (found.length === 0) return dist
  const probs = scoreCandidates(
    m.weights,
    local,
    found.map((c) => c.paradigm),
    found.map((c) => c.shared),
  )
  if (edit) {
    const lead = found.map((c) => ruleLeadP(edit.factor, edit.dist, m.rules[c.paradigm]!))
    reweigh(probs, lead, edit.weight)
  }
  found.forEach((c, i) => {
    const form = fillPattern(m.rules[c.paradigm]!.cells[0]!.forms[0]!, c.stems)
    if (form) dist.set(form, (dist.get(form) ?? 0) + probs[i]!)
  })
  return dist
}
