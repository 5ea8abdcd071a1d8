// Run the fuzz targets for a bounded number of inputs each and report: the code under npm run fuzz and the test.
import fc from 'fast-check'
import { cliTarget } from './cli-target.ts'
import { coreTargets } from './core-targets.ts'
import { httpTargets } from './http-targets.ts'
import { modelTargets } from './model-targets.ts'
import { readerTargets } from './reader-targets.ts'
import type { FuzzTarget } from './target.ts'

/** Every target, readers first (cheapest). */
export const FUZZ_TARGETS: FuzzTarget[] = [
  ...readerTargets,
  ...coreTargets,
  ...httpTargets,
  ...modelTargets,
  cliTarget,
]

export interface FuzzOptions {
  /** Inputs per target before its cost divides them. */
  runs: number
  seed?: number
  /** Only targets whose name contains this. */
  only?: string
}

/** The result of one target. */
export interface FuzzResult {
  name: string
  runs: number
  seed: number
  failed: boolean
  /** The shrunk failing input and error, when failed. */
  report?: string
  seconds: number
}

/**
 * Run the targets one after another; a failure is reported with its shrunk input, not thrown.
 * @example const results = await runFuzz({ runs: 1000, seed: 42 }); results.every((r) => !r.failed)
 */
export async function runFuzz(
  options: FuzzOptions,
  onResult?: (r: FuzzResult) => void,
): Promise<FuzzResult[]> {
  const results: FuzzResult[] = []
  const seed = options.seed ?? Date.now() % 2 ** 31
  for (const target of FUZZ_TARGETS) {
    if (options.only && !target.name.includes(options.only)) continue
    const runs = Math.max(1, Math.floor(options.runs / (target.cost ?? 1)))
    const t0 = performance.now()
    const details = await fc.check(target.property(), { numRuns: runs, seed, endOnFailure: false })
    const result: FuzzResult = {
      name: target.name,
      runs: details.numRuns,
      seed,
      failed: details.failed,
      report: details.failed ? describeFailure(details) : undefined,
      seconds: (performance.now() - t0) / 1000,
    }
    results.push(result)
    onResult?.(result)
  }
  return results
}

function describeFailure(details: fc.RunDetails<unknown>): string {
  const input = fc.stringify(details.counterexample)
  const error =
    details.errorInstance instanceof Error
      ? (details.errorInstance.stack ?? details.errorInstance.message)
      : String(details.errorInstance)
  return `after ${details.numRuns} runs (seed ${details.seed}, path ${details.counterexamplePath}):\ninput: ${input.slice(0, 2000)}\nerror: ${error.slice(0, 2000)}`
}
