// CoNLL-U: multi-word tokens, empty nodes, gold columns, ID-sequence errors, skipping bad sentences.
import { describe, expect, it } from 'vitest'
import { streamConllu } from '../../src/formats/index.ts'
import { collect, thrownProblem } from './helpers.ts'

const row = (...cols: string[]) => cols.join('\t')
const word = (id: string, form: string, upos = 'NOUN', feats = '_') =>
  row(id, form, form.toLowerCase(), upos, '_', feats, '0', 'dep', '_', '_')
const mwt = (id: string, form: string) => row(id, form, '_', '_', '_', '_', '_', '_', '_', '_')

// Multi-word tokens as the UD v2 guidelines show them for Spanish: "vámonos al mar" from the CoNLL-U
// format page (vámonos = vamos + nos, al = a + el) and the contraction "del" = de + el (from memory).
const SPANISH = [
  '# sent_id = 1',
  '# text = Vámonos al mar.',
  mwt('1-2', 'Vámonos'),
  row('1', 'Vamos', 'ir', 'VERB', '_', 'VerbForm=Fin|Mood=Imp|Number=Plur|Person=1', '0', 'root', '_', '_'),
  row(
    '2',
    'nos',
    'nosotros',
    'PRON',
    '_',
    'Case=Acc|Number=Plur|Person=1|PronType=Prs',
    '1',
    'obj',
    '_',
    '_',
  ),
  mwt('3-4', 'al'),
  row('3', 'a', 'a', 'ADP', '_', '_', '5', 'case', '_', '_'),
  row('4', 'el', 'el', 'DET', '_', 'Number=Sing|Gender=Masc|Definite=Def|PronType=Art', '5', 'det', '_', '_'),
  row('5', 'mar', 'mar', 'NOUN', '_', 'Number=Sing|Gender=Masc', '1', 'obl', '_', 'SpaceAfter=No'),
  row('6', '.', '.', 'PUNCT', '_', '_', '1', 'punct', '_', '_'),
  '',
  '# sent_id = 2',
  row('1', 'Salió', 'salir', 'VERB', '_', '_', '0', 'root', '_', '_'),
  mwt('2-3', 'del'),
  row('2', 'de', 'de', 'ADP', '_', '_', '4', 'case', '_', '_'),
  row('3', 'el', 'el', 'DET', '_', '_', '4', 'det', '_', '_'),
  row('4', 'agua', 'agua', 'NOUN', '_', '_', '1', 'obl', '_', '_'),
  row('4.1', 'salió', 'salir', 'VERB', '_', '_', '_', '_', '1:conj', '_'),
  '',
].join('\n')

describe('streamConllu', () => {
  it('exposes multi-word tokens as one surface token and their parts as gold words', async () => {
    const [first, second] = await collect(streamConllu(SPANISH, { file: 'es.conllu' }))
    expect(first!.comments).toEqual(['# sent_id = 1', '# text = Vámonos al mar.'])
    expect(first!.surface.map((t) => [t.id, t.form, t.line, t.sentenceInitial])).toEqual([
      ['1-2', 'Vámonos', 3, true],
      ['3-4', 'al', 6, false],
      ['5', 'mar', 9, false],
      ['6', '.', 10, false],
    ])
    expect(first!.words.map((w) => [w.form, w.lemma, w.upos, w.token])).toEqual([
      ['Vamos', 'ir', 'VERB', 0],
      ['nos', 'nosotros', 'PRON', 0],
      ['a', 'a', 'ADP', 1],
      ['el', 'el', 'DET', 1],
      ['mar', 'mar', 'NOUN', 2],
      ['.', '.', 'PUNCT', 3],
    ])
    expect(first!.words[3]!.feats).toBe('Definite=Def|Gender=Masc|Number=Sing|PronType=Art')
    expect(first!.words[4]!.misc).toBe('SpaceAfter=No')
    expect(second!.surface.map((t) => t.form)).toEqual(['Salió', 'del', 'agua'])
    expect(second!.words.map((w) => `${w.form}:${w.token}`)).toEqual(['Salió:0', 'de:1', 'el:1', 'agua:2'])
    expect(second!.line).toBe(12)
  })

  it('counts every line: read lines plus skipped lines is the input', async () => {
    const reader = streamConllu(SPANISH, { file: 'es.conllu' })
    await collect(reader)
    expect(reader.summary.lines + reader.summary.skipped).toBe(SPANISH.split('\n').length - 1)
  })

  it('reads a last sentence without a final blank line', async () => {
    const sentences = await collect(streamConllu(word('1', 'vessa'), { file: 'a.conllu' }))
    expect(sentences.map((s) => s.words.length)).toEqual([1])
  })

  it.each([
    [
      'nine columns',
      [word('1', 'a'), row('2', 'b', 'b', 'NOUN', '_', '_', '0', 'dep', '_')],
      'bad-conllu',
      2,
    ],
    [
      'an empty column',
      [word('1', 'a'), row('2', 'b', '', 'NOUN', '_', '_', '0', 'dep', '_', '_')],
      'bad-conllu',
      2,
    ],
    ['an ID that is no number', [word('1', 'a'), word('x', 'b')], 'bad-conllu', 2],
    ['word ID 0', [word('0', 'a')], 'bad-conllu', 1],
    ['a skipped word ID', [word('1', 'a'), word('3', 'b')], 'bad-conllu', 2],
    [
      'a range not just before its words',
      [word('1', 'a'), mwt('3-4', 'cd'), word('2', 'b')],
      'bad-conllu',
      2,
    ],
    ['a range that ends where it starts', [mwt('1-1', 'a'), word('1', 'a')], 'bad-conllu', 1],
    ['a range past the last word', [mwt('1-2', 'ab'), word('1', 'a'), ''], 'bad-conllu', 1],
    [
      'overlapping ranges',
      [mwt('1-3', 'abc'), word('1', 'a'), mwt('2-3', 'bc'), word('2', 'b')],
      'bad-conllu',
      3,
    ],
    [
      'an empty node after the wrong word',
      [word('1', 'a'), word('2', 'b'), word('1.1', 'e')],
      'bad-conllu',
      3,
    ],
    ['empty nodes out of order', [word('1', 'a'), word('1.2', 'e')], 'bad-conllu', 2],
    ['an unknown UPOS', [word('1', 'a', 'NN')], 'bad-upos', 1],
    ['malformed FEATS', [word('1', 'a', 'NOUN', 'Case')], 'bad-feats', 1],
    ['a control character', [word('1', 'a\u0007')], 'control-char', 1],
  ])('names file and line of %s', async (_name, lines, code, line) => {
    const text = `${lines.join('\n')}\n`
    expect(await thrownProblem(() => collect(streamConllu(text, { file: 'c.conllu' })))).toEqual({
      code,
      where: `c.conllu:${line}`,
    })
  })

  it('keeps tags as written when tag checks are off', async () => {
    const [s] = await collect(
      streamConllu(word('1', 'a', 'NN', 'case=nom'), { file: 'c.conllu', checkTags: false }),
    )
    expect([s!.words[0]!.upos, s!.words[0]!.feats]).toEqual(['NN', 'case=nom'])
  })

  it('with skipBad drops a sentence holding a bad line and counts all its lines', async () => {
    const text = [
      '# sent_id = bad',
      word('1', 'a'),
      word('3', 'c'),
      '',
      word('1', 'Koru', 'NOUN', 'Harmony=Back'),
      '',
    ].join('\n')
    const reader = streamConllu(text, { file: 'c.conllu', skipBad: true })
    const sentences = await collect(reader)
    expect(sentences.map((s) => s.words.map((w) => w.form))).toEqual([['Koru']])
    expect(reader.summary).toMatchObject({ lines: 2, skipped: 3, languageSpecific: ['Harmony=Back'] })
    expect(reader.summary.problems.map((p) => [p.code, p.line])).toEqual([['bad-conllu', 3]])
  })
})
