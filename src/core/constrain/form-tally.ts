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
 * gold tags per form, not with the number of tokens: a type is a map entry, its form, and two counts in
 * typed arrays (a million types of running text are a few tens of megabytes).
 * @example
 * const tally = new FormTally()
 * tally.add({ form: 'vessa', sentenceInitial: true })
 * tally.get('vessa') // { count: 1, initial: 1 }
 */
export class FormTally {
  /** Form → its type number (in order of first occurrence). */
  readonly #ids = new Map<string, number>()
  readonly #forms: string[] = []
  #count = new Int32Array(1024)
  #initial = new Int32Array(1024)
  /** Type number → gold key → tokens, for the types some token of which had gold tags. */
  readonly #gold = new Map<number, Map<string, number>>()
  #tokens = 0
  #goldTokens = 0

  /** Count one token. */
  add(token: ConstrainToken): void {
    this.#tokens++
    let id = this.#ids.get(token.form)
    if (id === undefined) {
      id = this.#forms.length
      const form = ownCopy(token.form)
      this.#ids.set(form, id)
      this.#forms.push(form)
      if (id === this.#count.length) this.#grow()
    }
    this.#count[id]!++
    if (token.sentenceInitial) this.#initial[id]!++
    const key = goldKey(token.gold)
    if (key === '') return
    this.#goldTokens++
    let gold = this.#gold.get(id)
    if (!gold) {
      gold = new Map()
      this.#gold.set(id, gold)
    }
    gold.set(key, (gold.get(key) ?? 0) + 1)
  }

  #grow(): void {
    const count = new Int32Array(this.#count.length * 2)
    count.set(this.#count)
    this.#count = count
    const initial = new Int32Array(this.#initial.length * 2)
    initial.set(this.#initial)
    this.#initial = initial
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
    return this.#forms.length
  }

  get(form: string): FormStats | undefined {
    const id = this.#ids.get(form)
    return id === undefined ? undefined : this.#stats(id)
  }

  #stats(id: number): FormStats {
    const stats: FormStats = { count: this.#count[id]!, initial: this.#initial[id]! }
    const gold = this.#gold.get(id)
    if (gold) stats.gold = gold
    return stats
  }

  /**
   * Forms with their counts, most frequent first (ties by code point order, so output is reproducible);
   * only the order is held while iterating (four bytes a type), each pair is made as it is reached.
   * @example [...tally.byFrequency()][0] // ['the', { count: 69971, initial: 0 }]
   */
  *byFrequency(): Generator<[string, FormStats]> {
    const forms = this.#forms
    const count = this.#count
    const order = new Int32Array(forms.length)
    for (let i = 0; i < order.length; i++) order[i] = i
    order.sort((a, b) => count[b]! - count[a]! || (forms[a]! < forms[b]! ? -1 : forms[a]! > forms[b]! ? 1 : 0))
    for (const id of order) yield [forms[id]!, this.#stats(id)]
  }
}
