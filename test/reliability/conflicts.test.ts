// Conflicting sources are reported and resolved by the documented rule: both tables kept, as variants.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Workdir, workdir } from './cli.ts'
import { asFile, demoSample } from './demo-sample.ts'

const entry = (gen: string) =>
  JSON.stringify({
    lemma: 'vessa',
    upos: 'NOUN',
    forms: [
      { form: 'vessa', feats: 'Case=Nom' },
      { form: gen, feats: 'Case=Gen' },
    ],
  })
const rows = (gen: string) => `vessa\tvessa\tNOUN\tCase=Nom\nvessa\t${gen}\tNOUN\tCase=Gen\n`

let w: Workdir
beforeAll(async () => {
  w = await workdir({
    'two.jsonl': `${entry('vessan')}\n${entry('vessin')}\n`,
    'a.tsv': rows('vessan'),
    'b.tsv': rows('vessin'),
  })
})
afterAll(() => w.dispose())

/** The genitive forms `expand` gives vessa in a model, in order. */
async function genitives(model: string): Promise<string[]> {
  const r = await w.run(['expand', '-m', model, '-'], { stdin: 'vessa\tNOUN\n' })
  expect(r.code).toBe(0)
  return r.stdout
    .trim()
    .split('\n')
    .map((l) => l.split('\t'))
    .filter((c) => c[3] === 'Case=Gen')
    .map((c) => c[1]!)
}

describe('conflicting tables for one lemma', () => {
  // README, merging rules: "Two JSON entries with different tables for one lemma are both kept (their rows
  // become variants) and reported as a conflict."
  it('from two entries of a file: a note at the second, both genitives kept as variants in input order', async () => {
    const r = await w.run(['learn', 'two.jsonl', '-o', 'two.json'])
    expect(r.code).toBe(0)
    expect(r.stderr).toContain(
      'note: two.jsonl:2: vessa (NOUN) has a second, different table; the rows of both are kept as variants',
    )
    expect(await genitives('two.json')).toEqual(['vessan', 'vessin'])
  })

  it('from two files: a note naming the second file, variants in the order the files were given', async () => {
    const ab = await w.run(['learn', 'a.tsv', 'b.tsv', '-o', 'ab.json'])
    const ba = await w.run(['learn', 'b.tsv', 'a.tsv', '-o', 'ba.json'])
    expect(ab.stderr).toContain('note: b.tsv:1: vessa (NOUN) has a second, different table')
    expect(ba.stderr).toContain('note: a.tsv:1: vessa (NOUN) has a second, different table')
    expect(await genitives('ab.json')).toEqual(['vessan', 'vessin'])
    expect(await genitives('ba.json')).toEqual(['vessin', 'vessan'])
  })

  it('from the same file given twice: no note, and the model of the file once', async () => {
    const twice = await w.run(['learn', 'a.tsv', 'a.tsv', '-o', 'aa.json'])
    const once = await w.run(['learn', 'a.tsv', '-o', 'a.json'])
    expect(twice.stderr).not.toContain('note:')
    expect((await w.read('aa.json')).equals(await w.read('a.json'))).toBe(true)
    expect(once.code).toBe(0)
  })
})

describe('evaluate --skip-bad', () => {
  it('says what it skipped in each file and scores the good rows', async () => {
    const { tables } = demoSample(4, 0)
    await w.write('train.tsv', asFile([...tables.slice(0, 200), 'vessa\tvessan\tNN\t_']))
    await w.write('test.tsv', asFile(['vessa\tvessan\tNOUN\tCase', ...tables.slice(200)]))
    const r = await w.run(['evaluate', '--skip-bad', '--train', 'train.tsv', '--test', 'test.tsv', '--json'])
    expect(r.code).toBe(0)
    expect(r.stderr).toContain('skipped 1 bad line(s); first ones:\n  train.tsv:201: unknown UPOS "NN"')
    expect(r.stderr).toContain('skipped 1 bad line(s); first ones:\n  test.tsv:1: malformed feature "Case"')
    expect(Object.keys(JSON.parse(r.stdout))).toContain('formAccuracy')
  })
})
