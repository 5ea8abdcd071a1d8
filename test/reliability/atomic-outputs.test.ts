// Failed runs leave no output and do not touch an existing one; a successful run replaces a file whole.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { DEMO, type Workdir, workdir } from './cli.ts'
import { asFile, demoSample } from './demo-sample.ts'

const sample = demoSample(3, 20)
const OLD = 'an older file that a failed run must leave as it is\n'
const CORPUS = 'Kekke šakko möltesi tuvošet. Jaisin.\nJötien sulaš, kelmät mistäsivät törvellät.\n'
const CONLLU = '1\tKekke\t_\t_\t_\t_\t_\t_\t_\t_\n2\tšakko\t_\t_\t_\t_\t_\t_\t_\t_\n\n'

let w: Workdir
beforeAll(async () => {
  w = await workdir({
    'tables.tsv': asFile(sample.tables),
    'lemmas.tsv': asFile(sample.lemmas),
    'corpus.txt': CORPUS,
  })
  expect((await w.run(['learn', 'tables.tsv', 'lemmas.tsv', '-o', 'model.json'])).code).toBe(0)
})
afterAll(() => w.dispose())

/** Put `OLD` in the named files, run, and return the result with what the files hold afterwards. */
async function runOver(names: string[], args: string[]) {
  for (const n of names) await w.write(n, OLD)
  const r = await w.run(args)
  const after = await Promise.all(names.map(async (n) => (await w.read(n)).toString('utf8')))
  const temporary = (await w.list()).filter((n) => n.endsWith('.tmp'))
  return { ...r, after, temporary }
}

interface FailedRun {
  name: string
  files: Record<string, string | Uint8Array>
  args: string[]
  outputs: string[]
  says: string
}

const failed: FailedRun[] = [
  {
    name: 'learn on a bad row',
    files: { 'bad1.tsv': `${asFile(sample.tables)}vessa\tvessan\tNN\t_\n` },
    args: ['learn', 'bad1.tsv', '-o', 'old1.json'],
    outputs: ['old1.json'],
    says: 'bad1.tsv:',
  },
  {
    name: 'learn whose second source is bad',
    files: { 'bad2.tsv': 'koru\tNOUN\nvessa\tNOUN\tCase\n' },
    args: ['learn', 'tables.tsv', 'bad2.tsv', '-o', 'old2.json'],
    outputs: ['old2.json'],
    says: 'bad2.tsv:2:',
  },
  {
    name: 'learn of a missing source',
    files: {},
    args: ['learn', 'tables.tsv', 'missing.tsv', '-o', 'old3.json'],
    outputs: ['old3.json'],
    says: 'missing.tsv: cannot read the file (no such file)',
  },
  {
    name: 'constrain on a corpus with a NUL byte',
    files: { 'nul.txt': 'Kekke šakko.\nJai\u0000sin.\n' },
    args: ['constrain', '-m', 'model.json', 'nul.txt', '-o', 'old4.tsv', '--report', 'old4.json'],
    outputs: ['old4.tsv', 'old4.json'],
    says: 'nul.txt:2: NUL byte',
  },
  {
    name: 'constrain on invalid UTF-8',
    files: { 'latin1.txt': Buffer.from('Kekke\nh\xe4us\n', 'latin1') },
    args: ['constrain', '-m', 'model.json', 'latin1.txt', '-o', 'old5.tsv', '--report', 'old5.json'],
    outputs: ['old5.tsv', 'old5.json'],
    says: 'latin1.txt:2: line is not valid UTF-8',
  },
  {
    name: 'constrain with a model file that is not a model',
    files: { 'notmodel.json': '{"hello":"world"}' },
    args: ['constrain', '-m', 'notmodel.json', 'corpus.txt', '-o', 'old6.tsv', '--report', 'old6.json'],
    outputs: ['old6.tsv', 'old6.json'],
    says: 'notmodel.json',
  },
  {
    name: 'constrain --conllu on a plain-text corpus',
    files: {},
    args: [
      'constrain',
      '-m',
      'model.json',
      'corpus.txt',
      '-o',
      'old7.tsv',
      '--report',
      'old7.json',
      '--conllu',
      'old7.conllu',
    ],
    outputs: ['old7.tsv', 'old7.json', 'old7.conllu'],
    says: '--conllu',
  },
  {
    name: 'constrain --conllu with a bad sentence',
    files: { 'bad.conllu': `${CONLLU}1\tJaisin\t_\tNN\t_\tCase\t_\t_\t_\t_\n\n` },
    args: [
      'constrain',
      '-m',
      'model.json',
      'bad.conllu',
      '-o',
      'old8.tsv',
      '--report',
      'old8.json',
      '--conllu',
      'old8.conllu',
    ],
    outputs: ['old8.tsv', 'old8.json', 'old8.conllu'],
    says: 'bad.conllu:4:',
  },
]

describe('a failed run', () => {
  it.each(failed)('$name exits 2 and leaves the existing outputs as they were', async (c) => {
    for (const [name, data] of Object.entries(c.files)) await w.write(name, data)
    const r = await runOver(c.outputs, c.args)
    expect(r.code).toBe(2)
    expect(r.stderr).toContain(c.says)
    expect(r.after).toEqual(c.outputs.map(() => OLD))
    expect(r.temporary).toEqual([])
  })

  it('learn into a missing directory exits 1 naming the output, creating nothing', async () => {
    const r = await w.run(['learn', 'tables.tsv', '-o', 'no-such-dir/model.json'])
    expect([r.code, r.stderr.trim()]).toEqual([1, 'formfold: cannot write no-such-dir/model.json: ENOENT'])
    expect((await w.list()).filter((n) => n.startsWith('no-such-dir') || n.endsWith('.tmp'))).toEqual([])
  })

  it('expand with a bad lemma list exits 2 before writing any table', async () => {
    await w.write('bad-lemmas.tsv', 'koru\tNOUN\nvessa\tNOUN\nmiral\tVERBB\n')
    const r = await w.run(['expand', '-m', 'model.json', 'bad-lemmas.tsv'])
    expect([r.code, r.stdout]).toEqual([2, ''])
    expect(r.stderr).toContain('bad-lemmas.tsv:3: unknown UPOS "VERBB"')
  })
})

describe('a successful run', () => {
  it('learn replaces an existing model whole, with no temporary file left', async () => {
    const r = await runOver(['replaced.json'], ['learn', 'tables.tsv', 'lemmas.tsv', '-o', 'replaced.json'])
    expect(r.code).toBe(0)
    expect(r.after[0]).toBe((await w.read('model.json')).toString('utf8'))
    expect(r.temporary).toEqual([])
  })

  it('constrain replaces the constraint file and the report together', async () => {
    const r = await runOver(
      ['new.tsv', 'new.json'],
      ['constrain', '-m', 'model.json', 'corpus.txt', '-o', 'new.tsv', '--report', 'new.json'],
    )
    expect(r.code).toBe(0)
    expect(r.after[0]).toContain('Kekke')
    expect(JSON.parse(r.after[1]!)).toHaveProperty('tokens')
    expect(r.temporary).toEqual([])
  })

  it('expand --skip-bad says what it skipped and expands the good lemmas', async () => {
    await w.write('some-bad.tsv', 'koru\tNOUN\tGender=Fem\nvessa\tNOUNN\n')
    const r = await w.run(['expand', '--skip-bad', '-m', 'model.json', 'some-bad.tsv'])
    expect(r.code).toBe(0)
    expect(r.stderr).toContain('skipped 1 bad line(s); first ones:\n  some-bad.tsv:2: unknown UPOS "NOUNN"')
    expect(
      new Set(
        r.stdout
          .trim()
          .split('\n')
          .map((l) => l.split('\t')[0]),
      ),
    ).toEqual(new Set(['koru']))
  })
})

describe('an interrupted run', () => {
  it('learn stopped by SIGTERM while learning leaves the old model and no temporary file', async () => {
    await w.write('demo.json', OLD)
    const r = await w.run(['learn', `${DEMO}tables.tsv`, `${DEMO}lemmas.tsv`, '-o', 'demo.json'], {
      started: (child) => setTimeout(() => child.kill('SIGTERM'), 1500),
    })
    const after = (await w.read('demo.json')).toString('utf8')
    // Either the signal came first (old file) or learning had finished (a whole new model): never a part.
    if (r.signal === 'SIGTERM') expect(after).toBe(OLD)
    else expect(JSON.parse(after)).toMatchObject({ format: 'formfold-model' })
    expect((await w.list()).filter((n) => n.endsWith('.tmp'))).toEqual([])
  }, 60_000)
})
