// Fuzz targets for the HTTP app, through app.request: random requests to every route, random and damaged models.
import fc from 'fast-check'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { createApp } from '../../src/http/app.ts'
import { feats, lexicon, noisyText, rawFeats, rowsToTsv, upos, word } from './arbitraries.ts'
import { check, type FuzzTarget } from './target.ts'

const TOKEN = 'fuzz-write-token'
let app: ReturnType<typeof createApp> | undefined
const send = (path: string, init?: RequestInit) => {
  app ??= createApp()
  return Promise.resolve(app.request(path, init, { WRITE_TOKEN: TOKEN }))
}

/** A path segment or query value: encoded words, raw characters, broken percent escapes. */
const segment = fc.oneof(
  { weight: 4, arbitrary: word.map(encodeURIComponent) },
  {
    weight: 1,
    arbitrary: fc.constantFrom('%FF', '%', '%C3', '%00', '%E2%82', '..', '%2F', '+', '%20', '~', ''),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 8 }).map(encodeURIComponent) },
)
const option = fc.oneof(segment, fc.constantFrom('0', '1', '-1', '5', '99', '1e3', 'NaN', 'true', ''))
const query = (names: string[]) =>
  fc
    .uniqueArray(fc.tuple(fc.constantFrom(...names), option), { maxLength: 4, selector: ([n]) => n })
    .map((ps) => (ps.length ? `?${ps.map(([n, v]) => `${n}=${v}`).join('&')}` : ''))

const anyBody = fc.oneof(
  fc.jsonValue().map((v) => JSON.stringify(v)),
  fc
    .record(
      {
        forms: fc.array(fc.oneof(word, fc.jsonValue()), { maxLength: 5 }),
        top: fc.jsonValue(),
        fold: fc.jsonValue(),
      },
      { requiredKeys: ['forms'] },
    )
    .map((o) => JSON.stringify(o)),
  fc
    .record(
      {
        lemmas: fc.array(
          fc.record(
            { lemma: word, upos: fc.oneof(upos, fc.string()), feats: rawFeats },
            { requiredKeys: [] },
          ),
          { maxLength: 4 },
        ),
        alternatives: fc.jsonValue(),
      },
      { requiredKeys: [] },
    )
    .map((o) => JSON.stringify(o)),
  noisyText(
    fc
      .array(
        fc.tuple(word, upos, feats).map(([l, u, f]) => `${l}\t${u}\t${f}`),
        { maxLength: 5 },
      )
      .map((ls) => ls.join('\n')),
  ),
  noisyText(fc.array(word, { maxLength: 20 }).map((ws) => ws.join(' '))),
  fc.uint8Array({ maxLength: 64 }),
)
const contentType = fc.constantFrom(
  undefined,
  'application/json',
  'text/plain',
  'text/tab-separated-values',
  'text/x-conllu',
  'application/vnd.formfold.model+json',
  'application/json; charset=utf-16',
  'image/png',
  'multipart/form-data',
)
const accept = fc.constantFrom(
  undefined,
  'application/json',
  'application/jsonl',
  'text/tab-separated-values',
  '*/*',
  'text/html',
  'nonsense',
)

/** A request to one of the routes (or a path no route has), with random parameters, body and headers. */
const request = fc.oneof(
  fc
    .tuple(segment, query(['top', 'fold', 'guess', 'model']))
    .map(([f, q]) => ({ method: 'GET', path: `/v1/analyze?form=${f}${q.replace('?', '&')}` })),
  fc
    .tuple(segment, query(['upos', 'feats', 'alternatives', 'model']))
    .map(([l, q]) => ({ method: 'GET', path: `/v1/lemmas/${l}${q}` })),
  fc.tuple(segment, query(['model'])).map(([id, q]) => ({ method: 'GET', path: `/v1/paradigms/${id}${q}` })),
  fc
    .constantFrom(
      '/health',
      '/v1/paradigms',
      '/v1/models',
      '/v1/models/demo',
      '/openapi.json',
      '/',
      '/v1/constraints.tsv',
    )
    .map((path) => ({ method: 'GET', path })),
  fc
    .tuple(
      fc.constantFrom('/v1/analyze', '/v1/expand', '/v1/constraints'),
      query(['model', 'scores', 'level']),
    )
    .map(([p, q]) => ({ method: 'POST', path: `${p}${q}` })),
  fc.tuple(segment, fc.boolean()).map(([n, auth]) => ({ method: 'PUT', path: `/v1/models/${n}`, auth })),
  fc
    .tuple(segment, segment)
    .map(([n, v]) => ({ method: 'DELETE', path: `/v1/models/${n}/versions/${v}`, auth: true })),
  fc
    .tuple(fc.constantFrom('PATCH', 'OPTIONS', 'HEAD', 'GET'), segment)
    .map(([method, s]) => ({ method, path: `/v1/${s}/${s}` })),
)

/** Send a request and check the answer: under 500; an error is JSON in the one shape; the body reads to its end. */
async function checkAnswer(path: string, init: RequestInit): Promise<Response> {
  const res = await send(path, init)
  const body = await res.text()
  check(
    res.status < 500,
    () => `${init.method ?? 'GET'} ${path} answered ${res.status}: ${body.slice(0, 300)}`,
  )
  check(!/\bat \S+ \(|\.ts:\d+|node_modules/.test(body), () => `${path}: a stack trace in the body`)
  if (res.status >= 400 && init.method !== 'HEAD') {
    const parsed = JSON.parse(body) as { error?: Record<string, unknown> }
    check(
      parsed.error && Object.keys(parsed.error).sort().join() === 'code,details,message',
      () => `${path}: error shape ${body.slice(0, 200)}`,
    )
  }
  return res
}

/** Every place in a JSON value (objects and arrays, depth first) as a setter. */
function places(value: unknown, out: ((v: unknown) => void)[] = []): ((v: unknown) => void)[] {
  if (value && typeof value === 'object') {
    for (const key of Object.keys(value)) {
      const holder = value as Record<string, unknown>
      out.push((v) => {
        holder[key] = v
      })
      places(holder[key], out)
    }
  }
  return out
}

/** A model file made from a random lexicon, maybe damaged: one value anywhere in it replaced by random JSON. */
const uploaded = fc
  .tuple(lexicon, fc.option(fc.tuple(fc.nat(), fc.jsonValue()), { freq: 2 }))
  .map(([lex, damage]) => {
    const json = JSON.parse(
      encodeModel(buildModel([...rowsToEntries(lex.tables.flat()), ...lex.bare])),
    ) as unknown
    if (damage) {
      const all = places(json)
      all[damage[0] % all.length]!(damage[1])
    }
    return {
      text: JSON.stringify(json),
      lemma: lex.tables[0]![0]!.lemma,
      form: lex.tables[0]![0]!.form,
      tsv: rowsToTsv(lex.tables[0]!),
    }
  })

let published = 0

export const httpTargets: FuzzTarget[] = [
  {
    name: 'http: random requests',
    checks:
      'every route (and unknown ones) with random parameters, bodies, media types and Accept headers: 2xx-4xx, errors as {error:{code,message,details}}, no stack',
    cost: 2,
    property: () =>
      fc.asyncProperty(request, anyBody, contentType, accept, async (r, body, type, acc) => {
        const headers: Record<string, string> = {}
        if (type) headers['content-type'] = type
        if (acc) headers.accept = acc
        if ('auth' in r && r.auth) headers.authorization = `Bearer ${TOKEN}`
        const withBody = r.method === 'POST' || r.method === 'PUT' || r.method === 'PATCH'
        await checkAnswer(r.path, {
          method: r.method,
          headers,
          body: withBody ? (body as BodyInit) : undefined,
        })
      }),
  },
  {
    name: 'http: random and damaged models',
    checks:
      'PUT of models learned from random tables, some with a field replaced; a published one answers analyze, lemma, expand and constraint requests under 500',
    cost: 8,
    property: () =>
      fc.asyncProperty(uploaded, async (u) => {
        const name = `fuzz-${published++ % 4}`
        const put = {
          method: 'PUT',
          headers: {
            'content-type': 'application/vnd.formfold.model+json',
            authorization: `Bearer ${TOKEN}`,
          },
          body: u.text,
        }
        const res = await checkAnswer(`/v1/models/${name}`, put)
        if (res.status !== 201) return
        const tsv = { 'content-type': 'text/tab-separated-values' }
        await checkAnswer(`/v1/analyze?model=${name}&form=${encodeURIComponent(u.form)}`, { method: 'GET' })
        await checkAnswer(`/v1/lemmas/${encodeURIComponent(u.lemma)}?model=${name}`, { method: 'GET' })
        await checkAnswer(`/v1/expand?model=${name}`, {
          method: 'POST',
          headers: tsv,
          body: u.tsv.split('\n')[0]!.split('\t').slice(0, 1).concat('NOUN').join('\t'),
        })
        await checkAnswer(`/v1/constraints?model=${name}`, {
          method: 'POST',
          headers: { 'content-type': 'text/plain' },
          body: `${u.form} ${u.lemma}.`,
        })
        await checkAnswer(`/v1/constraints.tsv?model=${name}`, { method: 'GET' })
        await checkAnswer(`/v1/paradigms?model=${name}`, { method: 'GET' })
      }),
  },
]
