// Sulvašti adjective classes: twelve positive Case × Number cells, two comparatives, one superlative.
import type { WordClass } from './types.ts'

/** Adjective cells in table order. */
export const ADJ_CELLS: readonly string[] = [
  'Case=Nom|Degree=Pos|Number=Sing',
  'Case=Acc|Degree=Pos|Number=Sing',
  'Case=Gen|Degree=Pos|Number=Sing',
  'Case=Dat|Degree=Pos|Number=Sing',
  'Case=Loc|Degree=Pos|Number=Sing',
  'Case=Ins|Degree=Pos|Number=Sing',
  'Case=Nom|Degree=Pos|Number=Plur',
  'Case=Acc|Degree=Pos|Number=Plur',
  'Case=Gen|Degree=Pos|Number=Plur',
  'Case=Dat|Degree=Pos|Number=Plur',
  'Case=Loc|Degree=Pos|Number=Plur',
  'Case=Ins|Degree=Pos|Number=Plur',
  'Case=Nom|Degree=Cmp|Number=Sing',
  'Case=Nom|Degree=Cmp|Number=Plur',
  'Case=Nom|Degree=Sup|Number=Sing',
]

/** Adjective classes: -a/-ä (like N1 nouns), -e, and consonant-final (like N3 nouns). Superlative: prefix pa-/pä-. */
export const ADJ_CLASSES: readonly WordClass[] = [
  {
    id: 'A1',
    upos: 'ADJ',
    name: 'a-adjectives (lemma ends in -a/-ä)',
    root: { kind: 'cluster' },
    gradation: true,
    strata: ['harmony', 'grade'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'A', 'An', 'As', 'Ale', 'AssA', 'Ami',
      'At', 'At', 'Ojen', 'Oile', 'OissA', 'Oimi',
      'Ampi', 'AmpAt', 'pA-A',
    ],
    tables: 24,
    bare: 45,
  },
  {
    id: 'A2',
    upos: 'ADJ',
    name: 'e-adjectives (lemma ends in -e)',
    root: { kind: 'cluster' },
    gradation: true,
    strata: ['harmony', 'grade'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      'e', 'en', 'eš', 'ele', 'essA', 'emi',
      'et', 'et', 'eiden', 'eile', 'eissA', 'eimi',
      'empi', 'empAt', 'pA-e',
    ],
    tables: 20,
    bare: 35,
  },
  {
    id: 'A3',
    upos: 'ADJ',
    name: 'consonant-final adjectives',
    root: { kind: 'cfinal', finals: ['l', 'r', 'n', 's', 'š'] },
    gradation: false,
    strata: ['harmony'],
    // biome-ignore format: one ending per cell reads best in rows of the paradigm
    endings: [
      '', 'Aš', 'in', 'ille', 'issA', 'imO',
      'et', 'et', 'ein', 'eille', 'eissA', 'eimO',
      'impi', 'impAt', 'pA-',
    ],
    tables: 12,
    bare: 20,
  },
]
