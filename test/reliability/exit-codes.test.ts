// Every command's exit code: 2 for bad usage or bad input (a missing or malformed file named in the message).
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Workdir, workdir } from './cli.ts'
import { asFile, demoSample } from './demo-sample.ts'

interface ExitCase {
  name: string
  args: string[]
  /** A part of stderr. */
  says: string
}

const NOT_A_MODEL = '{"hello":"world"}\n'

// README, command line: "Exit codes: 0 done, 1 failed, 2 bad usage or bad input (the message names `file:line`)".
const cases: ExitCase[] = [
  { name: 'an unknown command', args: ['fold'], says: "unknown command 'fold'" },
  {
    name: 'an unknown option',
    args: ['learn', '--bogus', 'tables.tsv', '-o', 'x.json'],
    says: "unknown option '--bogus'",
  },
  { name: 'learn without -o', args: ['learn', 'tables.tsv'], says: "required option '-o, --output <model>'" },
  {
    name: 'learn of a missing file',
    args: ['learn', 'missing.tsv', '-o', 'x.json'],
    says: 'missing.tsv: cannot read the file (no such file)',
  },
  {
    name: 'learn of a directory',
    args: ['learn', '.', '-o', 'x.json'],
    says: '.: cannot read the file (is a directory)',
  },
  {
    name: 'expand with a missing model',
    args: ['expand', '-m', 'missing.json'],
    says: 'missing.json: cannot read the model file',
  },
  {
    name: 'expand with a file that is not a model',
    args: ['expand', '-m', 'notmodel.json'],
    says: 'notmodel.json',
  },
  {
    name: 'expand of a missing lemma list',
    args: ['expand', '-m', 'model.json', 'missing.tsv'],
    says: 'missing.tsv: cannot read the file',
  },
  {
    name: 'expand --format xml',
    args: ['expand', '-m', 'model.json', '--format', 'xml'],
    says: '--format must be tsv or jsonl',
  },
  {
    name: 'expand --alternatives 99',
    args: ['expand', '-m', 'model.json', '--alternatives', '99'],
    says: '--alternatives must be an integer from 0 to 20',
  },
  {
    name: 'evaluate of a missing file',
    args: ['evaluate', '--train', 'missing.tsv', '--test', 'tables.tsv'],
    says: 'missing.tsv: cannot read the file',
  },
  {
    name: 'evaluate on a bad test row',
    args: ['evaluate', '--train', 'tables.tsv', '--test', 'bad.tsv'],
    says: 'bad.tsv:2: unknown UPOS "NN"',
  },
  {
    name: 'constrain without a corpus',
    args: ['constrain', '-m', 'model.json', '-o', 'x.tsv'],
    says: 'missing corpus',
  },
  {
    name: 'constrain of a missing corpus',
    args: ['constrain', '-m', 'model.json', 'missing.txt', '-o', 'x.tsv'],
    says: 'missing.txt: cannot read',
  },
  {
    name: 'constrain with a missing model',
    args: ['constrain', '-m', 'missing.json', 'corpus.txt', '-o', 'x.tsv'],
    says: 'missing.json: cannot read the model file',
  },
  {
    name: 'analyze with a missing model',
    args: ['analyze', '-m', 'missing.json', 'forms.txt'],
    says: 'missing.json: cannot read the model file',
  },
  {
    name: 'analyze with a file that is not a model',
    args: ['analyze', '-m', 'notmodel.json', 'forms.txt'],
    says: 'notmodel.json',
  },
  {
    name: 'analyze of a missing forms file',
    args: ['analyze', '-m', 'model.json', 'missing.txt'],
    says: 'missing.txt',
  },
  {
    name: 'publish of a missing model',
    args: ['publish', '-m', 'missing.json', '--name', 'demo'],
    says: 'missing.json',
  },
  {
    name: 'publish under a malformed name',
    args: ['publish', '-m', 'model.json', '--name', 'Bad Name'],
    says: '"Bad Name" is not a model name',
  },
  { name: 'serve on port 99999', args: ['serve', '--port', '99999'], says: 'expected a port number 0–65535' },
  {
    name: 'serve with a missing model',
    args: ['serve', '-m', 'missing.json', '--port', '0'],
    says: 'missing.json',
  },
  {
    name: 'serve with a file that is not a model',
    args: ['serve', '-m', 'notmodel.json', '--port', '0'],
    says: 'notmodel.json',
  },
]

describe('exit codes', () => {
  let w: Workdir
  beforeAll(async () => {
    const { tables, lemmas } = demoSample(2, 10)
    w = await workdir({
      'tables.tsv': asFile(tables),
      'lemmas.tsv': asFile(lemmas),
      'bad.tsv': 'vessa\tvessa\tNOUN\tCase=Nom\nvessa\tvessan\tNN\tCase=Gen\n',
      'notmodel.json': NOT_A_MODEL,
      'corpus.txt': 'Kekke šakko möltesi tuvošet.\n',
      'forms.txt': 'šakko\ntuvošet\n',
    })
    expect((await w.run(['learn', 'tables.tsv', 'lemmas.tsv', '-o', 'model.json'])).code).toBe(0)
  })
  afterAll(() => w.dispose())

  it.concurrent.each(cases)('$name exits 2 and says why', async (c) => {
    // A command that wrongly starts serving is stopped, and fails the check below.
    const r = await w.run(c.args, { started: (child) => setTimeout(() => child.kill(), 20_000).unref() })
    expect({ code: r.code, says: r.stderr.includes(c.says) }).toEqual({ code: 2, says: true })
    expect(r.stderr).not.toMatch(/\bat \S+ \(|node:internal/)
  })

  it('expand from stdin: a bad line is named <stdin>:line and nothing is written; good input expands', async () => {
    const bad = await w.run(['expand', '-m', 'model.json', '-'], { stdin: 'vessa\tNOUN\nkekke\tNN\n' })
    expect({ code: bad.code, says: bad.stderr.includes('<stdin>:2'), out: bad.stdout }).toEqual({ code: 2, says: true, out: '' })
    const good = await w.run(['expand', '-m', 'model.json', '-'], { stdin: 'vessa\tNOUN\n' })
    expect(good.code).toBe(0)
    expect(good.stdout.split('\n')[0]).toMatch(/^vessa\t\S+\tNOUN\t/)
  })

  it('help and a good run exit 0', async () => {
    expect((await w.run(['--help'])).code).toBe(0)
    expect((await w.run(['analyze', '-m', 'model.json', 'forms.txt'])).code).toBe(0)
  })
})
