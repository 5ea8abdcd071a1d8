// Raw text as evidence between candidate tables: a candidate whose distinctive forms the corpus attests
// gains over one whose forms it never shows. Using unlabeled text to choose among predicted paradigms
// follows Ahlberg, Forsberg & Hulden (2014), EACL, and the corpus counts of Durrett & DeNero (2013), NAACL.
import type { Lexicon } from '../lexicon/lexicon.ts'

/** Form counts of a corpus, with what the reranker needs to use them safely. */
export interface CorpusEvidence {
  /** Corpus form → count (exact spelling). */
  counts: Map<string, number>
  /** Forms that dictionary tables already give: attested as another lemma, they are no evidence. */
  claimed: Set<string>
  /** How strongly evidence moves a table: scores are multiplied by exp(weight × evidence). */
  weight: number
  /** The most a single form can contribute (damps frequent function-word homographs). */
  cap: number
  /** What a distinctive form the corpus lacks costs, once the corpus shows the lemma at all. */
  absence: number
}

export interface CorpusOptions {
  weight: number
  cap: number
  absence: number
}

/** Chosen on the DDN13 German dev simulation (see bench/corpus.ts). */
export const DEFAULT_CORPUS_OPTIONS: CorpusOptions = { weight: 8, cap: 2, absence: 0.3 }

/**
 * Build the evidence from form counts and the lexicon whose tables claim their forms.
 * @example corpusEvidence(new Map([['Fenstern', 3]]), lexicon).counts.get('Fenstern') // 3
 */
export function corpusEvidence(
  counts: Map<string, number>,
  lexicon: Lexicon,
  opts: CorpusOptions = DEFAULT_CORPUS_OPTIONS,
): CorpusEvidence {
  const claimed = new Set<string>()
  for (const e of lexicon.entries) for (const c of e.cells ?? []) for (const f of c.forms) claimed.add(f)
  return { counts, claimed, weight: opts.weight, cap: opts.cap, absence: opts.absence }
}

/** How often the corpus has a form (its capitalized spelling counts too: sentence-initial tokens). */
export function corpusCount(ev: CorpusEvidence, form: string): number {
  const exact = ev.counts.get(form) ?? 0
  const first = form[0]
  if (!first || first.toUpperCase() === first) return exact
  return exact + (ev.counts.get(first.toUpperCase() + form.slice(1)) ?? 0)
}

/** What one attested form is worth: 1 for one occurrence, growing slowly, capped. */
export function formEvidence(ev: CorpusEvidence, form: string): number {
  if (ev.claimed.has(form)) return 0
  const n = corpusCount(ev, form)
  return n > 0 ? Math.min(1 + Math.log10(n), ev.cap) : 0
}

/** A candidate table as the reranker sees it: its score and each cell's form (same cell order). */
export interface RerankItem {
  score: number
  cells: { key: string; form: string }[]
}

/**
 * Rescore candidate tables by corpus evidence, form by form: a table gains for each of its forms the corpus
 * attests and loses a little for each it lacks (once the corpus shows the lemma at all). Only telling forms
 * count — a form every candidate has says nothing — and each distinct form counts once per table, however
 * many cells it fills (a syncretic table must not gain from the lemma's own citation form). Forms in
 * `neutral` (already explained by other cells) count neither way. Never adds a candidate. Returns the new
 * scores (summing to 1) and each table's evidence.
 * @example rerankByCorpus(ev, [{score:.6, cells:[{key:'Pl', form:'Fenstere'}]}, {score:.4, cells:[{key:'Pl', form:'Fenstern'}]}]).scores // [0.0, 1.0]
 */
export function rerankByCorpus(
  ev: CorpusEvidence,
  items: RerankItem[],
  neutral: ReadonlySet<string> = new Set(),
): { scores: number[]; evidence: number[] } {
  const sets = items.map((t) => new Set(t.cells.map((c) => c.form).filter((f) => f && !neutral.has(f))))
  const everywhere = new Set([...(sets[0] ?? [])].filter((f) => sets.every((s) => s.has(f))))
  const cache = new Map<string, number>()
  const worth = (f: string) => cache.get(f) ?? cache.set(f, formEvidence(ev, f)).get(f)!
  let seen = false
  for (const s of sets) for (const f of s) if (worth(f) > 0) seen = true
  const evidence = sets.map((s) => {
    let e = 0
    for (const f of s) {
      if (everywhere.has(f)) continue
      const x = worth(f)
      e += x > 0 ? x : seen && !ev.claimed.has(f) ? -ev.absence : 0
    }
    return e
  })
  const raw = items.map((t, i) => Math.log(Math.max(t.score, 1e-300)) + ev.weight * evidence[i]!)
  const max = Math.max(...raw)
  const e = raw.map((x) => Math.exp(x - max))
  const z = e.reduce((a, b) => a + b, 0)
  return { scores: e.map((x) => x / z), evidence }
}
