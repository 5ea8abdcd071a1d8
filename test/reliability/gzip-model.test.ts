// Model files written gzip-compressed (`-o *.gz`, RFC 1952): the same model as the JSON file, read by every
// command that takes a model, byte-identical on every run, and a corrupt file named in a clear error.
import { gunzipSync } from 'node:zlib'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Workdir, workdir } from './cli.ts'
import { asFile, demoSample } from './demo-sample.ts'

describe('gzip model files', () => {
  let w: Workdir
  beforeAll(async () => {
    const { tables, lemmas } = demoSample(4, 30)
    w = await workdir({ 'tables.tsv': asFile(tables), 'lemmas.tsv': asFile(lemmas), 'forms.txt': 'x\n' })
    for (const out of ['m.json', 'm.json.gz', 'again.json.gz']) {
      const r = await w.run(['learn', 'tables.tsv', 'lemmas.tsv', '-o', out])
      expect(r.code, r.stderr).toBe(0)
    }
  }, 60_000)
  afterAll(() => w.dispose())

  it('holds exactly the JSON model, compressed, the same bytes on every run', async () => {
    const json = await w.read('m.json')
    const gz = await w.read('m.json.gz')
    expect([gz[0], gz[1]]).toEqual([0x1f, 0x8b]) // the gzip magic number (RFC 1952, section 2.3.1)
    expect(gz.length).toBeLessThan(json.length / 3)
    expect(gunzipSync(gz).equals(json)).toBe(true)
    expect((await w.read('again.json.gz')).equals(gz)).toBe(true)
  })

  it('expands and analyzes the same from either file', async () => {
    for (const args of [['expand', 'lemmas.tsv'], ['analyze', 'lemmas.tsv']]) {
      const plain = await w.run([args[0]!, '-m', 'm.json', args[1]!])
      const packed = await w.run([args[0]!, '-m', 'm.json.gz', args[1]!])
      expect(plain.code, plain.stderr).toBe(0)
      expect(packed.stdout).toBe(plain.stdout)
      expect(packed.stdout.length).toBeGreaterThan(100)
    }
  })

  it('names a gzip file that does not decompress', async () => {
    const gz = await w.read('m.json.gz')
    await w.write('broken.json.gz', gz.subarray(0, gz.length >> 1))
    const r = await w.run(['expand', '-m', 'broken.json.gz', 'lemmas.tsv'])
    expect(r.code).toBe(2)
    expect(r.stderr).toContain('broken.json.gz: the model file starts as gzip but does not decompress')
  })
})
