// Lookup as the routes use it: answers for forms (loading the index parts they need first), and the analyzer constraint files are built with.
import type { Analyzer, Candidate } from '../core/constrain/analyzer.ts'
import { type AnalyzeOptions, analyzeForm } from '../core/lookup/analyze.ts'
import type { FormIndex } from '../core/lookup/form-index.ts'
import { lookupKeys } from '../core/lookup/normalize.ts'
import { shardOf } from '../core/lookup/shard-route.ts'
import { ShardedFormIndex } from '../core/lookup/sharded-index.ts'
import { MAX_CACHED_ANSWERS, MAX_SHARDS_PER_STEP } from './limits.ts'
import { LruCache } from './lru-cache.ts'
import type { ServedModel } from './served-model.ts'

/** What a query may ask of lookup (the core's options: top, minScore, guess, foldDiacritics). */
export type LookupOptions = AnalyzeOptions

const answers = new WeakMap<ServedModel, LruCache<string>>()

function cacheOf(model: ServedModel): LruCache<string> {
  let cache = answers.get(model)
  if (!cache) {
    cache = new LruCache<string>(MAX_CACHED_ANSWERS)
    answers.set(model, cache)
  }
  return cache
}

const cacheKey = (form: string, o: LookupOptions) =>
  `${o.top ?? ''}\u0001${o.foldDiacritics ? 1 : 0}\u0001${o.guess === false ? 0 : 1}\u0001${form}`

/**
 * Forms in steps whose lookups need at most `MAX_SHARDS_PER_STEP` shards of a sharded index, each step
 * with a fresh index session that has them loaded (a whole index: one step, itself). A step's shards stay
 * held until the next step begins, so a batch never holds more than a step's worth beside the cache.
 * @example for await (const { forms, index } of loadedSteps(model, ['Tage'], {})) analyze(forms, index)
 */
export async function* loadedSteps(
  model: ServedModel,
  forms: readonly string[],
  options: LookupOptions,
): AsyncGenerator<{ forms: string[]; index: FormIndex }> {
  const sharded = model.index instanceof ShardedFormIndex ? model.index : undefined
  if (!sharded) {
    yield { forms: [...forms], index: model.index }
    return
  }
  let step: string[] = []
  let keys: string[] = []
  let shards = new Set<number>()
  const flush = async () => {
    const index = sharded.session()
    await index.load(keys)
    return { forms: step, index }
  }
  for (const form of forms) {
    const own = lookupKeys([form], options)
    const more = new Set(own.map((k) => shardOf(k, sharded.shardCount)))
    const union = new Set([...shards, ...more])
    if (step.length > 0 && union.size > MAX_SHARDS_PER_STEP) {
      yield await flush()
      step = []
      keys = []
      shards = more
    } else shards = union
    step.push(form)
    keys.push(...own)
  }
  if (step.length > 0) yield await flush()
}

/**
 * Each form's answer as JSON text, remembered per model: a model never changes once loaded, and running
 * text repeats its forms (Zipf), so most queries of a busy service are answered without a lookup, and
 * without fetching any shard of a sharded model.
 * @example await analyzeJson(model, ['lokan'], {}) // ['{"form":"lokan","normalized":["exact"],"candidates":[…]}']
 */
export async function analyzeJson(
  model: ServedModel,
  forms: readonly string[],
  options: LookupOptions,
): Promise<string[]> {
  const cache = cacheOf(model)
  const out = forms.map((f) => cache.get(cacheKey(f, options)))
  const missing = [...new Set(forms.filter((_, i) => out[i] === undefined))]
  const fresh = new Map<string, string>()
  for await (const { forms: step, index } of loadedSteps(model, missing, options)) {
    const view = { ...model, index }
    for (const form of step) {
      const text = JSON.stringify(analyzeForm(view, form, options))
      fresh.set(form, cache.set(cacheKey(form, options), text))
    }
  }
  return forms.map((f, i) => out[i] ?? fresh.get(f)!)
}

/**
 * The analyzer of a model for constraint files, with every form of `forms` looked up in advance (a sharded
 * model's shards are fetched step by step here, so the analyzer itself stays synchronous). A form outside
 * `forms` is looked up on demand, which needs a whole index.
 * @example constrainTally(tally, await analyzerFor(model, tally.forms()), { level: 'upos' })
 */
export async function analyzerFor(model: ServedModel, forms: Iterable<string>): Promise<Analyzer> {
  if (!(model.index instanceof ShardedFormIndex)) return analyzerOf(model)
  // Answers for each place a token may stand (unknown, inside a sentence, first), while its shard is loaded.
  const known = new Map<string, readonly Candidate[]>()
  const key = (form: string, initial: boolean | undefined) => `${initial === undefined ? '?' : initial ? '1' : '0'}${form}`
  for await (const { forms: step, index } of loadedSteps(model, [...forms], {})) {
    const view = { ...model, index }
    for (const form of step)
      for (const initial of [undefined, false, true])
        known.set(key(form, initial), analyzeForm(view, form, { sentenceInitial: initial }).candidates)
  }
  return (form, ctx) =>
    known.get(key(form, ctx?.sentenceInitial)) ?? analyzeForm(model, form, ctx ? { ...ctx } : {}).candidates
}

/**
 * The analyzer of a model whose index is whole. Lookup tries the case variants of every token itself,
 * so a sentence-initial token needs nothing more.
 * @example constrainCorpus(tokens, analyzerOf(model), { level: 'upos' })
 */
export function analyzerOf(model: ServedModel): Analyzer {
  return (form, ctx) => analyzeForm(model, form, ctx ? { ...ctx } : {}).candidates
}
