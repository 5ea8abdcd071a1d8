// The path-segment way to name a model: `/v1/models/NAME/analyze…` is `/v1/analyze…?model=NAME`.
import type { Hono, MiddlewareHandler } from 'hono'
import type { AppEnv } from './env.ts'

/** The read resources that can be reached under a model's path. */
const RESOURCES = ['analyze', 'lemmas', 'expand', 'paradigms', 'constraints', 'constraints.tsv']
const MODEL_PATH = new RegExp(
  `^/v1/models/([^/]+)/(${RESOURCES.map((r) => r.replace('.', '\\.')).join('|')})(/.*)?$`,
)

/**
 * The URL a model-path request stands for, or null when the path is not one (e.g. `/v1/models/x/versions/2`).
 * A `?model=` in the query is overridden by the path segment.
 * @example modelPathTarget('http://h/v1/models/demo/lemmas/vessa?upos=NOUN') // 'http://h/v1/lemmas/vessa?upos=NOUN&model=demo'
 */
export function modelPathTarget(href: string): string | null {
  const url = new URL(href)
  const m = MODEL_PATH.exec(url.pathname)
  if (!m) return null
  url.pathname = `/v1/${m[2]}${m[3] ?? ''}`
  url.searchParams.set('model', decodeURIComponent(m[1]!))
  return url.href
}

/**
 * Re-dispatch model-path requests through the app as their `?model=` form, so each route exists once
 * (and once in `/openapi.json`).
 * @example app.use('/v1/models/*', modelPath(app))
 */
export function modelPath(app: Hono<AppEnv>): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    const target = modelPathTarget(c.req.url)
    if (!target) return next()
    let ctx: Parameters<typeof app.fetch>[2]
    try {
      ctx = c.executionCtx
    } catch {
      // app.request() in tests has no execution context
    }
    return app.fetch(new Request(target, c.req.raw), c.env, ctx)
  }
}
