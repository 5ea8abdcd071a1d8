// Bad entries (.jsonl) and empty inputs: the JSON line named, "no entries" for a file with nothing to learn.
import { expect, it } from 'vitest'
import { type BadCase, describeBadInput } from './bad-input.ts'
import { workdir } from './cli.ts'

const GOOD =
  '{"lemma":"vessa","upos":"NOUN","forms":[{"form":"vessa","feats":"Case=Nom"}]}\n{"lemma":"koru","upos":"NOUN"}\n'
const entry = (line: string): string => `${GOOD}${line}\n`

const cases: BadCase[] = [
  {
    name: 'a line that is not JSON',
    file: 'bad.jsonl',
    data: entry('{"lemma":"vessa",'),
    says: 'not valid JSON',
  },
  {
    name: 'a misspelt key',
    file: 'bad.jsonl',
    data: entry('{"lemma":"vessa","upos":"NOUN","form":[]}'),
    says: 'unknown key "form"',
  },
  {
    name: 'an empty forms list',
    file: 'bad.jsonl',
    data: entry('{"lemma":"vessa","upos":"NOUN","forms":[]}'),
    says: '"forms" is empty',
  },
  {
    name: 'a lemma that is not a string',
    file: 'bad.jsonl',
    data: entry('{"lemma":7,"upos":"NOUN"}'),
    says: '"lemma" must be a string',
  },
  {
    name: 'an escaped tab in a form',
    file: 'bad.jsonl',
    data: entry('{"lemma":"vessa","upos":"NOUN","forms":[{"form":"a\\tb","feats":"_"}]}'),
    says: 'forms[0].form "a\tb" contains a tab or control character',
  },
  {
    name: 'an escaped lone surrogate',
    file: 'bad.jsonl',
    data: entry('{"lemma":"ve\\ud800ssa","upos":"NOUN"}'),
    says: 'lemma contains a lone surrogate',
  },
  {
    name: 'malformed FEATS in a form',
    file: 'bad.jsonl',
    data: entry('{"lemma":"vessa","upos":"NOUN","forms":[{"form":"vessan","feats":"Case:Gen"}]}'),
    says: 'malformed feature "Case:Gen"',
  },
]

describeBadInput('learn on bad entries', cases)

const empty: [string, string | Uint8Array, string][] = [
  ['an empty file', '', 'no entries found (0 lines read)'],
  ['comments and blank lines only', '# nothing yet\n\n   \n', 'no entries found (3 lines read)'],
  ['a byte order mark alone', new Uint8Array([0xef, 0xbb, 0xbf]), 'no entries found (1 lines read)'],
]

it.concurrent.each(empty)('learn on %s says "no entries" and exits 2', async (_, data, says) => {
  const w = await workdir({ 'empty.tsv': data })
  try {
    const r = await w.run(['learn', 'empty.tsv', '-o', 'out.json'])
    expect([r.code, r.stderr.trim()]).toEqual([2, `formfold: empty.tsv: ${says}`])
    expect(await w.list()).toEqual(['empty.tsv'])
  } finally {
    await w.dispose()
  }
})

it.concurrent('learn with --skip-bad on a file of bad lines only says "no entries" and exits 2', async () => {
  const w = await workdir({ 'bad.tsv': 'vessa\tvessan\tNN\t_\nvessa\tvessan\tNOUN\tCase\n' })
  try {
    const r = await w.run(['learn', '--skip-bad', 'bad.tsv', '-o', 'out.json'])
    expect([r.code, r.stderr.trim()]).toEqual([
      2,
      'formfold: bad.tsv: no entries found (0 lines read, 2 bad lines skipped)',
    ])
    expect(await w.list()).toEqual(['bad.tsv'])
  } finally {
    await w.dispose()
  }
})
