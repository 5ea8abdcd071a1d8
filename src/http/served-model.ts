// The model as the service sees it: the core model, its file codec, its summary, and the media type of its file.
import { ShardedFormIndex } from '../core/lookup/sharded-index.ts'
import { decodeModel } from '../core/model/decode-model.ts'
import type { Model } from '../core/model/model.ts'
import { checkManifest, decodeShardedModel, isShardedManifest } from '../core/model/read-sharded.ts'
import { SHARD_CACHE_BYTES } from './limits.ts'
import type { ModelCodec, ModelSummary } from './store/model-store.ts'

/** The model every route answers from. */
export type ServedModel = Model

/** Media type of a model file in a write (`application/json` is accepted too). */
export const MODEL_MEDIA_TYPE = 'application/vnd.formfold.model+json'

/** Media types a model-file write may declare. */
export const MODEL_MEDIA_TYPES: readonly string[] = [MODEL_MEDIA_TYPE, 'application/json']

/**
 * Counts that describe a model: lemmas (tables + bare), paradigms, indexed forms and analyses.
 * @example summarizeModel(model) // { lemmas: 1136, tables: 496, bareLemmas: 640, paradigms: 31, forms: 20412, analyses: 31877 }
 */
export function summarizeModel(model: Model): ModelSummary {
  const entries = model.inflection.lexicon.entries
  // An entry has its own table exactly when it keeps no predicted ones (read without decoding any table).
  const tables = model.kept.reduce((n, k) => n + (k === null ? 1 : 0), 0)
  return {
    lemmas: entries.length,
    tables,
    bareLemmas: entries.length - tables,
    paradigms: model.inflection.book.paradigms.length,
    forms: model.index.formCount,
    analyses: model.index.analysisCount,
    ...(model.index instanceof ShardedFormIndex ? { shards: model.index.shardCount } : {}),
  }
}

/**
 * How the model store reads and describes model files: a whole model file, or a sharded model's manifest
 * (its shards read from the store on demand, `SHARD_CACHE_BYTES` of them kept decoded per isolate).
 */
export const modelCodec: ModelCodec<Model> = {
  decode: (text, shards) =>
    isShardedManifest(text) ? decodeShardedModel(text, shards, SHARD_CACHE_BYTES) : decodeModel(text),
  summarize: summarizeModel,
  shardsOf: (text) => (isShardedManifest(text) ? checkManifest(JSON.parse(text)) : []),
}
