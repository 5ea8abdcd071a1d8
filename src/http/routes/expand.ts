// `POST /v1/expand`: tables for a lemma list (JSON or lemma-list TSV), streamed as JSON lines or TSV by `Accept`.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { expandLemma } from '../../core/inflect/expand.ts'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { EXPAND_MEDIA_TYPES, expandFormat, expansionStream } from '../expand-stream.ts'
import { type LemmaRequest, lemmasFromJson, lemmasFromTsv } from '../lemma-requests.ts'
import { MAX_ALTERNATIVES, MAX_BODY_BYTES, MAX_EXPAND_LEMMAS } from '../limits.ts'
import { errorResponses, ModelQuery } from '../schemas/common.ts'
import { jsonBody, mediaType, readBytes } from '../strict-input.ts'
import { useModel } from '../use-model.ts'

const TSV_TYPES = ['text/tab-separated-values', 'text/plain']
const CLI = 'formfold expand'

/** The JSON form of a lemma list. Items are checked like lemma-list lines (UPOS, FEATS, no control characters). */
const ExpandJson = z
  .object({
    lemmas: z
      .array(z.object({ lemma: z.string(), upos: z.string(), feats: z.string().optional() }))
      .min(1)
      .openapi({ description: `At most ${MAX_EXPAND_LEMMAS} lemmas (more: 413; use \`${CLI}\`).` }),
    alternatives: z.number().int().min(0).max(MAX_ALTERNATIVES).optional(),
  })
  .openapi('ExpandRequest')

const expandRoute = createRoute({
  method: 'post',
  path: '/v1/expand',
  summary:
    'Tables for a lemma list, streamed: JSON lines (default) or TSV table rows (Accept: text/tab-separated-values)',
  middleware: [
    (c, next) => (mediaType(c) === 'application/json' ? jsonBody(MAX_BODY_BYTES, CLI)(c, next) : next()),
  ] as const,
  request: {
    query: z.object({
      model: ModelQuery,
      scores: z
        .enum(['0', '1', 'false', 'true'])
        .optional()
        .openapi({ description: 'TSV: add source and score columns.' }),
    }),
    body: {
      required: false,
      content: {
        'application/json': { schema: ExpandJson },
        'text/tab-separated-values': {
          schema: { type: 'string', description: 'lemma<TAB>upos[<TAB>feats] lines' },
        },
        'text/plain': { schema: { type: 'string', description: 'as text/tab-separated-values' } },
      },
    },
  },
  responses: {
    200: {
      description: 'One table per lemma, in order; a lemma no paradigm fits is said so in place',
      content: {
        [EXPAND_MEDIA_TYPES.jsonl]: { schema: { type: 'string' } },
        [EXPAND_MEDIA_TYPES.tsv]: { schema: { type: 'string' } },
      },
    },
    ...errorResponses(400, 404, 413, 415, 422),
  },
})

/**
 * Add `POST /v1/expand`. The list is checked whole before the first table is made (a bad line is a 422,
 * not a broken stream); tables are then made one per pull of the response stream.
 * @example await app.request('/v1/expand', { method: 'POST', headers: { 'content-type': 'text/tab-separated-values' }, body: 'vessa\tNOUN\n' })
 */
export function registerExpand(app: OpenAPIHono<AppEnv>): void {
  app.openapi(expandRoute, async (c) => {
    const query = c.req.valid('query')
    let lemmas: LemmaRequest[]
    let alternatives = 0
    if (mediaType(c) === 'application/json') {
      // The route declares several body types, so the validated JSON is not in the handler's type.
      const body = (c.req as unknown as { valid(t: 'json'): z.infer<typeof ExpandJson> }).valid('json')
      lemmas = lemmasFromJson(body.lemmas)
      alternatives = body.alternatives ?? 0
    } else if (TSV_TYPES.includes(mediaType(c))) {
      lemmas = await lemmasFromTsv(await readBytes(c, MAX_BODY_BYTES, CLI))
    } else {
      throw new ApiError(
        400,
        'invalid-request',
        'send a lemma list: JSON {"lemmas":[…]} or lemma<TAB>upos lines as text/tab-separated-values',
      )
    }
    const { model } = await useModel(c, query.model)
    const format = expandFormat(c.req.header('accept'))
    const scores = query.scores === '1' || query.scores === 'true'
    const expand = (r: LemmaRequest) =>
      expandLemma(model.inflection, r.lemma, r.upos, r.feats, { alternatives })
    return c.body(expansionStream(lemmas, expand, format, scores), 200, {
      'Content-Type': EXPAND_MEDIA_TYPES[format],
    })
  })
}
