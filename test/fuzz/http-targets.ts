// Fuzz target for the HTTP app: random requests to every route (and unknown ones) against the demo model.
import fc from 'fast-check'
import { feats, noisyText, rawFeats, upos, word } from './arbitraries.ts'
import { checkAnswer, TOKEN } from './http-answer.ts'
import type { FuzzTarget } from './target.ts'

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
]
