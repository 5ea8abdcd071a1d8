// Lookup as the routes use it: one form's candidates, and the analyzer constraint files are built with.
import type { Analyzer } from '../core/constrain/analyzer.ts'
import { type AnalyzeOptions, analyzeForm } from '../core/lookup/analyze.ts'
import { MAX_CACHED_ANSWERS } from './limits.ts'
import { LruCache } from './lru-cache.ts'
import type { ServedModel } from './served-model.ts'

/** What a query may ask of lookup (the core's options: top, minScore, guess, foldDiacritics). */
export type LookupOptions = AnalyzeOptions

const answers = new WeakMap<ServedModel, LruCache<string>>()

/**
 * One form's answer as JSON text, remembered per model: a model never changes once loaded, and running text
 * repeats its forms (Zipf), so most queries of a busy service are answered without a second lookup.
 * @example analyzeJson(model, 'lokan', {}) // '{"form":"lokan","normalized":["exact"],"candidates":[…]}'
 */
export function analyzeJson(model: ServedModel, form: string, options: LookupOptions): string {
  let cache = answers.get(model)
  if (!cache) {
    cache = new LruCache<string>(MAX_CACHED_ANSWERS)
    answers.set(model, cache)
  }
  const key = `${options.top ?? ''}\u0001${options.foldDiacritics ? 1 : 0}\u0001${options.guess === false ? 0 : 1}\u0001${form}`
  return cache.get(key) ?? cache.set(key, JSON.stringify(analyzeForm(model, form, options)))
}

/**
 * The analyzer of a model for constraint files. Lookup tries the case variants of every token itself,
 * so a sentence-initial token needs nothing more.
 * @example constrainCorpus(tokens, analyzerOf(model), { level: 'upos' })
 */
export function analyzerOf(model: ServedModel): Analyzer {
  return (form) => analyzeForm(model, form).candidates
}
