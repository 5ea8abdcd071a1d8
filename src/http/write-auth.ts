// Writes need `Authorization: Bearer <token>` equal to the WRITE_TOKEN secret, compared in constant time.
import type { MiddlewareHandler } from 'hono'
import { bearerAuth } from 'hono/bearer-auth'
import { timingSafeEqual } from 'hono/utils/buffer'
import type { ErrorBody } from './api-error.ts'
import type { AppEnv } from './env.ts'

const denied = (message: string): ErrorBody => ({ error: { code: 'unauthorized', message, details: null } })

/**
 * The guard of every write route. Without a configured secret no token is accepted (writes are off);
 * tokens are compared through hashes of equal length, so the time taken does not reveal a prefix.
 * @example app.put('/v1/models/:name', writeAuth, handler)
 */
export const writeAuth: MiddlewareHandler<AppEnv> = bearerAuth({
  verifyToken: async (token, c) => {
    const secret = (c.env as AppEnv['Bindings'] | undefined)?.WRITE_TOKEN
    if (!secret) return false
    return timingSafeEqual(secret, token)
  },
  noAuthenticationHeader: { message: denied('this write needs Authorization: Bearer <token>') },
  invalidAuthenticationHeader: { message: denied('the Authorization header is not a bearer token') },
  invalidToken: { message: denied('the bearer token is not the write token') },
}) as MiddlewareHandler<AppEnv>
