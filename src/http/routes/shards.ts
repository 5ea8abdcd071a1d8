// `PUT /v1/models/:name/shards/:sha256`: one shard of a sharded model, uploaded before the manifest that lists it.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import type { AppEnv } from '../env.ts'
import { MAX_MODEL_BYTES } from '../limits.ts'
import { errorResponses } from '../schemas/common.ts'
import { readBytes } from '../strict-input.ts'
import { writeAuth } from '../write-auth.ts'
import { NameParam } from './models-schemas.ts'

/** Media type of a shard file. */
export const SHARD_MEDIA_TYPE = 'application/vnd.formfold.shard+json'

const ShardParams = NameParam.extend({
  sha256: z
    .string()
    .regex(/^[0-9a-f]{64}$/)
    .openapi({ param: { name: 'sha256', in: 'path' }, description: 'hex SHA-256 of the shard file' }),
})

const shardRoute = createRoute({
  method: 'put',
  path: '/v1/models/{name}/shards/{sha256}',
  summary: 'Upload one shard of a sharded model (publish its manifest with PUT /v1/models/{name} afterwards)',
  description:
    'Shards are stored under their own hash and serve nothing until a manifest that lists them is published; ' +
    'publishing a manifest whose shards are not all uploaded is refused (422 `missing-shards`) and moves nothing.',
  security: [{ bearer: [] as string[] }],
  middleware: [writeAuth] as const,
  request: {
    params: ShardParams,
    body: {
      required: true,
      content: { [SHARD_MEDIA_TYPE]: { schema: { type: 'string', format: 'binary' } } },
    },
  },
  responses: {
    201: {
      description: 'Stored',
      content: {
        'application/json': { schema: z.object({ name: z.string(), sha256: z.string(), bytes: z.number() }) },
      },
    },
    ...errorResponses(400, 401, 409, 413, 422, 503),
  },
})

/**
 * Add the shard upload route.
 * @example registerShardRoutes(app) // PUT /v1/models/:name/shards/:sha256
 */
export function registerShardRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(shardRoute, async (c) => {
    const { name, sha256 } = c.req.valid('param')
    c.var.models.assertWritable(name)
    const bytes = await readBytes(c, MAX_MODEL_BYTES, 'formfold publish --shard-budget')
    const stored = await c.var.models.store.shards.put(name, sha256, bytes)
    return c.json({ name, ...stored }, 201)
  })
}
