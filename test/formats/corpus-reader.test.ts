// Corpora: plain-text word tokens with sentence-initial marks, and telling text from CoNLL-U.
import { describe, expect, it } from 'vitest'
import { openCorpus, sniffCorpusLine, streamTextTokens, tokenizeLine } from '../../src/formats/index.ts'
import { collect, utf8 } from './helpers.ts'

const conllu =
  '# text = Vessa miral\n1\tVessa\tvessa\tNOUN\t_\t_\t2\tnsubj\t_\t_\n2\tmiral\tmiral\tVERB\t_\t_\t0\troot\t_\t_\n'

describe('tokenizeLine', () => {
  it.each([
    ['keeps word-like segments only', 'Vessa, miral — koru.', ['Vessa', 'miral', 'koru']],
    ['keeps numbers as words', 'Vessa 42 koru', ['Vessa', '42', 'koru']],
  ])('%s', (_name, text, forms) => {
    const tokens = tokenizeLine(text, 4)
    expect(tokens.map((t) => t.form)).toEqual(forms)
    expect(tokens.every((t) => t.line === 4)).toBe(true)
  })

  it.each([
    [
      'marks the first word and words after . ! ?',
      'Vessa miral. Koru! Tenna? ja',
      ['Vessa', 'Koru', 'Tenna', 'ja'],
    ],
    ['does not mark words after a comma or dash', 'Vessa, miral — koru', ['Vessa']],
    ['marks a word after quotes and a full stop', 'Vessa miral.» Koru', ['Vessa', 'Koru']],
  ])('%s', (_name, text, initial) => {
    expect(
      tokenizeLine(text, 1)
        .filter((t) => t.sentenceInitial)
        .map((t) => t.form),
    ).toEqual(initial)
  })

  it('marks a word after a sentence terminal of another script (Unicode Sentence_Terminal)', () => {
    expect(tokenizeLine('vessa。koru', 1).map((t) => t.sentenceInitial)).toEqual([true, true])
  })
})

describe('streamTextTokens', () => {
  it('gives each token its line, and the first word of every line is sentence-initial', async () => {
    const tokens = await collect(streamTextTokens('Vessa miral\nkoru tenna.\n\nJa', { file: 't.txt' }))
    expect(tokens.map((t) => [t.form, t.line, t.sentenceInitial])).toEqual([
      ['Vessa', 1, true],
      ['miral', 1, false],
      ['koru', 2, true],
      ['tenna', 2, false],
      ['Ja', 4, true],
    ])
  })

  it('with skipBad counts an unreadable line and reads on', async () => {
    const reader = streamTextTokens(new Uint8Array([0x61, 10, 0xff, 10, 0x62]), {
      file: 't.txt',
      skipBad: true,
    })
    expect((await collect(reader)).map((t) => t.form)).toEqual(['a', 'b'])
    expect(reader.summary).toMatchObject({ lines: 2, skipped: 1 })
  })
})

describe('openCorpus', () => {
  it.each([
    ['CoNLL-U by its first word line', 'upload', conllu, 'conllu'],
    ['CoNLL-U by a .conllu name', 'gold.conllu', '\n', 'conllu'],
    ['plain text, even after a # heading', 'notes.txt', '# Vessa\nVessa miral.\n', 'text'],
    ['plain text holding tabs', 'upload', 'Vessa\tmiral\n', 'text'],
  ])('sniffs %s', async (_name, file, text, format) => {
    expect((await openCorpus(utf8(text), { file })).format).toBe(format)
  })

  it('yields CoNLL-U surface tokens, and a # line of plain text as words', async () => {
    const fromConllu = await collect(await openCorpus(conllu, { file: 'upload' }))
    expect(fromConllu).toEqual([
      { form: 'Vessa', line: 2, sentenceInitial: true },
      { form: 'miral', line: 3, sentenceInitial: false },
    ])
    const fromText = await collect(await openCorpus('# Vessa\nmiral\n', { file: 'upload' }))
    expect(fromText.map((t) => t.form)).toEqual(['Vessa', 'miral'])
  })
})

describe('sniffCorpusLine', () => {
  it.each([
    ['', undefined],
    ['# sent_id = 1', undefined],
    ['1-2\tdel\t_\t_\t_\t_\t_\t_\t_\t_', 'conllu'],
    ['3.1\tx\t_\t_\t_\t_\t_\t_\t_\t_', 'conllu'],
    ['1\tonly\tthree', 'text'],
    ['Vessa miral.', 'text'],
  ])('%j → %s', (line, format) => {
    expect(sniffCorpusLine(line)).toBe(format)
  })
})
