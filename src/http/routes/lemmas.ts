// `GET /v1/lemmas/:lemma`: a lemma's table — attested from the dictionary, or predicted with paradigm and scores.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { type ExpandedTable, expandLemma } from '../../core/inflect/expand.ts'
import type { LexEntry } from '../../core/lexicon/lexicon.ts'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { MAX_ALTERNATIVES } from '../limits.ts'
import { errorResponses, Feats, Lemma, ModelQuery, Table, Upos } from '../schemas/common.ts'
import type { ServedModel } from '../served-model.ts'
import { useModel } from '../use-model.ts'

const LemmaTables = z.object({ lemma: z.string(), tables: z.array(Table) }).openapi('LemmaTables')

const lemmaRoute = createRoute({
  method: 'get',
  path: '/v1/lemmas/{lemma}',
  summary:
    "A lemma's tables: the dictionary's (attested) or the best paradigm's (predicted, scored per form)",
  description:
    'Without `upos`, the tables of every entry of the lemma in the dictionary (404 if it has none). With `upos`, ' +
    'that table — predicted for a lemma the dictionary lacks or lists without a table.',
  request: {
    params: z.object({ lemma: Lemma.openapi({ param: { name: 'lemma', in: 'path' } }) }),
    query: z.object({
      model: ModelQuery,
      upos: Upos.optional(),
      feats: Feats.optional().openapi({
        description: 'Inherent features (e.g. Gender=Fem) of a predicted table.',
      }),
      alternatives: z.coerce.number().int().min(0).max(MAX_ALTERNATIVES).default(0),
    }),
  },
  responses: {
    200: { description: 'Tables', content: { 'application/json': { schema: LemmaTables } } },
    ...errorResponses(400, 404),
  },
})

const byLemmaCache = new WeakMap<ServedModel, Map<string, LexEntry[]>>()

/** The dictionary entries of a lemma (one per UPOS), from an index built once per model. */
export function entriesOf(model: ServedModel, lemma: string): LexEntry[] {
  let byLemma = byLemmaCache.get(model)
  if (!byLemma) {
    byLemma = new Map()
    for (const e of model.inflection.lexicon.entries) {
      const list = byLemma.get(e.lemma)
      if (list) list.push(e)
      else byLemma.set(e.lemma, [e])
    }
    byLemmaCache.set(model, byLemma)
  }
  return byLemma.get(lemma) ?? []
}

/**
 * Add `GET /v1/lemmas/:lemma`.
 * @example registerLemmas(app); await app.request('/v1/lemmas/lokka?upos=NOUN')
 */
export function registerLemmas(app: OpenAPIHono<AppEnv>): void {
  app.openapi(lemmaRoute, async (c) => {
    const lemma = c.req.valid('param').lemma.normalize('NFC')
    const { model: name, upos, feats, alternatives } = c.req.valid('query')
    const { model } = await useModel(c, name)
    const wanted = upos
      ? [{ upos, inherent: feats }]
      : entriesOf(model, lemma).map((e) => ({ upos: e.upos, inherent: feats }))
    if (wanted.length === 0) {
      throw new ApiError(
        404,
        'unknown-lemma',
        `"${lemma}" is not in the dictionary; give ?upos= to predict its table`,
        { lemma },
      )
    }
    const tables: ExpandedTable[] = []
    for (const w of wanted) {
      const table = expandLemma(model.inflection, lemma, w.upos, w.inherent, { alternatives })
      if (table) tables.push(table)
    }
    if (tables.length === 0) {
      throw new ApiError(404, 'unknown-lemma', `no learned ${upos} paradigm applies to "${lemma}"`, {
        lemma,
        upos,
      })
    }
    return c.json({ lemma, tables }, 200)
  })
}
