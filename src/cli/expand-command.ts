// `formfold expand -m MODEL [LEMMAS|-]`: the tables of the given (or all table-less) lemmas as table rows.
import type { Command } from 'commander'
import { type Entry, type ExpandedTable, expandLemma, ProblemError } from '../core/index.ts'
import type { Model } from '../core/model/model.ts'
import { createReadStream } from 'node:fs'
import { formatJsonLine, formatTableRow, parseLemmaLine, streamRecords } from '../formats/index.ts'
import { reportSkipped, runCommand } from './io.ts'
import { loadModelFile } from './model-file.ts'
import { spoolStdin } from './spool-stdin.ts'
import { preferSmallHeap } from './streaming-heap.ts'

export function registerExpand(program: Command): void {
  program
    .command('expand')
    .description('tables of the given lemmas (a lemma list), or of every lemma-only entry of the model')
    .requiredOption('-m, --model <file>', 'model file (from formfold learn)')
    .argument('[lemmas]', 'lemma list (lemma<TAB>upos[<TAB>feats]); - for stdin; none = all table-less lemmas')
    .option('--scores', 'add source and score columns (TSV)')
    .option('--format <fmt>', 'tsv or jsonl', 'tsv')
    .option('--alternatives <k>', 'also give the k next-best tables (jsonl)', '0')
    .option('--skip-bad', 'count bad lines instead of stopping at the first')
    .action((lemmas: string | undefined, opts: { model: string; scores?: boolean; format: string; alternatives: string; skipBad?: boolean }) =>
      runCommand(async () => {
        preferSmallHeap()
        if (opts.format !== 'tsv' && opts.format !== 'jsonl') {
          throw new ProblemError({ code: 'bad-entry', message: `--format must be tsv or jsonl, not "${opts.format}"` })
        }
        const alternatives = Number.parseInt(opts.alternatives, 10)
        if (!Number.isInteger(alternatives) || alternatives < 0 || alternatives > 20) {
          throw new ProblemError({ code: 'bad-entry', message: '--alternatives must be an integer from 0 to 20' })
        }
        const model = await loadModelFile(opts.model)
        let wanted: Iterable<Entry> | AsyncIterable<Entry> = bareLemmas(model)
        // Standard input is spooled to a temporary file and read like one (bounded memory on a pipe too).
        const spooled = lemmas === '-' ? await spoolStdin() : undefined
        try {
          if (lemmas) {
            // A file is read twice, in bounded memory: checked whole first (a bad line stops the run before
            // any table is written), then streamed.
            const path = spooled?.path ?? lemmas
            const file = spooled ? '<stdin>' : lemmas
            const skipBad = Boolean(opts.skipBad)
            const check = streamRecords(createReadStream(path), parseLemmaLine, { file, skipBad })
            let count = 0
            for await (const _ of check) count++
            if (count === 0) throw new ProblemError({ code: 'no-entries', file, message: 'no lemmas to expand' })
            const s = check.summary
            reportSkipped({ entries: [], skipped: s.skipped, problems: s.problems, languageSpecific: [] })
            wanted = streamRecords(createReadStream(path), parseLemmaLine, { file, skipBad: true })
          }
          await writeTables(model, wanted, opts.format, Boolean(opts.scores), alternatives)
        } finally {
          await spooled?.done()
        }
      }),
    )
}

/** Expand each wanted lemma and write its table to stdout, waiting whenever the pipe is full. */
async function writeTables(
  model: Model,
  wanted: Iterable<Entry> | AsyncIterable<Entry>,
  format: string,
  scores: boolean,
  alternatives: number,
): Promise<void> {
  const out = process.stdout
  for await (const e of wanted) {
    const table = expandLemma(model.inflection, e.lemma, e.upos, e.feats, { alternatives })
    if (!table) {
      process.stderr.write(`no learned paradigm of ${e.upos} applies to "${e.lemma}"\n`)
      continue
    }
    const text = format === 'jsonl' ? `${formatJsonLine(table)}\n` : tableRows(table, scores)
    if (!out.write(text)) await new Promise((r) => out.once('drain', r))
  }
}

function tableRows(t: ExpandedTable, scores: boolean): string {
  return t.forms
    .map((f) => `${formatTableRow({ lemma: t.lemma, form: f.form, upos: t.upos, feats: f.feats, source: f.source, score: f.score }, { scores })}\n`)
    .join('')
}

function bareLemmas(model: Model): Entry[] {
  return model.inflection.lexicon.entries.filter((e) => !e.cells).map((e) => ({ lemma: e.lemma, upos: e.upos, feats: e.inherent }))
}
