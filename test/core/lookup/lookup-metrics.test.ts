// The lookup figures of the evaluation protocol on held-out German handbook nouns (tables from memory).
import { describe, expect, it } from 'vitest'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'
import { lookupMetrics } from '../../../src/core/lookup/lookup-metrics.ts'
import { germanTables } from './fixtures/german.ts'

// Feminine -e nouns with plural -n (Katze, Lampe) held out; Blume and Straße of the same class stay in training.
const heldOut = new Set(['Katze', 'Lampe'])
const train = germanTables.filter((e) => !heldOut.has(e.lemma))
const test = buildLexicon(germanTables.filter((e) => heldOut.has(e.lemma)))

describe('lookupMetrics', () => {
  const m = lookupMetrics(train, test)

  it('counts the syncretism of the test tables: 4 forms, 16 gold analyses', () => {
    // Katze: Katze in the four singular cells, Katzen in the four plural ones; the same for Lampe.
    expect(m.goldMeanAnalyses).toBe(4)
  })

  it('finds every analysis of a regular class once its lemmas are listed, and nothing else', () => {
    expect(m.listedRecall).toBe(1)
    expect(m.listedPrecision).toBe(1)
  })

  it('finds them from the forms alone too (besides readings as sentence-initial verbs)', () => {
    expect(m.unseenRecall).toBe(1)
    expect(m.unseenMeanCandidates).toBeGreaterThan(m.goldMeanAnalyses)
  })

  it('learns from the training tables only: bare lemmas of TRAIN are not listed', () => {
    const withBare = lookupMetrics([...train, { lemma: 'Katze', upos: 'NOUN', feats: '_' }], test)
    expect(withBare).toEqual(m)
  })
})
