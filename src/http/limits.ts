// The service's limits: every bound a request can hit, as named constants (documented in the README).

/** Largest JSON request body (analyze batches, expansion lists), in bytes. Beyond: 413. */
export const MAX_BODY_BYTES = 1024 * 1024

/** Largest corpus accepted by `POST /v1/constraints`, in bytes. Larger corpora: `formfold constrain`. */
export const MAX_CORPUS_BYTES = 2 * 1024 * 1024

/** Largest model file accepted by a write, in bytes. Larger models: `formfold publish` to local storage. */
export const MAX_MODEL_BYTES = 32 * 1024 * 1024

/**
 * Largest lexicon upload a write learns from, in bytes after gzip is undone (a bound on memory while reading;
 * the CPU bound is `MAX_LEARN_LEMMAS`). Larger lexicons: `formfold learn`, then `formfold publish`.
 */
export const MAX_LEXICON_BYTES = 8 * 1024 * 1024

/**
 * Most lemmas (entries with a table plus lemma-only entries) one upload is learned from: a lemma-only entry
 * costs about as much CPU as a table (its tables are predicted). `npm run bench:edge-learn` measured 2,500
 * German verbs at 68–73 s of workerd CPU, a quarter of the 300 s a request may have with `limits.cpu_ms`
 * (the 30 s default fits about 1,000). See the README for the table, and for memory.
 */
export const MAX_LEARN_LEMMAS = 2_500

/** Most table rows (forms) one upload is learned from (a bound for dictionaries with large tables). */
export const MAX_LEARN_ROWS = 75_000

/** Forms in one `POST /v1/analyze` batch. */
export const MAX_BATCH_FORMS = 1000

/** Longest form, in UTF-16 code units (a token longer than this is not a word form). */
export const MAX_FORM_CHARS = 256

/** Lemmas in one `POST /v1/expand` request. Larger lists: `formfold expand`, which streams from a file. */
export const MAX_EXPAND_LEMMAS = 10_000

/** Alternative tables a lemma query may ask for. */
export const MAX_ALTERNATIVES = 5

/** Candidates per form a query may ask for (`top`). */
export const MAX_TOP = 50

/** Longest model name; names are lowercase letters, digits, `.`, `_`, `-`. */
export const MAX_MODEL_NAME_CHARS = 64

/** How long an isolate trusts the pointer it read before reading it again, in milliseconds. */
export const POINTER_TTL_MS = 5_000

/** Decoded models kept per isolate (least recently used evicted first). */
export const MAX_CACHED_MODELS = 8

/** Analyze answers kept per model and option set (a model is immutable, so an answer never goes stale). */
export const MAX_CACHED_ANSWERS = 20_000

/** Shard file bytes kept decoded per sharded model and isolate (the LRU budget; least recently used out first). */
export const SHARD_CACHE_BYTES = 32 * 1024 * 1024

/** A batch is looked up in steps that each need at most this many shards of a sharded model. */
export const MAX_SHARDS_PER_STEP = 4

/**
 * All limits by name, for `/health` and the docs.
 * @example LIMITS.maxBatchForms // 1000
 */
export const LIMITS = {
  maxBodyBytes: MAX_BODY_BYTES,
  maxCorpusBytes: MAX_CORPUS_BYTES,
  maxModelBytes: MAX_MODEL_BYTES,
  maxLexiconBytes: MAX_LEXICON_BYTES,
  maxLearnLemmas: MAX_LEARN_LEMMAS,
  maxLearnRows: MAX_LEARN_ROWS,
  maxBatchForms: MAX_BATCH_FORMS,
  maxFormChars: MAX_FORM_CHARS,
  maxExpandLemmas: MAX_EXPAND_LEMMAS,
  maxAlternatives: MAX_ALTERNATIVES,
  maxTop: MAX_TOP,
  shardCacheBytes: SHARD_CACHE_BYTES,
  maxShardsPerStep: MAX_SHARDS_PER_STEP,
} as const
