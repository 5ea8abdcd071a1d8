// Expansion: the full table of a lemma — attested from the dictionary, or predicted with a score per cell.
import { mergeFeats } from '../lexicon/feats.ts'
import { ByEntry } from '../lexicon/entry.ts'
import { corpusCount } from './corpus-evidence.ts'
import type { InflectionModel } from './learn.ts'
import { type PredictedTable, predictLemma } from './predict.ts'

export type FormSource = 'attested' | 'predicted'

/** One form of an expanded table. `feats` is the full analysis FEATS (cell + inherent). */
export interface ExpandedForm {
  form: string
  feats: string
  cell: string
  source: FormSource
  score: number
  /** How often the learning corpus has this form (present only when the model has a corpus). */
  corpus?: number
}

/**
 * A lemma's table. `source` says whether it comes from the dictionary or from the best-ranked paradigm;
 * `score` is the table's probability (1 for attested); `alternatives` are the next best tables on request.
 */
export interface ExpandedTable {
  lemma: string
  upos: string
  inherent: string
  source: FormSource
  paradigm: string | null
  score: number
  forms: ExpandedForm[]
  alternatives: PredictedTable[]
}

export interface ExpandOptions {
  /** How many alternative tables to add (0 = none). */
  alternatives?: number
}

/** Index from (lemma, upos) to lexicon entry position, built once per model. */
const entryIndexCache = new WeakMap<InflectionModel, ByEntry<number>>()

function entryIndex(model: InflectionModel): ByEntry<number> {
  let idx = entryIndexCache.get(model)
  if (!idx) {
    idx = new ByEntry<number>()
    model.lexicon.entries.forEach((e, i) => idx!.set(e.lemma, e.upos, i))
    entryIndexCache.set(model, idx)
  }
  return idx
}

/**
 * Expand one lemma. A lemma with a dictionary table gets it back unchanged; any other lemma gets the table
 * of its best paradigm, each cell scored by the probability of its form over all candidate tables.
 * Returns null when no learned paradigm of that UPOS applies.
 * @example expandLemma(model, 'Mantel', 'NOUN').forms[2] // {form:'Mäntel', cell:'Case=Nom|Number=Plur', source:'predicted', score:0.93, ...}
 */
export function expandLemma(
  model: InflectionModel,
  lemma: string,
  upos: string,
  inherent?: string,
  opts: ExpandOptions = {},
): ExpandedTable | null {
  const at = entryIndex(model).get(lemma, upos)
  const entry = at === undefined ? undefined : model.lexicon.entries[at]
  const inh = inherent && inherent !== '_' ? inherent : (entry?.inherent ?? '_')
  if (entry?.cells) {
    const p = model.book.memberOf[at!]!
    return {
      lemma,
      upos,
      inherent: entry.inherent,
      source: 'attested',
      paradigm: p >= 0 ? model.book.paradigms[p]!.id : null,
      score: 1,
      forms: entry.cells.flatMap((c) =>
        c.forms.map((form) => ({ form, feats: mergeFeats(entry.inherent, c.key), cell: c.key, source: 'attested' as const, score: 1 })),
      ),
      alternatives: [],
    }
  }
  const { tables, cells } = predictLemma(model, lemma, upos, inh, Math.max(8, (opts.alternatives ?? 0) + 1))
  const best = tables[0]
  if (!best) return null
  // Each cell's most probable form; the best table's cell set (a defective paradigm keeps its gaps).
  const have = new Set(best.cells.map((c) => c.key))
  return {
    lemma,
    upos,
    inherent: inh,
    source: 'predicted',
    paradigm: best.paradigm,
    score: best.score,
    forms: cells
      .filter((c) => have.has(c.key) && c.forms[0])
      .map((c) => {
        const form = c.forms[0]!.form
        const f: ExpandedForm = { form, feats: mergeFeats(inh, c.key), cell: c.key, source: 'predicted', score: c.forms[0]!.score }
        if (model.corpus) f.corpus = corpusCount(model.corpus, form)
        return f
      }),
    alternatives: opts.alternatives ? tables.slice(1, 1 + opts.alternatives) : [],
  }
}
