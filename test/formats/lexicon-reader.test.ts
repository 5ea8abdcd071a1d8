// readLexicon: format from the option, the file name or the first data line; rows grouped into entries.
import { describe, expect, it } from 'vitest'
import { readLexicon, sniffLexiconLine } from '../../src/formats/index.ts'
import { thrownProblem, utf8 } from './helpers.ts'

const rows =
  '# tables\nvessa\tvessa\tNOUN\tNumber=Sing\nmiral\tmiran\tVERB\t_\nvessa\tvessat\tNOUN\tNumber=Plur\n'
const lemmas = '\nvessa\tNOUN\tGender=Fem\nmiral\tVERB\n'
const entries = '{"lemma":"vessa","upos":"NOUN"}\n'

describe('readLexicon', () => {
  it.each([
    ['a {-line as entries', 'lex.txt', entries, 'entries'],
    ['4 columns as table rows', 'lex.tsv', rows, 'rows'],
    ['2–3 columns as a lemma list', 'lex.tsv', lemmas, 'lemmas'],
    ['a .jsonl name as entries', 'lex.jsonl', entries, 'entries'],
  ])('sniffs %s', async (_name, file, text, format) => {
    expect((await readLexicon(utf8(text), { file })).format).toBe(format)
  })

  it('groups table rows into one entry per (lemma, upos), in order of first appearance', async () => {
    const { entries: read } = await readLexicon(rows, { file: 'lex.tsv' })
    expect(read.map((e) => [e.lemma, e.forms?.map((f) => f.form)])).toEqual([
      ['vessa', ['vessa', 'vessat']],
      ['miral', ['miran']],
    ])
    expect(read[0]).toMatchObject({ file: 'lex.tsv', line: 2 })
  })

  it('reads lemma lists as entries without forms', async () => {
    const { entries: read } = await readLexicon(lemmas, { file: 'lemmas.tsv' })
    expect(read).toEqual([
      { lemma: 'vessa', upos: 'NOUN', feats: 'Gender=Fem', file: 'lemmas.tsv', line: 2 },
      { lemma: 'miral', upos: 'VERB', feats: '_', file: 'lemmas.tsv', line: 3 },
    ])
  })

  it('follows the format option over sniffing', async () => {
    expect(await thrownProblem(() => readLexicon(lemmas, { file: 'x.tsv', format: 'rows' }))).toEqual({
      code: 'bad-columns',
      where: 'x.tsv:2',
    })
  })

  it('sniffs past a bad first line and still reports it', async () => {
    const text = 'bad\xff\u0007\nvessa\tNOUN\n'
    const result = await readLexicon(text, { file: 'l.tsv', skipBad: true })
    expect(result.format).toBe('lemmas')
    expect(result.problems).toEqual([
      { code: 'control-char', message: 'control character U+0007 at character 5', file: 'l.tsv', line: 1 },
    ])
  })

  it.each([
    ['an empty input', '', false],
    ['only comments', '# nothing here\n\n', false],
    ['only bad lines, skipped', 'vessa\tNN\nkoru\tNN\n', true],
  ])('throws no-entries for %s', async (_name, text, skipBad) => {
    expect(await thrownProblem(() => readLexicon(text, { file: 'e.tsv', skipBad }))).toEqual({
      code: 'no-entries',
      where: 'e.tsv',
    })
  })

  it('throws the first bad line without skipBad, and counts it with skipBad', async () => {
    const text = 'vessa\tNOUN\nkoru\tNN\nmiral\tVERB\n'
    expect(await thrownProblem(() => readLexicon(text, { file: 'l.tsv' }))).toEqual({
      code: 'bad-upos',
      where: 'l.tsv:2',
    })
    const result = await readLexicon(text, { file: 'l.tsv', skipBad: true })
    expect([result.entries.length, result.lines, result.skipped]).toEqual([2, 2, 1])
  })
})

describe('sniffLexiconLine', () => {
  it.each([
    ['', undefined],
    ['# comment', undefined],
    ['  {"lemma":"a"}', 'entries'],
    ['a\tNOUN', 'lemmas'],
    ['a\tNOUN\t_', 'lemmas'],
    ['a\ta\tNOUN\t_', 'rows'],
    ['just text', 'rows'],
  ])('%j → %s', (line, format) => {
    expect(sniffLexiconLine(line)).toBe(format)
  })
})
