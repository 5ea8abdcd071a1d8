// The demo model embedded in the app (learned from demo-lexicon/), decoded on first use.
import { decodeModel } from '../core/model/decode-model.ts'
import { DEMO_MODEL_TEXT } from './demo-model.generated.ts'
import type { EmbeddedModel } from './model-registry.ts'
import { type ServedModel, summarizeModel } from './served-model.ts'

/** The demo model's name (`?model=demo`), and the default model of the app. */
export const DEMO_MODEL_NAME = 'demo'

/**
 * The embedded demo model (regenerate with `npm run build:demo-model` after changing demo-lexicon/).
 * @example registryOver(store, [demoModel]).get('demo')
 */
export const demoModel: EmbeddedModel<ServedModel> = {
  name: DEMO_MODEL_NAME,
  load: () => decodeModel(DEMO_MODEL_TEXT),
  summarize: summarizeModel,
}
