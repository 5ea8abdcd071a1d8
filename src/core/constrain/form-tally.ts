// Corpus counts per form type (never per token), so a corpus of any length is counted in bounded memory.
import { ownCopy } from '../lexicon/own-copy.ts'
import { type ConstrainToken, goldKey } from './constrain-token.ts'

/** What is kept about one form type. */
export interface FormStats {
  /** Tokens of this form. */
  count: number
  /** Of which sentence-initial. */
  initial: number
  /** Gold key (UPOS joined with `+`) → tokens; absent when no token of the form had gold tags. */
  gold?: Map<string, number>
}

/**
 * Counts of every form type of a corpus. Memory grows with the number of distinct forms and of distinct
 * gold tags per form, not with the number of tokens.
 * @example
 * const tally = new FormTally()
 * tally.add({ form: 'vessa', sentenceInitial: true })
 * tally.get('vessa') // { count: 1, initial: 1 }
 */
export class FormTally {
  readonly #forms = new Map<string, FormStats>()
  #tokens = 0
  #goldTokens = 0

  /** Count one token. */
  add(token: ConstrainToken): void {
    this.#tokens++
    let stats = this.#forms.get(token.form)
    if (!stats) {
      stats = { count: 0, initial: 0 }
      this.#forms.set(ownCopy(token.form), stats)
    }
    stats.count++
    if (token.sentenceInitial) stats.initial++
    const key = goldKey(token.gold)
    if (key === '') return
    this.#goldTokens++
    stats.gold ??= new Map()
    stats.gold.set(key, (stats.gold.get(key) ?? 0) + 1)
  }

  /** Tokens counted. */
  get tokens(): number {
    return this.#tokens
  }

  /** Tokens that carried gold tags. */
  get goldTokens(): number {
    return this.#goldTokens
  }

  /** Distinct forms counted. */
  get types(): number {
    return this.#forms.size
  }

  get(form: string): FormStats | undefined {
    return this.#forms.get(form)
  }

  /**
   * Forms with their counts, most frequent first (ties by code point order, so output is reproducible).
   * @example tally.byFrequency()[0] // ['the', { count: 69971, initial: 0 }]
   */
  byFrequency(): [string, FormStats][] {
    return [...this.#forms].sort(
      (a, b) => b[1].count - a[1].count || (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0),
    )
  }
}
