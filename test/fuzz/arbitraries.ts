// Generators for the fuzz targets: words in many scripts, combining marks, huge words, random FEATS, tables, noise.
import fc from 'fast-check'
import { UNIVERSAL_FEATURES, UPOS_TAGS } from '../../src/core/lexicon/ud.ts'
import { MAX_WORD_CHARS } from '../../src/formats/index.ts'

// Letters a dictionary may hold: the demo language's, other scripts, letters outside the BMP, combining marks
// (acute, diaeresis, dot below, long stroke), joiners, precomposed and decomposable letters, Hangul syllables
// (which NFD splits into jamo), a ligature, and a space (multi-word lemmas).
const LETTERS = [
  ...'aeioukltmnrsvhjpdgbäöūšAKLMNS',
  ...'ßæøåıİǅﬁ',
  ...'αβγδΣσς',
  ...'жщыЖ',
  ...'字漢한글',
  ...'שלוםكتب',
  ...'कि',
  '😀',
  '𝔸',
  '𐍈',
  '\u0301',
  '\u0308',
  '\u0323',
  '\u0336',
  '\u200d',
  '\u200c',
  ' ',
]

/** A short word of 1–10 letters, NFC, not blank, not starting with `#` (a comment in the TSV formats). */
export const shortWord = fc
  .array(fc.constantFrom(...LETTERS), { minLength: 1, maxLength: 10 })
  .map((letters) => letters.join('').normalize('NFC'))
  .filter((w) => w.trim() !== '' && !w.startsWith('#'))

/** A word up to the word limit: a short one repeated (how a huge form looks in a broken dump). */
export const hugeWord = fc
  .tuple(shortWord, fc.integer({ min: 20, max: MAX_WORD_CHARS }))
  .map(([w, n]) =>
    w
      .repeat(Math.ceil(n / w.length))
      .slice(0, n)
      .normalize('NFC'),
  )
  .filter((w) => w.trim() !== '' && w.length <= MAX_WORD_CHARS && !/[\uD800-\uDBFF]$/.test(w))

/** Mostly short words, sometimes huge ones. */
export const word = fc.oneof({ weight: 9, arbitrary: shortWord }, { weight: 1, arbitrary: hugeWord })

/** A UPOS tag, weighted to the open classes. */
export const upos = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom('NOUN', 'VERB', 'ADJ') },
  { weight: 1, arbitrary: fc.constantFrom(...UPOS_TAGS) },
)

const NAMES = Object.keys(UNIVERSAL_FEATURES)

/** A well-formed FEATS bundle (canonical or not): universal features with their values, language-specific ones. */
export const feats = fc
  .uniqueArray(
    fc.oneof(
      fc
        .constantFrom(...NAMES)
        .chain((name) =>
          fc
            .uniqueArray(fc.constantFrom(...UNIVERSAL_FEATURES[name]!), { minLength: 1, maxLength: 2 })
            .map((v) => [name, v.join(',')]),
        ),
      fc.tuple(fc.stringMatching(/^[A-Z][a-z]{1,6}X$/), fc.stringMatching(/^[A-Z0-9][a-z0-9]{0,4}$/)),
    ),
    { maxLength: 4, selector: ([name]) => name },
  )
  .map((pairs) => (pairs.length === 0 ? '_' : pairs.map(([n, v]) => `${n}=${v}`).join('|')))

/** Strings shaped like FEATS that may be malformed (empty names, `;`, duplicated features, lower case…). */
export const rawFeats = fc.oneof(
  feats,
  fc.constantFrom(
    'Case',
    'case=Nom',
    'Case=',
    '=Nom',
    'Case=Nom|Case=Gen',
    'Case=Nom;Number=Sing',
    'Case=Nominative',
    '|',
    'Case=Nom||',
  ),
  fc.string({ maxLength: 20 }),
)

/** The inflected forms of a lemma: the lemma edited at its end, start or middle, as paradigms do; or unrelated. */
const formOf = (lemma: string) =>
  fc
    .oneof(
      fc.constant(lemma),
      shortWord.map((s) => `${lemma}${s}`),
      fc
        .tuple(fc.nat({ max: 3 }), shortWord)
        .map(([cut, s]) => `${[...lemma].slice(0, -cut || undefined).join('')}${s}`),
      shortWord.map((s) => `${s}${lemma}`),
      shortWord,
    )
    .map((f) => f.normalize('NFC'))

/** Cell FEATS for a table of `n` cells: distinct Case × Number bundles (a noun-like table). */
const CELLS = UNIVERSAL_FEATURES.Case!.slice(0, 8).flatMap((c) =>
  ['Sing', 'Plur'].map((n) => `Case=${c}|Number=${n}`),
)

/** One table row, as the readers produce it. */
export interface Row {
  lemma: string
  form: string
  upos: string
  feats: string
}

/** A random table: a lemma, its UPOS, 1–8 cells, each with 1–2 forms derived from the lemma. */
export const table = fc
  .record({ lemma: word, upos, size: fc.integer({ min: 1, max: 8 }) })
  .chain(({ lemma, upos, size }) =>
    fc
      .tuple(
        ...CELLS.slice(0, size).map((cellFeats) =>
          fc.array(formOf(lemma), { minLength: 1, maxLength: 2 }).map((forms) => ({ cellFeats, forms })),
        ),
      )
      .map((cells) =>
        cells.flatMap(({ cellFeats, forms }) =>
          forms
            .filter((f) => f.trim() !== '' && f.length <= MAX_WORD_CHARS && !f.startsWith('#'))
            .map((form): Row => ({ lemma, form, upos, feats: cellFeats })),
        ),
      ),
  )
  .filter((rows) => rows.length > 0)

/** A small lexicon: a few tables (often sharing a UPOS, so paradigms are learned) and a few bare lemmas. */
export const lexicon = fc.record({
  tables: fc.array(table, { minLength: 1, maxLength: 6 }),
  bare: fc.array(fc.record({ lemma: word, upos, feats: fc.constantFrom('_', 'Gender=Fem', 'Gender=Masc') }), {
    maxLength: 4,
  }),
})

/** Noise inserted into text: bytes and characters the readers must refuse or accept. */
export const noise = fc.oneof(
  fc.constantFrom(
    '\t',
    '\r',
    '\r\n',
    '\n',
    '\u0000',
    '\u0007',
    '\uFEFF',
    '#',
    '{',
    '}',
    '"',
    '\\',
    '\u2028',
    '\uD800',
    '_',
  ),
  fc.string({ unit: 'binary', maxLength: 6 }),
)

/** Rows as TSV text. */
export function rowsToTsv(rows: readonly Row[]): string {
  return rows.map((r) => `${r.lemma}\t${r.form}\t${r.upos}\t${r.feats}\n`).join('')
}

/** Text with noise spliced in at random places. */
export const noisyText = (text: fc.Arbitrary<string>) =>
  fc.tuple(text, fc.array(fc.tuple(fc.nat(), noise), { maxLength: 4 })).map(([t, edits]) => {
    let out = t
    for (const [at, piece] of edits) {
      const i = out.length === 0 ? 0 : at % (out.length + 1)
      out = out.slice(0, i) + piece + out.slice(i)
    }
    return out
  })

/** Split bytes into chunks at random offsets (how a stream delivers them). */
export const chunking = fc.array(fc.nat({ max: 4096 }), { maxLength: 4 })
