// The work of `formfold constrain`: count the corpus, analyze each form type once, write file and report.
import { access } from 'node:fs/promises'
import {
  allowedLookup,
  annotateConllu,
  type ConstrainOptions,
  type ConstraintFileHeader,
  type ConstraintFormat,
  type CoverageReport,
  constraintRows,
  countTokens,
  FormTally,
  formatReportSummary,
  lexiconConstraints,
  ReportBuilder,
  type ReportOptions,
  ruleCounts,
  type TokenTagSource,
  type TypeConstraint,
  writeConstraintFile,
} from '../core/constrain/index.ts'
import { formatProblem, type Problem, ProblemError } from '../core/lexicon/problem.ts'
import { type AnalyzeOptions, DEFAULT_MIN_SCORE, DEFAULT_TOP } from '../core/lookup/analyze.ts'
import type { CorpusFormat } from '../formats/corpus-reader.ts'
import { readLines } from '../formats/line-reader.ts'
import {
  endProgress,
  inputName,
  inputStream,
  openCorpusInput,
  terminalProgress,
  writeLinesAtomic,
} from './constrain-io.ts'
import { loadConstrainModel } from './constrain-model.ts'
import { EXIT } from './io.ts'

/** One checked `constrain` invocation. `corpus: null` is the whole-lexicon file. */
export interface ConstrainRun {
  model: string
  corpus: string | null
  output: string
  format: ConstraintFormat
  report?: string
  corpusFormat?: CorpusFormat
  options: ConstrainOptions & ReportOptions
  conllu?: { path: string; tokenTags?: TokenTagSource; key: string }
  /** Options of lookup (`analyzeForm`): candidate bound, score floor, guessing. */
  lookup: AnalyzeOptions
  skipBad: boolean
}

/**
 * Run `constrain`: problems with the input throw `ProblemError` (exit 2), anything else fails (exit 1).
 * @example await runConstrain({ model: 'en.json', corpus: 'brown.conllu', output: 'en.tsv', format: 'tsv', options: { level: 'upos' }, skipBad: false })
 */
export async function runConstrain(run: ConstrainRun): Promise<void> {
  if (run.corpus !== null && run.corpus !== '-') await mustExist(run.corpus, 'corpus')
  const model = await loadConstrainModel(run.model, run.lookup)
  const progress = terminalProgress()
  const header = (corpus: ConstraintFileHeader['corpus']): ConstraintFileHeader => ({
    model: { name: model.name, version: model.version, digest: model.digest },
    corpus,
    options: stripReportOptions(run.options),
    lookup: {
      top: run.lookup.top ?? DEFAULT_TOP,
      minScore: run.lookup.minScore ?? DEFAULT_MIN_SCORE,
      guess: run.lookup.guess ?? true,
    },
  })

  if (run.corpus === null) {
    let rows = 0
    const counted = (function* () {
      for (const row of lexiconConstraints(model.forms(), model.analyzer, run.options)) {
        rows++
        yield row
      }
    })()
    await writeLinesAtomic(run.output, writeConstraintFile(counted, header(null), run.format))
    process.stderr.write(`${rows} forms the model knows written to ${run.output}\n`)
    return
  }

  const started = performance.now()
  const input = await openCorpusInput(run.corpus, { format: run.corpusFormat, skipBad: run.skipBad })
  const file = inputName(run.corpus)
  // Checked before anything is written: a failed run leaves every existing output as it was.
  if (run.conllu && input.format !== 'conllu') {
    throw new ProblemError({ code: 'bad-conllu', file, message: '--conllu needs a CoNLL-U corpus; this one reads as plain text' })
  }
  const tally = await countTokens(input.tokens, new FormTally(), progress)
  const report = new ReportBuilder(run.options)
  const allowed: TypeConstraint[] = []
  const rows = (function* () {
    for (const row of constraintRows(tally, model.analyzer, run.options, report, progress)) {
      // The CoNLL-U pass needs each type's allowed set, not its analyses.
      if (run.conllu) allowed.push({ ...row, analyses: [] })
      yield row
    }
  })()
  await writeLinesAtomic(
    run.output,
    writeConstraintFile(rows, header({ file, tokens: tally.tokens, types: tally.types }), run.format),
  )
  endProgress()
  const finished = report.finish()
  if (run.conllu) {
    await writeConllu(run, allowedLookup(allowed, model.analyzer, run.options))
  }
  const full = { ...summaryFacts(run, model, input.format, input.summary), ...finished }
  if (run.report) await writeLinesAtomic(run.report, [`${JSON.stringify(full, null, 2)}\n`])
  printSummary(finished, input.summary.skipped, input.summary.problems)
  const secs = ((performance.now() - started) / 1000).toFixed(1)
  const peak = Math.round(process.resourceUsage().maxRSS / 1024)
  process.stderr.write(
    `${tally.tokens} tokens, ${tally.types} form types in ${secs} s; peak memory ${peak} MB\n`,
  )
}

async function writeConllu(
  run: ConstrainRun,
  allowedOf: (form: string) => readonly string[] | null,
): Promise<void> {
  const target = run.conllu!
  const counts = ruleCounts()
  let skipped = 0
  const file = inputName(run.corpus!)
  async function* lines() {
    for await (const item of readLines(inputStream(run.corpus!), { file })) {
      if (item.problem) {
        skipped++
        continue
      }
      yield { text: item.text, line: item.line }
    }
  }
  const onProblem = (problem: Problem) => {
    if (!run.skipBad) throw new ProblemError({ ...problem, file })
    skipped++
  }
  const annotated = annotateConllu(
    lines(),
    allowedOf,
    { tokenTags: target.tokenTags, key: target.key },
    counts,
    onProblem,
  )
  await writeLinesAtomic(target.path, withBreaks(annotated))
  const parts = Object.entries(counts).map(([rule, n]) => `${rule} ${n}`)
  process.stderr.write(`CoNLL-U with ${target.key}= written to ${target.path}: ${parts.join(', ')}`)
  process.stderr.write(skipped > 0 ? `; ${skipped} unreadable line(s) left out\n` : '\n')
}

async function* withBreaks(lines: AsyncIterable<string>): AsyncGenerator<string> {
  for await (const line of lines) yield `${line}\n`
}

function stripReportOptions(o: ConstrainOptions & ReportOptions): ConstrainOptions {
  const out: ConstrainOptions = { level: o.level }
  if (o.minScore !== undefined) out.minScore = o.minScore
  if (o.sources !== undefined) out.sources = o.sources
  if (o.bestSourceOnly) out.bestSourceOnly = true
  return out
}

function summaryFacts(
  run: ConstrainRun,
  model: { name: string; version: string; digest?: string },
  format: CorpusFormat,
  read: { lines: number; skipped: number; problems: Problem[] },
) {
  return {
    model: { name: model.name, version: model.version, digest: model.digest },
    corpus: { file: inputName(run.corpus!), format, lines: read.lines, skipped: read.skipped },
    options: {
      ...stripReportOptions(run.options),
      excludeGold: run.options.excludeGold ?? [],
      lookup: run.lookup,
    },
  }
}

function printSummary(report: CoverageReport, skipped: number, problems: Problem[]): void {
  process.stderr.write(`${formatReportSummary(report)}\n`)
  if (skipped === 0) return
  process.stderr.write(`skipped ${skipped} bad line(s); first ones:\n`)
  for (const p of problems) process.stderr.write(`  ${formatProblem(p)}\n`)
}

/** A missing input is bad input (exit 2), said before any work starts. */
export async function mustExist(path: string, what: string): Promise<void> {
  try {
    await access(path)
  } catch {
    process.stderr.write(`formfold constrain: ${path}: cannot read the ${what} file\n`)
    process.exit(EXIT.badInput)
  }
}
