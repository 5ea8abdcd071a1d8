// Sulvašti verb classes: the 24 cells (infinitive, three finite paradigms, imperative, participles, converb).
import type { WordClass } from './types.ts'

/** Verb cells in table order. */
export const VERB_CELLS: readonly string[] = [
  'VerbForm=Inf',
  'Mood=Ind|Number=Sing|Person=1|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Sing|Person=2|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Sing|Person=3|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=1|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=2|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=3|Tense=Pres|VerbForm=Fin',
  'Mood=Ind|Number=Sing|Person=1|Tense=Past|VerbForm=Fin',
  'Mood=Ind|Number=Sing|Person=2|Tense=Past|VerbForm=Fin',
  'Mood=Ind|Number=Sing|Person=3|Tense=Past|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=1|Tense=Past|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=2|Tense=Past|VerbForm=Fin',
  'Mood=Ind|Number=Plur|Person=3|Tense=Past|VerbForm=Fin',
  'Mood=Cnd|Number=Sing|Person=1|VerbForm=Fin',
  'Mood=Cnd|Number=Sing|Person=2|VerbForm=Fin',
  'Mood=Cnd|Number=Sing|Person=3|VerbForm=Fin',
  'Mood=Cnd|Number=Plur|Person=1|VerbForm=Fin',
  'Mood=Cnd|Number=Plur|Person=2|VerbForm=Fin',
  'Mood=Cnd|Number=Plur|Person=3|VerbForm=Fin',
  'Mood=Imp|Number=Sing|Person=2|VerbForm=Fin',
  'Mood=Imp|Number=Plur|Person=2|VerbForm=Fin',
  'Tense=Pres|VerbForm=Part',
  'Tense=Past|VerbForm=Part',
  'VerbForm=Conv',
]

/** Verb classes, told apart by the infinitive: -Vra, -ista, long vowel + -da, and -lla/-nna/-rra/-sta. */
export const VERB_CLASSES: readonly WordClass[] = [
  {
    id: 'V1',
    upos: 'VERB',
    name: 'ra-verbs (vowel stems, consonant gradation)',
    root: { kind: 'vstem' },
    gradation: true,
    strata: ['harmony', 'grade'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'rA',
      'n', 'š', 'vA', 'mmO', 'tte', 'vAt',
      'sin', 'siš', 'si', 'simmO', 'sitte', 'sivAt',
      'isin', 'isiš', 'isi', 'isimmO', 'isitte', 'isivAt',
      'h', 'kAA', 'vA', 've-ttO', 'en',
    ],
    tables: 40,
    bare: 80,
  },
  {
    id: 'V2',
    upos: 'VERB',
    name: 'ista-verbs (consonant stems)',
    root: { kind: 'cfinal', finals: ['l', 'r', 'n', 'v', 'm', 'k'] },
    gradation: false,
    strata: ['harmony'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'istA',
      'isen', 'iseš', 'isevA', 'isemmO', 'isette', 'isevAt',
      'istin', 'istiš', 'isti', 'istimmO', 'istitte', 'istivAt',
      'isisin', 'isisiš', 'isisi', 'isisimmO', 'isisitte', 'isisivAt',
      'iseh', 'iskAA', 'isevA', 've-istO', 'isten',
    ],
    tables: 14,
    bare: 35,
  },
  {
    id: 'V3',
    upos: 'VERB',
    name: 'da-verbs (one syllable, long vowel; short vowel before -i-)',
    root: { kind: 'long' },
    gradation: false,
    strata: ['vowel'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'dA',
      'n', 'š', 'vA', 'mmO', 'tte', 'vAt',
      '*in', '*iš', '*i', '*immO', '*itte', '*ivAt',
      '*isin', '*isiš', '*isi', '*isimmO', '*isitte', '*isivAt',
      'h', 'kAA', 'vA', 've-tO', 'den',
    ],
    tables: 16,
    bare: 30,
  },
  {
    id: 'V4',
    upos: 'VERB',
    name: 'consonant stems in l, n, r, s (infinitive -lla, -nna, -rra, -sta)',
    root: { kind: 'cfinal', finals: ['l', 'n', 'r', 's'], notBefore: ['i'] },
    gradation: false,
    strata: ['harmony', 'final'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'TA',
      'en', 'eš', 'evA', 'emmO', 'ette', 'evAt',
      'in', 'iš', 'i', 'immO', 'itte', 'ivAt',
      'isin', 'isiš', 'isi', 'isimmO', 'isitte', 'isivAt',
      'eh', 'kAA', 'evA', 've-TO', 'en',
    ],
    tables: 18,
    bare: 35,
  },
]
