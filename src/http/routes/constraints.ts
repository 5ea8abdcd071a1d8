// Constraint files: `POST /v1/constraints` for an uploaded corpus (report alongside), `GET /v1/constraints.tsv` for the lexicon.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { constrainTally, countTokens, lexiconConstraints } from '../../core/constrain/constrain-corpus.ts'
import {
  type ConstraintFileHeader,
  constraintHeaderLines,
  formatConstraintRow,
  writeConstraintFile,
} from '../../core/constrain/constraint-file.ts'
import type { CoverageReport } from '../../core/constrain/coverage-report.ts'
import { analyzeForm } from '../../core/lookup/analyze.ts'
import { openCorpus } from '../../formats/corpus-reader.ts'
import { encodeLines } from '../../formats/encode-lines.ts'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { MAX_CORPUS_BYTES } from '../limits.ts'
import { analyzerFor, loadedSteps } from '../lookup.ts'
import { errorResponses, ModelQuery } from '../schemas/common.ts'
import type { ServedModel } from '../served-model.ts'
import { mediaType, readBytes } from '../strict-input.ts'
import { useModel } from '../use-model.ts'

const TSV = 'text/tab-separated-values; charset=utf-8'
const JSONL = 'application/jsonl; charset=utf-8'
const CLI = 'formfold constrain'
/** Corpus media types: plain text (or CoNLL-U, sniffed), or CoNLL-U declared. */
const CORPUS_TYPES = ['text/plain', 'text/x-conllu']
const Level = z
  .enum(['upos', 'full'])
  .default('upos')
  .openapi({ description: 'Allowed tags: UPOS, or UPOS|FEATS.' })
const fileContent = {
  [TSV]: { schema: { type: 'string' } },
  [JSONL]: { schema: { type: 'string' } },
} as const

const corpusRoute = createRoute({
  method: 'post',
  path: '/v1/constraints',
  summary:
    'The constraint file of a corpus (plain text or CoNLL-U), as a download; the coverage report alongside',
  description:
    'TSV by default (`Accept: application/jsonl` for JSON lines) with the report summarized in the `Formfold-Report` ' +
    'header; `Accept: application/json` answers `{report, file}` with the full report.',
  request: {
    query: z.object({ model: ModelQuery, level: Level, format: z.enum(['text', 'conllu']).optional() }),
    body: {
      required: true,
      content: {
        'text/plain': { schema: { type: 'string' } },
        'text/x-conllu': { schema: { type: 'string' } },
      },
    },
  },
  responses: {
    200: {
      description: 'The constraint file',
      content: { ...fileContent, 'application/json': { schema: { type: 'object' } } },
    },
    ...errorResponses(400, 404, 413, 415, 422),
  },
})

const lexiconRoute = createRoute({
  method: 'get',
  path: '/v1/constraints.tsv',
  summary: 'The constraint file of every form the model knows (count 0), streamed',
  request: { query: z.object({ model: ModelQuery, level: Level }) },
  responses: {
    200: { description: 'The constraint file', content: { [TSV]: { schema: { type: 'string' } } } },
    ...errorResponses(400, 404),
  },
})

/** The report's headline figures, small enough for a response header. */
export function reportHeadline(report: CoverageReport): Record<string, number> {
  const r = (x: number) => Math.round(x * 10_000) / 10_000
  return {
    tokens: report.tokens.total,
    tokenCoverage: r(report.tokens.coverage),
    types: report.types.total,
    typeCoverage: r(report.types.coverage),
    ambiguity: r(report.ambiguity),
    singleTagShare: r(report.singleTagShare),
  }
}

/**
 * Add the constraint routes.
 * @example registerConstraints(app); await app.request('/v1/constraints', { method: 'POST', headers: { 'content-type': 'text/plain' }, body: 'Lokka on.' })
 */
export function registerConstraints(app: OpenAPIHono<AppEnv>): void {
  app.openapi(corpusRoute, async (c) => {
    const { model: name, level, format } = c.req.valid('query')
    const type = mediaType(c)
    if (!CORPUS_TYPES.includes(type)) {
      throw new ApiError(415, 'unsupported-media-type', `send the corpus as ${CORPUS_TYPES.join(' or ')}`, {
        contentType: type || null,
      })
    }
    const bytes = await readBytes(c, MAX_CORPUS_BYTES, CLI)
    const loaded = await useModel(c, name)
    const corpus = await openCorpus(bytes, {
      file: 'corpus',
      format: format ?? (type === 'text/plain' ? undefined : 'conllu'),
    })
    const tally = await countTokens(corpus)
    const analyzer = await analyzerFor(
      loaded.model,
      [...tally.byFrequency()].map(([form]) => form),
    )
    const { rows, report } = constrainTally(tally, analyzer, { level })
    const header: ConstraintFileHeader = {
      model: { name: loaded.name, version: loaded.version ?? 'embedded' },
      corpus: { file: `upload (${corpus.format})`, tokens: tally.tokens, types: tally.types },
      options: { level },
    }
    const accept = c.req.header('accept') ?? ''
    if (/\bapplication\/json\b/.test(accept)) {
      return c.json({ report, file: [...writeConstraintFile(rows, header, 'tsv')].join('') }, 200)
    }
    const jsonl = /\bapplication\/(jsonl|x-ndjson)\b/.test(accept)
    c.header('Content-Disposition', `attachment; filename="constraints.${jsonl ? 'jsonl' : 'tsv'}"`)
    c.header('Formfold-Report', JSON.stringify(reportHeadline(report)))
    return c.body(encodeLines(writeConstraintFile(rows, header, jsonl ? 'jsonl' : 'tsv')), 200, {
      'Content-Type': jsonl ? JSONL : TSV,
    })
  })

  app.openapi(lexiconRoute, async (c) => {
    const { model: name, level } = c.req.valid('query')
    const loaded = await useModel(c, name)
    const header: ConstraintFileHeader = {
      model: { name: loaded.name, version: loaded.version ?? 'embedded' },
      corpus: null,
      options: { level },
    }
    c.header('Content-Disposition', `attachment; filename="${loaded.name}-constraints.tsv"`)
    return c.body(encodeLines(lexiconFile(loaded.model, header, level)), 200, { 'Content-Type': TSV })
  })
}

/**
 * The whole-lexicon file, one part of the index at a time: each group of forms is loaded (a sharded model
 * fetches its shard) and written before the next, so memory holds one group beside the shard cache.
 */
async function* lexiconFile(
  model: ServedModel,
  header: ConstraintFileHeader,
  level: 'upos' | 'full',
): AsyncGenerator<string> {
  for (const line of constraintHeaderLines(header)) yield `${line}\n`
  for await (const group of model.index.formGroups()) {
    for await (const { forms, index } of loadedSteps(model, group, {})) {
      const view = { ...model, index }
      const analyzer = (form: string) => analyzeForm(view, form).candidates
      for (const row of lexiconConstraints(forms, analyzer, { level }))
        yield `${formatConstraintRow(row, level)}\n`
    }
  }
}
