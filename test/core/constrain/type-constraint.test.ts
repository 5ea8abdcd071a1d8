// Type constraints of single forms: contexts, merging of repeated analyses, options, levels.
import { describe, expect, it } from 'vitest'
import { type ConstrainOptions, constrainForm, formatAllowed } from '../../../src/core/constrain/index.ts'
import { fakeAnalyzer } from './fake-analyzer.ts'

const plain = { plain: true, initial: false }
const upos: ConstrainOptions = { level: 'upos' }

describe('constrainForm', () => {
  it.each([
    ['an attested pronoun', 'surit', plain, upos, 'attested', ['PRON']],
    ['a predicted verb form', 'volivat', plain, upos, 'predicted', ['VERB']],
    ['a form with predicted and guessed analyses', 'kūmele', plain, upos, 'predicted', ['ADJ', 'NOUN']],
    ['an unknown form, explicitly unconstrained', 'zzq', plain, upos, 'none', null],
    [
      'a capital met only sentence-initially',
      'Surit',
      { plain: false, initial: true },
      upos,
      'attested',
      ['PRON'],
    ],
    ['a capital met only inside sentences', 'Surit', plain, upos, 'none', null],
    [
      'guesses below the score floor dropped',
      'hatti',
      plain,
      { level: 'upos', minScore: 0.5 },
      'attested',
      ['NOUN'],
    ],
    ['no guesses for punctuation', '?', plain, upos, 'none', null],
    ['no guesses for digits', '12', plain, upos, 'none', null],
    ['best source only', 'kūmele', plain, { level: 'upos', bestSourceOnly: true }, 'predicted', ['ADJ']],
    [
      'guesses not allowed to constrain',
      'Velmora',
      plain,
      { level: 'upos', sources: ['attested'] },
      'none',
      null,
    ],
  ] as const)('%s', (_name, form, contexts, options, source, allowed) => {
    const row = constrainForm(fakeAnalyzer, form, contexts, options, 7)
    expect(row.source).toBe(source)
    expect(row.allowed).toEqual(allowed)
    expect(row.count).toBe(7)
  })

  it('unions the analyses of both contexts when a form occurs in both', () => {
    const row = constrainForm(fakeAnalyzer, 'Surit', { plain: true, initial: true }, upos, 2)
    expect(row.allowed).toEqual(['PRON'])
  })

  it('keeps one analysis per (lemma, UPOS, FEATS), with its best source and score', () => {
    const row = constrainForm(fakeAnalyzer, 'kūmele', plain, upos, 1)
    expect(row.analyses).toEqual([
      {
        lemma: 'kūme',
        upos: 'ADJ',
        feats: 'Case=Dat|Degree=Pos|Number=Sing',
        source: 'predicted',
        score: 0.8,
      },
      { lemma: 'kūmel', upos: 'NOUN', feats: 'Case=Nom|Number=Sing', source: 'guessed', score: 0.3 },
    ])
  })

  it('writes UPOS|FEATS tags at the full level', () => {
    const row = constrainForm(fakeAnalyzer, 'hatti', plain, { level: 'full' }, 1)
    expect(row.allowed).toEqual(['NOUN|Case=Nom|Number=Sing', 'VERB|VerbForm=Inf'])
    expect(formatAllowed(row.allowed, 'full')).toBe('NOUN|Case=Nom|Number=Sing;VERB|VerbForm=Inf')
  })

  it('never lets the score floor drop an attested analysis', () => {
    const row = constrainForm(fakeAnalyzer, 'ašti', plain, { level: 'upos', minScore: 1.5 }, 1)
    expect(row.allowed).toEqual(['ADP'])
  })
})
