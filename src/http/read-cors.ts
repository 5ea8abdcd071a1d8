// CORS for reads: any origin may query; writes (PUT, DELETE) get no CORS headers, so browsers can't send them cross-site.
import type { MiddlewareHandler } from 'hono'
import { cors } from 'hono/cors'

/** Response headers a page on another origin may read. */
export const EXPOSED_HEADERS = [
  'Content-Disposition',
  'Formfold-Model',
  'Formfold-Model-Version',
  'Formfold-Report',
]

const readCors = cors({
  origin: '*',
  allowMethods: ['GET', 'HEAD', 'POST'],
  allowHeaders: ['Content-Type', 'Accept'],
  exposeHeaders: EXPOSED_HEADERS,
  maxAge: 86400,
})

/**
 * CORS on every read (GET, HEAD, POST queries and their preflights); write methods pass through without it.
 * @example app.use('*', readCorsOnly)
 */
export const readCorsOnly: MiddlewareHandler = async (c, next) => {
  const method = c.req.method
  const preflightFor = c.req.header('access-control-request-method')?.toUpperCase()
  const isWrite =
    method === 'PUT' ||
    method === 'DELETE' ||
    (method === 'OPTIONS' && (preflightFor === 'PUT' || preflightFor === 'DELETE'))
  if (isWrite) return next()
  return readCors(c, next)
}
