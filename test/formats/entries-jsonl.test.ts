// Entries in JSON lines: lemma-only and tabled entries, hand-written shape checks, located errors.
import { describe, expect, it } from 'vitest'
import { readEntries } from '../../src/formats/index.ts'
import { thrownProblem } from './helpers.ts'

const file = 'entries.jsonl'

describe('readEntries', () => {
  it('reads a lemma-only entry and an entry with a table, canonicalizing FEATS', async () => {
    const text = [
      '{"lemma":"miral","upos":"VERB"}',
      '',
      '{"lemma":"vessa","upos":"NOUN","feats":"Harmony=Front|Gender=Fem","forms":[{"form":"vessat","feats":"Number=Plur|Case=Nom"}]}',
    ].join('\n')
    const result = await readEntries(text, { file })
    expect(result.entries).toEqual([
      { lemma: 'miral', upos: 'VERB', feats: '_', file, line: 1 },
      {
        lemma: 'vessa',
        upos: 'NOUN',
        feats: 'Gender=Fem|Harmony=Front',
        forms: [{ form: 'vessat', feats: 'Case=Nom|Number=Plur' }],
        file,
        line: 3,
      },
    ])
    expect(result.languageSpecific).toEqual(['Harmony=Front'])
    expect(result.lines).toBe(3)
  })

  it('normalizes strings decoded from JSON escapes to NFC', async () => {
    const { entries } = await readEntries('{"lemma":"vesse\\u0301","upos":"NOUN"}', { file })
    expect(entries[0]!.lemma).toBe('vess\u00e9')
  })

  it.each([
    ['broken JSON', '{"lemma":"vessa",', 'bad-json'],
    ['a # comment (JSON has none)', '# entries', 'bad-json'],
    ['an array', '["vessa","NOUN"]', 'bad-entry'],
    ['a missing upos', '{"lemma":"vessa"}', 'bad-entry'],
    ['a number as lemma', '{"lemma":7,"upos":"NOUN"}', 'bad-entry'],
    ['an unknown key', '{"lemma":"vessa","upos":"NOUN","form":[]}', 'bad-entry'],
    ['forms that are not an array', '{"lemma":"vessa","upos":"NOUN","forms":{}}', 'bad-entry'],
    ['an empty forms array', '{"lemma":"vessa","upos":"NOUN","forms":[]}', 'bad-entry'],
    ['a form without feats', '{"lemma":"vessa","upos":"NOUN","forms":[{"form":"vessat"}]}', 'bad-entry'],
    ['an empty lemma', '{"lemma":"","upos":"NOUN"}', 'empty-field'],
    ['an empty form', '{"lemma":"vessa","upos":"NOUN","forms":[{"form":" ","feats":"_"}]}', 'empty-field'],
    [
      'a tab inside a form',
      '{"lemma":"vessa","upos":"NOUN","forms":[{"form":"a\\tb","feats":"_"}]}',
      'control-char',
    ],
    ['a lone surrogate escape', '{"lemma":"\\ud800","upos":"NOUN"}', 'bad-utf8'],
    ['an unknown UPOS', '{"lemma":"vessa","upos":"Noun"}', 'bad-upos'],
    ['malformed feats', '{"lemma":"vessa","upos":"NOUN","feats":"Gender:Fem"}', 'bad-feats'],
    [
      'malformed form feats',
      '{"lemma":"vessa","upos":"NOUN","forms":[{"form":"v","feats":"Case=nom"}]}',
      'bad-feats',
    ],
  ])('names file and line of %s', async (_name, badLine, code) => {
    const text = `{"lemma":"miral","upos":"VERB"}\n${badLine}\n`
    expect(await thrownProblem(() => readEntries(text, { file }))).toEqual({ code, where: `${file}:2` })
  })
})
