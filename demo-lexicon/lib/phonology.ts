// Sulvašti sound rules: vowel harmony, consonant gradation in closed syllables, long-vowel shortening.
import { BACK_VOWELS, FRONT_VOWELS, GRADATION, HARMONIC, T_ASSIMILATION, VOWELS } from '../grammar/sounds.ts'
import type { Harmony } from '../grammar/types.ts'

/** True for a vowel letter (either case). */
export function isVowel(ch: string | undefined): boolean {
  return ch !== undefined && VOWELS.includes(ch.toLowerCase())
}

/**
 * Harmony of a word: back if its last harmonic vowel is a, o, u or ū; front if ä or ö; front if none.
 * @example
 * harmonyOf('kelm') // 'front' (only neutral vowels)
 */
export function harmonyOf(word: string): Harmony {
  const lower = word.toLowerCase()
  for (let i = lower.length - 1; i >= 0; i--) {
    const ch = lower[i]!
    if (BACK_VOWELS.includes(ch)) return 'back'
    if (FRONT_VOWELS.includes(ch)) return 'front'
  }
  return 'front'
}

/** Resolves the harmonic placeholders A and O of an ending. */
export function applyHarmony(text: string, harmony: Harmony): string {
  let out = ''
  for (const ch of text) out += HARMONIC[ch]?.[harmony] ?? ch
  return out
}

/** Resolves T: a copy of a stem-final l, n or r, else t. */
export function applyAssimilation(suffix: string, stem: string): string {
  const last = stem[stem.length - 1] ?? ''
  return suffix.replaceAll('T', T_ASSIMILATION[last] ?? 't')
}

/** Where a root's last consonant cluster stands, if it is one that alternates. */
export interface GradationSite {
  start: number
  end: number
  weak: string
}

/**
 * Finds the alternating cluster before a root's final vowels (or at its end), preceded by a vowel.
 * @example
 * gradationSite('lokka') // { start: 2, end: 4, weak: 'k' }
 */
export function gradationSite(root: string): GradationSite | null {
  const lower = root.toLowerCase()
  let i = lower.length
  while (i > 0 && isVowel(lower[i - 1])) i--
  const end = i
  while (i > 0 && !isVowel(lower[i - 1])) i--
  const start = i
  if (start === 0 || start === end) return null
  const weak = GRADATION[lower.slice(start, end)]
  return weak === undefined ? null : { start, end, weak }
}

/**
 * Weakens the cluster at `site` when the syllable it opens is closed: its vowels are followed by a
 * consonant that ends the word or stands before another consonant.
 * @example
 * gradate('lokkan', { start: 2, end: 4, weak: 'k' }) // 'lokan'
 * gradate('lokkavat', { start: 2, end: 4, weak: 'k' }) // 'lokkavat'
 */
export function gradate(word: string, site: GradationSite): string {
  let i = site.end
  while (i < word.length && isVowel(word[i])) i++
  if (i === site.end || i >= word.length) return word
  const closed = !isVowel(word[i]) && (i + 1 === word.length || !isVowel(word[i + 1]))
  return closed ? word.slice(0, site.start) + site.weak + word.slice(site.end) : word
}

/**
 * The short stem of a one-syllable root: its long vowel loses its length.
 * @example
 * shorten('kaa') // 'ka'
 * shorten('pū') // 'pu'
 */
export function shorten(root: string): string {
  if (root.endsWith('ū')) return `${root.slice(0, -1)}u`
  const last = root[root.length - 1]
  return last !== undefined && root[root.length - 2] === last ? root.slice(0, -1) : root
}
