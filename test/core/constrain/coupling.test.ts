// Token and type constraints coupled (Täckström et al. 2013, TACL): the rule, and a hand-made CoNLL-U file.
import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import {
  allowedLookup,
  annotateConllu,
  annotateConlluLine,
  type ConstrainToken,
  constrainCorpus,
  coupleConstraints,
  parseTokenTagSource,
  ruleCounts,
  sentenceTokens,
  type TokenTagSource,
} from '../../../src/core/constrain/index.ts'
import { streamConllu } from '../../../src/formats/index.ts'
import { fakeAnalyzer } from './fake-analyzer.ts'

const fixture = (name: string) => readFileSync(new URL(`fixtures/${name}`, import.meta.url), 'utf8')

describe('coupleConstraints', () => {
  it.each([
    ['intersection: the token tag is a type tag', ['NOUN', 'VERB'], 'VERB', ['VERB'], 'intersection'],
    ['fallback: empty intersection keeps the type', ['ADJ', 'NOUN'], 'ADV', ['ADJ', 'NOUN'], 'fallback'],
    ['token: an unconstrained type takes the token tag', null, 'NOUN', ['NOUN'], 'token'],
    ['type: no token tag', ['ADP'], undefined, ['ADP'], 'type'],
    ['unconstrained: neither', null, undefined, null, 'unconstrained'],
  ] as const)('%s', (_name, type, token, allowed, rule) => {
    expect(coupleConstraints(type, token)).toEqual({ allowed, rule })
  })
})

describe('parseTokenTagSource', () => {
  it.each([
    ['upos', { column: 'upos' }],
    ['misc:Projected', { column: 'misc', key: 'Projected' }],
    ['misc:', undefined],
    ['xpos', undefined],
  ])('%s', (text, expected) => {
    expect(parseTokenTagSource(text)).toEqual(expected)
  })
})

async function annotate(tokenTags: TokenTagSource | undefined) {
  const text = fixture('coupling.conllu')
  const tokens: ConstrainToken[] = []
  for await (const sentence of streamConllu(text, { file: 'coupling.conllu' }))
    tokens.push(...sentenceTokens(sentence))
  const options = { level: 'upos' } as const
  const { rows } = await constrainCorpus(tokens, fakeAnalyzer, options)
  const counts = ruleCounts()
  const lines = text.split('\n').map((t, i) => ({ text: t, line: i + 1 }))
  const out: string[] = []
  for await (const line of annotateConllu(
    lines,
    allowedLookup(rows, fakeAnalyzer, options),
    { tokenTags },
    counts,
  )) {
    out.push(line)
  }
  return { text: out.join('\n'), counts }
}

describe('CoNLL-U with allowed tags in MISC', () => {
  it('shows intersection, fallback, token-only and unconstrained words on a hand-made file', async () => {
    const { text, counts } = await annotate({ column: 'misc', key: 'Projected' })
    expect(text).toBe(fixture('coupling.expected.conllu'))
    expect(counts).toEqual({ intersection: 4, fallback: 1, token: 1, type: 3, unconstrained: 1 })
  })

  it('writes type constraints alone when no token tags are named', async () => {
    const { text, counts } = await annotate(undefined)
    expect(text).toContain('1\tSurit\tsurit\tPRON\t_\t_\t2\tnsubj\t_\tProjected=PRON|Allowed=PRON')
    expect(text).toContain('3\tkūmele\tkūme\tADJ\t_\t_\t2\tobj\t_\tProjected=ADV|Allowed=ADJ,NOUN')
    expect(text).toContain('4\tzzq\tzzq\tNOUN\t_\t_\t3\tnmod\t_\tProjected=NOUN|SpaceAfter=No|Allowed=*')
    expect(counts).toEqual({ intersection: 0, fallback: 0, token: 0, type: 8, unconstrained: 2 })
  })

  it('reads token tags from the UPOS column', async () => {
    const { counts } = await annotate({ column: 'upos' })
    // kūmele's UPOS column says ADJ, which its type allows; zzq's NOUN stands alone twice.
    expect(counts).toEqual({ intersection: 8, fallback: 0, token: 2, type: 0, unconstrained: 0 })
  })

  it('replaces an earlier Allowed value and leaves ranges and empty nodes alone', () => {
    const allowed = () => ['NOUN']
    const line = annotateConlluLine('1\thatti\t_\t_\t_\t_\t0\troot\t_\tAllowed=VERB|Gloss=x', allowed, {})
    expect(line).toEqual({ text: '1\thatti\t_\t_\t_\t_\t0\troot\t_\tGloss=x|Allowed=NOUN' })
    for (const text of [
      '1-2\tAšsur\t_\t_\t_\t_\t_\t_\t_\t_',
      '4.1\tvolivat\tvolla\tVERB\t_\t_\t_\t_\t3:conj\t_',
      '# c',
    ]) {
      expect(annotateConlluLine(text, allowed, {})).toEqual({ text })
    }
  })

  it('reports a token tag that is not a UPOS tag as a problem', () => {
    const result = annotateConlluLine('1\thatti\t_\tnoun\t_\t_\t0\troot\t_\t_', () => null, {
      tokenTags: { column: 'upos' },
    })
    expect(result).toEqual({
      problem: {
        code: 'bad-upos',
        message: 'token tag "noun" in UPOS column is not one of the 17 UPOS tags',
      },
    })
  })
})
