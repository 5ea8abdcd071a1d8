// `GET /v1/analyze?form=…` and `POST /v1/analyze {forms:[…]}`: candidate analyses of word forms.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import type { TypedResponse } from 'hono'
import { tooLarge } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { MAX_BATCH_FORMS, MAX_BODY_BYTES, MAX_TOP } from '../limits.ts'
import { analyzeJson } from '../lookup.ts'
import { Candidate, errorResponses, Form, ModelQuery } from '../schemas/common.ts'
import { jsonBody } from '../strict-input.ts'
import { useModel } from '../use-model.ts'

const Options = {
  top: z.coerce
    .number()
    .int()
    .min(1)
    .max(MAX_TOP)
    .optional()
    .openapi({ description: 'At most this many candidates.' }),
  fold: z.enum(['0', '1']).optional().openapi({ description: '1: also try the form without diacritics.' }),
  guess: z
    .enum(['0', '1'])
    .optional()
    .openapi({ description: '0: no guesses for a form the index lacks (default 1).' }),
}

/** One form's answer: the form asked, the spelling that matched (after normalization), its candidates. */
export const Analysis = z
  .object({
    form: z.string(),
    normalized: z
      .array(z.string())
      .openapi({ description: 'The spellings that matched: exact, lowercase, titlecase, quotes…, folded…' }),
    candidates: z.array(Candidate),
  })
  .openapi('Analysis')

/** The answer of a batch. */
const Batch = z.object({ results: z.array(Analysis) }).openapi('AnalysisBatch')

const JSON_TYPE = { 'Content-Type': 'application/json' }
/** Answers are sent as the JSON text the cache holds; this is the type the route declares for them. */
type TypedJson<T extends z.ZodType> = TypedResponse<z.infer<T>, 200, 'json'>

const getRoute = createRoute({
  method: 'get',
  path: '/v1/analyze',
  summary:
    'Candidate analyses (lemma, UPOS, FEATS) of one form, each attested, predicted or guessed, with a score',
  request: { query: z.object({ form: Form, model: ModelQuery, ...Options }) },
  responses: {
    200: { description: 'Candidates', content: { 'application/json': { schema: Analysis } } },
    ...errorResponses(400, 404),
  },
})

const postRoute = createRoute({
  method: 'post',
  path: '/v1/analyze',
  summary: `Candidate analyses of a batch of forms (at most ${MAX_BATCH_FORMS})`,
  middleware: [jsonBody(MAX_BODY_BYTES)] as const,
  request: {
    query: z.object({ model: ModelQuery }),
    body: {
      required: true,
      content: {
        'application/json': {
          schema: z
            .object({
              forms: z
                .array(Form)
                .min(1)
                .openapi({ description: `1 to ${MAX_BATCH_FORMS} forms (more: 413).` }),
              top: Options.top.unwrap().optional(),
              fold: z.boolean().optional(),
              guess: z.boolean().optional(),
            })
            .openapi('AnalyzeBatch'),
        },
      },
    },
  },
  responses: {
    200: { description: 'One answer per form, in order', content: { 'application/json': { schema: Batch } } },
    ...errorResponses(400, 404, 413, 415),
  },
})

/**
 * Add the analyze routes.
 * @example registerAnalyze(app); await app.request('/v1/analyze?form=lokan')
 */
export function registerAnalyze(app: OpenAPIHono<AppEnv>): void {
  app.openapi(getRoute, async (c) => {
    const { form, model: name, top, fold, guess } = c.req.valid('query')
    const { model } = await useModel(c, name)
    const options = { top, foldDiacritics: fold === '1', guess: guess !== '0' }
    const [body] = await analyzeJson(model, [form], options)
    return c.body(body!, 200, JSON_TYPE) as unknown as TypedJson<typeof Analysis>
  })

  app.openapi(postRoute, async (c) => {
    const { forms, top, fold, guess } = c.req.valid('json')
    if (forms.length > MAX_BATCH_FORMS)
      throw tooLarge(`a batch of ${forms.length} forms`, MAX_BATCH_FORMS, 'formfold analyze')
    const { model } = await useModel(c, c.req.valid('query').model)
    const options = { top, foldDiacritics: fold === true, guess: guess !== false }
    const body = `{"results":[${(await analyzeJson(model, forms, options)).join(',')}]}`
    return c.body(body, 200, JSON_TYPE) as unknown as TypedJson<typeof Batch>
  })
}
