// npm run bench -- [--json]: the whole benchmark suite in one run, parts one after another, and last one JSON
// object of ratios and peaks. Parts that run as child processes print their own JSON, which is parsed here.
// Options: --expand-sizes 100000,1000000  --constrain-tokens 1000000,10000000  --learn-lemmas 0 (0: all)
//          --learn-fractions 0.1,0.3,1  --http-seconds 6  --lookup-rounds 3
// Learning runs on every npm German table by default (about 100k lemmas; a 16 GB heap, some minutes); the
// dictionary-sized model it gives at 100% is the one `bytesPerForm` measures (its gzip file; JSON beside it).
// The lookup part reads ../shared/bench-data/ddn13 beside the checkout and is skipped (null) when missing.
import { spawn } from 'node:child_process'
import { fileURLToPath } from 'node:url'
import { parseArgs } from 'node:util'
import { measureExpand } from './scale-expand.ts'
import type { LearnPoint } from './scale-learn.ts'

const { values } = parseArgs({
  options: {
    json: { type: 'boolean', default: false },
    'expand-sizes': { type: 'string', default: '100000,1000000' },
    'constrain-tokens': { type: 'string', default: '1000000,10000000' },
    'learn-lemmas': { type: 'string', default: '0' },
    'learn-fractions': { type: 'string', default: '0.1,0.3,1' },
    'http-seconds': { type: 'string', default: '6' },
    'lookup-rounds': { type: 'string', default: '3' },
  },
})
const root = fileURLToPath(new URL('..', import.meta.url))
const log = (text: string) => process.stderr.write(`${text}\n`)
const list = (s: string) => s.split(',').map(Number)
const round = (x: number | null | undefined, digits = 3) =>
  x === null || x === undefined || !Number.isFinite(x) ? null : Number(x.toFixed(digits))

/** Run a bench file with tsx; its stderr passes through, its stdout is returned (and echoed to stderr). */
function runBench(file: string, args: string[], node: string[] = []): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [...node, '--import', 'tsx', file, ...args], {
      cwd: root,
      stdio: ['ignore', 'pipe', 'inherit'],
    })
    let out = ''
    child.stdout.on('data', (d: Buffer) => {
      out += d.toString()
      process.stderr.write(d)
    })
    child.on('error', reject)
    child.on('close', () => resolve(out))
  })
}

/** The last line of `text` that parses as a JSON object, or the first one when `first` (else null). */
function jsonLine(text: string, first = false): Record<string, unknown> | null {
  const lines = text.split('\n').filter((l) => l.startsWith('{'))
  for (const line of first ? lines : lines.reverse()) {
    try {
      return JSON.parse(line) as Record<string, unknown>
    } catch {
      // not JSON; try the next
    }
  }
  return null
}

const started = performance.now()
log('== lookup (bench/lookup.ts)')
const lookup = jsonLine(await runBench('bench/lookup.ts', ['--json', '--rounds', values['lookup-rounds']!]))

log('== http, Node only (bench/http.ts)')
const http = jsonLine(
  await runBench('bench/http.ts', ['--no-wrangler', '--seconds', values['http-seconds']!]),
)

log('== constrain at each size (bench/constrain-scale.ts)')
const constrain: { tokens: number; seconds: number | null; peakRssMB: number | null }[] = []
for (const tokens of list(values['constrain-tokens']!)) {
  const r = jsonLine(await runBench('bench/constrain-scale.ts', ['--tokens', String(tokens)]), true)
  constrain.push({
    tokens,
    seconds: (r?.seconds as number) ?? null,
    peakRssMB: (r?.peakMB as number) ?? null,
  })
}

log('== expand at each size (bench/scale-expand.ts)')
const expand = []
for (const size of list(values['expand-sizes']!)) {
  const r = await measureExpand(size)
  log(`expand ${r.lemmas} lemmas: ${r.seconds} s, peak RSS ${r.peakRssMB} MB (${r.method})`)
  expand.push(r)
}

log('== learning on the npm German verb, noun and adjective tables (bench/scale-learn.ts)')
const learnArgs = ['--json', '--lemmas', values['learn-lemmas']!, '--fractions', values['learn-fractions']!]
const learn = jsonLine(await runBench('bench/scale-learn.ts', learnArgs, ['--max-old-space-size=16000'])) as {
  sampleLemmas: number
  points: LearnPoint[]
  learnVsParse: number
  learnGrowth: number
  workGrowth: number
}

const largest = learn.points.at(-1)!
const result = {
  learnVsParse: round(learn.learnVsParse, 1),
  analyzeVsMap: round(lookup?.analyzeVsMap as number),
  bytesPerForm: round(largest.gzipBytes / largest.forms, 1),
  bytesPerFormJson: round(largest.modelBytes / largest.forms, 1),
  httpAnalyzeVsHealth: round((http?.ratios as Record<string, number> | undefined)?.node),
  expandPeakRssMB: expand.at(-1)?.peakRssMB ?? null,
  expandLemmas: expand.at(-1)?.lemmas ?? null,
  constrainPeakRssMB: constrain.at(-1)?.peakRssMB ?? null,
  constrainTokens: constrain.at(-1)?.tokens ?? null,
  learnGrowth: round(learn.learnGrowth, 2),
  learnWorkGrowth: round(learn.workGrowth, 2),
  learnSample: `${learn.sampleLemmas} of the npm German verb+noun lemmas, evenly spread; fractions ${values['learn-fractions']}`,
  expand: expand.map((r) => ({ lemmas: r.lemmas, seconds: r.seconds, peakRssMB: r.peakRssMB })),
  constrain,
  learn: learn.points.map((p) => ({
    fraction: p.fraction,
    lemmas: p.lemmas,
    tables: p.tables,
    rows: p.rows,
    parseSeconds: round(p.parseSeconds),
    learnSeconds: round(p.learnSeconds, 1),
  })),
  germanModel: {
    lemmas: largest.lemmas,
    forms: largest.forms,
    modelBytes: largest.modelBytes,
    gzipBytes: largest.gzipBytes,
    loadSeconds: round(largest.loadSeconds),
  },
  lookupModel: lookup
    ? {
        lemmas: lookup.lemmas,
        forms: lookup.forms,
        modelBytes: lookup.modelBytes,
        bytesPerForm: round(lookup.bytesPerForm as number, 1),
        loadSeconds: round(lookup.loadSeconds as number),
      }
    : null,
  suiteSeconds: Math.round((performance.now() - started) / 1000),
}
if (values.json) process.stdout.write(`${JSON.stringify(result)}\n`)
else process.stdout.write(`${JSON.stringify(result, null, 2)}\n`)
