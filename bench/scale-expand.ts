// Streams a synthetic lemma list (demo-lexicon lemma shapes combined) through `formfold expand` and prints
// its peak memory at each size, to show whether it stays flat. Run: npx tsx bench/scale-expand.ts -- [--sizes 100000,1000000] [--json]
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { parseArgs } from 'node:util'
import { DEMO_MODEL_TEXT } from '../src/http/demo-model.generated.ts'
import { peakRss } from './scale-rss.ts'

const root = fileURLToPath(new URL('..', import.meta.url))

/** The demo's lemma-only entries: lemma, UPOS and inherent FEATS. */
function demoLemmas(): [string, string, string][] {
  return readFileSync(join(root, 'demo-lexicon/lemmas.tsv'), 'utf8')
    .split('\n')
    .filter((l) => l && !l.startsWith('#'))
    .map((l) => {
      const [lemma, upos, feats] = l.split('\t')
      return [lemma!, upos!, feats || '_']
    })
}

/**
 * `count` invented lemmas: the start of one demo lemma (2–4 letters) before a whole other demo lemma, whose
 * ending, UPOS and features it keeps (so the paradigms of that lemma apply), deterministic.
 * @example [...syntheticLemmas(2)] // ['ahahma\tADJ\t_\n', 'beahma\tADJ\t_\n']
 */
export function* syntheticLemmas(count: number): Generator<string> {
  const shapes = demoLemmas()
  const n = shapes.length
  for (let i = 0; i < count; i++) {
    const head = shapes[i % n]![0]
    const cut = 2 + (Math.floor(i / (n * n)) % 3)
    const [lemma, upos, feats] = shapes[Math.floor(i / n) % n]!
    yield `${head.slice(0, cut)}${lemma}\t${upos}\t${feats}\n`
  }
}

/** One expand run over `count` synthetic lemmas against the demo model (TSV rows to /dev/null). */
export async function measureExpand(
  count: number,
): Promise<{
  lemmas: number
  seconds: number
  peakRssMB: number | null
  exit: number | null
  method: string
}> {
  const dir = mkdtempSync(join(tmpdir(), 'formfold-expand-'))
  try {
    const model = join(dir, 'demo.model.json')
    writeFileSync(model, DEMO_MODEL_TEXT)
    const run = await peakRss(
      [process.execPath, 'bin/formfold.js', 'expand', '-m', model, '-'],
      syntheticLemmas(count),
      root,
    )
    if (run.exit !== 0) process.stderr.write(`expand exited ${run.exit}: ${run.stderrTail}\n`)
    return {
      lemmas: count,
      seconds: run.seconds,
      peakRssMB: run.peakRssMB,
      exit: run.exit,
      method: run.method,
    }
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { values } = parseArgs({
    options: {
      sizes: { type: 'string', default: '100000,1000000' },
      json: { type: 'boolean', default: false },
    },
  })
  const runs = []
  for (const size of values.sizes!.split(',').map(Number)) {
    const r = await measureExpand(size)
    process.stderr.write(
      `expand ${r.lemmas} lemmas: ${r.seconds} s, peak RSS ${r.peakRssMB} MB (${r.method})\n`,
    )
    runs.push(r)
  }
  if (values.json) process.stdout.write(`${JSON.stringify({ expand: runs })}\n`)
}
