// The in-memory form index against the shared contract, plus what only it promises.
import { expect, it } from 'vitest'
import { FormIndexBuilder } from '../../../src/core/lookup/memory-index.ts'
import { contractRecords, formIndexContract, type IndexRecord } from './form-index-contract.ts'

function buildMemory(records: IndexRecord[]) {
  const owners: { lemma: string; upos: string }[] = []
  const paradigms: string[] = []
  const builder = new FormIndexBuilder()
  for (const r of records) {
    let o = owners.findIndex((x) => x.lemma === r.lemma && x.upos === r.upos)
    if (o < 0) o = owners.push({ lemma: r.lemma, upos: r.upos }) - 1
    let p = r.paradigm === null ? -1 : paradigms.indexOf(r.paradigm)
    if (r.paradigm !== null && p < 0) p = paradigms.push(r.paradigm) - 1
    builder.add(r.form, o, r.feats, r.source, r.score, p)
  }
  return builder.build(owners, paradigms)
}

formIndexContract('memory', async (records) => buildMemory(records))

it('gives the same index for the same records in any order of forms', () => {
  const a = buildMemory(contractRecords)
  const b = buildMemory([...contractRecords].reverse())
  for (const f of a.forms()) expect(b.get(f)).toEqual(a.get(f))
})
