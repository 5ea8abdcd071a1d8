// What a sharded model costs an isolate: memory (JS heap and array buffers) of its head once decoded, then after answering indexed forms
// (shards fetched) and unknown forms (the guesser's tables built), with the time each step took.
// The model file comes from elsewhere, e.g. the whole German model of bench/scale-learn.ts --save FILE.
// Run: node --expose-gc --max-old-space-size=16000 --import tsx bench/edge-memory.ts --model FILE [--budget BYTES]
import { parseArgs } from 'node:util'
import { readModelText } from '../src/cli/model-file.ts'
import { decodeModel } from '../src/core/model/decode-model.ts'
import { decodeShardedModel } from '../src/core/model/read-sharded.ts'
import { shardModel } from '../src/core/model/shard-model.ts'
import { analyzeJson } from '../src/http/lookup.ts'

const { values } = parseArgs({
  options: {
    model: { type: 'string' },
    budget: { type: 'string', default: '4000000' },
    cache: { type: 'string', default: String(8 << 20) },
    known: { type: 'string', default: 'Häuser,gingen' },
    unknown: { type: 'string', default: 'Quaxelung,verschnorpelt' },
  },
})
const gc = (globalThis as { gc?: () => void }).gc
if (!values.model || !gc) {
  process.stderr.write('usage: node --expose-gc --max-old-space-size=16000 --import tsx bench/edge-memory.ts --model FILE\n')
  process.exit(2)
}
// What an isolate pays for: the JS heap plus the typed arrays' buffers, which V8 keeps outside it.
const heapMB = () => {
  gc()
  gc()
  const m = process.memoryUsage()
  return (m.heapUsed + m.arrayBuffers) / 1048576
}
let files: Awaited<ReturnType<typeof shardModel>> | undefined
{
  files = await shardModel(decodeModel(await readModelText(values.model)), Number(values.budget))
}
const shards = files.shards
await new Promise((done) => setTimeout(done, 10)) // weak references from sharding are cleared between jobs
const base = heapMB()
let t = performance.now()
const model = decodeShardedModel(files.manifest, async (i) => new TextEncoder().encode(shards[i]), Number(values.cache))
const result: Record<string, number> = {
  shards: files.refs.length,
  manifestBytes: new TextEncoder().encode(files.manifest).byteLength,
  decodeSeconds: (performance.now() - t) / 1000,
  headHeapMB: heapMB() - base,
}
for (const [name, list] of [['known', values.known!], ['unknown', values.unknown!]] as const) {
  t = performance.now()
  await analyzeJson(model, list.split(','), {})
  result[`${name}Seconds`] = (performance.now() - t) / 1000
  result[`after${name[0]!.toUpperCase()}${name.slice(1)}HeapMB`] = heapMB() - base
}
const rounded = Object.fromEntries(Object.entries(result).map(([k, v]) => [k, Math.round(v * 10) / 10]))
process.stderr.write(`${JSON.stringify(rounded, null, 1)}\n`)
process.stdout.write(`${JSON.stringify(rounded)}\n`)
