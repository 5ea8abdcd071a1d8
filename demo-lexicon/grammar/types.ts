// Shapes of the Sulvašti grammar data: word classes, root shapes and exceptional tables.

/** Harmony of a word: suffix vowels A and O become a/o (back) or ä/ö (front). */
export type Harmony = 'back' | 'front'

/** Which property of a generated lemma its class must show in the tables (so it can be learned). */
export type Stratum = 'harmony' | 'grade' | 'final' | 'vowel'

/**
 * How roots of a class are built.
 * - `cluster`: (C)V(MV)K — ends in a consonant cluster K; endings start with a vowel.
 * - `vstem`: (C)VKV — ends in a vowel after the cluster K.
 * - `cfinal`: (C)V(MV)F — ends in one of `finals`; `notBefore` bans vowels before that final.
 * - `long`: CVV — one syllable with a long vowel.
 */
export type RootShape =
  | { kind: 'cluster' }
  | { kind: 'vstem' }
  | { kind: 'cfinal'; finals: readonly string[]; notBefore?: readonly string[] }
  | { kind: 'long' }

/**
 * An inflection class. `endings` line up with the part of speech's cell list.
 * An ending is `suffix`, or `prefix-suffix`; `*` at the start of the suffix uses the short stem;
 * `A`/`O` follow vowel harmony; `T` is t assimilated to a stem-final l, n or r.
 */
export interface WordClass {
  id: string
  upos: 'NOUN' | 'VERB' | 'ADJ'
  name: string
  gender?: 'Masc' | 'Fem' | 'Neut'
  root: RootShape
  /** Consonant gradation of the root's last cluster in closed syllables. */
  gradation: boolean
  strata: readonly Stratum[]
  endings: readonly string[]
  /** How many generated lemmas get full tables, and how many are listed bare. */
  tables: number
  bare: number
}

/** A lemma of a regular class with a fixed root and an English gloss. */
export interface CoreLemma {
  classId: string
  root: string
  gloss: string
}

/** A table that departs from its class: overridden cells, dropped cells, or fully listed. */
export interface ExceptionalTable {
  lemma: string
  upos: string
  gloss: string
  kind: 'irregular' | 'defective'
  /** Inherent features (e.g. `Gender=Neut`), `_` for none. */
  inherent: string
  /** Start from this class and root... */
  classId?: string
  root?: string
  /** ...then replace these cells (by cell FEATS without inherent features)... */
  overrides?: Readonly<Record<string, string>>
  /** ...and drop every cell that has all features of one of these lists. */
  drop?: readonly (readonly string[])[]
  /** Or list every cell outright. */
  forms?: readonly (readonly [string, string])[]
  why: string
}

/** An extra form for a cell of a core lemma (a second row for that cell). */
export interface VariantForm {
  lemma: string
  feats: string
  form: string
}

/** An uninflected or closed-class table written out in full. */
export interface ClosedTable {
  lemma: string
  upos: string
  gloss: string
  inherent: string
  forms: readonly (readonly [string, string])[]
  /** For adpositions: the case it governs. */
  governs?: string
}

/** A place name: inflects like a noun class (from its capitalized root) but is listed in no dictionary file. */
export interface PlaceName {
  root: string
  classId: string
}
