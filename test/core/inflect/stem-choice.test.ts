// Prefix-stem patterns and the choice between stem kinds. Finnish -ata verbs with a doubled consonant
// (lautata / lauttaa / lautattiin, mitata / mittaa / mitattiin) are from memory of a grammar handbook;
// German weak verbs (machen, sagen) likewise; mtu / watu from memory of a Swahili grammar handbook.
import { describe, expect, it } from 'vitest'
import { extractParadigms } from '../../../src/core/inflect/extract.ts'
import { DEFAULT_LEARN_OPTIONS, learnFromLexicon } from '../../../src/core/inflect/learn.ts'
import { prefixPattern, showPattern } from '../../../src/core/inflect/pattern.ts'
import { chooseStemKind, STEM_KINDS } from '../../../src/core/inflect/stem-choice.ts'
import { rowsToEntries } from '../../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'

const FI = [
  'InfForm=1|VerbForm=Inf',
  'Mood=Ind|Number=Sing|Person=3|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Tense=Past|VerbForm=Fin|Voice=Pass',
]
const rows = (cells: string[], tables: string[][]) =>
  tables.flatMap((forms) =>
    forms.map((form, i) => ({ lemma: forms[0]!, form, upos: 'VERB', feats: cells[i]! })),
  )

describe('prefixPattern', () => {
  it('keeps the shared prefix as the stem and puts the doubled consonant in the endings', () => {
    const p = prefixPattern('lautata', ['lautata', 'lauttaa', 'lautattiin'])!
    expect(showPattern(p.lemma)).toBe('x1+ata')
    expect(p.forms.map(showPattern)).toEqual(['x1+ata', 'x1+taa', 'x1+attiin'])
    expect(p.stems).toEqual(['laut'])
  })

  it('is null when a form shares no first letter with the lemma', () => {
    expect(prefixPattern('mtu', ['watu'])).toBeNull()
  })
})

describe('extractParadigms with prefix stems', () => {
  const fi = buildLexicon(
    rowsToEntries(
      rows(FI, [
        ['lautata', 'lauttaa', 'lautattiin'],
        ['mitata', 'mittaa', 'mitattiin'],
      ]),
    ),
  )

  it('gives both doubled-t verbs one paradigm', () => {
    const book = extractParadigms(fi, 'prefix')
    expect(book.paradigms).toHaveLength(1)
    expect(book.paradigms[0]!.members).toBe(2)
  })
})

describe('chooseStemKind', () => {
  const DE = [
    'VerbForm=Inf',
    'Mood=Ind|Number=Sing|Person=1|Tense=Pres|VerbForm=Fin',
    'Tense=Past|VerbForm=Part',
  ]
  const weak = (s: string) => [`${s}en`, `${s}e`, `ge${s}t`]
  const de = buildLexicon(rowsToEntries(rows(DE, ['mach', 'sag', 'lach', 'koch'].map(weak))))

  it('learns on each half with each kind, and keeps lcs on a tie', () => {
    const calls: string[] = []
    const kind = chooseStemKind(
      de,
      (lex, k) => {
        calls.push(`${k}:${lex.entries.length}`)
        return learnFromLexicon(lex, { ...DEFAULT_LEARN_OPTIONS, stems: k })
      },
      400,
    )
    // ge-…-t participles share no first letter with the lemma: both kinds give the same book.
    expect(kind).toBe('lcs')
    expect(calls).toEqual(['lcs:2', 'lcs:2', 'prefix:2', 'prefix:2'])
    expect(STEM_KINDS).toContain(kind)
  })
})
