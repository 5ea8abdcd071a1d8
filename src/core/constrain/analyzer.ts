// What constraint building needs from lookup: a function from a corpus form to its candidate analyses.

import type { CandidateSource, Candidate as LookupCandidate } from '../lookup/candidate.ts'

export type { CandidateSource }

/** Best first: a form's source is the best source among its candidates. */
export const SOURCE_ORDER: readonly CandidateSource[] = ['attested', 'predicted', 'guessed']

/** One analysis of a form, as lookup returns it (constraints do not need the paradigm). */
export type Candidate = Omit<LookupCandidate, 'paradigm'> & { paradigm?: string | null }

/** Where a token stands, which lookup may use (a sentence-initial capital may be an ordinary word). */
export interface AnalyzeContext {
  sentenceInitial: boolean
}

/**
 * Lookup as constraint building sees it. Pure and deterministic: the same form and context give the same
 * candidates, so a form type is analyzed once per context however often it occurs.
 * @example
 * const analyzer: Analyzer = (form, ctx) => analyzeForm(model, form, ctx).candidates
 */
export type Analyzer = (form: string, ctx: AnalyzeContext) => readonly Candidate[]

/**
 * Rank of a source (0 best); `none` (no candidate) ranks last.
 * @example sourceRank('predicted') // 1
 */
export function sourceRank(source: CandidateSource | 'none'): number {
  const at = SOURCE_ORDER.indexOf(source as CandidateSource)
  return at === -1 ? SOURCE_ORDER.length : at
}

/**
 * An analyzer that remembers its answers per (form, context), for passes that meet a form many times.
 * @example const cached = cachedAnalyzer(analyzer); cached('vessa', { sentenceInitial: false })
 */
export function cachedAnalyzer(analyzer: Analyzer): Analyzer {
  const seen = new Map<string, readonly Candidate[]>()
  return (form, ctx) => {
    const key = ctx.sentenceInitial ? `1${form}` : `0${form}`
    let found = seen.get(key)
    if (!found) {
      found = analyzer(form, ctx)
      seen.set(key, found)
    }
    return found
  }
}
