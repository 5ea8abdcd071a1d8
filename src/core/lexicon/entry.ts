// Dictionary entries: what readers produce (lemma, UPOS, inherent FEATS, optional table of forms), and their identity.

/** One form of a table with the full FEATS bundle of its cell (canonical). */
export interface FormRow {
  form: string
  feats: string
}

/**
 * A dictionary entry. `forms` absent means a lemma-only entry (the dictionary lists the word, not its table).
 * @example { lemma: 'Aal', upos: 'NOUN', feats: '_', forms: [{ form: 'Aale', feats: 'Case=Nom|Number=Plur' }] }
 */
export interface Entry {
  lemma: string
  upos: string
  /** Inherent features given by the source (canonical, `_` for none). */
  feats: string
  forms?: FormRow[]
  /** Where the entry came from, for messages. */
  file?: string
  line?: number
}

/** One row of the table-rows format: `lemma<TAB>form<TAB>upos<TAB>feats`. */
export interface TableRow {
  lemma: string
  form: string
  upos: string
  feats: string
  file?: string
  line?: number
}

/** Identity of a lexicon entry: the same lemma string under two UPOS tags is two entries. */
export function entryKey(lemma: string, upos: string): string {
  return `${lemma}\t${upos}`
}

/**
 * Values by (lemma, UPOS), a map of lemmas per UPOS: the keys are the entries' own lemma strings, where
 * one map keyed by "lemma\tUPOS" would make a string per entry.
 * @example const m = new ByEntry<number>(); m.set('Mantel', 'NOUN', 7); m.get('Mantel', 'NOUN') // 7
 */
export class ByEntry<V> {
  private readonly byUpos = new Map<string, Map<string, V>>()

  get(lemma: string, upos: string): V | undefined {
    return this.byUpos.get(upos)?.get(lemma)
  }

  has(lemma: string, upos: string): boolean {
    return this.byUpos.get(upos)?.has(lemma) ?? false
  }

  set(lemma: string, upos: string, value: V): void {
    let m = this.byUpos.get(upos)
    if (!m) this.byUpos.set(upos, (m = new Map()))
    m.set(lemma, value)
  }
}

/**
 * Group table rows into entries, one per (lemma, upos), in order of first appearance.
 * @example rowsToEntries([{lemma:'a',form:'ab',upos:'NOUN',feats:'Number=Plur'}]).length // 1
 */
export function rowsToEntries(rows: Iterable<TableRow>): Entry[] {
  const byKey = new Map<string, Entry>()
  for (const row of rows) {
    const key = entryKey(row.lemma, row.upos)
    let entry = byKey.get(key)
    if (!entry) {
      entry = { lemma: row.lemma, upos: row.upos, feats: '_', forms: [], file: row.file, line: row.line }
      byKey.set(key, entry)
    }
    entry.forms!.push({ form: row.form, feats: row.feats })
  }
  return [...byKey.values()]
}
