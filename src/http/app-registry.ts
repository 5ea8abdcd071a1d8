// Which registry a request uses: one per R2 bucket binding (so its caches live as long as the isolate), or memory.

import { DEMO_MODEL_NAME, demoModel } from './demo-model.ts'
import type { Bindings } from './env.ts'
import { type EmbeddedModel, ModelRegistry } from './model-registry.ts'
import { modelCodec, type ServedModel } from './served-model.ts'
import { MemoryBlobStore } from './store/memory-blob-store.ts'
import { ModelStore } from './store/model-store.ts'
import { R2BlobStore } from './store/r2-blob-store.ts'

/** Chooses the registry of a request from its bindings. */
export type RegistryFor = (env: Bindings | undefined) => ModelRegistry<ServedModel>

const byBucket = new WeakMap<R2Bucket, ModelRegistry<ServedModel>>()
let inMemory: ModelRegistry<ServedModel> | undefined

/**
 * A registry over a store with the demo model embedded (and as default).
 * @example const registry = registryOver(new ModelStore(new MemoryBlobStore(), modelCodec))
 */
export function registryOver(
  store: ModelStore<ServedModel>,
  embedded: EmbeddedModel<ServedModel>[] = [demoModel],
  defaultName = DEMO_MODEL_NAME,
): ModelRegistry<ServedModel> {
  return new ModelRegistry({ store, embedded, defaultName })
}

/**
 * The default choice: the `BUCKET` binding when there is one (workerd, `wrangler dev`), else one
 * in-memory store for the process (Node without storage).
 * @example createApp({ registry: defaultRegistry })
 */
export const defaultRegistry: RegistryFor = (env) => {
  const bucket = env?.BUCKET
  if (!bucket) {
    inMemory ??= registryOver(new ModelStore(new MemoryBlobStore(), modelCodec))
    return inMemory
  }
  let registry = byBucket.get(bucket)
  if (!registry) {
    registry = registryOver(new ModelStore(new R2BlobStore(bucket), modelCodec))
    byBucket.set(bucket, registry)
  }
  return registry
}
