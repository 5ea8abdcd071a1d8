// Paradigm patterns by longest common subsequence (Ahlberg, Forsberg & Hulden 2014), on handbook tables
// written from memory: German umlaut plural, ge-…-t participle, strong-verb ablaut; a Swahili-style prefix
// change (from memory of a grammar handbook: mtu / watu "person / people").
import { describe, expect, it } from 'vitest'
import { alignLemmaForm } from '../../../src/core/inflect/align.ts'
import { applyParadigm, matchAll } from '../../../src/core/inflect/paradigm.ts'
import { extractPattern, showPattern } from '../../../src/core/inflect/pattern.ts'

describe('extractPattern', () => {
  it.each([
    ['Vater', ['Väter', 'Vätern'], 'x1+a+x2', ['x1+ä+x2', 'x1+ä+x2+n']],
    ['aalen', ['geaalt', 'aalte'], 'x1+en', ['ge+x1+t', 'x1+te']],
    ['singen', ['sang', 'gesungen'], 'x1+i+x2+en', ['x1+a+x2', 'ge+x1+u+x2+en']],
    ['mtu', ['watu'], 'x1+m+x2', ['x1+wa+x2']],
  ])('extracts %s', (lemma, forms, lemmaPattern, formPatterns) => {
    const p = extractPattern(lemma, forms)
    expect(showPattern(p.lemma)).toBe(lemmaPattern)
    expect(p.forms.map(showPattern)).toEqual(formPatterns)
  })

  it('aligns contiguously when it can', () => {
    expect(alignLemmaForm('geben', 'gegeben')).toEqual([2, 3, 4, 5, 6])
  })
})

describe('applying a paradigm', () => {
  const vater = extractPattern('Vater', ['Vater', 'Väter'])
  const p = { lemma: vater.lemma, openPrefix: vater.openPrefix, cells: [{ key: 'a', forms: [vater.forms[0]!] }, { key: 'b', forms: [vater.forms[1]!] }] }

  it('umlauts the stem vowel of a new lemma', () => {
    expect(applyParadigm(p, 'Mantel')).toEqual([['Mantel'], ['Mäntel']])
  })

  it('does not apply where the lemma pattern does not fit', () => {
    expect(applyParadigm(p, 'Hund')).toBeNull()
  })

  it('lists every match, greedy first', () => {
    expect(matchAll([0, 'a', 1], false, 'Kanal')).toEqual([
      ['Kan', 'l'],
      ['K', 'nal'],
    ])
  })

  it('lets a prefix-changing pattern fit a compound through its open prefix', () => {
    const mtu = extractPattern('mtu', ['watu'])
    const q = { lemma: mtu.lemma, openPrefix: mtu.openPrefix, cells: [{ key: 'pl', forms: [mtu.forms[0]!] }] }
    expect(applyParadigm(q, 'mtoto')).toEqual([['watoto']])
  })
})
