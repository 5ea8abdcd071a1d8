// The form index contract: form → the analyses the dictionary licenses, whole in memory or split in shards.

/** Where an indexed analysis comes from: a dictionary table, or a paradigm the model assigned to a bare lemma. */
export type IndexSource = 'attested' | 'predicted'

/**
 * One analysis of an indexed form. `feats` is the full bundle (inherent + cell), canonical.
 * `score` is 1 for attested forms; for predicted ones, the probability that the lemma's table has this
 * form in this cell. `paradigm` is the paradigm id (null for an attested table no paradigm reproduces).
 * @example { lemma: 'Tag', upos: 'NOUN', feats: 'Case=Dat|Number=Plur', source: 'attested', score: 1, paradigm: 'NOUN-1' }
 */
export interface IndexedAnalysis {
  lemma: string
  upos: string
  feats: string
  source: IndexSource
  score: number
  paradigm: string | null
}

/**
 * What every form index offers (the whole in-memory index and a sharded one implement the same contract and
 * pass the same test suite). Lookups are synchronous so that analysis stays a few hash steps; an index
 * whose parts live elsewhere makes the parts a set of keys needs resident in `load`, and answers `get`
 * only for keys it has loaded (asking for others throws).
 * @example
 * await index.load(['Tage'])
 * index.get('Tage')?.map((a) => a.feats) // ['Case=Nom|Number=Plur', 'Case=Gen|Number=Plur', ...]
 */
export interface FormIndex {
  /** Distinct forms indexed. */
  readonly formCount: number
  /** (form, analysis) pairs indexed. */
  readonly analysisCount: number
  /** The analyses of exactly this (NFC) string in answer order (see `compareCandidates`), or undefined; shared, frozen. */
  get(form: string): readonly IndexedAnalysis[] | undefined
  /** Indexed forms whose diacritic-folded spelling (see `foldDiacritics`) is `folded`. */
  folded(folded: string): readonly string[]
  /**
   * Make `get` and `folded` answer for these keys (plain forms or folded keys; for a folded key, also `get`
   * of the forms it names). A whole index resolves at once; `get` of a key not loaded throws.
   */
  load(keys: Iterable<string>): Promise<void>
  /**
   * An index for one unit of work (a request, a batch): the whole index is its own session; a sharded one
   * gives a fresh view that holds the shards it loads until it is dropped.
   */
  session(): FormIndex
  /**
   * Every indexed form, in index order (for constraint files over the whole lexicon). A sharded index lists
   * them only once every shard is loaded; iterate `formGroups` there.
   */
  forms(): Iterable<string>
  /** Every indexed form, in groups that each sit in one part of the index (whole: one group). */
  formGroups(): AsyncIterable<readonly string[]>
}
