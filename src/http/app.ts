// The formfold HTTP app: every route, one error model, `/openapi.json` generated from the route schemas.
import { OpenAPIHono } from '@hono/zod-openapi'
import { defaultRegistry, type RegistryFor } from './app-registry.ts'
import type { AppEnv } from './env.ts'
import { onError, onNotFound, validationHook } from './error-handler.ts'
import { modelPath } from './model-path.ts'
import { registerPage } from './page.ts'
import { readCorsOnly } from './read-cors.ts'
import { registerAnalyze } from './routes/analyze.ts'
import { registerConstraints } from './routes/constraints.ts'
import { registerExpand } from './routes/expand.ts'
import { registerHealth } from './routes/health.ts'
import { registerLemmas } from './routes/lemmas.ts'
import { registerModelRoutes } from './routes/models.ts'
import { registerParadigms } from './routes/paradigms.ts'
import { registerShardRoutes } from './routes/shards.ts'
import { strictUrl } from './strict-input.ts'

/** How an app finds its models (default: the R2 binding, or memory under Node). */
export interface AppOptions {
  registry?: RegistryFor
}

/**
 * Build the app. The same app runs in workerd (`export default app`) and under Node (`@hono/node-server`).
 * @example
 * const app = createApp()
 * const res = await app.request('/v1/analyze?form=vessat') // 200 {form, normalized, candidates}
 */
export function createApp(options: AppOptions = {}): OpenAPIHono<AppEnv> {
  const registryFor = options.registry ?? defaultRegistry
  const app = new OpenAPIHono<AppEnv>({ defaultHook: validationHook })
  app.onError(onError)
  app.notFound(onNotFound)
  app.use('*', strictUrl)
  app.use('*', readCorsOnly)
  app.use('*', async (c, next) => {
    c.set('models', registryFor(c.env))
    await next()
  })
  app.use('/v1/models/*', modelPath(app))

  registerHealth(app)
  registerAnalyze(app)
  registerLemmas(app)
  registerExpand(app)
  registerParadigms(app)
  registerConstraints(app)
  registerModelRoutes(app)
  registerShardRoutes(app)
  registerPage(app)

  app.openAPIRegistry.registerComponent('securitySchemes', 'bearer', { type: 'http', scheme: 'bearer' })
  app.doc('/openapi.json', {
    openapi: '3.0.3',
    info: {
      title: 'formfold',
      version: '1',
      description:
        'Candidate analyses (lemma, UPOS, FEATS) of word forms, tables of lemmas and constraint files, from paradigms ' +
        'learned from a dictionary. Every form and analysis says whether it is attested, predicted or guessed.',
    },
  })
  return app
}
