// Lookup as the routes use it: one form's candidates, and the analyzer constraint files are built with.
import type { Analyzer } from '../core/constrain/analyzer.ts'
import { type AnalyzeOptions, analyzeForm, type FormAnalysis } from '../core/lookup/analyze.ts'
import type { ServedModel } from './served-model.ts'

/** What a query may ask of lookup (the core's options: top, minScore, guess, foldDiacritics). */
export type LookupOptions = AnalyzeOptions

/** The core's answer as JSON goes out (Hono's JSON types have no read-only arrays; nothing mutates it). */
export type AnalysisJson = Omit<FormAnalysis, 'normalized'> & { normalized: string[] }

/**
 * The candidates of one form (the core's answer, passed through).
 * @example analyze(model, 'lokan', {}).candidates[0] // { lemma: 'lokka', upos: 'NOUN', source: 'attested', … }
 */
export function analyze(model: ServedModel, form: string, options: LookupOptions): AnalysisJson {
  return analyzeForm(model, form, options) as AnalysisJson
}

/**
 * The analyzer of a model for constraint files. Lookup tries the case variants of every token itself,
 * so a sentence-initial token needs nothing more.
 * @example constrainCorpus(tokens, analyzerOf(model), { level: 'upos' })
 */
export function analyzerOf(model: ServedModel): Analyzer {
  return (form) => analyzeForm(model, form).candidates
}
