// The work of `npm run demo` before serving: learn the demo model, write the paradigm book, expand the bare
// lemmas, write the demo corpus's constraint file and report. Each step returns what the demo prints.
import { mkdir, readFile } from 'node:fs/promises'
import { fileURLToPath } from 'node:url'
import { runConstrain } from '../src/cli/constrain-run.ts'
import { countCorpusForms } from '../src/cli/corpus-counts.ts'
import { writeAtomic } from '../src/cli/io.ts'
import { expandLemma } from '../src/core/inflect/expand.ts'
import { buildModel } from '../src/core/model/build-model.ts'
import { encodeModel } from '../src/core/model/encode-model.ts'
import type { Model } from '../src/core/model/model.ts'
import { formatTableRow } from '../src/formats/rows-writer.ts'
import { BOOK_DIR, bookFiles, readDemoEntries, writeBook } from './build-paradigm-book.ts'

/** The repository root (every path below is relative to it). */
export const ROOT = fileURLToPath(new URL('..', import.meta.url))
/** The git-ignored folder the demo writes its outputs to. */
export const OUT_DIR = 'demo-out'
export const MODEL_FILE = `${OUT_DIR}/demo.model.json`
export const EXPANDED_FILE = `${OUT_DIR}/expanded.tsv`
export const CORPUS = 'demo-lexicon/corpus.txt'
export const CONSTRAINTS_FILE = `${OUT_DIR}/corpus-constraints.tsv`
export const REPORT_FILE = `${OUT_DIR}/corpus-report.json`

const seconds = (t0: number) => (performance.now() - t0) / 1000

/** The learned model and what learning it took. */
export interface Learned {
  model: Model
  seconds: number
  bytes: number
}

/**
 * Learn the demo model from demo-lexicon/tables.tsv and lemmas.tsv and write its file.
 * @example const { model } = await learnDemoModel()
 */
export async function learnDemoModel(): Promise<Learned> {
  const t0 = performance.now()
  await mkdir(ROOT + OUT_DIR, { recursive: true })
  const corpus = await countCorpusForms([ROOT + CORPUS], { skipBad: false })
  const model = buildModel(await readDemoEntries(), {}, corpus)
  const text = encodeModel(model)
  await writeAtomic(ROOT + MODEL_FILE, text)
  return { model, seconds: seconds(t0), bytes: text.length }
}

/**
 * Write the paradigm book of the model to paradigms/; the file names and paradigm count per UPOS file.
 * @example await writeDemoBook(model) // [['NOUN.json', 67], …]
 */
export async function writeDemoBook(model: Model): Promise<[string, number][]> {
  const files = bookFiles(model.inflection.lexicon, model.inflection.book)
  await writeBook(files, ROOT + BOOK_DIR)
  return [...files]
    .filter(([name]) => name !== 'index.json')
    .map(([name, text]) => [name, JSON.parse(text).paradigms.length])
}

/** What expanding the bare lemmas gave. */
export interface Expanded {
  tables: number
  rows: number
  missing: string[]
  sample: string[]
}

/**
 * Expand every lemma-only entry (TSV rows with source and score columns, as `formfold expand --scores`).
 * @example (await expandBareLemmas(model)).tables // 640
 */
export async function expandBareLemmas(model: Model): Promise<Expanded> {
  const lines: string[] = []
  const missing: string[] = []
  let tables = 0
  for (const e of model.inflection.lexicon.entries) {
    if (e.cells) continue
    const t = expandLemma(model.inflection, e.lemma, e.upos, e.inherent)
    if (!t) {
      missing.push(`${e.lemma} ${e.upos}`)
      continue
    }
    tables++
    for (const f of t.forms) {
      const row = {
        lemma: t.lemma,
        form: f.form,
        upos: t.upos,
        feats: f.feats,
        source: f.source,
        score: f.score,
      }
      lines.push(formatTableRow(row, { scores: true }))
    }
  }
  await writeAtomic(ROOT + EXPANDED_FILE, lines.map((l) => `${l}\n`).join(''))
  return { tables, rows: lines.length, missing, sample: lines.slice(0, 3) }
}

/** The corpus's constraint file and report, read back for the demo's summary. */
export interface Constrained {
  report: {
    tokens: { total: number; coverage: number; shares: Record<string, number> }
    types: { total: number }
    ambiguity: number
  }
  rows: string[][]
}

/**
 * Write the constraint file and coverage report of the demo corpus, through the `constrain` command's own run
 * (paths relative to the repository, which must be the working directory: the file's header names them).
 * @example (await constrainDemoCorpus()).report.tokens.coverage // 0.99…
 */
export async function constrainDemoCorpus(): Promise<Constrained> {
  await runConstrain({
    model: MODEL_FILE,
    corpus: CORPUS,
    output: CONSTRAINTS_FILE,
    format: 'tsv',
    report: REPORT_FILE,
    options: { level: 'upos' },
    lookup: {},
    skipBad: false,
  })
  const report = JSON.parse(await readFile(ROOT + REPORT_FILE, 'utf8'))
  const rows = (await readFile(ROOT + CONSTRAINTS_FILE, 'utf8'))
    .split('\n')
    .filter((l) => l && !l.startsWith('#'))
    .map((l) => l.split('\t'))
  return { report, rows: rows.slice(1) }
}
