// Corpus tokens as constraint building sees them, with the gold UPOS a CoNLL-U corpus gives.

/** A corpus token as constraint building sees it; `gold` holds the UPOS of its syntactic words, if known. */
export interface ConstrainToken {
  form: string
  sentenceInitial: boolean
  /** Gold UPOS of the token's words (one for a plain word, several for a multi-word token). */
  gold?: readonly string[]
}

/** Joins the gold UPOS of a multi-word token's words into one key. */
export const GOLD_JOIN = '+'

/**
 * The gold key of a token: its words' UPOS joined with `+`, or `''` when any word lacks a gold tag (`_`).
 * @example goldKey(['ADP', 'DET']) // 'ADP+DET'
 */
export function goldKey(gold: readonly string[] | undefined): string {
  if (!gold || gold.length === 0 || gold.some((tag) => tag === '_' || tag === '')) return ''
  return gold.join(GOLD_JOIN)
}

/** The parts of a CoNLL-U sentence used here (structurally what the CoNLL-U reader yields). */
export interface SentenceLike {
  surface: readonly { form: string; sentenceInitial: boolean }[]
  words: readonly { upos: string; token: number }[]
}

/**
 * One token per surface token (a multi-word token once, by its FORM), with the gold UPOS of its words in
 * order. Empty nodes are not surface tokens and never appear.
 * @example
 * sentenceTokens({ surface: [{ form: 'del', sentenceInitial: true }], words: [{ upos: 'ADP', token: 0 }, { upos: 'DET', token: 0 }] })
 * // [{ form: 'del', sentenceInitial: true, gold: ['ADP', 'DET'] }]
 */
export function sentenceTokens(sentence: SentenceLike): ConstrainToken[] {
  const gold: string[][] = sentence.surface.map(() => [])
  for (const word of sentence.words) gold[word.token]?.push(word.upos)
  return sentence.surface.map((token, i) => ({
    form: token.form,
    sentenceInitial: token.sentenceInitial,
    gold: gold[i]!,
  }))
}
