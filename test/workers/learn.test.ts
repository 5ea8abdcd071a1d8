// The learning suite inside workerd: the worker's own app with the R2 binding of wrangler.toml.
import { env } from 'cloudflare:workers'
import app from '../../src/worker.ts'
import { describeLearning } from '../http/learn-suite.ts'

const token = 'workers-learn-suite-token'
const bindings = { ...env, WRITE_TOKEN: token }

describeLearning(() => ({ fetch: (path, init) => Promise.resolve(app.request(path, init, bindings)), token }))
