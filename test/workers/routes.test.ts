// The HTTP suites inside workerd: the worker's own app with the R2 and KV bindings of wrangler.toml.
import { env, exports } from 'cloudflare:workers'
import { describe, expect, it } from 'vitest'
import app from '../../src/worker.ts'
import { describeBadRequests } from '../http/bad-request-suite.ts'
import { describeExpandStream } from '../http/expand-stream-suite.ts'
import { describePublishing } from '../http/publish-suite.ts'
import { describeRoutes } from '../http/route-suite.ts'
import type { RouteTarget } from '../http/route-target.ts'

const token = 'workers-suite-write-token'
const bindings = { ...env, WRITE_TOKEN: token }
const target = (): RouteTarget => ({
  fetch: (path, init) => Promise.resolve(app.request(path, init, bindings)),
  token,
})

describe('the worker entry point', { timeout: 30_000 }, () => {
  it('runs in workerd with the R2 and KV bindings', async () => {
    expect(navigator.userAgent).toBe('Cloudflare-Workers')
    expect(typeof env.BUCKET.put).toBe('function')
    expect(typeof env.KV.get).toBe('function')
  })

  it('answers through the default export as the runtime calls it', async () => {
    const res = await exports.default.fetch('http://formfold.test/v1/analyze?form=lokan')
    expect(res.status).toBe(200)
    expect((await res.json<{ form: string }>()).form).toBe('lokan')
  })

  it('refuses writes when no write secret is bound', async () => {
    const res = await exports.default.fetch('http://formfold.test/v1/models/x', {
      method: 'PUT',
      headers: { authorization: 'Bearer anything' },
    })
    expect(res.status).toBe(401)
  })
})

describeRoutes(target)
describePublishing(target)
describeBadRequests(target)
describeExpandStream()
