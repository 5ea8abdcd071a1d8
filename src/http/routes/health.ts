// `GET /health`: the service answers, and with which limits; touches no model, so it is the floor of any benchmark.
import { createRoute, type OpenAPIHono, z } from '@hono/zod-openapi'
import type { AppEnv } from '../env.ts'
import { LIMITS } from '../limits.ts'

const Health = z
  .object({ status: z.literal('ok'), limits: z.record(z.string(), z.number()) })
  .openapi('Health')

const healthRoute = createRoute({
  method: 'get',
  path: '/health',
  summary: 'Liveness, and the limits requests are held to',
  responses: { 200: { description: 'Up', content: { 'application/json': { schema: Health } } } },
})

/**
 * Add `GET /health`.
 * @example registerHealth(app); await app.request('/health') // 200 {"status":"ok",…}
 */
export function registerHealth(app: OpenAPIHono<AppEnv>): void {
  app.openapi(healthRoute, (c) => c.json({ status: 'ok' as const, limits: LIMITS }, 200))
}
