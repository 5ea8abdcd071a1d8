// `npm run fuzz [-- --runs N] [--seed S] [--only NAME]`: property-based fuzzing of the readers, core, HTTP and CLI.
// Runs also come from FUZZ_RUNS (default 1000 per target; costly targets get a share, see test/fuzz/run-fuzz.ts).
// Exit 0 when every target held, 1 when one failed (its shrunk input is printed), 2 for bad arguments.
import { parseArgs } from 'node:util'
import { type FuzzResult, runFuzz } from '../test/fuzz/run-fuzz.ts'

const usage = 'usage: npm run fuzz -- [--runs N] [--seed S] [--only NAME]'

function positive(name: string, text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback
  const n = Number(text)
  if (!Number.isInteger(n) || n < 0) {
    process.stderr.write(`fuzz: --${name} must be a whole number ≥ 0, not "${text}"\n${usage}\n`)
    process.exit(2)
  }
  return n
}

let values: { runs?: string; seed?: string; only?: string }
try {
  values = parseArgs({
    options: { runs: { type: 'string' }, seed: { type: 'string' }, only: { type: 'string' } },
  }).values
} catch (err) {
  process.stderr.write(`fuzz: ${(err as Error).message}\n${usage}\n`)
  process.exit(2)
}
const runs = positive('runs', values.runs ?? process.env.FUZZ_RUNS, 1000)
const seed = positive('seed', values.seed ?? process.env.FUZZ_SEED, Date.now() % 2 ** 31)

// Internal errors the HTTP app logs would bury the report; they also show as a failed target (a 500).
console.error = () => {}

process.stdout.write(`fuzzing with ${runs} inputs per target, seed ${seed}\n`)
const print = (r: FuzzResult) =>
  process.stdout.write(
    `${r.failed ? 'FAIL' : 'ok  '}  ${r.name.padEnd(40)} ${String(r.runs).padStart(7)} inputs  ${r.seconds.toFixed(1)} s\n${r.report ? `${r.report}\n` : ''}`,
  )
const results = await runFuzz({ runs, seed, only: values.only }, print)
const total = results.reduce((n, r) => n + r.runs, 0)
const failed = results.filter((r) => r.failed)
process.stdout.write(`${total} inputs, ${failed.length} failing target(s)\n`)
process.exit(failed.length === 0 ? 0 : 1)
