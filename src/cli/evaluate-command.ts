// `formfold evaluate --train TABLES --test TABLES [--json]`: the evaluation protocol of DESIGN.md.
import type { Command } from 'commander'
import { buildLexicon, learnForEvaluation, scoreInflection } from '../core/index.ts'
import { lookupMetrics } from '../core/lookup/lookup-metrics.ts'
import { readSources, reportSkipped, runCommand } from './io.ts'

/** The protocol's keys, in order. */
const KEYS = [
  'formAccuracy',
  'tableAccuracy',
  'top3TableAccuracy',
  'unseenRecall',
  'unseenMeanCandidates',
  'listedRecall',
  'listedPrecision',
  'goldMeanAnalyses',
  'learnSeconds',
  'lemmas',
  'cells',
] as const

export function registerEvaluate(program: Command): void {
  program
    .command('evaluate')
    .description('learn from TRAIN tables, predict the tables of TEST lemmas from (lemma, upos), and score')
    .requiredOption('--train <file>', 'table rows to learn from (only tables are used)')
    .requiredOption('--test <file>', 'table rows to predict')
    .option('--json', 'print one JSON object with exactly the protocol keys')
    .option('--skip-bad', 'count bad lines instead of stopping at the first')
    .action((opts: { train: string; test: string; json?: boolean; skipBad?: boolean }) =>
      runCommand(async () => {
        const skipBad = Boolean(opts.skipBad)
        const trainRead = await readSources([opts.train], { skipBad })
        const testRead = await readSources([opts.test], { skipBad })
        reportSkipped(trainRead)
        reportSkipped(testRead)
        const train = buildLexicon(trainRead.entries)
        const test = buildLexicon(testRead.entries)
        const t0 = performance.now()
        const model = learnForEvaluation(train)
        const learnSeconds = (performance.now() - t0) / 1000
        const s = scoreInflection(model, test)
        const lookup = lookupMetrics(model, test)
        const result: Record<string, number | null> = {
          ...s,
          ...lookup,
          learnSeconds: round(learnSeconds, 2),
        }
        const ordered = Object.fromEntries(KEYS.map((k) => [k, result[k] ?? null]))
        if (opts.json) process.stdout.write(`${JSON.stringify(ordered)}\n`)
        else for (const k of KEYS) process.stdout.write(`${k.padEnd(22)}${fmt(ordered[k])}\n`)
      }),
    )
}

function round(x: number, d: number): number {
  const f = 10 ** d
  return Math.round(x * f) / f
}

function fmt(v: number | null | undefined): string {
  if (v === null || v === undefined) return 'n/a'
  return Number.isInteger(v) ? String(v) : v.toFixed(4)
}
