// Normalization: the spellings a token is looked up under, tier by tier (Unicode NFC per UAX #15).
import { describe, expect, it } from 'vitest'
import { foldDiacritics, lookupKeys, lookupTiers, titleCase } from '../../../src/core/lookup/normalize.ts'

const keys = (token: string, fold = false) =>
  lookupTiers(token, { foldDiacritics: fold }).map((t) => t.map((k) => `${k.how}:${k.key}`))

describe('lookupTiers', () => {
  it.each([
    ['tage', [['exact:tage'], ['titlecase:Tage']]],
    ['Tage', [['exact:Tage', 'lowercase:tage']]],
    ['TAGE', [['exact:TAGE', 'lowercase:tage', 'titlecase:Tage']]],
    ['l’homme', [['exact:l’homme'], ['titlecase:L’homme'], ["quotes:l'homme"]]],
    ["l'homme", [["exact:l'homme"], ["titlecase:L'homme"], ['quotes:l’homme']]],
    [
      '„Haus“',
      [
        ['exact:„Haus“', 'lowercase:„haus“'],
        ['quotes:Haus', 'quotes+lowercase:haus'],
      ],
    ],
    ['42', [['exact:42']]],
  ])('%s', (token, expected) => {
    expect(keys(token)).toEqual(expected)
  })

  it('says nfc when the token was not in NFC', () => {
    expect(keys('Ma\u0308ntel')[0]).toEqual(['nfc:Mäntel', 'lowercase:mäntel'])
  })

  it('folds diacritics only when asked, in a tier of its own', () => {
    expect(
      keys('Mäntel')
        .flat()
        .some((k) => k.startsWith('folded')),
    ).toBe(false)
    expect(keys('Mäntel', true).at(-1)).toEqual(['folded:Mantel', 'folded+lowercase:mantel'])
  })
})

describe('helpers', () => {
  it.each([
    ['Mäntel', 'Mantel'],
    ['crème brûlée', 'creme brulee'],
    ['Straße', 'Straße'],
  ])('foldDiacritics(%s) is %s', (text, folded) => {
    expect(foldDiacritics(text)).toBe(folded)
  })

  it.each([
    ['HAUS', 'Haus'],
    ['über', 'Über'],
    ['', ''],
  ])('titleCase(%s) is %s', (text, title) => {
    expect(titleCase(text)).toBe(title)
  })

  it('lists every key a sharded index must load, once', () => {
    expect(lookupKeys(['Tage', 'tage', 'HUT'])).toEqual(['Tage', 'tage', 'HUT', 'hut', 'Hut'])
  })
})
