// A hand-made analyzer over a few Sulvašti words (the invented demo language), for constraint tests.
import type { Analyzer, Candidate } from '../../../src/core/constrain/index.ts'

const c = (
  lemma: string,
  upos: string,
  feats: string,
  source: Candidate['source'],
  score = 1,
): Candidate => ({
  lemma,
  upos,
  feats,
  source,
  score,
  paradigm: null,
})

/** Form → candidates in running text; a capitalized sentence-initial form is also looked up lower-cased. */
export const FAKE_LEXICON: Record<string, Candidate[]> = {
  surit: [c('surit', 'PRON', 'Case=Nom|Number=Plur|Person=3|PronType=Prs', 'attested')],
  volivat: [c('volla', 'VERB', 'Mood=Ind|Number=Plur|Person=3|Tense=Past|VerbForm=Fin', 'predicted', 0.9)],
  ašti: [c('ašti', 'ADP', '_', 'attested')],
  kūmele: [
    c('kūme', 'ADJ', 'Case=Dat|Degree=Pos|Number=Sing', 'predicted', 0.8),
    c('kūmel', 'NOUN', 'Case=Nom|Number=Sing', 'guessed', 0.3),
    c('kūme', 'ADJ', 'Case=Dat|Degree=Pos|Number=Sing', 'guessed', 0.2),
  ],
  hatti: [
    c('hatti', 'NOUN', 'Case=Nom|Number=Sing', 'attested'),
    c('hatta', 'VERB', 'VerbForm=Inf', 'guessed', 0.1),
  ],
  Velmora: [c('Velmora', 'PROPN', 'Case=Nom|Number=Sing', 'guessed', 0.6)],
  '.': [c('.', 'PUNCT', '_', 'attested')],
  '?': [c('?', 'NOUN', 'Number=Sing', 'guessed', 0.4)],
  '12': [c('12', 'NOUN', 'Number=Sing', 'guessed', 0.4)],
}

/**
 * Looks forms up in `FAKE_LEXICON`; sentence-initially a capitalized form is tried lower-cased too.
 * @example fakeAnalyzer('Surit', { sentenceInitial: true })[0].upos // 'PRON'
 */
export const fakeAnalyzer: Analyzer = (form, ctx) => {
  const found = [...(FAKE_LEXICON[form] ?? [])]
  const lower = form.toLowerCase()
  if (ctx.sentenceInitial && lower !== form) found.push(...(FAKE_LEXICON[lower] ?? []))
  return found
}
