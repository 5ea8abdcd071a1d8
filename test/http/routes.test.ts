// The HTTP suites under Node, through app.request (no server), with an in-memory model store.
import { createApp } from '../../src/http/app.ts'
import { describeBadRequests } from './bad-request-suite.ts'
import { describePublishing } from './publish-suite.ts'
import { describeRoutes } from './route-suite.ts'
import type { RouteTarget } from './route-target.ts'

const app = createApp()
const token = 'node-suite-write-token'
const target = (): RouteTarget => ({
  fetch: (path, init) => Promise.resolve(app.request(path, init, { WRITE_TOKEN: token })),
  token,
})

describeRoutes(target)
describePublishing(target)
describeBadRequests(target)
