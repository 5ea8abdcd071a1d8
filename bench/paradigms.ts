// Benchmark: the evaluation protocol on the five DDN13 sets (reads ../shared/bench-data/ddn13 beside the
// checkout; skips cleanly when it is missing). German trains on `train`; Spanish and Finnish train on the
// 200 `dev` tables (a low-resource setting, not comparable to full-training figures). Reports `test`.
import { createReadStream, existsSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { buildLexicon, learnForEvaluation, scoreInflection } from '../src/core/index.ts'
import { readLexicon } from '../src/formats/index.ts'

const DATA = fileURLToPath(new URL('../../shared/bench-data/ddn13/', import.meta.url))

/** Reference points quoted in the task that set the floors (from memory, not re-measured here). */
const SETS = [
  { set: 'de-verb', train: 'train', ref: '2013 system ~0.85 / 0.962; suffix analogy ~0.865 / 0.977' },
  { set: 'de-noun', train: 'train', ref: '2013 system ~0.795 / 0.889; suffix analogy ~0.77 / 0.88' },
  { set: 'es-verb', train: 'dev', ref: 'suffix analogy (dev-trained) ~0.98 table' },
  { set: 'fi-nounadj', train: 'dev', ref: 'suffix analogy (dev-trained) ~0.56 table' },
  { set: 'fi-verb', train: 'dev', ref: 'suffix analogy (dev-trained) ~0.86 table' },
]

async function lexicon(file: string) {
  const r = await readLexicon(createReadStream(file), { file, format: 'rows' })
  return buildLexicon(r.entries)
}

async function main(): Promise<void> {
  if (!existsSync(DATA)) {
    console.log('bench:paradigms: ../shared/bench-data/ddn13 is not beside this checkout; skipped')
    return
  }
  const split = process.argv.includes('--dev') ? 'dev' : 'test'
  const rows: Record<string, string | number>[] = []
  for (const s of SETS) {
    const evalSplit = s.train === 'dev' && split === 'dev' ? null : split
    if (!evalSplit) continue
    const train = await lexicon(`${DATA}${s.set}-${s.train}.tsv`)
    const test = await lexicon(`${DATA}${s.set}-${evalSplit}.tsv`)
    const t0 = performance.now()
    const model = learnForEvaluation(train)
    const learnSeconds = (performance.now() - t0) / 1000
    const r = scoreInflection(model, test)
    rows.push({
      set: s.set,
      trainedOn: s.train,
      scoredOn: evalSplit,
      tableAccuracy: r.tableAccuracy.toFixed(3),
      formAccuracy: r.formAccuracy.toFixed(4),
      top3TableAccuracy: r.top3TableAccuracy.toFixed(3),
      learnSeconds: learnSeconds.toFixed(1),
      reference: s.ref,
    })
    console.error(`${s.set} done`)
  }
  if (process.argv.includes('--json')) console.log(JSON.stringify(rows))
  else console.table(rows)
}

await main()
