// The coverage report on a hand-counted corpus: source split, ambiguity, single tags, gold recall, scope.
import { describe, expect, it } from 'vitest'
import {
  type Analyzer,
  type ConstrainToken,
  constrainCorpus,
  formatReportSummary,
  sentenceTokens,
} from '../../../src/core/constrain/index.ts'
import { fakeAnalyzer } from './fake-analyzer.ts'

const t = (form: string, gold: string, sentenceInitial = false): ConstrainToken => ({
  form,
  sentenceInitial,
  gold: [gold],
})

// Gold UPOS as a UD annotator would give them; every figure below is counted by hand from this list.
const CORPUS: ConstrainToken[] = [
  t('Surit', 'PRON', true),
  t('volivat', 'VERB'),
  t('kūmele', 'ADJ'),
  t('hatti', 'NOUN'),
  t('ašti', 'ADP'),
  t('zzq', 'X'),
  t('.', 'PUNCT'),
  t('hatti', 'VERB'),
  t('kūmele', 'ADV'),
  t('zzq', 'X'),
  t('Velmora', 'PROPN'),
]

describe('coverage report', () => {
  it('splits token and type coverage by source, leaving out excluded gold tags', async () => {
    const { report, rows } = await constrainCorpus(CORPUS, fakeAnalyzer, {
      level: 'upos',
      excludeGold: ['PUNCT'],
    })
    expect(rows).toHaveLength(8)
    expect(report.tokens.total).toBe(10)
    expect(report.tokens.excluded).toBe(1)
    expect(report.tokens.counts).toEqual({ attested: 4, predicted: 3, guessed: 1, none: 2 })
    expect(report.tokens.coverage).toBeCloseTo(0.8)
    expect(report.types.total).toBe(7)
    expect(report.types.counts).toEqual({ attested: 3, predicted: 2, guessed: 1, none: 1 })
    expect(report.ambiguity).toBeCloseTo(12 / 8)
    expect(report.singleTagShare).toBeCloseTo(0.4)
    expect(report.uncovered).toEqual([{ form: 'zzq', count: 2 }])
  })

  it('measures recall over covered gold tokens and names the misses', async () => {
    const { report } = await constrainCorpus(CORPUS, fakeAnalyzer, { level: 'upos', excludeGold: ['PUNCT'] })
    expect(report.gold).toEqual({
      tokens: 10,
      covered: 8,
      recall: 7 / 8,
      singleTagAccuracy: 1,
      missed: [{ form: 'kūmele', gold: 'ADV', allowed: ['ADJ', 'NOUN'], count: 1 }],
    })
  })

  it('counts every token when nothing is excluded, and has no gold figures without gold', async () => {
    const plain = CORPUS.map(({ form, sentenceInitial }) => ({ form, sentenceInitial }))
    const { report } = await constrainCorpus(plain, fakeAnalyzer, { level: 'upos' })
    expect(report.tokens.total).toBe(11)
    expect(report.tokens.counts.attested).toBe(5)
    expect(report.gold).toBeNull()
  })

  it('needs every word of a multi-word token allowed for a recall hit', async () => {
    // A contraction of ašti + surit, written as one surface token over two syntactic words (UD v2 format).
    const analyzer: Analyzer = (form) =>
      form === 'ašsur' ? [{ lemma: 'ašti', upos: 'ADP', feats: '_', source: 'predicted', score: 0.7 }] : []
    const tokens = sentenceTokens({
      surface: [{ form: 'ašsur', sentenceInitial: true }],
      words: [
        { upos: 'ADP', token: 0 },
        { upos: 'PRON', token: 0 },
      ],
    })
    expect(tokens).toEqual([{ form: 'ašsur', sentenceInitial: true, gold: ['ADP', 'PRON'] }])
    const { report } = await constrainCorpus(tokens, analyzer, { level: 'upos' })
    expect(report.gold?.recall).toBe(0)
    expect(report.gold?.missed[0]?.gold).toBe('ADP+PRON')
  })

  it('prints a readable summary', async () => {
    const { report } = await constrainCorpus(CORPUS, fakeAnalyzer, { level: 'upos', excludeGold: ['PUNCT'] })
    expect(formatReportSummary(report)).toMatchInlineSnapshot(`
      "tokens         10  covered  80.0%  (attested 40.0%, predicted 30.0%, guessed 10.0%, none 20.0%)
      types           7  covered  85.7%  (attested 42.9%, predicted 28.6%, guessed 14.3%, none 14.3%)
      excluded 1 tokens by their gold tag
      ambiguity 1.50 allowed tags per covered token; single tag 40.0% of tokens
      gold: recall 87.5% over 8 covered tokens; single tags right 100.0%
      uncovered: zzq (2)"
    `)
  })
})
