// Bad requests: each gets a 4xx JSON error in the one shape, never a 5xx or a stack, and the service keeps serving.
import { describe, expect, it } from 'vitest'
import { MAX_BATCH_FORMS, MAX_EXPAND_LEMMAS, MAX_FORM_CHARS } from '../../src/http/limits.ts'
import { postJson, type RouteTarget } from './route-target.ts'

interface BadCase {
  name: string
  path: string
  init?: RequestInit
  status: number
  code: string
}

const THREE_MB = 3 * 1024 * 1024
const bytes = (...b: number[]) => new Uint8Array(b) as Uint8Array<ArrayBuffer>
const text = (type: string, body: BodyInit): RequestInit => ({
  method: 'POST',
  headers: { 'content-type': type },
  body,
})

/** The table of bad requests (built lazily: some bodies are megabytes). */
function cases(): BadCase[] {
  return [
    {
      name: 'malformed JSON',
      path: '/v1/analyze',
      init: text('application/json', '{"forms":["lokan"'),
      status: 400,
      code: 'bad-json',
    },
    {
      name: 'a string where a list is due',
      path: '/v1/analyze',
      init: postJson({ forms: 'lokan' }),
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'numbers as forms',
      path: '/v1/analyze',
      init: postJson({ forms: [1, 2] }),
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'a missing field',
      path: '/v1/analyze',
      init: postJson({}),
      status: 400,
      code: 'invalid-request',
    },
    { name: 'a missing query parameter', path: '/v1/analyze', status: 400, code: 'invalid-request' },
    {
      name: 'a non-numeric option',
      path: '/v1/analyze?form=lokan&top=many',
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'a 3 MB JSON body',
      path: '/v1/analyze',
      init: postJson({ forms: ['a'.repeat(THREE_MB)] }),
      status: 413,
      code: 'too-large',
    },
    {
      name: 'a 3 MB corpus',
      path: '/v1/constraints',
      init: text('text/plain', 'lokka '.repeat(THREE_MB / 6)),
      status: 413,
      code: 'too-large',
    },
    {
      name: 'a 3 MB lemma list',
      path: '/v1/expand',
      init: text('text/tab-separated-values', 'lokka\tNOUN\n'.repeat(THREE_MB / 11)),
      status: 413,
      code: 'too-large',
    },
    {
      name: 'invalid UTF-8 in a JSON body',
      path: '/v1/analyze',
      init: text('application/json', bytes(0x7b, 0x22, 0x66, 0xff, 0x22, 0x7d)),
      status: 400,
      code: 'bad-utf8',
    },
    { name: 'invalid UTF-8 in the query', path: '/v1/analyze?form=lok%FFan', status: 400, code: 'bad-utf8' },
    { name: 'invalid UTF-8 in the path', path: '/v1/lemmas/lok%C3', status: 400, code: 'bad-utf8' },
    {
      name: 'invalid UTF-8 in a lemma list',
      path: '/v1/expand',
      init: text('text/tab-separated-values', bytes(0x61, 0xc3, 0x28, 0x09, 0x4e, 0x4f, 0x55, 0x4e, 0x0a)),
      status: 422,
      code: 'bad-utf8',
    },
    {
      name: 'invalid UTF-8 in a corpus',
      path: '/v1/constraints',
      init: text('text/plain', bytes(0x61, 0x20, 0xe2, 0x82, 0x0a)),
      status: 422,
      code: 'bad-utf8',
    },
    { name: 'NUL in a form', path: '/v1/analyze?form=lo%00kan', status: 400, code: 'invalid-request' },
    {
      name: 'a control character in a batch form',
      path: '/v1/analyze',
      init: postJson({ forms: ['lokan', 'lo\u0007kan'] }),
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'NUL in a corpus',
      path: '/v1/constraints',
      init: text('text/plain', 'lokka\u0000lokan\n'),
      status: 422,
      code: 'nul-byte',
    },
    {
      name: 'an over-long form',
      path: `/v1/analyze?form=${'a'.repeat(MAX_FORM_CHARS + 1)}`,
      status: 400,
      code: 'invalid-request',
    },
    { name: 'an empty form', path: '/v1/analyze?form=', status: 400, code: 'invalid-request' },
    {
      name: 'an unknown model',
      path: '/v1/analyze?form=lokan&model=no-such-model',
      status: 404,
      code: 'unknown-model',
    },
    {
      name: 'an unknown model by path',
      path: '/v1/models/no-such-model/analyze?form=lokan',
      status: 404,
      code: 'unknown-model',
    },
    {
      name: 'a malformed model name',
      path: '/v1/analyze?form=lokan&model=Bad%20Name',
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'an over-long batch',
      path: '/v1/analyze',
      init: postJson({ forms: Array(MAX_BATCH_FORMS + 1).fill('lokan') }),
      status: 413,
      code: 'too-large',
    },
    {
      name: 'too many lemmas to expand',
      path: '/v1/expand',
      init: postJson({ lemmas: Array(MAX_EXPAND_LEMMAS + 1).fill({ lemma: 'lokka', upos: 'NOUN' }) }),
      status: 413,
      code: 'too-large',
    },
    {
      name: 'an unknown UPOS in a lemma list',
      path: '/v1/expand',
      init: text('text/tab-separated-values', 'lokka\tNOUN\nkötti\tNOUNN\n'),
      status: 422,
      code: 'bad-upos',
    },
    {
      name: 'an unknown UPOS in JSON lemmas',
      path: '/v1/expand',
      init: postJson({ lemmas: [{ lemma: 'lokka', upos: 'NN' }] }),
      status: 422,
      code: 'bad-upos',
    },
    {
      name: 'an unknown UPOS in a query',
      path: '/v1/lemmas/lokka?upos=NN',
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'malformed FEATS in a query',
      path: '/v1/lemmas/lokka?upos=NOUN&feats=Gender',
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'a body of the wrong type',
      path: '/v1/analyze',
      init: text('text/plain', 'lokan'),
      status: 415,
      code: 'unsupported-media-type',
    },
    {
      name: 'a corpus of the wrong type',
      path: '/v1/constraints',
      init: text('image/png', 'lokan'),
      status: 415,
      code: 'unsupported-media-type',
    },
    {
      name: 'an expansion with no body',
      path: '/v1/expand',
      init: { method: 'POST' },
      status: 400,
      code: 'invalid-request',
    },
    { name: 'an unknown route', path: '/v2/everything', status: 404, code: 'not-found' },
    {
      name: 'a write without a token',
      path: '/v1/models/newmodel',
      init: { method: 'PUT', body: '{}' },
      status: 401,
      code: 'unauthorized',
    },
    {
      name: 'a delete with a wrong token',
      path: '/v1/models/demo/versions/first',
      init: { method: 'DELETE', headers: { authorization: 'Bearer x' } },
      status: 401,
      code: 'unauthorized',
    },
  ]
}

/**
 * Register the bad-request suite against a target.
 * @example describeBadRequests(() => target)
 */
export function describeBadRequests(target: () => RouteTarget): void {
  describe('bad requests', () => {
    for (const c of cases()) {
      it(`answers ${c.name} with ${c.status} ${c.code}`, async () => {
        const res = await target().fetch(c.path, c.init)
        const body = await res.text()
        expect(res.headers.get('content-type')).toMatch(/^application\/json/)
        const parsed = JSON.parse(body)
        expect(Object.keys(parsed.error).sort()).toEqual(['code', 'details', 'message'])
        expect([res.status, parsed.error.code]).toEqual([c.status, c.code])
        expect(body).not.toMatch(/\bat \S+ \(|\.ts:\d+|node_modules/)
      })
    }

    it('keeps serving after all of them', async () => {
      for (const c of cases()) await (await target().fetch(c.path, c.init)).body?.cancel()
      expect((await target().fetch('/health')).status).toBe(200)
      const res = await target().fetch('/v1/analyze?form=lokan')
      expect(res.status).toBe(200)
      expect(((await res.json()) as { candidates: unknown[] }).candidates.length).toBeGreaterThan(0)
    })
  })
}
