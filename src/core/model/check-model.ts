// Checking a decoded model file's shape and contents, so a damaged file is refused (bad-model), never served.
import { expandLemma } from '../inflect/expand.ts'
import type { Paradigm } from '../inflect/paradigm.ts'
import { ProblemError } from '../lexicon/problem.ts'
import { analyzeForm } from '../lookup/analyze.ts'
import type { Model } from './model.ts'

/** The most stem variables a pattern may have (learned patterns have a handful). */
const MAX_VARIABLES = 64

function bad(message: string): ProblemError {
  return new ProblemError({ code: 'bad-model', message: `model file: ${message}` })
}

const isNum = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x)
const isStrings = (x: unknown): boolean => Array.isArray(x) && x.every((s) => typeof s === 'string')
const isRecordOfStrings = (x: unknown): boolean =>
  !!x && typeof x === 'object' && !Array.isArray(x) && Object.values(x).every(isStrings)

/**
 * Check the top-level fields a reader relies on (types only; contents are checked after decoding).
 * @example checkModelJson(JSON.parse(text)) // throws ProblemError on a damaged field
 */
export function checkModelJson(json: Record<string, unknown>): void {
  if (!isStrings(json.upos)) throw bad('"upos" must be a list of strings')
  if (!isStrings(json.feats)) throw bad('"feats" must be a list of strings')
  if (!isRecordOfStrings(json.cellKeys)) throw bad('"cellKeys" must map UPOS tags to lists of cells')
  if (json.inflectional !== undefined && !isRecordOfStrings(json.inflectional)) throw bad('"inflectional" is malformed')
  const o = json.options as Record<string, unknown> | null
  if (!o || typeof o !== 'object' || Array.isArray(o)) throw bad('"options" must be an object')
  for (const k of ['tablesPerLemma', 'tableFloor', 'weightDecimals'] as const) if (!isNum(o[k])) throw bad(`options.${k} must be a number`)
  const learn = o.learn as Record<string, Record<string, unknown> | null> | null
  if (!learn || typeof learn !== 'object') throw bad('options.learn must be an object')
  const groups: Record<string, string[]> = {
    features: ['maxSuffix', 'maxPrefix'],
    ranker: ['epochs', 'rate', 'l2', 'seed'],
    combine: ['cellWeight', 'tableFloor', 'cellFloor', 'meanPower', 'cellMix'],
  }
  for (const [g, keys] of Object.entries(groups)) {
    const v = learn[g]
    if (!v || typeof v !== 'object') throw bad(`options.learn.${g} must be an object`)
    for (const k of keys) if (!isNum(v[k])) throw bad(`options.learn.${g}.${k} must be a number`)
  }
  if (json.featureNames !== undefined && !isStrings(json.featureNames)) throw bad('"featureNames" must be a list of strings')
  checkWeights(json.weights, 'weights')
  if (json.cellRules !== undefined) {
    if (!Array.isArray(json.cellRules)) throw bad('"cellRules" must be a list')
    json.cellRules.forEach((c: { weights?: unknown; rules?: unknown; members?: unknown }, i: number) => {
      if (!c || typeof c !== 'object' || !Array.isArray(c.rules) || !(typeof c.members === 'string' || Number.isInteger(c.members)))
        throw bad(`cellRules[${i}] is malformed`)
      // Since 2.0 a cell may give the position of an earlier cell with the same weights.
      if (!Number.isInteger(c.weights)) checkWeights(c.weights, `cellRules[${i}].weights`)
    })
  }
  if (!Array.isArray(json.paradigms) || !json.paradigms.every((p) => p && typeof p === 'object' && !Array.isArray(p)))
    throw bad('"paradigms" must be a list of objects')
  const f = learn.features!
  if (!Number.isInteger(f.maxSuffix) || !Number.isInteger(f.maxPrefix) || (f.maxSuffix as number) > 32 || (f.maxPrefix as number) > 32)
    throw bad('options.learn.features are out of range')
}

function checkWeights(w: unknown, where: string): void {
  const x = w as Record<string, unknown> | null
  const ok =
    !!x &&
    typeof x === 'object' &&
    isNum(x.scale) &&
    (x.scale as number) > 0 &&
    (isStrings(x.features) || typeof x.features === 'string') &&
    typeof x.local === 'string' &&
    !!x.shared &&
    typeof x.shared === 'object' &&
    !Array.isArray(x.shared) &&
    Object.values(x.shared as object).every(isNum)
  if (!ok) throw bad(`${where} are malformed`)
}

/** Every stem variable a form pattern uses must be one the lemma pattern binds. */
export function checkParadigm(p: Paradigm): void {
  if (!Array.isArray(p.lemma)) throw bad(`${p.id}: malformed lemma pattern`)
  const bound = new Set<number>()
  for (const part of p.lemma) {
    if (typeof part === 'number') {
      if (!Number.isInteger(part) || part < 0 || part >= MAX_VARIABLES) throw bad(`${p.id}: bad stem variable ${part}`)
      bound.add(part)
    } else if (typeof part !== 'string') throw bad(`${p.id}: bad lemma pattern`)
  }
  if (p.shapes !== undefined) {
    const ok =
      Array.isArray(p.shapes) &&
      p.shapes.every(
        (sh) =>
          sh && isStrings(sh.seen) && typeof sh.first === 'string' && typeof sh.last === 'string' && isNum(sh.minLength) && isNum(sh.maxLength),
      )
    if (!ok) throw bad(`${p.id}: malformed stem shapes`)
  }
  if (!Array.isArray(p.cells) || !p.cells.every((c) => c && typeof c.key === 'string' && Array.isArray(c.forms) && c.forms.every(Array.isArray)))
    throw bad(`${p.id}: malformed cells`)
  if (!isNum(p.members) || !isStrings(p.examples)) throw bad(`${p.id}: malformed members or examples`)
  for (const c of p.cells)
    for (const f of c.forms)
      for (const part of f)
        if (typeof part === 'number' ? !bound.has(part) : typeof part !== 'string') throw bad(`${p.id}: a cell uses an unbound stem`)
}

/**
 * Exercise a decoded model on a few of its own entries: a file whose parts do not fit together fails here
 * instead of in a request.
 */
export function smokeTestModel(model: Model): void {
  for (const p of model.inflection.book.paradigms) checkParadigm(p)
  for (const c of model.inflection.cells) for (const r of c.rules) checkParadigm(r)
  const seen = new Set<string>()
  try {
    for (const e of model.inflection.lexicon.entries) {
      if (seen.has(`${e.upos}${e.cells ? 1 : 0}`)) continue
      seen.add(`${e.upos}${e.cells ? 1 : 0}`)
      expandLemma(model.inflection, e.lemma, e.upos, e.inherent)
      analyzeForm(model, e.lemma, { guess: false }) // the guesser's tables are built on its first use, not here
      if (seen.size > 40) break
    }
  } catch (err) {
    throw bad(`its parts do not fit together (${(err as Error).message})`)
  }
}
