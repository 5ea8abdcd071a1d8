// A deterministic slice of the German npm verb set as an entries upload: spread over the set, some lemma-only.
import type { Entry, FormRow } from '../../src/core/lexicon/entry.ts'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { entryToJson, toJsonLines } from '../../src/formats/index.ts'
import { loadGermanNpm } from './german-npm.ts'

/** Every this-many-th lemma of a slice is uploaded without its table (a dictionary line with no forms). */
export const LEMMA_ONLY_EVERY = 10

/** A slice: the upload's entries (as JSON lines too) and the npm tables of the lemmas sent without one. */
export interface VerbSlice {
  entries: Entry[]
  jsonl: string
  /** The source's table of each lemma-only entry: the gold its predicted forms are checked against. */
  withheld: Record<string, FormRow[]>
}

/**
 * `size` verbs taken evenly from the converted set (source order), every `LEMMA_ONLY_EVERY`-th one with its
 * table withheld. The same size always gives the same slice.
 * @example germanVerbSlice(2000).entries.filter((e) => !e.forms).length // 200
 */
export function germanVerbSlice(size: number): VerbSlice {
  const all = rowsToEntries(loadGermanNpm('verbs').rows)
  if (size > all.length) throw new Error(`the verb set has ${all.length} lemmas, fewer than ${size}`)
  const entries: Entry[] = []
  const withheld: Record<string, FormRow[]> = {}
  for (let i = 0; i < size; i++) {
    const e = all[Math.floor((i * all.length) / size)]!
    if (i % LEMMA_ONLY_EVERY === LEMMA_ONLY_EVERY - 1) {
      entries.push({ lemma: e.lemma, upos: e.upos, feats: e.feats })
      withheld[e.lemma] = e.forms ?? []
    } else {
      entries.push({ lemma: e.lemma, upos: e.upos, feats: e.feats, forms: e.forms })
    }
  }
  return { entries, jsonl: toJsonLines(entries.map(entryToJson)), withheld }
}
