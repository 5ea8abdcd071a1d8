// Sulvašti sounds: vowels and their harmony sets, consonants of root building, gradation pairs.

/** All vowel letters (precomposed, NFC). */
export const VOWELS: readonly string[] = ['a', 'e', 'i', 'o', 'u', 'ä', 'ö', 'ū']

/** Vowels that make a word back or front; e and i are neutral. */
export const BACK_VOWELS: readonly string[] = ['a', 'o', 'u', 'ū']
export const FRONT_VOWELS: readonly string[] = ['ä', 'ö']

/** Vowels drawn for root syllables, by the harmony a root is built in (neutral vowels mixed in). */
export const ROOT_VOWELS: Readonly<Record<'back' | 'front', readonly string[]>> = {
  back: ['a', 'a', 'o', 'o', 'u', 'ū', 'e', 'i'],
  front: ['ä', 'ä', 'ö', 'ö', 'e', 'i', 'e'],
}

/** The vowel closing a `vstem` root (verb stems of the ra-class). */
export const STEM_FINAL_VOWELS: Readonly<Record<'back' | 'front', readonly string[]>> = {
  back: ['a', 'a', 'o', 'e', 'i'],
  front: ['ä', 'ä', 'ö', 'e', 'i'],
}

/** Harmonic placeholders in endings and what they become. */
export const HARMONIC: Readonly<Record<string, { back: string; front: string }>> = {
  A: { back: 'a', front: 'ä' },
  O: { back: 'o', front: 'ö' },
}

/** Word-initial consonants ('' = vowel-initial). */
export const ONSETS: readonly string[] = [
  'p',
  't',
  'k',
  'm',
  'n',
  'l',
  'r',
  's',
  'š',
  'v',
  'j',
  'h',
  'd',
  'b',
  'g',
  'p',
  't',
  'k',
  'm',
  's',
  'v',
  '',
]

/** Strong cluster -> weak cluster; the weak one stands at the start of a closed syllable. */
export const GRADATION: Readonly<Record<string, string>> = {
  kk: 'k',
  pp: 'p',
  tt: 't',
  nt: 'nn',
  lt: 'll',
}

/** Clusters between vowels that never alternate. */
export const PLAIN_CLUSTERS: readonly string[] = [
  'l',
  'r',
  'n',
  'm',
  'v',
  's',
  'š',
  'st',
  'sk',
  'lv',
  'rv',
  'rk',
  'lm',
  'hm',
  'rš',
  'nš',
]

/** Long vowels of one-syllable roots; the short stem keeps one letter (ū -> u). */
export const LONG_VOWELS: readonly string[] = ['aa', 'oo', 'ū', 'ää', 'öö', 'ee', 'ii']

/** Final consonants of consonant-final noun and adjective roots. */
export const NOMINAL_FINALS: readonly string[] = ['l', 'r', 'n', 's', 'š', 'k', 't']

/** `T` in an ending: t, but a copy of a stem-final l, n or r. */
export const T_ASSIMILATION: Readonly<Record<string, string>> = { l: 'l', n: 'n', r: 'r' }

/** Share of generated roots with three syllables instead of two. */
export const LONG_ROOT_SHARE = 0.2

/** Share of cluster roots whose last cluster is one that alternates. */
export const GRADING_SHARE = 0.5
