// The paradigm book of a model: `GET /v1/paradigms` (a line per paradigm) and `GET /v1/paradigms/:id` (its rules).
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { describeParadigm, type Paradigm } from '../../core/inflect/paradigm.ts'
import { showPattern } from '../../core/inflect/pattern.ts'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { errorResponses, ModelQuery, Upos } from '../schemas/common.ts'
import { useModel } from '../use-model.ts'

const ParadigmLine = z
  .object({
    id: z.string(),
    upos: z.string(),
    lemma: z.string(),
    cells: z.number().int(),
    members: z.number().int(),
    examples: z.array(z.string()),
    twinOf: z.string().optional().openapi({
      description:
        'only on a twin: the id of the learned paradigm it mirrors by a letter alternation (never attested, no members)',
    }),
  })
  .openapi('ParadigmLine')
const ParadigmRules = ParadigmLine.omit({ cells: true })
  .extend({
    openPrefix: z.boolean(),
    cells: z.array(z.object({ feats: z.string(), rule: z.array(z.string()) })),
  })
  .openapi('Paradigm')

const listRoute = createRoute({
  method: 'get',
  path: '/v1/paradigms',
  summary: 'The paradigm book: each paradigm with its lemma shape, cell count, members and example lemmas',
  request: { query: z.object({ model: ModelQuery, upos: Upos.optional() }) },
  responses: {
    200: {
      description: 'Paradigms',
      content: { 'application/json': { schema: z.object({ paradigms: z.array(ParadigmLine) }) } },
    },
    ...errorResponses(400, 404),
  },
})

const oneRoute = createRoute({
  method: 'get',
  path: '/v1/paradigms/{id}',
  summary: 'One paradigm: the rule that makes each cell from the stems (x1, x2…)',
  request: {
    params: z.object({
      id: z
        .string()
        .max(128)
        .openapi({ param: { name: 'id', in: 'path' }, example: 'NOUN-1' }),
    }),
    query: z.object({ model: ModelQuery }),
  },
  responses: {
    200: { description: 'The paradigm', content: { 'application/json': { schema: ParadigmRules } } },
    ...errorResponses(400, 404),
  },
})

/** The id of the paradigm a twin mirrors, as the routes show it (absent for a learned paradigm). */
function twinField(p: Paradigm, book: readonly Paradigm[]): { twinOf?: string } {
  return p.twinOf === undefined ? {} : { twinOf: book[p.twinOf]?.id ?? String(p.twinOf) }
}

/** One line of the book. */
export function paradigmLine(p: Paradigm, book: readonly Paradigm[] = []): z.infer<typeof ParadigmLine> {
  return {
    id: p.id,
    upos: p.upos,
    lemma: showPattern(p.lemma),
    cells: p.cells.length,
    members: p.members,
    examples: p.examples,
    ...twinField(p, book),
  }
}

/**
 * Add the paradigm routes.
 * @example registerParadigms(app); await app.request('/v1/paradigms?upos=NOUN')
 */
export function registerParadigms(app: OpenAPIHono<AppEnv>): void {
  app.openapi(listRoute, async (c) => {
    const { model: name, upos } = c.req.valid('query')
    const { model } = await useModel(c, name)
    const book = model.inflection.book.paradigms
    const paradigms = book.filter((p) => !upos || p.upos === upos).map((p) => paradigmLine(p, book))
    return c.json({ paradigms }, 200)
  })

  app.openapi(oneRoute, async (c) => {
    const { id } = c.req.valid('param')
    const { model } = await useModel(c, c.req.valid('query').model)
    const p = model.inflection.book.paradigms.find((x) => x.id === id)
    if (!p) throw new ApiError(404, 'unknown-paradigm', `the model has no paradigm "${id}"`, { id })
    const { lemma, cells } = describeParadigm(p)
    return c.json(
      {
        id: p.id,
        upos: p.upos,
        lemma,
        openPrefix: p.openPrefix,
        members: p.members,
        examples: p.examples,
        ...twinField(p, model.inflection.book.paradigms),
        cells,
      },
      200,
    )
  })
}
