// The model a request asks for (`?model=`, default the default model), named in the answer's headers.
import type { Context } from 'hono'
import type { AppEnv } from './env.ts'
import type { LoadedModel } from './model-registry.ts'
import type { ServedModel } from './served-model.ts'

/**
 * Load the model named by `name` (undefined: the default) and say in `Formfold-Model` and
 * `Formfold-Model-Version` which one answers (`embedded` for a model built into the service).
 * @example const { model } = await useModel(c, c.req.valid('query').model)
 */
export async function useModel(
  c: Context<AppEnv>,
  name: string | undefined,
): Promise<LoadedModel<ServedModel>> {
  const loaded = await c.var.models.get(name)
  c.header('Formfold-Model', loaded.name)
  c.header('Formfold-Model-Version', loaded.version === null ? 'embedded' : String(loaded.version))
  return loaded
}
