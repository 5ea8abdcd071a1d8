// The learning suite under Node, through app.request (no server), with an in-memory model store.
import { createApp } from '../../src/http/app.ts'
import { describeLearning } from './learn-suite.ts'
import type { RouteTarget } from './route-target.ts'

const app = createApp()
const token = 'node-learn-write-token'

describeLearning(
  (): RouteTarget => ({
    fetch: (path, init) => Promise.resolve(app.request(path, init, { WRITE_TOKEN: token })),
    token,
  }),
)
