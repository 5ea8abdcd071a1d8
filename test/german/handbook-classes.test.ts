// Regular inflection classes of grammar handbooks (German, Spanish, Finnish), written from memory: learn from
// a handful of tables, then predict a held-out lemma of each class and compare with its whole table.
import { readFile } from 'node:fs/promises'
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../src/core/inflect/expand.ts'
import { learnFromLexicon } from '../../src/core/inflect/learn.ts'
import { rowsToEntries, type TableRow } from '../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'
import { readTableRows } from '../../src/formats/index.ts'

const fixture = (name: string) => new URL(`../fixtures/handbook/${name}`, import.meta.url)

async function rows(name: string): Promise<TableRow[]> {
  return (await readTableRows(await readFile(fixture(name), 'utf8'), { file: name })).rows
}

const rowText = (form: string, feats: string) => `${feats}\t${form}`

// Classes and held-out lemmas (from memory; see test/fixtures/handbook/README.md).
describe.each([
  ['German', 'de-verb', ['holen', 'klingen']],
  ['Spanish', 'es-verb', ['nadar', 'vender']],
  ['Finnish', 'fi-noun', ['auto']],
])('%s handbook classes (%s, from memory)', (_language, set, heldOut) => {
  it.each(heldOut)('predicts the whole table of held-out %s exactly', async (lemma) => {
    const model = learnFromLexicon(buildLexicon(rowsToEntries(await rows(`${set}.train.tsv`))))
    const expected = (await rows(`${set}.heldout.tsv`)).filter((r) => r.lemma === lemma)
    const table = expandLemma(model, lemma, expected[0]!.upos)
    expect(table?.source).toBe('predicted')
    expect(table!.forms.map((f) => rowText(f.form, f.feats)).sort()).toEqual(
      expected.map((r) => rowText(r.form, r.feats)).sort(),
    )
  })
})
