// Learning uploads: every input format (and gzip) learns the model `formfold learn` writes; bad uploads publish nothing.
import { describe, expect, it } from 'vitest'
import { buildModel } from '../../src/core/model/build-model.ts'
import { keptCells } from '../../src/core/model/model.ts'
import { MAX_LEARN_LEMMAS, MAX_LEXICON_BYTES } from '../../src/http/limits.ts'
import { gzip, learnedLikeTheCli, sha256OfText, smallLexicon } from './lexicon-fixtures.ts'
import { freshName, json, type RouteTarget } from './route-target.ts'

const TSV = 'text/tab-separated-values'
const JSONL = 'application/jsonl'
const encode = (s: string) => new TextEncoder().encode(s) as Uint8Array<ArrayBuffer>

/** A write of a lexicon body. */
function upload(
  t: RouteTarget,
  name: string,
  type: string,
  body: BodyInit,
  headers: Record<string, string> = {},
) {
  const init = {
    method: 'PUT',
    headers: { 'content-type': type, authorization: `Bearer ${t.token}`, ...headers },
    body,
  }
  return (query = '') => t.fetch(`/v1/models/${name}${query}`, init)
}

/** Bad uploads: each is a 422 (or 413/415/400) and leaves the served version as it was. */
function badUploads(): {
  name: string
  type: string
  body: Uint8Array<ArrayBuffer>
  status: number
  code: string
  line?: number
  headers?: Record<string, string>
}[] {
  const rows = smallLexicon().rowsTsv.split('\n')
  const broken = [...rows.slice(0, 6), 'lokka\tlokan\tNOUNN\tCase=Acc', ...rows.slice(6)].join('\n')
  return [
    {
      name: 'a row with an unknown UPOS',
      type: TSV,
      body: encode(broken),
      status: 422,
      code: 'bad-upos',
      line: 7,
    },
    {
      name: 'table rows sent as entries',
      type: JSONL,
      body: encode(smallLexicon().rowsTsv),
      status: 422,
      code: 'no-entries',
      line: 1,
    },
    {
      name: 'entries sent as a lemma list',
      type: `${TSV}; format=lemmas`,
      body: encode(smallLexicon().entriesJsonl),
      status: 422,
      code: 'no-entries',
      line: 1,
    },
    { name: 'an empty body', type: TSV, body: new Uint8Array(0), status: 422, code: 'no-entries' },
    {
      name: 'only comments',
      type: TSV,
      body: encode('# a lexicon\n\n# nothing here\n'),
      status: 422,
      code: 'no-entries',
    },
    {
      name: 'invalid UTF-8 on line 2',
      type: TSV,
      body: new Uint8Array([...encode(rows[0]!), 0x0a, 0x61, 0xc3, 0x28, 0x0a]),
      status: 422,
      code: 'bad-utf8',
      line: 2,
    },
    {
      name: 'a body that is not gzip',
      type: TSV,
      body: encode(smallLexicon().rowsTsv),
      status: 422,
      code: 'bad-encoding',
      headers: { 'content-encoding': 'gzip' },
    },
    {
      name: 'an unknown content encoding',
      type: TSV,
      body: encode('x'),
      status: 415,
      code: 'unsupported-media-type',
      headers: { 'content-encoding': 'br' },
    },
    {
      name: 'a format the media type cannot carry',
      type: `${TSV}; format=entries`,
      body: encode('x'),
      status: 400,
      code: 'invalid-request',
    },
    {
      name: 'a charset other than UTF-8',
      type: `${TSV}; charset=iso-8859-1`,
      body: encode('x'),
      status: 415,
      code: 'unsupported-media-type',
    },
  ]
}

/**
 * Register the learning suite against a target (Node's app.request, or the worker inside workerd).
 * @example describeLearning(() => target)
 */
export function describeLearning(target: () => RouteTarget): void {
  describe('learning a lexicon upload', { timeout: 120_000 }, () => {
    it.each([
      ['table rows (sniffed)', TSV, () => smallLexicon().rowsTsv, 'rows'],
      ['entries with lemma-only ones', JSONL, () => smallLexicon().entriesJsonl, 'entries'],
      [
        'entries as application/x-ndjson',
        'application/x-ndjson',
        () => smallLexicon().entriesJsonl,
        'entries',
      ],
      ['a lemma list (format parameter)', `${TSV}; format=lemmas`, () => smallLexicon().lemmasTsv, 'lemmas'],
    ])('learns %s into the model formfold learn writes', async (_, type, text, format) => {
      const t = target()
      const name = freshName('learn')
      const { status, body } = await json(await upload(t, name, type, text())())
      expect(status).toBe(201)
      expect(body.learned.format).toBe(format)
      expect(body.sha256).toBe(await sha256OfText(await learnedLikeTheCli(text(), 'upload')))
      expect(body.summary).toMatchObject({
        lemmas: body.learned.tables + body.learned.lemmaOnly,
        skippedLines: 0,
      })
      expect(Object.keys(body.milliseconds)).toEqual(['read', 'learn', 'publish', 'total'])
    })

    it('learns a gzip-compressed upload like the same bytes sent plain', async () => {
      const t = target()
      const text = smallLexicon().entriesJsonl
      const plain = await json(await upload(t, freshName('plain'), JSONL, encode(text))())
      const packed = await json(
        await upload(t, freshName('gzip'), JSONL, await gzip(encode(text)), { 'content-encoding': 'gzip' })(),
      )
      expect([packed.status, packed.body.learned.gzip, packed.body.learned.uploadBytes]).toEqual([
        201,
        true,
        encode(text).byteLength,
      ])
      expect(packed.body.sha256).toBe(plain.body.sha256)
    })

    it('serves a predicted form of a lemma the upload listed without a table', async () => {
      const t = target()
      const name = freshName('bare')
      expect((await upload(t, name, JSONL, smallLexicon().entriesJsonl)()).status).toBe(201)
      const local = buildModel(smallLexicon().entries)
      const i = local.kept.findIndex((k) => k && k.length > 0)
      const entry = local.inflection.lexicon.entries[i]!
      const cell = keptCells(local.inflection, entry.lemma, local.kept[i]![0]!).find(
        (c) => c.forms[0] !== entry.lemma,
      )!
      const { body } = await json(
        await t.fetch(`/v1/analyze?form=${encodeURIComponent(cell.forms[0]!)}&model=${name}`),
      )
      expect(body.candidates).toContainEqual(
        expect.objectContaining({ lemma: entry.lemma, upos: entry.upos, source: 'predicted' }),
      )
    })

    it('refuses a bad upload, saying where, and keeps serving the version before', async () => {
      const t = target()
      const name = freshName('bad')
      expect((await upload(t, name, TSV, smallLexicon().rowsTsv)()).status).toBe(201)
      for (const bad of badUploads()) {
        const { status, body } = await json(await upload(t, name, bad.type, bad.body, bad.headers)())
        expect([bad.name, status, body.error.code]).toEqual([bad.name, bad.status, bad.code])
        if (bad.line !== undefined)
          expect([bad.name, body.error.details.problems[0].line]).toEqual([bad.name, bad.line])
      }
      const described = await json(await t.fetch(`/v1/models/${name}`))
      expect([described.body.served, described.body.versions.length]).toEqual([1, 1])
    })

    it('learns from the lines that read with skipBad=1, reporting the bad ones by line', async () => {
      const t = target()
      const text = `${smallLexicon().rowsTsv}lokka\tlokan\tNOUNN\tCase=Acc\n`
      const { status, body } = await json(await upload(t, freshName('skip'), TSV, encode(text))('?skipBad=1'))
      const line = text.split('\n').length - 1
      expect([status, body.learned.skipped, body.summary.skippedLines]).toEqual([201, 1, 1])
      expect(body.learned.problems).toEqual([
        { code: 'bad-upos', message: expect.any(String), file: 'upload', line },
      ])
    })

    it('refuses a lexicon beyond the learning limits with 413, naming the command-line path', async () => {
      const t = target()
      const name = freshName('big')
      const many = Array.from({ length: MAX_LEARN_LEMMAS + 1 }, (_, i) => `lemma${i}\tNOUN\n`).join('')
      const huge = await gzip(encode(`${'#'.repeat(1023)}\n`.repeat(MAX_LEXICON_BYTES / 1024 + 1)))
      for (const [body, headers] of [
        [encode(many), {}],
        [huge, { 'content-encoding': 'gzip' }],
      ] as const) {
        const { status, body: answer } = await json(await upload(t, name, TSV, body, headers)())
        expect([status, answer.error.code]).toEqual([413, 'too-large'])
        expect(answer.error.message).toMatch(/formfold learn.*then.*formfold publish/)
      }
      expect((await t.fetch(`/v1/models/${name}`)).status).toBe(404)
    })

    it('lists learned versions with their summaries', async () => {
      const t = target()
      const name = freshName('list')
      await upload(t, name, TSV, smallLexicon().rowsTsv)()
      const second = await json(await upload(t, name, JSONL, smallLexicon().entriesJsonl)())
      const described = await json(await t.fetch(`/v1/models/${name}`))
      expect(described.body.served).toBe(2)
      expect(
        described.body.versions.map((v: { summary: { bareLemmas: number } }) => v.summary.bareLemmas),
      ).toEqual([0, second.body.learned.lemmaOnly])
      expect(described.body.versions[1].summary).toEqual(second.body.summary)
      const listed = await json(await t.fetch('/v1/models'))
      expect(listed.body.models).toContainEqual(
        expect.objectContaining({ name, served: 2, summary: second.body.summary }),
      )
    })

    it('needs the write token for a lexicon too', async () => {
      const t = target()
      const init = { method: 'PUT', headers: { 'content-type': TSV }, body: smallLexicon().rowsTsv }
      expect((await t.fetch(`/v1/models/${freshName('auth')}`, init)).status).toBe(401)
    })
  })
}
