// Malformed table rows: wrong column count, empty fields, malformed FEATS, unknown UPOS, over-long words.
import { expect, it } from 'vitest'
import { MAX_WORD_CHARS } from '../../src/formats/index.ts'
import { type BadCase, describeBadInput, GOOD } from './bad-input.ts'
import { workdir } from './cli.ts'

const row = (line: string): string => `${GOOD}${line}\n`
const COLUMNS = 'expected 4 tab-separated columns (lemma, form, upos, feats)'

// The rules are UD v2's (universaldependencies.org/format.html and /u/feat/): the 17 UPOS tags, FEATS as
// Name=Value pairs joined by |, each name once, universal features with their universal values only.
const cases: BadCase[] = [
  {
    name: 'five columns',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tCase=Gen\textra'),
    says: `${COLUMNS}, found 5`,
  },
  { name: 'three columns', file: 'bad.tsv', data: row('vessa\tvessan\tNOUN'), says: `${COLUMNS}, found 3` },
  {
    name: 'spaces for tabs',
    file: 'bad.tsv',
    data: row('vessa vessan NOUN Case=Gen'),
    says: `${COLUMNS}, found 1`,
  },
  { name: 'an empty lemma', file: 'bad.tsv', data: row('\tvessan\tNOUN\tCase=Gen'), says: 'lemma is empty' },
  { name: 'a blank form', file: 'bad.tsv', data: row('vessa\t  \tNOUN\tCase=Gen'), says: 'form is empty' },
  {
    name: 'a feature without a value',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tCase'),
    says: 'malformed feature "Case"',
  },
  {
    name: 'a lower-case feature name',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tcase=Gen'),
    says: 'malformed feature name "case"',
  },
  {
    name: 'a feature given twice',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tCase=Gen|Case=Acc'),
    says: 'feature "Case" appears twice',
  },
  {
    name: 'FEATS joined by ;',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tCase=Gen;Number=Sing'),
    says: 'malformed value "Gen;Number=Sing"',
  },
  {
    name: 'a value UD does not have',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNOUN\tCase=Genitive'),
    says: '"Genitive" is not a universal value of Case',
  },
  {
    name: 'an unknown UPOS',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tNN\tCase=Gen'),
    says: 'unknown UPOS "NN"',
  },
  {
    name: 'a lower-case UPOS',
    file: 'bad.tsv',
    data: row('vessa\tvessan\tnoun\tCase=Gen'),
    says: 'unknown UPOS "noun"',
  },
  {
    name: 'a form over the word limit',
    file: 'bad.tsv',
    data: row(`vessa\t${'ka'.repeat(MAX_WORD_CHARS)}\tNOUN\t_`),
    says: `form is ${2 * MAX_WORD_CHARS} characters long (at most ${MAX_WORD_CHARS})`,
  },
  {
    name: 'a lemma over the word limit',
    file: 'bad.tsv',
    data: row(`${'ka'.repeat(MAX_WORD_CHARS)}\tvessan\tNOUN\t_`),
    says: `lemma is ${2 * MAX_WORD_CHARS} characters long`,
  },
  {
    name: 'four columns in a lemma list',
    file: 'bad.tsv',
    data: 'vessa\tNOUN\nkoru\tNOUN\tGender=Fem\nmiral\tmiran\tVERB\t_\n',
    says: 'expected 2 or 3 tab-separated columns (lemma, upos[, feats]), found 4',
  },
]

describeBadInput('learn on malformed table rows', cases)

it.concurrent('learn stops at the first of several bad lines', async () => {
  const w = await workdir({ 'bad.tsv': `${row('vessa\tvessan\tNN\t_')}vessa\tvessan\tNOUN\tCase\n` })
  try {
    const r = await w.run(['learn', 'bad.tsv', '-o', 'out.json'])
    expect([r.code, r.stderr.trim()]).toEqual([
      2,
      'formfold: bad.tsv:3: unknown UPOS "NN" (expected one of the 17 UD tags, e.g. NOUN)',
    ])
  } finally {
    await w.dispose()
  }
})

it.concurrent('learn accepts a word of exactly the word limit', async () => {
  const stem = 'ka'.repeat(MAX_WORD_CHARS).slice(0, MAX_WORD_CHARS - 1)
  const w = await workdir({
    'long.tsv': `${stem}a\t${stem}a\tNOUN\tCase=Nom\n${stem}a\t${stem}n\tNOUN\tCase=Gen\n`,
  })
  try {
    expect((await w.run(['learn', 'long.tsv', '-o', 'out.json'])).code).toBe(0)
  } finally {
    await w.dispose()
  }
})
