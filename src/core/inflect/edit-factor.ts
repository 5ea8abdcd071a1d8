// The word-initial edit factor: which literals a table's forms put before the stem (a participle prefix or
// none), predicted from the lemma's first and last letters alone by one small ranker per UPOS, and
// multiplied into the paradigm and cell rankers' distributions at prediction (a product of experts:
// Hinton 2002, "Training products of experts by minimizing contrastive divergence", Neural Computation 14).

import { sampleByClass } from './example-sample.ts'
import type { Paradigm } from './paradigm.ts'
import { type RankerOptions, type RankerWeights, scoreCandidates } from './ranker.ts'
import { ExampleCoder } from './ranker-coding.ts'
import { trainCoded } from './ranker-train.ts'

/** Per UPOS: the distinct edit signatures of its paradigms and the weights choosing among them. */
export interface EditFactor {
  /** Per signature: cell key → the literal its forms start with, where it differs from the lemma's. */
  edits: Map<string, string>[]
  weights: RankerWeights
}

/** The cells of a paradigm whose forms start with another literal than its lemma, as key → that literal. */
export function leadEdits(p: Paradigm): Map<string, string> {
  const first = p.openPrefix ? 1 : 0
  const lead = (pt: readonly (string | number)[]) => {
    const part = pt[first]
    return typeof part === 'string' ? part : ''
  }
  const own = lead(p.lemma)
  const out = new Map<string, string>()
  for (const c of p.cells) {
    const f = c.forms[0]
    if (f && lead(f) !== own) out.set(c.key, lead(f))
  }
  return out
}

const signature = (m: Map<string, string>) => [...m].map(([k, v]) => `${k}=${v}`).join('\u0001')

/** The features the factor sees: the lemma's first and last letters, up to five. */
export function editFeatures(lemma: string): string[] {
  const w = [...lemma.toLowerCase()]
  const out = ['b']
  for (let k = 1; k <= Math.min(5, w.length - 2); k++) out.push(`p${k}:${w.slice(0, k).join('')}`)
  for (let k = 1; k <= Math.min(5, w.length - 1); k++) out.push(`s${k}:${w.slice(w.length - k).join('')}`)
  return out
}

/** A signature index per paradigm (see EditFactor.edits), with the distinct signatures. */
export function editClasses(paradigms: readonly Paradigm[]): {
  classOf: number[]
  edits: Map<string, string>[]
} {
  const ids = new Map<string, number>()
  const edits: Map<string, string>[] = []
  const classOf = paradigms.map((p) => {
    const m = leadEdits(p)
    const s = signature(m)
    let id = ids.get(s)
    if (id === undefined) {
      id = edits.length
      ids.set(s, id)
      edits.push(m)
    }
    return id
  })
  return { classOf, edits }
}

/**
 * Train the factor on lemmas and their edit classes (a seeded sample of at most `opts.maxExamples`).
 * Null when fewer than two classes have `minCount` lemmas (nothing to choose).
 * @example trainEditFactor(['machen', 'bemalen', 'malen', 'bezahlen'], [0, 1, 0, 1], edits, opts, 2)?.edits.length // 2
 */
export function trainEditFactor(
  lemmas: readonly string[],
  classes: readonly number[],
  edits: Map<string, string>[],
  opts: RankerOptions,
  minCount = 3,
): EditFactor | null {
  const counts = new Map<number, number>()
  for (const c of classes) counts.set(c, (counts.get(c) ?? 0) + 1)
  if ([...counts.values()].filter((n) => n >= minCount).length < 2) return null
  const all = edits.map((_, i) => i)
  const coder = new ExampleCoder()
  for (const i of sampleByClass(classes, opts.maxExamples ?? 0, opts.seed)) {
    coder.add({
      local: editFeatures(lemmas[i]!),
      candidates: all,
      shared: all.map(() => []),
      gold: [classes[i]!],
    })
  }
  return { edits, weights: trainCoded(coder.done(), opts) }
}

/** The factor's distribution over its classes for a lemma. */
export function editDistribution(f: EditFactor, lemma: string): number[] {
  const all = f.edits.map((_, i) => i)
  return scoreCandidates(
    f.weights,
    editFeatures(lemma),
    all,
    all.map(() => []),
  )
}

/** Probability that a cell (`key`) starts with `lead` (''= as the lemma does), summed over the classes. */
export function cellLeadProbability(
  f: EditFactor,
  dist: readonly number[],
  key: string,
  lead: string,
): number {
  let p = 0
  f.edits.forEach((m, i) => {
    if ((m.get(key) ?? '') === lead) p += dist[i]!
  })
  return p
}

/** The factors of a model: one per UPOS whose paradigms differ in their initial edits, and each paradigm's class. */
export interface EditFactors {
  byUpos: Map<string, EditFactor>
  /** Per book paradigm: its class in its UPOS's factor. */
  classOf: number[]
}

/**
 * Learn the edit factors of a book from the lexicon's tables (`memberOf`: each entry's paradigm, -1 none).
 * @example learnEditFactors(lexicon.entries, book.paradigms, book.memberOf, opts).byUpos.has('VERB') // true
 */
export function learnEditFactors(
  entries: readonly { lemma: string; upos: string; cells?: unknown }[],
  paradigms: readonly Paradigm[],
  memberOf: readonly number[],
  opts: RankerOptions,
): EditFactors {
  const classOf: number[] = paradigms.map(() => 0)
  const byUpos = new Map<string, EditFactor>()
  for (const upos of new Set(paradigms.map((p) => p.upos))) {
    const own = paradigms.flatMap((p, i) => (p.upos === upos ? [i] : []))
    const ec = editClasses(own.map((i) => paradigms[i]!))
    own.forEach((i, k) => {
      classOf[i] = ec.classOf[k]!
    })
    // A member of a paradigm is an entry with its own table (a bare lemma is a member of none): reading its
    // cells, which a model head may decode on every read, is not needed to know that.
    const rows = entries.flatMap((e, i) => (e.upos === upos && memberOf[i]! >= 0 ? [i] : []))
    const lemmas = rows.map((i) => entries[i]!.lemma)
    const factor = trainEditFactor(
      lemmas,
      rows.map((i) => classOf[memberOf[i]!]!),
      ec.edits,
      opts,
    )
    if (factor) byUpos.set(upos, factor)
  }
  return { byUpos, classOf }
}

/**
 * Multiply candidate probabilities by the factor's probability of each one's edit (raised to `weight`)
 * and renormalize, in place.
 * @example reweigh([0.6, 0.4], [0.1, 0.9], 1) // [0.142.., 0.857..]
 */
export function reweigh(probs: number[], edit: readonly number[], weight: number): number[] {
  let z = 0
  for (let i = 0; i < probs.length; i++) {
    probs[i] = probs[i]! * edit[i]! ** weight
    z += probs[i]!
  }
  if (z > 0) for (let i = 0; i < probs.length; i++) probs[i] = probs[i]! / z
  return probs
}

const ruleLeads = new WeakMap<Paradigm, string>()

/** The feature of a one-cell rule: the factor's probability that its cell starts as the rule's form does. */
/** The factor's probability that a one-cell rule's cell starts as the rule's form does. */
export function ruleLeadP(f: EditFactor, dist: readonly number[], rule: Paradigm): number {
  let lead = ruleLeads.get(rule)
  if (lead === undefined) {
    lead = leadEdits(rule).get(rule.cells[0]!.key) ?? ''
    ruleLeads.set(rule, lead)
  }
  return cellLeadProbability(f, dist, rule.cells[0]!.key, lead)
}
