// Lookup speed and size: analyze() over every form of a large model against a bare Map.get of the same
// strings, the model file's bytes per form, and its load time; the same model sharded (sizes, and analyze
// through a sharded index against the whole one, warm and per request). Reads the DDN13 German sets from
// ../shared/bench-data/ddn13 (beside the repository, not part of it) and skips when they are missing.
// Run: npm run bench:lookup -- [--json] [--rounds N] [--model FILE] [--save-model FILE] [--shard-budget BYTES]
import { existsSync, readFileSync, writeFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { parseArgs } from 'node:util'
import type { Entry } from '../src/core/lexicon/entry.ts'
import { analyzeForm } from '../src/core/lookup/analyze.ts'
import { lookupKeys } from '../src/core/lookup/normalize.ts'
import type { ShardedFormIndex } from '../src/core/lookup/sharded-index.ts'
import { buildModel } from '../src/core/model/build-model.ts'
import { decodeModel } from '../src/core/model/decode-model.ts'
import { encodeModel } from '../src/core/model/encode-model.ts'
import { decodeShardedModel } from '../src/core/model/read-sharded.ts'
import { shardModel } from '../src/core/model/shard-model.ts'
import { readTableRowsFile } from '../test/support/table-rows-file.ts'

const { values } = parseArgs({
  options: {
    json: { type: 'boolean', default: false },
    rounds: { type: 'string', default: '5' },
    model: { type: 'string' },
    'save-model': { type: 'string' },
    'shard-budget': { type: 'string' },
  },
})
const log = (text: string) => process.stderr.write(`${text}\n`)
const data = new URL('../../shared/bench-data/ddn13/', import.meta.url)
const file = (name: string) => fileURLToPath(new URL(name, data))

if (!values.model && (!existsSync(file('de-verb-train.tsv')) || !existsSync(file('de-noun-train.tsv')))) {
  log('bench:lookup skipped: the DDN13 German sets (../shared/bench-data/ddn13) are not there')
  process.exit(0)
}

function readTsv(name: string): Entry[] {
  return readTableRowsFile(file(name))
}

// The dictionary: German noun and verb tables, and the held-out lemmas listed without their tables
// (or a model file given with --model).
let learnSeconds = 0
let text: string
if (values.model) text = readFileSync(values.model, 'utf8')
else {
  const tables = [...readTsv('de-noun-train.tsv'), ...readTsv('de-verb-train.tsv')]
  const bare = ['de-noun-dev.tsv', 'de-noun-test.tsv', 'de-verb-dev.tsv', 'de-verb-test.tsv']
    .filter((n) => existsSync(file(n)))
    .flatMap(readTsv)
    .map((e): Entry => ({ lemma: e.lemma, upos: e.upos, feats: '_' }))
  const t = performance.now()
  const built = buildModel([...tables, ...bare])
  learnSeconds = (performance.now() - t) / 1000
  text = encodeModel(built)
}
if (values['save-model']) writeFileSync(values['save-model'], text)
const bytes = new TextEncoder().encode(text).length

// Load time: the whole decode (index rebuilt), beside a bare JSON.parse of the same text.
let t0 = performance.now()
JSON.parse(text)
const parseSeconds = (performance.now() - t0) / 1000
t0 = performance.now()
const model = decodeModel(text)
const loadSeconds = (performance.now() - t0) / 1000

const forms = [...model.index.forms()]
// The floor: a Map from the same strings to a value, looked up the same way.
const floor = new Map(forms.map((f, i) => [f, i]))
let sink = 0
const timeMap = () => {
  const t = performance.now()
  for (const f of forms) sink += floor.get(f) ?? 0
  return performance.now() - t
}
const timeAnalyze = () => {
  const t = performance.now()
  for (const f of forms) sink += analyzeForm(model, f).candidates.length
  return performance.now() - t
}
// The first pass builds each form's answer (then shared): timed on its own as the cold figure.
const coldMap = timeMap()
const coldAnalyze = timeAnalyze()
// Then alternate the two, several rounds, and compare medians: the machine is noisy.
const mapMs: number[] = []
const analyzeMs: number[] = []
for (let r = 0; r < Number(values.rounds); r++) {
  mapMs.push(timeMap())
  analyzeMs.push(timeAnalyze())
}
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!
const nsPerForm = (ms: number) => (ms * 1e6) / forms.length
const mapNs = nsPerForm(median(mapMs))
const analyzeNs = nsPerForm(median(analyzeMs))

// Sharded: by default a budget of an eighth of the index's bytes (8 or more shards), all in memory here, so the
// figures are the index's own cost (decoding a shard, routing, sessions), not the network's.
const encoder = new TextEncoder()
const indexBytes = (await shardModel(model, Number.MAX_SAFE_INTEGER)).refs[0]!.bytes
const budget = Number(values['shard-budget'] ?? Math.ceil(indexBytes / 8))
const files = await shardModel(model, budget)
const manifestBytes = encoder.encode(files.manifest).byteLength
const sharded = decodeShardedModel(files.manifest, async (i) => encoder.encode(files.shards[i]!), Infinity)
t0 = performance.now()
const all = sharded.index.session()
await all.load(forms)
const shardLoadMs = performance.now() - t0
const warm = { ...sharded, index: all }
const timeSharded = () => {
  const t = performance.now()
  for (const f of forms) sink += analyzeForm(warm, f).candidates.length
  return performance.now() - t
}
timeSharded()
// One request per form: a fresh session loads the form's spellings (its shard, from the cache), then analyzes.
const sample = forms.filter((_, i) => i % Math.max(1, Math.floor(forms.length / 5000)) === 0)
const timeRequests = async (m: typeof sharded) => {
  const t = performance.now()
  for (const f of sample) {
    const index = m.index.session()
    await index.load(lookupKeys([f]))
    sink += analyzeForm({ ...m, index }, f).candidates.length
  }
  return ((performance.now() - t) * 1e6) / sample.length
}
const shardedMs: number[] = []
const wholeMs: number[] = []
const requestNs: number[] = []
const wholeRequestNs: number[] = []
for (let r = 0; r < Number(values.rounds); r++) {
  wholeMs.push(timeAnalyze())
  shardedMs.push(timeSharded())
  wholeRequestNs.push(await timeRequests(model))
  requestNs.push(await timeRequests(sharded))
}
const shards = files.refs.map((r) => r.bytes)
const shardResult = {
  shardBudget: budget,
  shards: files.refs.length,
  shardBytesMin: Math.min(...shards),
  shardBytesMax: Math.max(...shards),
  shardBytesTotal: shards.reduce((a, b) => a + b, 0),
  manifestBytes,
  shardDecodeMsPerShard: shardLoadMs / files.refs.length,
  shardedAnalyzeVsWhole: median(shardedMs) / median(wholeMs),
  shardedRequestNsPerForm: median(requestNs),
  shardedRequestVsWhole: median(requestNs) / median(wholeRequestNs),
  shardsFetched: (sharded.index as ShardedFormIndex).cache.fetched,
}

const result = {
  lemmas: model.inflection.lexicon.entries.length,
  forms: forms.length,
  analyses: model.index.analysisCount,
  modelBytes: bytes,
  bytesPerForm: bytes / forms.length,
  learnSeconds,
  loadSeconds,
  loadVsParse: loadSeconds / parseSeconds,
  mapNsPerForm: mapNs,
  analyzeNsPerForm: analyzeNs,
  analyzeVsMap: analyzeNs / mapNs,
  analyzeColdVsMap: coldAnalyze / coldMap,
  ...shardResult,
}
log(
  `model: ${result.lemmas} lemmas, ${result.forms} forms, ${result.analyses} analyses, learned in ${learnSeconds.toFixed(1)} s`,
)
log(
  `file: ${bytes} bytes = ${result.bytesPerForm.toFixed(1)} bytes per form; load ${(loadSeconds * 1000).toFixed(0)} ms = ${result.loadVsParse.toFixed(1)} × JSON.parse`,
)
log(
  `analyze: ${analyzeNs.toFixed(0)} ns per form; Map.get: ${mapNs.toFixed(0)} ns; analyzeVsMap ${result.analyzeVsMap.toFixed(2)}; first pass (answers built) ${result.analyzeColdVsMap.toFixed(2)}${sink > 0 ? '' : ' (no answers?)'}`,
)
log(
  `sharded (budget ${budget} bytes): ${files.refs.length} shards of ${shardResult.shardBytesMin}–${shardResult.shardBytesMax} bytes ` +
    `(${shardResult.shardBytesTotal} in all), manifest ${manifestBytes} bytes; decode ${shardResult.shardDecodeMsPerShard.toFixed(1)} ms per shard`,
)
log(
  `sharded analyze (all shards resident) / whole ${shardResult.shardedAnalyzeVsWhole.toFixed(2)}; one request per form ` +
    `(session + load + analyze) ${shardResult.shardedRequestNsPerForm.toFixed(0)} ns = ${shardResult.shardedRequestVsWhole.toFixed(2)} × the whole index's`,
)
if (values.json) process.stdout.write(`${JSON.stringify(result)}\n`)
