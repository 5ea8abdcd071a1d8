// Input that is well-formed though not tidy (BOM, CRLF, decomposed letters, comments) learns the same model.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Workdir, workdir } from './cli.ts'
import { asFile, demoSample } from './demo-sample.ts'

const { tables } = demoSample(2, 0)
const CLEAN = asFile(tables)
const encoder = new TextEncoder()
const BOM = new Uint8Array([0xef, 0xbb, 0xbf])

// Each variant says the same rows; the readers accept a BOM and CRLF and normalize to NFC (README, input formats).
const variants: [string, string | Uint8Array][] = [
  ['a byte order mark', new Uint8Array([...BOM, ...encoder.encode(CLEAN)])],
  ['CRLF line ends', CLEAN.replaceAll('\n', '\r\n')],
  ['a byte order mark and CRLF', new Uint8Array([...BOM, ...encoder.encode(CLEAN.replaceAll('\n', '\r\n'))])],
  ['CRLF on some lines only', tables.map((l, i) => `${l}${i % 3 === 0 ? '\r\n' : '\n'}`).join('')],
  ['decomposed (NFD) letters', CLEAN.normalize('NFD')],
  ['no final line feed', CLEAN.slice(0, -1)],
  [
    'comments and blank lines between rows',
    tables.map((l, i) => (i % 4 === 0 ? `# row ${i}\n\n${l}\n` : `${l}\n`)).join(''),
  ],
  ['FEATS in another order', asFile(tables.map(reorderFeats))],
]

/** The same row with its FEATS written in reverse order (the reader canonicalizes them). */
function reorderFeats(row: string): string {
  const cols = row.split('\t')
  cols[3] = cols[3]!.split('|').reverse().join('|')
  return cols.join('\t')
}

describe('learn on untidy but valid input', () => {
  let w: Workdir
  let reference: Buffer
  beforeAll(async () => {
    w = await workdir({ 'clean.tsv': CLEAN })
    const r = await w.run(['learn', 'clean.tsv', '-o', 'clean.json'])
    expect(r.code).toBe(0)
    reference = await w.read('clean.json')
  })
  afterAll(() => w.dispose())

  it.concurrent.each(variants)('gives the byte-identical model with %s', async (name, data) => {
    const file = `${name.replaceAll(' ', '-')}.tsv`
    await w.write(file, data)
    const r = await w.run(['learn', file, '-o', `${file}.json`])
    expect([r.code, r.stderr]).toEqual([0, expect.stringMatching(/^learned \d+ paradigms/)])
    expect((await w.read(`${file}.json`)).equals(reference)).toBe(true)
  })
})

describe('learn --skip-bad', () => {
  const bad = [...tables]
  bad.splice(2, 0, 'vessa\tvessan\tNN\tCase=Gen') // line 3
  bad.splice(4, 0, 'vessa\tvessan\tNOUN') // line 5

  it('exits 0, says how many lines it skipped and which, and writes the model of the good lines', async () => {
    const w = await workdir({ 'bad.tsv': asFile(bad), 'clean.tsv': CLEAN })
    try {
      const r = await w.run(['learn', '--skip-bad', 'bad.tsv', '-o', 'out.json'])
      expect(r.code).toBe(0)
      expect(r.stderr).toContain('skipped 2 bad line(s); first ones:\n')
      expect(r.stderr).toContain('  bad.tsv:3: unknown UPOS "NN"')
      expect(r.stderr).toContain('  bad.tsv:5: expected 4 tab-separated columns')
      expect((await w.run(['learn', 'clean.tsv', '-o', 'clean.json'])).code).toBe(0)
      expect((await w.read('out.json')).equals(await w.read('clean.json'))).toBe(true)
    } finally {
      await w.dispose()
    }
  })

  it('counts every bad line but shows the first five', async () => {
    const many = [
      ...tables.slice(0, 4),
      ...Array.from({ length: 7 }, (_, i) => `bad${i}\tbad\tNOUN\tCase=Bad`),
    ]
    const w = await workdir({ 'many.tsv': asFile(many) })
    try {
      const r = await w.run(['learn', '--skip-bad', 'many.tsv', '-o', 'out.json'])
      expect(r.code).toBe(0)
      expect(r.stderr).toContain('skipped 7 bad line(s); first ones:\n')
      const shown = r.stderr.split('\n').filter((l) => l.startsWith('  many.tsv:'))
      expect(shown.map((l) => l.split(':')[1])).toEqual(['5', '6', '7', '8', '9'])
      expect(await w.list()).toEqual(['many.tsv', 'out.json'])
    } finally {
      await w.dispose()
    }
  })
})
