// The same rows give byte-identical models and outputs, run after run and whatever the order of equal-priority rows.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Workdir, workdir } from './cli.ts'
import { asFile, demoLines, demoSample, shuffleRows, VARIANT_LEMMAS } from './demo-sample.ts'

/** Learn SOURCES into OUT in the workdir and return the model's bytes. */
async function learn(w: Workdir, sources: string[], out: string): Promise<Buffer> {
  const r = await w.run(['learn', ...sources, '-o', out])
  expect([r.code, r.stderr]).toEqual([0, expect.stringMatching(/^learned /)])
  return w.read(out)
}

describe('a small sample of the demo lexicon', () => {
  const { tables, lemmas } = demoSample(6, 40)
  let w: Workdir
  let reference: Buffer
  beforeAll(async () => {
    w = await workdir({ 'tables.tsv': asFile(tables), 'lemmas.tsv': asFile(lemmas) })
    reference = await learn(w, ['tables.tsv', 'lemmas.tsv'], 'reference.json')
  })
  afterAll(() => w.dispose())

  it('holds variant cells, so the shuffles below keep something to keep', () => {
    for (const lemma of VARIANT_LEMMAS) expect(tables.some((r) => r.startsWith(`${lemma}\t`))).toBe(true)
  })

  it('learns the byte-identical model a second time', async () => {
    expect((await learn(w, ['tables.tsv', 'lemmas.tsv'], 'again.json')).equals(reference)).toBe(true)
  })

  it.concurrent.each([1, 2, 3])(
    'learns the byte-identical model from rows shuffled with seed %i',
    async (seed) => {
      await w.write(`tables-${seed}.tsv`, asFile(shuffleRows(tables, seed)))
      await w.write(`lemmas-${seed}.tsv`, asFile(shuffleRows(lemmas, seed)))
      const model = await learn(w, [`lemmas-${seed}.tsv`, `tables-${seed}.tsv`], `shuffled-${seed}.json`)
      expect(model.equals(reference)).toBe(true)
    },
  )

  it('learns the same model when a source is given twice (identical rows count once)', async () => {
    const model = await learn(w, ['tables.tsv', 'lemmas.tsv', 'tables.tsv'], 'twice.json')
    expect(model.equals(reference)).toBe(true)
  })

  it('expands the table-less lemmas to the byte-identical output, run after run', async () => {
    const runs = await Promise.all([1, 2].map(() => w.run(['expand', '-m', 'reference.json', '--scores'])))
    expect(runs.map((r) => r.code)).toEqual([0, 0])
    expect(runs[0]!.stdout.length).toBeGreaterThan(0)
    expect(runs[1]!.stdout).toBe(runs[0]!.stdout)
  })

  it('keeps both values of an inherent feature two lists disagree on, in either order, and says so', async () => {
    await w.write('fem.tsv', 'koru\tNOUN\tGender=Fem\n')
    await w.write('masc.tsv', 'koru\tNOUN\tGender=Masc\n')
    const a = await w.run(['learn', 'tables.tsv', 'fem.tsv', 'masc.tsv', '-o', 'fm.json'])
    const b = await w.run(['learn', 'tables.tsv', 'masc.tsv', 'fem.tsv', '-o', 'mf.json'])
    expect([a.code, b.code]).toEqual([0, 0])
    expect((await w.read('fm.json')).equals(await w.read('mf.json'))).toBe(true)
    expect(a.stderr).toContain(
      'note: masc.tsv:1: koru (NOUN) is listed again with other Gender; both values are kept (Gender=Fem,Masc)',
    )
    expect(b.stderr).toContain('note: fem.tsv:1: koru (NOUN) is listed again with other Gender')
  })
})

describe('the whole demo lexicon (demo-lexicon/tables.tsv and lemmas.tsv)', () => {
  it('learns byte-identical models twice and from shuffled rows with the sources swapped', async () => {
    const tables = demoLines('tables.tsv')
    const lemmas = demoLines('lemmas.tsv')
    const w = await workdir({
      'tables.tsv': asFile(tables),
      'lemmas.tsv': asFile(lemmas),
      'shuffled-tables.tsv': asFile(shuffleRows(tables, 42)),
      'shuffled-lemmas.tsv': asFile(shuffleRows(lemmas, 42)),
    })
    try {
      const [first, second, shuffled] = await Promise.all([
        learn(w, ['tables.tsv', 'lemmas.tsv'], 'first.json'),
        learn(w, ['tables.tsv', 'lemmas.tsv'], 'second.json'),
        learn(w, ['shuffled-lemmas.tsv', 'shuffled-tables.tsv'], 'shuffled.json'),
      ])
      expect(second.equals(first)).toBe(true)
      expect(shuffled.equals(first)).toBe(true)
    } finally {
      await w.dispose()
    }
  }, 300_000)
})
