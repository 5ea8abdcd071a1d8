// The models routes: list models and versions, publish a model file or a lexicon to learn (writes), delete a version.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { learnUpload } from '../learn-upload.ts'
import { LEXICON_MEDIA_TYPES, lexiconMediaOf } from '../lexicon-media.ts'
import { MAX_MODEL_BYTES } from '../limits.ts'
import { errorResponses } from '../schemas/common.ts'
import { MODEL_MEDIA_TYPE, MODEL_MEDIA_TYPES } from '../served-model.ts'
import { mediaType, readBytes } from '../strict-input.ts'
import { writeAuth } from '../write-auth.ts'
import {
  Described,
  LearnedVersion,
  Listing,
  NameParam,
  PublishQuery,
  Version,
  VersionParams,
} from './models-schemas.ts'

const bearer = [{ bearer: [] as string[] }]

const listRoute = createRoute({
  method: 'get',
  path: '/v1/models',
  summary: 'Every model served: embedded ones and published ones, with the version served and its summary',
  responses: {
    200: {
      description: 'Models',
      content: { 'application/json': { schema: z.object({ models: z.array(Listing) }) } },
    },
  },
})

const describeRoute = createRoute({
  method: 'get',
  path: '/v1/models/{name}',
  summary: 'A model: the version served and every stored version',
  request: { params: NameParam },
  responses: {
    200: { description: 'Versions', content: { 'application/json': { schema: Described } } },
    ...errorResponses(400, 404),
  },
})

const text = (description: string) => ({ schema: { type: 'string' as const, description } })

const publishRoute = createRoute({
  method: 'put',
  path: '/v1/models/{name}',
  summary: 'Publish a new version: a model file as it is, or a lexicon that the service learns first',
  description:
    'A lexicon (table rows or a lemma list as TSV, entries as JSON lines; `Content-Encoding: gzip` accepted) is ' +
    'read and learned exactly as `formfold learn` does; the pointer moves once the version is stored and checked. ' +
    'Any bad line refuses the upload (422) unless `skipBad=1`; nothing is published on any error.',
  security: bearer,
  middleware: [writeAuth] as const,
  request: {
    params: NameParam,
    query: PublishQuery,
    // Plain schemas, not zod: bodies are streamed through the readers (or checked by the store), not parsed here.
    body: {
      required: true,
      content: {
        [MODEL_MEDIA_TYPE]: { schema: { type: 'string', format: 'binary' } },
        'text/tab-separated-values': text(
          'table rows or a lemma list (`; format=rows|lemmas`, else sniffed)',
        ),
        'application/jsonl': text('entries, one JSON object a line (also application/x-ndjson)'),
      },
    },
  },
  responses: {
    201: {
      description: 'Published and served (for a lexicon, with what learning it found and the time it took)',
      content: { 'application/json': { schema: Version.extend({ name: z.string() }).or(LearnedVersion) } },
    },
    ...errorResponses(400, 401, 409, 413, 415, 422, 503),
  },
})

const deleteRoute = createRoute({
  method: 'delete',
  path: '/v1/models/{name}/versions/{v}',
  summary: 'Delete a version that is not served',
  security: bearer,
  middleware: [writeAuth] as const,
  request: { params: VersionParams },
  responses: { 204: { description: 'Deleted' }, ...errorResponses(400, 401, 404, 409) },
})

/**
 * Add the models routes to an app.
 * @example registerModelRoutes(app) // GET /v1/models, GET|PUT /v1/models/:name, DELETE …/versions/:v
 */
export function registerModelRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(listRoute, async (c) => c.json({ models: await c.var.models.list() }, 200))

  app.openapi(describeRoute, async (c) => c.json(await c.var.models.describe(c.req.valid('param').name), 200))

  app.openapi(publishRoute, async (c) => {
    const { name } = c.req.valid('param')
    const query = c.req.valid('query')
    const lexicon = lexiconMediaOf(c.req.header('content-type') ?? '', query.format)
    if (lexicon) {
      const skipBad = query.skipBad === '1' || query.skipBad === 'true'
      return c.json(await learnUpload(c, name, lexicon.format, skipBad), 201)
    }
    if (!MODEL_MEDIA_TYPES.includes(mediaType(c))) {
      throw new ApiError(
        415,
        'unsupported-media-type',
        `send a model file as ${MODEL_MEDIA_TYPE} (made by \`formfold learn\`), or a lexicon to learn ` +
          `as ${LEXICON_MEDIA_TYPES.join(', ')}`,
        {
          contentType: c.req.header('content-type') ?? null,
          accepted: [...MODEL_MEDIA_TYPES, ...LEXICON_MEDIA_TYPES],
        },
      )
    }
    const bytes = await readBytes(c, MAX_MODEL_BYTES, 'formfold publish --local')
    const info = await c.var.models.publish(name, bytes)
    return c.json({ name, ...info }, 201)
  })

  app.openapi(deleteRoute, async (c) => {
    const { name, v } = c.req.valid('param')
    await c.var.models.deleteVersion(name, v)
    return c.body(null, 204)
  })
}
