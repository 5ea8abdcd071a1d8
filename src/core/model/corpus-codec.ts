// The corpus section of a model file: the counts of the forms that can move a bare lemma's tables.
import {
  type CorpusEvidence,
  corpusCount,
  corpusEvidence,
  DEFAULT_CORPUS_OPTIONS,
} from '../inflect/corpus-evidence.ts'
import type { InflectionModel } from '../inflect/learn.ts'
import { predictLemma } from '../inflect/predict.ts'
import type { Lexicon } from '../lexicon/lexicon.ts'

/** `forms` holds [form, count] pairs, sorted by form, only for forms some candidate of a bare lemma has. */
export interface CorpusJson {
  weight: number
  cap: number
  absence: number
  tokens: number
  forms: [string, number][]
}

/**
 * Keep only the counts that matter: forms of the candidate tables and cells of the model's bare lemmas.
 * The model predicts the same with these as with the whole corpus.
 * @example encodeCorpus(model.inflection, 21003).forms[0] // ['ahmat', 2]
 */
export function encodeCorpus(inflection: InflectionModel, tokens: number): CorpusJson | undefined {
  const ev = inflection.corpus
  if (!ev) return undefined
  const keep = new Map<string, number>()
  const note = (f: string) => {
    const n = corpusCount(ev, f)
    if (n <= 0) return
    keep.set(f, ev.counts.get(f) ?? 0)
    const cap = f[0] ? f[0].toUpperCase() + f.slice(1) : f
    if (cap !== f && ev.counts.has(cap)) keep.set(cap, ev.counts.get(cap)!)
  }
  for (const e of inflection.lexicon.entries) {
    if (e.cells) continue
    const p = predictLemma(inflection, e.lemma, e.upos, e.inherent, 8)
    for (const t of p.tables) for (const c of t.cells) for (const f of c.forms) note(f)
    for (const c of p.cells) for (const f of c.forms) note(f.form)
  }
  const forms = [...keep].filter(([, n]) => n > 0).sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0))
  return { weight: ev.weight, cap: ev.cap, absence: ev.absence, tokens, forms }
}

/** Rebuild the evidence from the file's section (claimed forms come from the lexicon again). */
export function decodeCorpus(json: CorpusJson | undefined, lexicon: Lexicon): CorpusEvidence | undefined {
  if (!json) return undefined
  const { weight, cap, absence } = { ...DEFAULT_CORPUS_OPTIONS, ...json }
  return corpusEvidence(new Map(json.forms), lexicon, { weight, cap, absence })
}
