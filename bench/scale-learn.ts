// Learning cost on the npm German verb, noun and adjective tables: time to learn vs. time to only read and parse the same
// table rows, growth over sample fractions, and the model at the largest size (lemmas, forms, bytes, load time).
// A seeded, evenly spread sample of the lemmas is used when all of them take too long (--lemmas N; 0 = all).
// Every fifth sampled lemma becomes a lemma-only entry, so the model holds predicted tables too.
// Learning runs as `formfold learn` does: each size in a fresh process that reads a table-rows file (the timed
// parse) and learns on one thread per core (--jobs), parts of speech side by side.
// Run: npx tsx bench/scale-learn.ts -- [--lemmas 3000] [--fractions 0.1,0.3,1] [--jobs N] [--save MODEL.json[.gz]] [--json]
// All lemmas (--lemmas 0) need a larger heap: node --max-old-space-size=16000 --import tsx bench/scale-learn.ts …
import { spawnSync } from 'node:child_process'
import { createReadStream, mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { parseArgs } from 'node:util'
import { getHeapStatistics } from 'node:v8'
import { type Entry, rowsToEntries } from '../src/core/lexicon/entry.ts'
import { decodeModel } from '../src/core/model/decode-model.ts'
import { encodeModel } from '../src/core/model/encode-model.ts'
import { gzipModelText } from '../src/cli/model-file.ts'
import { buildModelThreaded, defaultJobs } from '../src/cli/threaded-learn.ts'
import { readLexicon } from '../src/formats/index.ts'
import { loadGermanNpm } from '../test/support/german-npm.ts'

/** One learned size: lemmas in, seconds to parse its rows, seconds to learn, the model it gave. */
export interface LearnPoint {
  fraction: number
  lemmas: number
  tables: number
  rows: number
  parseSeconds: number
  learnSeconds: number
  forms: number
  /** The model file as JSON. */
  modelBytes: number
  /** The same file gzip-compressed, as `formfold learn -o model.json.gz` writes it. */
  gzipBytes: number
  loadSeconds: number
  /** Threads learning was allowed. */
  jobs: number
}

/** Every k-th lemma of verbs, nouns then adjectives, so a sample spreads over the alphabet and all three sets. */
function sample(limit: number): Entry[] {
  const all = (['verbs', 'nouns', 'adjectives'] as const).flatMap((set) =>
    rowsToEntries(loadGermanNpm(set).rows),
  )
  if (limit <= 0 || limit >= all.length) return all
  const step = all.length / limit
  return Array.from({ length: limit }, (_, i) => all[Math.floor(i * step)]!)
}

/** The table rows of the table entries, as `formfold learn` reads them from a file. */
function tsvOf(entries: Entry[]): string {
  return entries
    .flatMap((e) => (e.forms ?? []).map((f) => `${e.lemma}\t${f.form}\t${e.upos}\t${f.feats}\n`))
    .join('')
}

/**
 * Write the rows of `entries`' first `fraction` (spread evenly; 1 in 5 as lemma-only) to files, then parse and
 * learn them in a fresh process, as `formfold learn` reads a file and learns: the process holds only what
 * the command would, not this bench's copy of every entry.
 * @example (await measureLearn(sample(300), 1)).learnSeconds
 */
export async function measureLearn(
  entries: Entry[],
  fraction: number,
  save?: string,
  jobs = defaultJobs(),
): Promise<LearnPoint> {
  const count = Math.round(entries.length * fraction)
  const part = Array.from({ length: count }, (_, j) => entries[Math.floor(j / fraction)]!) // spread evenly
  const input = part.map((e, i): Entry => (i % 5 === 4 ? { lemma: e.lemma, upos: e.upos, feats: '_' } : e))
  const dir = mkdtempSync(join(tmpdir(), 'formfold-scale-'))
  try {
    const rows = join(dir, 'tables.tsv')
    const lemmas = join(dir, 'lemmas.tsv')
    writeFileSync(rows, tsvOf(input.filter((e) => e.forms)))
    writeFileSync(
      lemmas,
      input
        .filter((e) => !e.forms)
        .map((e) => `${e.lemma}\t${e.upos}\n`)
        .join(''),
    )
    const heap = Math.ceil(getHeapStatistics().heap_size_limit / 2 ** 20)
    const args = [`--max-old-space-size=${heap}`, '--import', 'tsx', fileURLToPath(import.meta.url)]
    args.push('--point', rows, '--lemma-list', lemmas, '--jobs', String(jobs), '--fraction', String(fraction))
    if (save) args.push('--save', save)
    const run = spawnSync(process.execPath, args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] })
    if (run.status !== 0) throw new Error(`measuring ${fraction} of the sample failed (exit ${run.status})`)
    return JSON.parse(run.stdout) as LearnPoint
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}

/** One point, in this process: parse the table rows file (timed; once before, to warm up), then learn. */
async function learnPoint(rows: string, lemmas: string, fraction: number, jobs: number, save?: string) {
  await readLexicon(createReadStream(rows), { file: rows, format: 'rows' }) // warm-up
  const bare = (await readLexicon(createReadStream(lemmas), { file: lemmas, format: 'lemmas' })).entries
  let t = performance.now()
  const read = await readLexicon(createReadStream(rows), { file: rows, format: 'rows' })
  const parseSeconds = (performance.now() - t) / 1000
  t = performance.now()
  const model = await buildModelThreaded([...read.entries, ...bare], {}, undefined, jobs)
  const learnSeconds = (performance.now() - t) / 1000
  const encoded = encodeModel(model)
  const packed = gzipModelText(encoded)
  if (save) writeFileSync(save, save.endsWith('.gz') ? packed : encoded)
  t = performance.now()
  const decoded = decodeModel(encoded)
  const loadSeconds = (performance.now() - t) / 1000
  const point: LearnPoint = {
    fraction,
    lemmas: read.entries.length + bare.length,
    tables: read.entries.length,
    rows: read.entries.reduce((n, e) => n + (e.forms?.length ?? 0), 0),
    parseSeconds,
    learnSeconds,
    forms: [...decoded.index.forms()].length,
    modelBytes: Buffer.byteLength(encoded),
    gzipBytes: packed.byteLength,
    loadSeconds,
    jobs,
  }
  return point
}

/** Growth and learn/parse over the given fractions of a sample of `lemmas` German lemmas. */
export async function measureGrowth(
  lemmas: number,
  fractions: number[],
  save?: string,
  jobs = defaultJobs(),
) {
  const entries = sample(lemmas)
  const points: LearnPoint[] = []
  for (const f of fractions) {
    const p = await measureLearn(entries, f, f === fractions.at(-1) ? save : undefined, jobs)
    process.stderr.write(
      `learn ${(f * 100).toFixed(0)}% (${p.lemmas} lemmas, ${p.tables} tables, ${p.rows} rows): parse ${p.parseSeconds.toFixed(3)} s, learn ${p.learnSeconds.toFixed(1)} s (up to ${p.jobs} threads); ${p.forms} forms, ${p.modelBytes} bytes (${p.gzipBytes} gzip), load ${p.loadSeconds.toFixed(2)} s\n`,
    )
    points.push(p)
  }
  const full = points.at(-1)!
  const first = points[0]!
  return {
    sampleLemmas: entries.length,
    points,
    learnVsParse: full.learnSeconds / full.parseSeconds,
    learnGrowth: full.learnSeconds / first.learnSeconds,
    workGrowth: full.lemmas / first.lemmas,
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { values } = parseArgs({
    options: {
      lemmas: { type: 'string', default: '3000' },
      fractions: { type: 'string', default: '0.1,0.3,1' },
      json: { type: 'boolean', default: false },
      save: { type: 'string' },
      jobs: { type: 'string' },
      // One point in a fresh process (measureLearn runs this).
      point: { type: 'string' },
      'lemma-list': { type: 'string' },
      fraction: { type: 'string' },
    },
  })
  if (values.point) {
    const jobs = Number(values.jobs ?? defaultJobs())
    const p = await learnPoint(
      values.point,
      values['lemma-list']!,
      Number(values.fraction),
      jobs,
      values.save,
    )
    process.stdout.write(JSON.stringify(p))
    process.exit(0)
  }
  const jobs = values.jobs ? Number(values.jobs) : defaultJobs()
  const r = await measureGrowth(
    Number(values.lemmas),
    values.fractions!.split(',').map(Number),
    values.save,
    jobs,
  )
  if (values.json) process.stdout.write(`${JSON.stringify(r)}\n`)
}
