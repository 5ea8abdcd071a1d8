// The constraint file: header naming model and options, one row per form, unconstrained rows explicit.
import { describe, expect, it } from 'vitest'
import {
  type ConstraintFileHeader,
  constrainCorpus,
  lexiconConstraints,
  writeConstraintFile,
} from '../../../src/core/constrain/index.ts'
import { fakeAnalyzer } from './fake-analyzer.ts'

const tokens = ['hatti', 'zzq', 'hatti', 'kūmele', 'Surit', 'hatti'].map((form, i) => ({
  form,
  sentenceInitial: i === 4,
}))

async function file(level: 'upos' | 'full', format: 'tsv' | 'jsonl') {
  const options = { level }
  const { rows, tally } = await constrainCorpus(tokens, fakeAnalyzer, options)
  const header: ConstraintFileHeader = {
    model: { name: 'sulvasti-demo', version: 2 },
    corpus: { file: 'sample.txt', tokens: tally.tokens, types: tally.types },
    options,
  }
  return [...writeConstraintFile(rows, header, format)].join('')
}

describe('writeConstraintFile', () => {
  it('writes TSV with a traceable header, most frequent form first, unconstrained forms kept', async () => {
    expect(await file('upos', 'tsv')).toMatchInlineSnapshot(`
      "# formfold constraint file
      # model: sulvasti-demo, version 2
      # corpus: sample.txt, 6 tokens, 4 form types
      # options: level=upos min-score=0 sources=attested,predicted,guessed best-source-only=no
      # allowed: UPOS tags joined with ","; "*" = unconstrained, every tag allowed (no candidate)
      # source: best source of the form analyses (attested, predicted or guessed; predicted and guessed are hypotheses), none = no candidate
      form	count	source	allowed
      hatti	3	attested	NOUN,VERB
      Surit	1	attested	PRON
      kūmele	1	predicted	ADJ,NOUN
      zzq	1	none	*
      "
    `)
  })

  it('writes UPOS|FEATS tags joined with ";" at the full level', async () => {
    const text = await file('full', 'tsv')
    expect(text).toContain('hatti\t3\tattested\tNOUN|Case=Nom|Number=Sing;VERB|VerbForm=Inf\n')
    expect(text).toContain('# options: level=full ')
  })

  it('writes JSON lines: a meta line, then rows with analyses, null for unconstrained', async () => {
    const lines = (await file('upos', 'jsonl'))
      .trimEnd()
      .split('\n')
      .map((l) => JSON.parse(l))
    expect(lines[0].meta.model).toEqual({ name: 'sulvasti-demo', version: 2 })
    expect(lines[0].meta.options.described).toBe(
      'level=upos min-score=0 sources=attested,predicted,guessed best-source-only=no',
    )
    expect(lines.slice(1).map((l) => [l.form, l.count, l.allowed])).toEqual([
      ['hatti', 3, ['NOUN', 'VERB']],
      ['Surit', 1, ['PRON']],
      ['kūmele', 1, ['ADJ', 'NOUN']],
      ['zzq', 1, null],
    ])
    expect(lines[1].analyses[1]).toEqual({
      lemma: 'hatta',
      upos: 'VERB',
      feats: 'VerbForm=Inf',
      source: 'guessed',
      score: 0.1,
    })
  })

  it('writes the whole-lexicon file with count 0 and no corpus', () => {
    const options = { level: 'upos' } as const
    const rows = lexiconConstraints(['surit', 'ašti', 'surit', 'zzq'], fakeAnalyzer, options)
    const header: ConstraintFileHeader = {
      model: { name: 'sulvasti-demo', version: 2 },
      corpus: null,
      options,
    }
    const lines = [...writeConstraintFile(rows, header)].join('').split('\n')
    expect(lines).toContain('# corpus: none; every form the model knows (count 0)')
    expect(lines.slice(-4)).toEqual([
      'surit\t0\tattested\tPRON',
      'ašti\t0\tattested\tADP',
      'zzq\t0\tnone\t*',
      '',
    ])
  })

  it('refuses a form that would break the TSV', () => {
    const rows = [{ form: 'a\tb', count: 1, source: 'none' as const, allowed: null, analyses: [] }]
    const header: ConstraintFileHeader = {
      model: { name: 'm', version: 1 },
      corpus: null,
      options: { level: 'upos' },
    }
    expect(() => [...writeConstraintFile(rows, header)]).toThrow(/tab or line break/)
  })
})
