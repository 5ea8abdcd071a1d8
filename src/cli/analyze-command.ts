// `formfold analyze -m MODEL [FORMS|-]`: one JSON line of candidate analyses per form read.

import { createReadStream } from 'node:fs'
import type { Command } from 'commander'
import { formatProblem, ProblemError } from '../core/index.ts'
import { type AnalyzeOptions, analyzeForm, DEFAULT_MIN_SCORE, DEFAULT_TOP } from '../core/lookup/analyze.ts'
import { readLines } from '../formats/index.ts'
import { runCommand } from './io.ts'
import { loadModelFile } from './model-file.ts'

interface AnalyzeFlags {
  model: string
  top: string
  minScore: string
  foldDiacritics?: boolean
  guess: string
  skipBad?: boolean
}

/**
 * Register `analyze`: forms one per line (a file, or stdin for `-` or nothing), answers on stdout.
 * @example registerAnalyze(program) // formfold analyze -m model.json forms.txt --top 5
 */
export function registerAnalyze(program: Command): void {
  program
    .command('analyze')
    .description(
      'candidate analyses (lemma, UPOS, FEATS; attested, predicted or guessed) of each form, as JSON lines',
    )
    .requiredOption('-m, --model <file>', 'model file (from formfold learn)')
    .argument('[forms]', 'forms, one per line; - or nothing for stdin')
    .option(
      '--top <n>',
      'at most n predicted or guessed candidates per form (attested ones are all kept)',
      String(DEFAULT_TOP),
    )
    .option(
      '--min-score <x>',
      'drop predicted and guessed candidates scoring below x',
      String(DEFAULT_MIN_SCORE),
    )
    .option('--fold-diacritics', 'also look forms up without their diacritics')
    .option(
      '--guess <when>',
      'guess analyses: missing (forms not indexed), unattested (also forms only predicted), never',
      'missing',
    )
    .option('--skip-bad', 'count unreadable lines instead of stopping at the first')
    .action((forms: string | undefined, flags: AnalyzeFlags) => runCommand(() => analyze(forms, flags)))
}

async function analyze(forms: string | undefined, flags: AnalyzeFlags): Promise<void> {
  const opts = analyzeOptions(flags)
  const model = await loadModelFile(flags.model)
  const fromStdin = forms === undefined || forms === '-'
  const file = fromStdin ? '<stdin>' : forms
  const out = process.stdout
  let skipped = 0
  for await (const item of readLines(fromStdin ? process.stdin : createReadStream(forms), { file })) {
    if (item.problem) {
      if (!flags.skipBad) throw new ProblemError(item.problem)
      if (skipped++ < 5) process.stderr.write(`  ${formatProblem(item.problem)}\n`)
      continue
    }
    const form = item.text.trim()
    if (form === '') continue
    const line = `${JSON.stringify(analyzeForm(model, form, opts))}\n`
    if (!out.write(line)) await new Promise((r) => out.once('drain', r))
  }
  if (skipped > 0) process.stderr.write(`skipped ${skipped} unreadable line(s)\n`)
}

function analyzeOptions(flags: AnalyzeFlags): AnalyzeOptions {
  const top = Number(flags.top)
  if (!Number.isInteger(top) || top < 0) {
    throw new ProblemError({ code: 'bad-entry', message: `--top must be a whole number, not "${flags.top}"` })
  }
  const minScore = Number(flags.minScore)
  if (!Number.isFinite(minScore) || minScore < 0 || minScore > 1) {
    throw new ProblemError({
      code: 'bad-entry',
      message: `--min-score must be a number from 0 to 1, not "${flags.minScore}"`,
    })
  }
  const when = { missing: true, unattested: 'unattested', never: false } as const
  const guess = Object.hasOwn(when, flags.guess) ? when[flags.guess as keyof typeof when] : undefined
  if (guess === undefined) {
    throw new ProblemError({
      code: 'bad-entry',
      message: `--guess must be missing, unattested or never, not "${flags.guess}"`,
    })
  }
  return { top, minScore, foldDiacritics: Boolean(flags.foldDiacritics), guess }
}
