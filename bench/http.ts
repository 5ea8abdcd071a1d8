// npm run bench:http — loopback load: GET /v1/analyze against the GET /health floor, under Node and wrangler dev.
// Options: --seconds N per route (default 10), --connections N (default 10), --no-wrangler (Node only). 127.0.0.1 only.
// The two routes alternate in rounds of 2 s, so a change in machine load falls on both alike.
import { type ChildProcess, spawn } from 'node:child_process'
import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
// autocannon ships no types; the part used here is declared below.
// @ts-expect-error no declaration file
import autocannon from 'autocannon'

interface LoadResult {
  requests: { average: number }
  latency: { p50: number; p99: number }
  errors: number
  timeouts: number
  non2xx: number
}
const root = fileURLToPath(new URL('..', import.meta.url))
const args = process.argv.slice(2)
const option = (name: string, fallback: number) => {
  const at = args.indexOf(name)
  return at >= 0 ? Number(args[at + 1]) : fallback
}
const SECONDS = option('--seconds', 10)
const CONNECTIONS = option('--connections', 10)

/** Word forms of the demo corpus (attested, predicted and unknown ones, as running text has them). */
function corpusForms(limit: number): string[] {
  const segmenter = new Intl.Segmenter(undefined, { granularity: 'word' })
  const forms: string[] = []
  // Line by line: a segment of one long string carries a copy of that string.
  for (const line of readFileSync(`${root}demo-lexicon/corpus.txt`, 'utf8').split('\n')) {
    for (const s of segmenter.segment(line)) if (s.isWordLike && forms.length < limit) forms.push(s.segment)
    if (forms.length >= limit) break
  }
  return forms
}

/** Start a server process and wait until its /health answers. */
async function startServer(
  command: string,
  argv: string[],
  url: string,
  env: NodeJS.ProcessEnv = {},
): Promise<ChildProcess> {
  const child = spawn(command, argv, {
    cwd: root,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'ignore', 'pipe'],
  })
  let stderr = ''
  child.stderr!.on('data', (d) => (stderr += d))
  const deadline = Date.now() + 60_000
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`${command} exited: ${stderr}`)
    try {
      if ((await fetch(`${url}/health`)).ok) return child
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200))
  }
  child.kill('SIGTERM')
  throw new Error(`${url} did not answer within 60 s: ${stderr}`)
}

const ROUND_SECONDS = 2

function load(url: string, paths: string[], seconds: number): Promise<LoadResult> {
  let i = 0
  const requests = [
    { setupRequest: (req: { path: string }) => ({ ...req, path: paths[i++ % paths.length] }) },
  ]
  return autocannon({ url, connections: CONNECTIONS, duration: seconds, requests }) as Promise<LoadResult>
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!

/** Rounds summed: mean throughput over all rounds, the median round's p50 and p99, all errors. */
function combine(rounds: LoadResult[]): LoadResult {
  return {
    requests: { average: rounds.reduce((n, r) => n + r.requests.average, 0) / rounds.length },
    latency: { p50: median(rounds.map((r) => r.latency.p50)), p99: median(rounds.map((r) => r.latency.p99)) },
    errors: rounds.reduce((n, r) => n + r.errors, 0),
    timeouts: rounds.reduce((n, r) => n + r.timeouts, 0),
    non2xx: rounds.reduce((n, r) => n + r.non2xx, 0),
  }
}

/** Both loads against one server, alternating; returns a row per route and the throughput ratio. */
async function measure(label: string, url: string, forms: string[]) {
  const analyze = forms.map((f) => `/v1/analyze?form=${encodeURIComponent(f)}`)
  await load(url, ['/health'], 1) // warm-up, not counted
  await load(url, analyze, 2) // warm-up: the forms' first analyses fill the lookup caches
  const healthRounds: LoadResult[] = []
  const analyzeRounds: LoadResult[] = []
  for (let r = 0; r < Math.max(1, Math.round(SECONDS / ROUND_SECONDS)); r++) {
    healthRounds.push(await load(url, ['/health'], ROUND_SECONDS))
    analyzeRounds.push(await load(url, analyze, ROUND_SECONDS))
  }
  const health = combine(healthRounds)
  const lookups = combine(analyzeRounds)
  const row = (route: string, r: LoadResult) => ({
    target: label,
    route,
    'req/s': Math.round(r.requests.average),
    'p50 ms': r.latency.p50,
    'p99 ms': r.latency.p99,
    errors: r.errors + r.timeouts + r.non2xx,
  })
  return {
    rows: [row('GET /health', health), row('GET /v1/analyze', lookups)],
    ratio: lookups.requests.average / health.requests.average,
  }
}

const forms = corpusForms(2000)
const results: { label: string; rows: Record<string, unknown>[]; ratio: number }[] = []
const nodePort = 18788
const node = await startServer(
  process.execPath,
  ['bin/formfold.js', 'serve', '--port', String(nodePort)],
  `http://127.0.0.1:${nodePort}`,
)
try {
  results.push({
    label: 'node',
    ...(await measure('node (formfold serve)', `http://127.0.0.1:${nodePort}`, forms)),
  })
} finally {
  node.kill('SIGTERM')
}
if (!args.includes('--no-wrangler')) {
  const port = 18787
  const wrangler = await startServer(
    process.execPath,
    [
      'node_modules/wrangler/bin/wrangler.js',
      'dev',
      '--local',
      '--ip',
      '127.0.0.1',
      '--port',
      String(port),
      '--inspector-port',
      '19787',
      '--show-interactive-dev-session=false',
      '--log-level',
      'warn',
    ],
    `http://127.0.0.1:${port}`,
    { WRANGLER_SEND_METRICS: 'false', CLOUDFLARE_CF_FETCH_ENABLED: 'false' },
  )
  try {
    results.push({
      label: 'wrangler',
      ...(await measure('wrangler dev (workerd)', `http://127.0.0.1:${port}`, forms)),
    })
  } finally {
    wrangler.kill('SIGTERM')
  }
}

console.table(results.flatMap((r) => r.rows))
for (const r of results) console.log(`${r.label}: analyze/health throughput ratio ${r.ratio.toFixed(3)}`)
const errors = results.flatMap((r) => r.rows).reduce((n, row) => n + Number(row.errors), 0)
console.log(
  JSON.stringify({
    seconds: SECONDS,
    connections: CONNECTIONS,
    ratios: Object.fromEntries(results.map((r) => [r.label, Number(r.ratio.toFixed(3))])),
    errors,
  }),
)
process.exit(errors === 0 ? 0 : 1)
