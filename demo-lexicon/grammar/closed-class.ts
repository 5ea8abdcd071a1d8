// Sulvašti closed classes: personal pronouns (six cases each) and uninflected function words.
import type { ClosedTable } from './types.ts'

const CASES = ['Nom', 'Acc', 'Gen', 'Dat', 'Loc', 'Ins'] as const

/** A personal pronoun's six forms, in the order of CASES. */
function pronoun(lemma: string, gloss: string, person: string, number: string, forms: string[]): ClosedTable {
  return {
    lemma,
    upos: 'PRON',
    gloss,
    inherent: `Number=${number}|Person=${person}|PronType=Prs`,
    forms: CASES.map((c, i) => [`Case=${c}`, forms[i]!] as const),
  }
}

/** A function word with one form and no features. */
function word(lemma: string, upos: string, gloss: string, governs?: string): ClosedTable {
  return { lemma, upos, gloss, inherent: '_', forms: [['_', lemma]], ...(governs ? { governs } : {}) }
}

/** Pronouns: Nom, Acc, Gen, Dat, Loc, Ins. */
export const PRONOUNS: readonly ClosedTable[] = [
  pronoun('mö', 'I', '1', 'Sing', ['mö', 'mönt', 'mönä', 'mölle', 'mössä', 'mömi']),
  pronoun('šä', 'you (one)', '2', 'Sing', ['šä', 'šänt', 'šänä', 'šälle', 'šässä', 'šämi']),
  pronoun('sur', 'he, she, it', '3', 'Sing', ['sur', 'suran', 'surin', 'surale', 'surassa', 'surami']),
  pronoun('meš', 'we', '1', 'Plur', ['meš', 'mešät', 'mešän', 'mešille', 'mešissä', 'mešimi']),
  pronoun('teš', 'you (many)', '2', 'Plur', ['teš', 'tešät', 'tešän', 'tešille', 'tešissä', 'tešimi']),
  pronoun('surit', 'they', '3', 'Plur', ['surit', 'surit', 'surien', 'surille', 'surissa', 'surimi']),
]

/** Adpositions (prepositions, each governing one case), conjunctions and adverbs. */
export const FUNCTION_WORDS: readonly ClosedTable[] = [
  word('sel', 'ADP', 'in, at', 'Loc'),
  word('kon', 'ADP', 'with', 'Ins'),
  word('ver', 'ADP', 'towards, for', 'Dat'),
  word('ašti', 'ADP', 'out of, from', 'Gen'),
  word('ot', 'CCONJ', 'and'),
  word('pūr', 'CCONJ', 'but'),
  word('kuš', 'SCONJ', 'because'),
  word('tūna', 'ADV', 'here'),
  word('kämi', 'ADV', 'now'),
  word('ašol', 'ADV', 'again'),
]
