// Paradigm book: tables with one shape merge; a table with gaps joins the paradigm that reproduces it.
// German weak verbs, from memory of a grammar handbook (machen, sagen, lachen; "kosten" cut to two cells).
import { describe, expect, it } from 'vitest'
import { rowsToEntries } from '../../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'
import { extractParadigms } from '../../../src/core/inflect/extract.ts'
import { expandLemma } from '../../../src/core/inflect/expand.ts'
import { learnInflection } from '../../../src/core/inflect/learn.ts'

const CELLS = ['VerbForm=Inf', 'Mood=Ind|Number=Sing|Person=1|Tense=Pres|VerbForm=Fin', 'Tense=Past|VerbForm=Part']
const weak = (stem: string) => [`${stem}en`, `${stem}e`, `ge${stem}t`]
const table = (lemma: string, forms: string[]) =>
  forms.map((form, i) => ({ lemma, form, upos: 'VERB', feats: CELLS[i]! }))

const rows = [
  ...table('machen', weak('mach')),
  ...table('sagen', weak('sag')),
  ...table('lachen', weak('lach')),
  ...table('legen', weak('leg')).slice(0, 2),
]

describe('extractParadigms', () => {
  const lex = buildLexicon(rowsToEntries(rows))
  const book = extractParadigms(lex)

  it('merges tables with the same shape, and a table with a gap joins them', () => {
    expect(book.paradigms).toHaveLength(1)
    expect(book.paradigms[0]!.members).toBe(4)
    expect(book.memberOf).toEqual([0, 0, 0, 0])
  })

  it('predicts the table of a new lemma of the class', () => {
    const model = learnInflection(rowsToEntries(rows))
    const t = expandLemma(model, 'kochen', 'VERB')!
    expect(t.source).toBe('predicted')
    expect(t.forms.map((f) => [f.cell, f.form])).toEqual([
      [CELLS[1], 'koche'],
      [CELLS[2], 'gekocht'],
      [CELLS[0], 'kochen'],
    ])
  })

  it('gives an attested table back unchanged', () => {
    const model = learnInflection(rowsToEntries(rows))
    const t = expandLemma(model, 'legen', 'VERB')!
    expect(t.source).toBe('attested')
    expect(t.forms.map((f) => f.form)).toEqual(['lege', 'legen'])
  })
})
