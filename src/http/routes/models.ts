// The models routes: list models and versions, publish a model file (a write), delete an unserved version.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import { ApiError } from '../api-error.ts'
import type { AppEnv } from '../env.ts'
import { MAX_MODEL_BYTES } from '../limits.ts'
import { errorResponses } from '../schemas/common.ts'
import { MODEL_MEDIA_TYPE, MODEL_MEDIA_TYPES } from '../served-model.ts'
import { mediaType, readBytes } from '../strict-input.ts'
import { writeAuth } from '../write-auth.ts'

const Summary = z.record(z.string(), z.number()).openapi('ModelSummary')
const Version = z
  .object({
    version: z.number().int(),
    sha256: z.string(),
    bytes: z.number().int(),
    createdAt: z.string(),
    summary: Summary,
  })
  .openapi('ModelVersion')
const Listing = z
  .object({
    name: z.string(),
    embedded: z.boolean(),
    default: z.boolean(),
    served: z.number().int().nullable(),
    summary: Summary,
  })
  .openapi('ModelListing')
const NameParam = z.object({
  name: z.string().openapi({ param: { name: 'name', in: 'path' }, example: 'demo' }),
})
const VersionParams = NameParam.extend({
  v: z.coerce
    .number()
    .int()
    .positive()
    .openapi({ param: { name: 'v', in: 'path' }, example: 2 }),
})
const Described = z
  .object({
    name: z.string(),
    embedded: z.boolean(),
    served: z.number().int().nullable(),
    versions: z.array(Version),
  })
  .openapi('ModelVersions')
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

const publishRoute = createRoute({
  method: 'put',
  path: '/v1/models/{name}',
  summary: 'Publish a model file as a new version; the pointer moves once the version is stored and checked',
  security: bearer,
  middleware: [writeAuth] as const,
  request: {
    params: NameParam,
    // A plain schema, not zod: the file is read and checked by the store, not by a JSON validator.
    body: {
      required: true,
      content: { [MODEL_MEDIA_TYPE]: { schema: { type: 'string', format: 'binary' } } },
    },
  },
  responses: {
    201: {
      description: 'Published and served',
      content: { 'application/json': { schema: Version.extend({ name: z.string() }) } },
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
    if (!MODEL_MEDIA_TYPES.includes(mediaType(c))) {
      throw new ApiError(
        415,
        'unsupported-media-type',
        `send a model file as ${MODEL_MEDIA_TYPE} (made by \`formfold learn\`)`,
        {
          contentType: c.req.header('content-type') ?? null,
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
