// What the app sees of its runtime: the bindings (R2 bucket, KV, the write secret) and per-request variables.
import type { ModelRegistry } from './model-registry.ts'
import type { ServedModel } from './served-model.ts'

/**
 * Bindings from wrangler.toml and secrets; all optional, so the same app runs under Node without them.
 * @example { BUCKET: env.BUCKET, WRITE_TOKEN: 'a long random string' }
 */
export interface Bindings {
  /** The R2 bucket holding published models. */
  BUCKET?: R2Bucket
  KV?: KVNamespace
  /** The secret every write must present as `Authorization: Bearer <token>`. Unset: writes are refused. */
  WRITE_TOKEN?: string
}

/** Per-request values set by middleware. */
export interface Variables {
  models: ModelRegistry<ServedModel>
}

/** The Hono environment of every route. */
export interface AppEnv {
  Bindings: Bindings
  Variables: Variables
}
