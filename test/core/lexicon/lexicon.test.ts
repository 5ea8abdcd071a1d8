// Lexicon building: inherent features, cells, defective tables and conflicts.
import { describe, expect, it } from 'vitest'
import { rowsToEntries } from '../../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'

// German noun tables, from memory of a grammar handbook (Tag: strong masculine; Milch: no plural).
const rows = [
  ['Tag', 'Tag', 'Case=Nom|Gender=Masc|Number=Sing'],
  ['Tag', 'Tages', 'Case=Gen|Gender=Masc|Number=Sing'],
  ['Tag', 'Tage', 'Case=Nom|Gender=Masc|Number=Plur'],
  ['Tag', 'Tagen', 'Case=Dat|Gender=Masc|Number=Plur'],
  ['Milch', 'Milch', 'Case=Nom|Gender=Fem|Number=Sing'],
  ['Milch', 'Milch', 'Case=Gen|Gender=Fem|Number=Sing'],
].map(([lemma, form, feats]) => ({ lemma: lemma!, form: form!, upos: 'NOUN', feats: feats! }))

describe('buildLexicon', () => {
  const lex = buildLexicon(rowsToEntries(rows))

  it('orders entries by lemma and cells by FEATS, whatever the input order', () => {
    expect(lex.entries.map((e) => e.lemma)).toEqual(['Milch', 'Tag'])
    expect(buildLexicon(rowsToEntries([...rows].reverse()))).toEqual(lex)
  })

  it('finds inherent features constant over a table', () => {
    expect(lex.entries[1]!.inherent).toBe('Gender=Masc')
    expect(lex.entries[1]!.cells!.map((c) => c.key)).toEqual([
      'Case=Dat|Number=Plur',
      'Case=Gen|Number=Sing',
      'Case=Nom|Number=Plur',
      'Case=Nom|Number=Sing',
    ])
  })

  it('keeps Number in the cells of a noun with no plural', () => {
    expect(lex.entries[0]!.inherent).toBe('Gender=Fem')
    expect(lex.entries[0]!.cells!.map((c) => c.key)).toEqual(['Case=Gen|Number=Sing', 'Case=Nom|Number=Sing'])
    expect(lex.inflectional.NOUN).toEqual(['Case', 'Number'])
  })

  it('keeps a lemma-only entry as such', () => {
    const l = buildLexicon([{ lemma: 'Hund', upos: 'NOUN', feats: 'Gender=Masc' }])
    expect(l.entries).toEqual([{ lemma: 'Hund', upos: 'NOUN', inherent: 'Gender=Masc', cells: null }])
  })

  it('reports two different tables for one lemma and keeps both as variants', () => {
    const a = { lemma: 'x', upos: 'NOUN', feats: '_', forms: [{ form: 'xa', feats: 'Number=Plur' }], line: 1 }
    const b = { lemma: 'x', upos: 'NOUN', feats: '_', forms: [{ form: 'xb', feats: 'Number=Plur' }], line: 2 }
    const l = buildLexicon([a, b])
    expect(l.problems.map((p) => p.code)).toEqual(['conflict'])
    expect(l.entries[0]!.cells![0]!.forms).toEqual(['xa', 'xb'])
  })
})
