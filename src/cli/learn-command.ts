// `formfold learn SOURCES… -o MODEL`: tables, entries and lemma lists in; a model file out; summary on stderr.
import { type Command, InvalidArgumentError, Option } from 'commander'
import { formatProblem } from '../core/index.ts'
import { corpusChangedLemmas } from '../core/model/build-model.ts'
import { encodeModel } from '../core/model/encode-model.ts'
import { countCorpusForms } from './corpus-counts.ts'
import { readSources, reportSkipped, runCommand, writeAtomic } from './io.ts'
import { modelFileBytes } from './model-file.ts'
import { buildModelThreaded, defaultJobs } from './threaded-learn.ts'

export function registerLearn(program: Command): void {
  program
    .command('learn')
    .description('learn paradigms from the tables of the sources; predict tables for lemma-only entries')
    .argument('<sources...>', 'table rows (.tsv), entries (.jsonl) or lemma lists (.tsv, 2-3 columns)')
    .requiredOption(
      '-o, --output <model>',
      'model file to write (written atomically; gzip-compressed when it ends in .gz)',
    )
    .option('--skip-bad', 'count bad lines (first few shown) instead of stopping at the first')
    .option('--corpus <files...>', 'raw text or CoNLL-U whose forms help choose between candidate tables')
    .addOption(
      new Option(
        '-j, --jobs <n>',
        'threads to learn on (parts of speech side by side; the same model for any n)',
      )
        .argParser(parseJobs)
        .default(defaultJobs(), 'one per core, at most 8'),
    )
    .action(
      (sources: string[], opts: { output: string; skipBad?: boolean; corpus?: string[]; jobs: number }) =>
        runCommand(async () => {
          const t0 = performance.now()
          const read = await readSources(sources, { skipBad: Boolean(opts.skipBad) })
          const corpus = opts.corpus
            ? await countCorpusForms(opts.corpus, { skipBad: Boolean(opts.skipBad) })
            : undefined
          const model = await buildModelThreaded(read.entries, {}, corpus, opts.jobs)
          const text = encodeModel(model)
          const bytes = modelFileBytes(opts.output, text)
          await writeAtomic(opts.output, bytes)
          const lex = model.inflection.lexicon
          const tables = lex.entries.filter((e) => e.cells).length
          const learnedParadigms = model.inflection.book.paradigms.filter(
            (p) => p.twinOf === undefined,
          ).length
          const twins = model.inflection.book.paradigms.length - learnedParadigms
          const predicted = model.kept.filter((k) => k && k.length > 0).length
          const unfit = lex.entries.length - tables - predicted
          const forms = model.index.formCount
          const seconds = ((performance.now() - t0) / 1000).toFixed(1)
          process.stderr.write(
            `learned ${learnedParadigms} paradigms${twins > 0 ? ` (and ${twins} letter-alternation twins)` : ''} from ${tables} tables; ` +
              `${predicted} lemma-only entries got predicted tables${unfit > 0 ? ` (${unfit} fit no learned paradigm)` : ''}; ` +
              `${forms} forms indexed; ${bytes.byteLength} bytes${bytes.byteLength < text.length ? ` (${Buffer.byteLength(text)} as JSON)` : ''} → ${opts.output} in ${seconds} s\n`,
          )
          if (corpus) {
            process.stderr.write(
              `corpus: ${corpus.tokens} tokens, ${corpus.counts.size} distinct forms; ` +
                `${corpusChangedLemmas(model)} lemma-only entries changed their best table because of it\n`,
            )
          }
          if (read.languageSpecific.length > 0) {
            process.stderr.write(`language-specific features: ${read.languageSpecific.join(' ')}\n`)
          }
          for (const p of lex.problems) process.stderr.write(`note: ${formatProblem(p)}\n`)
          reportSkipped(read)
        }),
    )
}

function parseJobs(v: string): number {
  const n = Number(v)
  if (!Number.isInteger(n) || n < 1)
    throw new InvalidArgumentError(`--jobs wants a whole number of threads ≥ 1, not "${v}"`)
  return n
}
