// Harmony classes widened from a learned swap. Finnish vowel harmony, from memory of a grammar handbook:
// a, o, u are back vowels, ä, ö, y front ones, and e, i are neutral (words with only e/i take front endings).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { mirror } from '../../../src/core/inflect/alternations.ts'
import { harmonyClass, harmonyLetters } from '../../../src/core/inflect/harmony.ts'

// Back and front words, from memory (kala fish, talo house, kuva picture, juna train, sota war, kumi rubber;
// kylä village, pöytä table, tyttö girl, höyry steam, kynä pen, pöllö owl).
const back = ['kala', 'talo', 'kuva', 'juna', 'sota', 'kumi', 'pallo', 'muna']
const front = ['kylä', 'pöytä', 'tyttö', 'höyry', 'kynä', 'pöllö', 'sydän', 'kesy']
const SWAP_SIDES = { a: 0, ä: 1 }

describe('harmonyLetters (Finnish, from memory)', () => {
  const letters = harmonyLetters(SWAP_SIDES, [0, 1], [back, front])

  it('widens a/ä to the back vowels o, u and the front vowels y, ö', () => {
    expect(letters).toMatchObject({ a: 0, ä: 1, o: 0, u: 0, y: 1, ö: 1 })
  })

  it('leaves the neutral vowels e, i and consonants both sides use out', () => {
    for (const c of ['e', 'i', 'k', 'l', 't', 'n']) expect(letters[c]).toBeUndefined()
  })

  it('takes only the letters it is allowed to (e.g. those the paradigms write)', () => {
    const some = harmonyLetters(SWAP_SIDES, [0, 1], [back, front], new Set(['o', 'y']))
    expect(some).toEqual({ a: 0, ä: 1, o: 0, y: 1 })
  })

  it('ignores paradigms without a side', () => {
    expect(harmonyLetters(SWAP_SIDES, [-1, -1], [back, front])).toEqual(SWAP_SIDES)
  })
})

describe('harmonyClass', () => {
  const letters = harmonyLetters(SWAP_SIDES, [0, 1], [back, front])

  it('is the side of the last classed letter, or -1 for neutral words (from memory)', () => {
    expect(harmonyClass('puhelin', letters)).toBe(0) // telephone: back (puhelimessa)
    expect(harmonyClass('tyttö', letters)).toBe(1)
    expect(harmonyClass('perinteinen', letters)).toBe(-1) // traditional: front (perinteisessä)
    expect(harmonyClass('tie', letters)).toBe(-1) // road: front (tiellä)
  })

  it('flips under the swap of its letters (property)', () => {
    const classes = { a: 0, o: 0, ä: 1, ö: 1 }
    const swap = { a: 'ä', ä: 'a', o: 'ö', ö: 'o' }
    const word = fc.array(fc.constantFrom('a', 'ä', 'o', 'ö', 'e', 'i', 'k'), { minLength: 1, maxLength: 8 })
    fc.assert(
      fc.property(word, (w) => {
        const s = w.join('')
        const c = harmonyClass(s, classes)
        expect(harmonyClass(mirror(s, swap), classes)).toBe(c < 0 ? -1 : 1 - c)
      }),
    )
  })
})
