// The contract every form index must keep (whole or sharded): one suite, run against each implementation.
import { describe, expect, it } from 'vitest'
import { compareCandidates } from '../../../src/core/lookup/candidate.ts'
import type { FormIndex, IndexedAnalysis } from '../../../src/core/lookup/form-index.ts'

/** One (form, analysis) pair to index. */
export type IndexRecord = IndexedAnalysis & { form: string }

/** German noun analyses (handbook declension, from memory): syncretic forms, two lemmas sharing a form. */
export const contractRecords: IndexRecord[] = [
  {
    form: 'Tage',
    lemma: 'Tag',
    upos: 'NOUN',
    feats: 'Case=Nom|Number=Plur',
    source: 'attested',
    score: 1,
    paradigm: 'NOUN-1',
  },
  {
    form: 'Tage',
    lemma: 'Tag',
    upos: 'NOUN',
    feats: 'Case=Acc|Number=Plur',
    source: 'attested',
    score: 1,
    paradigm: 'NOUN-1',
  },
  {
    form: 'Tagen',
    lemma: 'Tag',
    upos: 'NOUN',
    feats: 'Case=Dat|Number=Plur',
    source: 'attested',
    score: 1,
    paradigm: 'NOUN-1',
  },
  {
    form: 'Mäntel',
    lemma: 'Mantel',
    upos: 'NOUN',
    feats: 'Case=Nom|Number=Plur',
    source: 'predicted',
    score: 0.8,
    paradigm: 'NOUN-2',
  },
  {
    form: 'Mäntel',
    lemma: 'Mäntel',
    upos: 'NOUN',
    feats: 'Case=Nom|Number=Sing',
    source: 'predicted',
    score: 0.2,
    paradigm: 'NOUN-1',
  },
  {
    form: 'Mantel',
    lemma: 'Mantel',
    upos: 'NOUN',
    feats: 'Case=Nom|Number=Sing',
    source: 'predicted',
    score: 1,
    paradigm: 'NOUN-2',
  },
  {
    form: 'Tage',
    lemma: 'Tage',
    upos: 'NOUN',
    feats: 'Case=Nom|Number=Sing',
    source: 'predicted',
    score: 0.5,
    paradigm: null,
  },
]

/** Run the contract against an implementation built from records. */
export function formIndexContract(name: string, build: (records: IndexRecord[]) => Promise<FormIndex>): void {
  describe(`form index contract: ${name}`, () => {
    const load = async () => {
      const index = await build(contractRecords)
      await index.load([...new Set(contractRecords.map((r) => r.form)), 'Hut', 'Mantel'])
      return index
    }

    it('answers every analysis of a form, attested before predicted, best first', async () => {
      const index = await load()
      const got = index.get('Tage')!
      expect(got.map((a) => `${a.lemma}:${a.feats}:${a.source}`)).toEqual([
        'Tag:Case=Acc|Number=Plur:attested',
        'Tag:Case=Nom|Number=Plur:attested',
        'Tage:Case=Nom|Number=Sing:predicted',
      ])
      expect([...got].sort(compareCandidates)).toEqual(got)
    })

    it('keeps scores, sources and paradigm ids as given', async () => {
      const index = await load()
      const { form: _, ...first } = contractRecords[3]!
      expect(index.get('Mäntel')?.[0]).toEqual(first)
      expect(index.get('Tage')?.[2]?.paradigm).toBeNull()
    })

    it('answers undefined for a form it does not have', async () => {
      expect((await load()).get('Hut')).toBeUndefined()
    })

    it('counts forms and analyses, and lists every form once', async () => {
      const index = await load()
      const forms = [...index.forms()]
      expect(new Set(forms)).toEqual(new Set(contractRecords.map((r) => r.form)))
      expect(forms.length).toBe(index.formCount)
      expect(index.analysisCount).toBe(contractRecords.length)
    })

    it('finds forms by their folded spelling', async () => {
      const index = await load()
      expect([...index.folded('Mantel')].sort()).toEqual(['Mantel', 'Mäntel'])
      expect(index.folded('Hut')).toEqual([])
    })
  })
}
