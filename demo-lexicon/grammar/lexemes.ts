// Fixed Sulvašti lemmas of the regular classes (with glosses) and the place names of the corpus.
import type { CoreLemma, PlaceName, VariantForm } from './types.ts'

/** Always in tables.tsv; the README's examples come from here. */
export const CORE_LEMMAS: readonly CoreLemma[] = [
  { classId: 'N1', root: 'talv', gloss: 'river' },
  { classId: 'N1', root: 'kelm', gloss: 'door' },
  { classId: 'N1', root: 'lokk', gloss: 'boat' },
  { classId: 'N2', root: 'vork', gloss: 'wolf' },
  { classId: 'N2', root: 'möpp', gloss: 'hill' },
  { classId: 'N3', root: 'tavel', gloss: 'stone' },
  { classId: 'N3', root: 'kömir', gloss: 'smith' },
  { classId: 'N4', root: 'sulaš', gloss: 'field' },
  { classId: 'N4', root: 'mirel', gloss: 'word' },
  { classId: 'N5', root: 'rusk', gloss: 'bread' },
  { classId: 'N5', root: 'vänt', gloss: 'song' },
  { classId: 'N6', root: 'murk', gloss: 'night' },
  { classId: 'N6', root: 'sant', gloss: 'shore' },
  { classId: 'N7', root: 'kött', gloss: 'bird' },
  { classId: 'N7', root: 'halm', gloss: 'sister' },
  { classId: 'V1', root: 'lokka', gloss: 'close' },
  { classId: 'V1', root: 'sinte', gloss: 'sing' },
  { classId: 'V1', root: 'pölö', gloss: 'burn' },
  { classId: 'V2', root: 'mur', gloss: 'build' },
  { classId: 'V2', root: 'vel', gloss: 'write' },
  { classId: 'V3', root: 'kaa', gloss: 'see' },
  { classId: 'V3', root: 'töö', gloss: 'give' },
  { classId: 'V4', root: 'vorul', gloss: 'carry' },
  { classId: 'V4', root: 'mäšes', gloss: 'wash' },
  { classId: 'V4', root: 'kumar', gloss: 'bow' },
  { classId: 'V4', root: 'sūn', gloss: 'drink' },
  { classId: 'A1', root: 'sūkk', gloss: 'swift' },
  { classId: 'A1', root: 'hälv', gloss: 'bright' },
  { classId: 'A2', root: 'mūnt', gloss: 'old' },
  { classId: 'A2', root: 'häšm', gloss: 'green' },
  { classId: 'A3', root: 'kavur', gloss: 'heavy' },
  { classId: 'A3', root: 'pilmeš', gloss: 'warm' },
]

/** Second forms for a cell: each becomes one more row of that cell. */
export const VARIANT_FORMS: readonly VariantForm[] = [
  { lemma: 'talva', feats: 'Case=Gen|Number=Plur', form: 'talvien' },
  { lemma: 'kelmä', feats: 'Case=Gen|Number=Plur', form: 'kelmien' },
  { lemma: 'vorulla', feats: 'Mood=Ind|Number=Sing|Person=3|Tense=Past|VerbForm=Fin', form: 'vorulihe' },
]

/** Invented places: used in the corpus, listed in no dictionary file. */
export const PLACE_NAMES: readonly PlaceName[] = [
  { root: 'Velmor', classId: 'N1' },
  { root: 'Tašköl', classId: 'N3' },
  { root: 'Ristäm', classId: 'N2' },
  { root: 'Kūrviš', classId: 'N4' },
]
