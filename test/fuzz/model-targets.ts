// Fuzz targets for model writes: random and damaged model files, and lexicon uploads the service learns.
import fc from 'fast-check'
import { rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { ProblemError } from '../../src/core/lexicon/problem.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { type LexiconFormat, readLexicon } from '../../src/formats/index.ts'
import { lexicon, noisyText, rowsToTsv, table, word } from './arbitraries.ts'
import { checkAnswer, TOKEN } from './http-answer.ts'
import { check, type FuzzTarget, problemOr } from './target.ts'

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

export const modelTargets: FuzzTarget[] = [
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
  {
    name: 'http: lexicon uploads',
    checks:
      'PUT of messy lexicons (rows, lemma lists, entries; gzip or not; skipBad or not): 201 only where formfold learn succeeds, with its model file byte for byte; else a 4xx',
    cost: 8,
    property: () =>
      fc.asyncProperty(lexiconUpload, fc.boolean(), fc.boolean(), async (u, skipBad, gzip) => {
        const name = `lexicon-${uploads++ % 4}`
        const headers: Record<string, string> = { 'content-type': u.type, authorization: `Bearer ${TOKEN}` }
        if (gzip) headers['content-encoding'] = 'gzip'
        const bytes = new TextEncoder().encode(u.text)
        const body = (gzip ? await gzipped(bytes) : bytes) as Uint8Array<ArrayBuffer>
        const res = await checkAnswer(`/v1/models/${name}${skipBad ? '?skipBad=1' : ''}`, {
          method: 'PUT',
          headers,
          body,
        })
        // What `formfold learn` makes of the same text: the service must agree with it.
        const local = await problemOr(async () => {
          const read = await readLexicon(bytes, { file: 'upload', format: u.format, skipBad })
          return sha256(encodeModel(buildModel(read.entries)))
        })
        if (local instanceof ProblemError)
          return check(
            res.status === 422,
            () => `learn refused it (${local.message}), the service answered ${res.status}`,
          )
        if (res.status === 413) return
        check(
          res.status === 201,
          () => `learn succeeded, the service answered ${res.status}: ${res.body.slice(0, 300)}`,
        )
        const sha = (JSON.parse(res.body) as { sha256: string }).sha256
        check(sha === local, () => `the service learned another model file (${sha} ≠ ${local})`)
      }),
  },
]

let uploads = 0

/** A lexicon upload: messy rows, a lemma list or entries, with the media type that declares its format. */
const lexiconUpload = fc.oneof(
  noisyText(fc.array(table, { minLength: 1, maxLength: 3 }).map((ts) => rowsToTsv(ts.flat()))).map(
    (text) => ({ text, type: 'text/tab-separated-values', format: undefined as LexiconFormat | undefined }),
  ),
  noisyText(
    fc.array(word, { minLength: 1, maxLength: 5 }).map((ws) => ws.map((w) => `${w}\tNOUN\n`).join('')),
  ).map((text) => ({
    text,
    type: 'text/tab-separated-values; format=lemmas',
    format: 'lemmas' as LexiconFormat,
  })),
  noisyText(
    fc
      .array(table, { minLength: 1, maxLength: 2 })
      .map((ts) =>
        ts
          .map(
            (rows) =>
              `${JSON.stringify({ lemma: rows[0]!.lemma, upos: rows[0]!.upos, forms: rows.map((r) => ({ form: r.form, feats: r.feats })) })}\n`,
          )
          .join(''),
      ),
  ).map((text) => ({ text, type: 'application/jsonl', format: 'entries' as LexiconFormat })),
)

async function gzipped(bytes: Uint8Array): Promise<Uint8Array> {
  const stream = new Blob([bytes as Uint8Array<ArrayBuffer>])
    .stream()
    .pipeThrough(new CompressionStream('gzip'))
  return new Uint8Array(await new Response(stream).arrayBuffer())
}

async function sha256(text: string): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text))
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('')
}
