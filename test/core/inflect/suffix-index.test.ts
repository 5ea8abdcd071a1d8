// The compact suffix index against a brute-force reading of its contract over generated member lists
// (property-based, fast-check): longest shared ending, members sharing it, a whole member as a proper ending.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { SuffixIndex } from '../../../src/core/inflect/suffix-index.ts'

/** What longestShared promises, computed by looking at every member. */
function bruteForce(members: string[], word: string, exclude: boolean | string) {
  const rest = [...members]
  const out = exclude === true ? word : exclude === false ? null : exclude
  if (out !== null) rest.splice(rest.indexOf(out), 1)
  const w = [...word]
  const endsWith = (m: string, k: number) => {
    const letters = [...m]
    return letters.length >= k && letters.slice(letters.length - k).join('') === w.slice(w.length - k).join('')
  }
  let length = 0
  let count = rest.length
  for (let k = 1; k <= w.length; k++) {
    const c = rest.filter((m) => endsWith(m, k)).length
    if (c === 0) break
    length = k
    count = c
  }
  const wholeMember = rest.some((m) => m.length > 0 && [...m].length < w.length && endsWith(m, [...m].length))
  return { length, count, wholeMember }
}

const letter = fc.constantFrom('a', 'b', 'ä', '𝔞') // a letter outside the BMP too
const words = fc.array(fc.string({ unit: letter, maxLength: 6 }), { maxLength: 12 })

describe('SuffixIndex', () => {
  it('answers as a brute-force scan of the members does', () => {
    fc.assert(
      fc.property(words, fc.string({ unit: letter, maxLength: 7 }), (members, word) => {
        const idx = new SuffixIndex(members)
        expect(idx.longestShared(word, false)).toEqual(bruteForce(members, word, false))
      }),
      { numRuns: 300 },
    )
  })

  it('leaves out the word itself or another member as a brute-force scan does', () => {
    fc.assert(
      fc.property(words.filter((m) => m.length >= 2), fc.nat(), fc.nat(), (members, i, j) => {
        const idx = new SuffixIndex(members)
        const word = members[i % members.length]!
        const other = members[j % members.length]!
        expect(idx.longestShared(word, true)).toEqual(bruteForce(members, word, true))
        if (j % members.length !== i % members.length)
          expect(idx.longestShared(word, other)).toEqual(bruteForce(members, word, other))
      }),
      { numRuns: 300 },
    )
  })

  it('finds a member as a proper ending of at least so many units as a scan of the word\'s endings does', () => {
    fc.assert(
      fc.property(words, fc.string({ unit: letter, maxLength: 8 }), fc.integer({ min: 1, max: 4 }), (members, word, min) => {
        const known = new Set(members)
        let scan = false
        for (let k = 1; k <= word.length - min; k++) if (known.has(word.slice(k))) scan = true
        expect(new SuffixIndex(members).endsWithMember(word, min)).toBe(scan)
      }),
      { numRuns: 500 },
    )
  })
})
