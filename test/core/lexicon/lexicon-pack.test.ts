// Packed entries (what a learning thread receives) unpack to the entries given, in order, for any strings.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import type { LexEntry } from '../../../src/core/lexicon/lexicon.ts'
import { packEntries, unpackEntries } from '../../../src/core/lexicon/lexicon-pack.ts'

const cell = fc.record({
  key: fc.string(),
  forms: fc.array(fc.string({ unit: 'grapheme' }), { maxLength: 3 }),
})
const entry: fc.Arbitrary<LexEntry> = fc.record({
  lemma: fc.string({ unit: 'grapheme' }),
  upos: fc.constantFrom('NOUN', 'VERB', 'ADJ'),
  inherent: fc.constantFrom('_', 'Gender=Fem', 'Gender=Masc,Neut'),
  cells: fc.option(fc.array(cell, { maxLength: 4 }), { nil: null }),
})

describe('packed lexicon entries', () => {
  it('unpack to the same entries (empty strings, lemma-only entries and variants included)', () => {
    fc.assert(
      fc.property(fc.array(entry, { maxLength: 20 }), (entries) => {
        expect(unpackEntries(packEntries(entries))).toEqual(entries)
      }),
    )
  })

  it('keep a real table as it is', () => {
    const table: LexEntry = {
      lemma: 'Mantel',
      upos: 'NOUN',
      inherent: 'Gender=Masc',
      cells: [
        { key: 'Case=Nom|Number=Sing', forms: ['Mantel'] },
        { key: 'Case=Dat|Number=Plur', forms: ['Mänteln'] },
      ],
    }
    expect(unpackEntries(packEntries([table, { ...table, lemma: 'Tag', cells: null }]))).toEqual([
      table,
      { ...table, lemma: 'Tag', cells: null },
    ])
  })
})
