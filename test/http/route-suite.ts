// The route suite, run twice: under Node (app.request) and inside workerd (test/workers/).
// Expected analyses come from demo-lexicon/README.md (the demo language's documented classes) and its tables.tsv.
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../src/core/inflect/expand.ts'
import { analyzeForm } from '../../src/core/lookup/analyze.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import { DEMO_MODEL_TEXT } from '../../src/http/demo-model.generated.ts'
import { json, postJson, type RouteTarget } from './route-target.ts'

/** A bare lemma of demo-lexicon/lemmas.tsv (no table in the dictionary): its table is predicted. */
const BARE = { lemma: 'baskerka', upos: 'NOUN', feats: 'Gender=Fem' }

const analysis = (lemma: string, upos: string, feats: string, source: string) =>
  expect.objectContaining({ lemma, upos, feats, source })

/**
 * Register the read-route suite against a target.
 * @example describeRoutes(() => ({ fetch: (p, i) => app.request(p, i, env), token }))
 */
export function describeRoutes(target: () => RouteTarget): void {
  describe('read routes', { timeout: 30_000 }, () => {
    it('answers /health with CORS open to any origin', async () => {
      const res = await target().fetch('/health', { headers: { origin: 'https://elsewhere.example' } })
      expect(res.status).toBe(200)
      expect(res.headers.get('access-control-allow-origin')).toBe('*')
      expect(((await res.json()) as { status: string }).status).toBe('ok')
    })

    it('lets other origins send reads, not writes (preflights)', async () => {
      const preflight = (method: string) =>
        target().fetch('/v1/analyze', {
          method: 'OPTIONS',
          headers: { origin: 'https://elsewhere.example', 'access-control-request-method': method },
        })
      const read = await preflight('POST')
      expect(read.headers.get('access-control-allow-origin')).toBe('*')
      expect(read.headers.get('access-control-allow-methods')).toBe('GET,HEAD,POST')
      const write = await preflight('PUT')
      expect(write.headers.get('access-control-allow-origin')).toBeNull()
    })

    it('analyzes an attested form (lokka, Acc.Sg lokan: demo-lexicon/README.md)', async () => {
      const res = await target().fetch('/v1/analyze?form=lokan')
      expect(res.headers.get('formfold-model')).toBe('demo')
      expect(res.headers.get('formfold-model-version')).toBe('embedded')
      const { status, body } = await json(res)
      expect(status).toBe(200)
      expect(body.form).toBe('lokan')
      expect(body.candidates).toContainEqual(
        analysis('lokka', 'NOUN', 'Case=Acc|Gender=Fem|Number=Sing', 'attested'),
      )
    })

    it('answers as the core does, the first time and from the cache', async () => {
      const model = decodeModel(DEMO_MODEL_TEXT)
      // Attested, case-folded, predicted, quoted and unknown forms of demo-lexicon/ (README, tables, lemmas).
      for (const form of ['lokan', 'Kötit', 'baskerka', '"lokan"', 'velmoraš']) {
        const want = JSON.parse(JSON.stringify(analyzeForm(model, form)))
        for (let round = 0; round < 2; round++) {
          const { status, body } = await json(
            await target().fetch(`/v1/analyze?form=${encodeURIComponent(form)}`),
          )
          expect([status, body]).toEqual([200, want])
        }
      }
    })

    it('names the model by a path segment as well as by ?model=', async () => {
      const a = await json(await target().fetch('/v1/models/demo/analyze?form=lokan'))
      const b = await json(await target().fetch('/v1/analyze?form=lokan&model=demo'))
      expect(a).toEqual(b)
    })

    it('analyzes a batch in order (kötti, Nom.Pl = Acc.Pl kötit: README, class N7)', async () => {
      const { status, body } = await json(
        await target().fetch('/v1/analyze', postJson({ forms: ['lokan', 'kötit'] })),
      )
      expect(status).toBe(200)
      expect(body.results.map((r: { form: string }) => r.form)).toEqual(['lokan', 'kötit'])
      expect(body.results[1].candidates).toEqual(
        expect.arrayContaining([
          analysis('kötti', 'NOUN', 'Case=Nom|Gender=Fem|Number=Plur', 'attested'),
          analysis('kötti', 'NOUN', 'Case=Acc|Gender=Fem|Number=Plur', 'attested'),
        ]),
      )
    })

    it("gives a dictionary table as attested (lokka's rows in demo-lexicon/tables.tsv)", async () => {
      const { status, body } = await json(await target().fetch('/v1/lemmas/lokka'))
      expect(status).toBe(200)
      const [table] = body.tables
      expect([table.source, table.upos, table.score]).toEqual(['attested', 'NOUN', 1])
      expect(table.forms).toContainEqual(
        expect.objectContaining({
          form: 'lokan',
          feats: 'Case=Acc|Gender=Fem|Number=Sing',
          source: 'attested',
        }),
      )
    })

    it('predicts the table of a listed lemma without one, as the core does', async () => {
      const { status, body } = await json(
        await target().fetch(`/v1/lemmas/${encodeURIComponent(BARE.lemma)}`),
      )
      expect(status).toBe(200)
      const core = expandLemma(decodeModel(DEMO_MODEL_TEXT).inflection, BARE.lemma, BARE.upos, BARE.feats)
      expect(body.tables).toEqual([JSON.parse(JSON.stringify(core))])
      expect(body.tables[0].forms.every((f: { source: string }) => f.source === 'predicted')).toBe(true)
    })

    it('asks for a UPOS before predicting an unlisted lemma', async () => {
      const missing = await json(await target().fetch('/v1/lemmas/hakkara'))
      expect([missing.status, missing.body.error.code]).toEqual([404, 'unknown-lemma'])
      const { status, body } = await json(
        await target().fetch('/v1/lemmas/hakkara?upos=NOUN&feats=Gender%3DFem&alternatives=2'),
      )
      expect(status).toBe(200)
      expect(body.tables[0].source).toBe('predicted')
      expect(body.tables[0].alternatives.length).toBeLessThanOrEqual(2)
    })

    it('lists the paradigm book and shows one paradigm', async () => {
      const list = await json(await target().fetch('/v1/paradigms?upos=NOUN'))
      expect(list.status).toBe(200)
      expect(list.body.paradigms.length).toBeGreaterThan(0)
      expect(list.body.paradigms.every((p: { upos: string }) => p.upos === 'NOUN')).toBe(true)
      const first = list.body.paradigms[0]
      const one = await json(await target().fetch(`/v1/paradigms/${encodeURIComponent(first.id)}`))
      expect(one.status).toBe(200)
      expect(one.body.cells).toHaveLength(first.cells)
      const none = await json(await target().fetch('/v1/paradigms/NOUN-99999'))
      expect([none.status, none.body.error.code]).toEqual([404, 'unknown-paradigm'])
    })

    it('marks letter-alternation twins with the learned paradigm they mirror', async () => {
      const list = await json(await target().fetch('/v1/paradigms'))
      type Line = { id: string; members: number; twinOf?: string }
      const lines: Line[] = list.body.paradigms
      const twins = lines.filter((p) => p.twinOf !== undefined)
      // The demo language has vowel harmony (demo-lexicon/README.md): its book gets twins.
      expect(twins.length).toBeGreaterThan(0)
      const ids = new Set(lines.filter((p) => p.twinOf === undefined).map((p) => p.id))
      for (const t of twins) expect({ members: t.members, mirrors: ids.has(t.twinOf!) }).toEqual({ members: 0, mirrors: true })
      const one = await json(await target().fetch(`/v1/paradigms/${encodeURIComponent(twins[0]!.id)}`))
      expect(one.body.twinOf).toBe(twins[0]!.twinOf)
    })

    it('expands a lemma list as JSON lines, or as TSV rows by Accept', async () => {
      const lemmas = [{ lemma: 'lokka', upos: 'NOUN' }, BARE]
      const jsonl = await target().fetch('/v1/expand', postJson({ lemmas }))
      expect(jsonl.headers.get('content-type')).toMatch(/^application\/jsonl/)
      const lines = (await jsonl.text())
        .trimEnd()
        .split('\n')
        .map((l) => JSON.parse(l))
      expect(lines.map((t) => [t.lemma, t.source])).toEqual([
        ['lokka', 'attested'],
        [BARE.lemma, 'predicted'],
      ])
      const tsv = await target().fetch(
        '/v1/expand?scores=1',
        postJson({ lemmas }, { accept: 'text/tab-separated-values' }),
      )
      expect(tsv.headers.get('content-type')).toMatch(/^text\/tab-separated-values/)
      const rows = (await tsv.text()).split('\n').filter((l) => l && !l.startsWith('#'))
      expect(rows).toContain('lokka\tlokan\tNOUN\tCase=Acc|Gender=Fem|Number=Sing\tattested\t1')
      expect(rows.every((r) => r.split('\t').length === 6)).toBe(true)
    })

    it('expands a lemma-list TSV body', async () => {
      const res = await target().fetch('/v1/expand', {
        method: 'POST',
        headers: { 'content-type': 'text/tab-separated-values', accept: 'text/tab-separated-values' },
        body: 'lokka\tNOUN\n',
      })
      expect(res.status).toBe(200)
      expect((await res.text()).split('\n')).toContain('lokka\tlokan\tNOUN\tCase=Acc|Gender=Fem|Number=Sing')
    })

    it('writes the constraint file of an uploaded corpus, with the report alongside', async () => {
      const corpus = 'Lokka on tūna. Kötit ot lokan.\n'
      const res = await target().fetch('/v1/constraints', {
        method: 'POST',
        headers: { 'content-type': 'text/plain' },
        body: corpus,
      })
      expect(res.status).toBe(200)
      expect(res.headers.get('content-disposition')).toBe('attachment; filename="constraints.tsv"')
      const headline = JSON.parse(res.headers.get('formfold-report')!)
      expect(headline.tokens).toBe(6)
      const rows = (await res.text()).split('\n').filter((l) => l && !l.startsWith('#'))
      expect(rows[0]).toBe('form\tcount\tsource\tallowed')
      expect(rows).toContainEqual(expect.stringMatching(/^lokan\t1\tattested\t.*NOUN/))
      const full = await json(
        await target().fetch('/v1/constraints?level=full', {
          method: 'POST',
          headers: { 'content-type': 'text/plain', accept: 'application/json' },
          body: corpus,
        }),
      )
      expect(full.body.report.tokens.total).toBe(6)
      expect(full.body.file).toContain('# options: level=full')
    })

    it('streams the whole-lexicon constraint file', async () => {
      const res = await target().fetch('/v1/constraints.tsv')
      expect(res.status).toBe(200)
      const text = await res.text()
      expect(text.startsWith('# formfold constraint file\n')).toBe(true)
      expect(text).toMatch(/\nlokan\t0\tattested\t[^\n]*NOUN/)
    })

    it('describes every route in /openapi.json', async () => {
      const { status, body } = await json(await target().fetch('/openapi.json'))
      expect(status).toBe(200)
      expect(Object.keys(body.paths).sort()).toEqual(
        [
          '/health',
          '/v1/analyze',
          '/v1/constraints',
          '/v1/constraints.tsv',
          '/v1/expand',
          '/v1/lemmas/{lemma}',
          '/v1/models',
          '/v1/models/{name}',
          '/v1/models/{name}/versions/{v}',
          '/v1/models/{name}/shards/{sha256}',
          '/v1/paradigms',
          '/v1/paradigms/{id}',
        ].sort(),
      )
      expect(Object.keys(body.paths['/v1/analyze'])).toEqual(['get', 'post'])
    })

    it('serves the page at /', async () => {
      const res = await target().fetch('/')
      expect(res.status).toBe(200)
      expect(res.headers.get('content-type')).toMatch(/^text\/html/)
      expect((await res.text()).toLowerCase()).toContain('<!doctype html>')
    })

    it('lists the embedded demo model as the default', async () => {
      const { body } = await json(await target().fetch('/v1/models'))
      expect(body.models).toContainEqual(
        expect.objectContaining({ name: 'demo', embedded: true, default: true }),
      )
    })
  })
}
