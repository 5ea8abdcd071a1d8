// The fuzz targets with a small number of inputs each, in every test run (npm run fuzz runs them longer),
// and the inputs fuzzing found, pinned so that each stays found.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest'
import { expandLemma, learnInflection } from '../../src/core/index.ts'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { createApp } from '../../src/http/app.ts'
import { FUZZ_TARGETS, runFuzz } from './run-fuzz.ts'

/**
 * Inputs per target here; FUZZ_RUNS raises it (the CLI target gets one input per 200). The suite uses a fixed
 * seed so that a test run is repeatable; FUZZ_SEED changes it, and `npm run fuzz` draws a new one each time.
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 200)
const SEED = Number(process.env.FUZZ_SEED ?? 20261201)

// The app logs internal errors; a failing check reports its own, so the log would only repeat them.
beforeAll(() => void vi.spyOn(console, 'error').mockImplementation(() => {}))
afterAll(() => vi.restoreAllMocks())

describe('fuzzing', () => {
  it.each(FUZZ_TARGETS.map((t) => [t.name, t.checks]))(
    '%s: %s',
    async (name) => {
      const [result] = await runFuzz({ runs: RUNS, seed: SEED, only: name })
      expect(result?.report ?? 'no failure').toBe('no failure')
    },
    120_000,
  )
})

const ROWS = [
  ['vessa', 'vessa', 'Case=Nom|Number=Sing'],
  ['vessa', 'vessat', 'Case=Nom|Number=Plur'],
  ['koru', 'koru', 'Case=Nom|Number=Sing'],
  ['koru', 'korut', 'Case=Nom|Number=Plur'],
].map(([lemma, form, feats]) => ({ lemma: lemma!, form: form!, upos: 'NOUN', feats: feats! }))

/** A valid small model file with one top-level field replaced. */
function damagedModel(field: string, value: unknown): string {
  const json = JSON.parse(
    encodeModel(buildModel([...rowsToEntries(ROWS), { lemma: 'talo', upos: 'NOUN', feats: '_' }])),
  )
  return JSON.stringify({ ...json, [field]: value })
}

const TOKEN = 'pinned-token'
const requests: [string, RequestInit?][] = [
  ['/v1/analyze?model=damaged&form=vessat'],
  ['/v1/lemmas/kala?model=damaged&upos=NOUN'],
  [
    '/v1/constraints?model=damaged',
    { method: 'POST', headers: { 'content-type': 'text/plain' }, body: 'vessat talot kalat' },
  ],
  [
    '/v1/expand?model=damaged',
    { method: 'POST', headers: { 'content-type': 'text/tab-separated-values' }, body: 'kala\tNOUN\n' },
  ],
]

describe('inputs fuzzing found', () => {
  // src/http/README.md, errors: "a corrupt model file" is a 422 `bad-model`. One the service accepts must then
  // answer every route under 500, with a body that reads to its end.
  it.each([
    ['a number for a UPOS', 'upos', [0]],
    ['a string for the options', 'options', ' '],
  ])('a published model file with %s is refused, or answers every route', async (_, field, value) => {
    const app = createApp()
    const env = { WRITE_TOKEN: TOKEN }
    const headers = {
      'content-type': 'application/vnd.formfold.model+json',
      authorization: `Bearer ${TOKEN}`,
    }
    const put = await app.request(
      '/v1/models/damaged',
      { method: 'PUT', headers, body: damagedModel(field, value) },
      env,
    )
    if (put.status === 422) return
    expect(put.status).toBe(201)
    for (const [path, init] of requests) {
      const res = await app.request(path, init, env)
      const body = await res.text().then(
        (text) => text,
        (err: Error) => `unreadable body: ${err.message}`,
      )
      expect({
        path,
        status: res.status < 500 ? 'under 500' : res.status,
        body: body.startsWith('unreadable') ? body : 'read',
      }).toEqual({ path, status: 'under 500', body: 'read' })
    }
  })

  // Learned from one table whose second form drops every other letter of the lemma: its lemma pattern has
  // seven stem variables between literals, and a long lemma of the literal's letter fits none of them. Trying
  // every split takes time exponential in the variables (seconds at 80 letters, minutes at 120); remembering
  // which (part, position) failed would make it polynomial, well under the bound here.
  it('expands a long lemma under a paradigm of many stem variables in reasonable time', () => {
    const lemma = 'qaqaqaqaqaqbq'
    const model = learnInflection([
      {
        lemma,
        upos: 'NOUN',
        feats: '_',
        forms: [
          { form: lemma, feats: 'Case=Nom' },
          { form: 'qqqqqqq', feats: 'Case=Gen' },
        ],
      },
    ])
    expect(expandLemma(model, 'a'.repeat(80), 'NOUN')).toBeNull()
  }, 2_000)
})
