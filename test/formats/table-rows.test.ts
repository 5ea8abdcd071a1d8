// Table rows and lemma lists: parsing, canonical FEATS, and each error kind located at file:line.
import { describe, expect, it } from 'vitest'
import { readLemmaList, readTableRows } from '../../src/formats/index.ts'
import { thrownProblem } from './helpers.ts'

const file = 'tables.tsv'

describe('readTableRows', () => {
  it('reads rows, ignoring # comments and blank lines', async () => {
    const text =
      '# vessa: an invented noun\n\nvessa\tvessa\tNOUN\tNumber=Sing\n  \nvessa\tvessat\tNOUN\tNumber=Plur\n'
    const result = await readTableRows(text, { file })
    expect(result.rows).toEqual([
      { lemma: 'vessa', form: 'vessa', upos: 'NOUN', feats: 'Number=Sing', file, line: 3 },
      { lemma: 'vessa', form: 'vessat', upos: 'NOUN', feats: 'Number=Plur', file, line: 5 },
    ])
    expect({ lines: result.lines, skipped: result.skipped, problems: result.problems }).toEqual({
      lines: 5,
      skipped: 0,
      problems: [],
    })
  })

  it('gives every row with the same FEATS one string, and locates a repeated bad bundle at each line', async () => {
    const text = 'vessa\tvessa\tNOUN\tNumber=Sing|Case=Nom\nkura\tkura\tNOUN\tNumber=Sing|Case=Nom\n'
    const { rows } = await readTableRows(text, { file })
    expect(rows.map((r) => r.feats)).toEqual(['Case=Nom|Number=Sing', 'Case=Nom|Number=Sing'])
    const bad = 'vessa\tvessa\tNOUN\tCase\nkura\tkura\tNOUN\tCase\n'
    const read = await readTableRows(bad, { file, skipBad: true })
    expect(read.problems.map((p) => [p.code, p.line])).toEqual([
      [read.problems[0]!.code, 1],
      [read.problems[0]!.code, 2],
    ])
  })

  // UD v2 CoNLL-U format, FEATS column: features sorted alphabetically, case-insensitively ("Number"
  // before "NumType"), several values of one feature sorted and comma-joined, `_` for none.
  it.each([
    ['Number=Sing|Case=Nom', 'Case=Nom|Number=Sing'],
    ['NumType=Card|Number=Plur', 'Number=Plur|NumType=Card'],
    ['Case=Nom,Acc', 'Case=Acc,Nom'],
    [
      'VerbForm=Fin|Mood=Ind|Tense=Pres|Person=3|Number=Sing',
      'Mood=Ind|Number=Sing|Person=3|Tense=Pres|VerbForm=Fin',
    ],
    ['_', '_'],
    ['', '_'],
  ])('canonicalizes FEATS %j to %j', async (raw, canonical) => {
    const { rows } = await readTableRows(`miral\tmiran\tVERB\t${raw}\n`, { file })
    expect(rows[0]!.feats).toBe(canonical)
  })

  it('reports each language-specific Feature=Value once, in order of first appearance', async () => {
    const text = [
      'vessa\tvessa\tNOUN\tHarmony=Front|Number=Sing',
      'vessa\tvessat\tNOUN\tHarmony=Front|Number=Plur',
      'koru\tkoru\tNOUN\tHarmony=Back,Front|Number=Sing',
    ].join('\n')
    const { languageSpecific } = await readTableRows(text, { file })
    expect(languageSpecific).toEqual(['Harmony=Front', 'Harmony=Back'])
  })

  it.each([
    ['too few columns', 'vessa\tvessa\tNOUN', 'bad-columns'],
    ['too many columns (scores are not input)', 'vessa\tvessa\tNOUN\t_\tpredicted\t0.5', 'bad-columns'],
    ['an empty lemma', '\tvessa\tNOUN\t_', 'empty-field'],
    ['a blank form', 'vessa\t \tNOUN\t_', 'empty-field'],
    ['an unknown UPOS', 'vessa\tvessa\tNN\t_', 'bad-upos'],
    ['a feature without a value', 'vessa\tvessa\tNOUN\tNumber', 'bad-feats'],
    ['a non-universal value of a universal feature', 'vessa\tvessa\tNOUN\tCase=Nominative', 'bad-feats'],
    ['a repeated feature', 'vessa\tvessa\tNOUN\tCase=Nom|Case=Acc', 'bad-feats'],
    ['a lower-case feature name', 'vessa\tvessa\tNOUN\tcase=Nom', 'bad-feats'],
    ['a NUL byte', 'vessa\tve\u0000ssa\tNOUN\t_', 'nul-byte'],
  ])('names file and line of %s', async (_name, badLine, code) => {
    const text = `# header\nvessa\tvessa\tNOUN\tNumber=Sing\n${badLine}\n`
    expect(await thrownProblem(() => readTableRows(text, { file }))).toEqual({ code, where: `${file}:3` })
  })

  it('with skipBad counts bad lines and keeps the first five as examples', async () => {
    const bad = Array.from({ length: 7 }, (_, i) => `vessa${i}\tvessa\tNN\t_`)
    const text = ['vessa\tvessa\tNOUN\t_', ...bad, 'koru\tkoru\tNOUN\t_'].join('\n')
    const result = await readTableRows(text, { file, skipBad: true })
    expect(result.rows.map((r) => r.lemma)).toEqual(['vessa', 'koru'])
    expect(result.skipped).toBe(7)
    expect(result.lines).toBe(2)
    expect(result.problems.map((p) => p.line)).toEqual([2, 3, 4, 5, 6])
  })
})

describe('readLemmaList', () => {
  it('reads 2- and 3-column lines as lemma-only entries with canonical inherent features', async () => {
    const text = 'vessa\tNOUN\tNumber=Sing|Gender=Fem\nmiral\tVERB\nkoru\tNOUN\t\n'
    const { entries } = await readLemmaList(text, { file: 'lemmas.tsv' })
    expect(entries).toEqual([
      { lemma: 'vessa', upos: 'NOUN', feats: 'Gender=Fem|Number=Sing', file: 'lemmas.tsv', line: 1 },
      { lemma: 'miral', upos: 'VERB', feats: '_', file: 'lemmas.tsv', line: 2 },
      { lemma: 'koru', upos: 'NOUN', feats: '_', file: 'lemmas.tsv', line: 3 },
    ])
  })

  it.each([
    ['one column', 'vessa', 'bad-columns'],
    ['four columns', 'vessa\tNOUN\t_\t_', 'bad-columns'],
    ['an empty lemma', '\tNOUN', 'empty-field'],
    ['an unknown UPOS', 'vessa\tnoun', 'bad-upos'],
    ['malformed inherent features', 'vessa\tNOUN\tGender', 'bad-feats'],
  ])('names file and line of %s', async (_name, badLine, code) => {
    const text = `miral\tVERB\n${badLine}\n`
    expect(await thrownProblem(() => readLemmaList(text, { file: 'lemmas.tsv' }))).toEqual({
      code,
      where: 'lemmas.tsv:2',
    })
  })
})
