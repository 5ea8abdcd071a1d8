// `formfold constrain -m MODEL CORPUS -o FILE`: options checked here, the work done by constrain-run.ts.
import { type Command, InvalidArgumentError, Option } from 'commander'
import { type CandidateSource, parseTokenTagSource, SOURCE_ORDER } from '../core/constrain/index.ts'
import { UPOS_TAGS } from '../core/lexicon/ud.ts'
import { type ConstrainRun, runConstrain } from './constrain-run.ts'
import { EXIT, runCommand } from './io.ts'
import { preferSmallHeap } from './streaming-heap.ts'

interface RawOptions {
  model: string
  output: string
  level: 'upos' | 'full'
  format: 'tsv' | 'jsonl'
  report?: string
  corpusFormat?: 'text' | 'conllu'
  lexicon?: boolean
  minScore?: number
  sources?: CandidateSource[]
  bestSourceOnly?: boolean
  excludeGold?: string[]
  reportTop: number
  top?: number
  guess: boolean
  conllu?: string
  tokenTags?: string
  allowedKey: string
  skipBad?: boolean
}

const number = (text: string): number => {
  const n = Number(text)
  if (!Number.isFinite(n) || n < 0) throw new InvalidArgumentError('expected a number ≥ 0')
  return n
}
const list =
  (allowed: readonly string[], what: string) =>
  (text: string): string[] => {
    const items = text.split(',').filter((s) => s !== '')
    const bad = items.find((s) => !allowed.includes(s))
    if (bad !== undefined) throw new InvalidArgumentError(`"${bad}" is not ${what} (${allowed.join(', ')})`)
    return items
  }

/**
 * Register `constrain` on the program.
 * @example registerConstrain(new Command('formfold')) // formfold constrain -m en.model.json corpus.conllu -o en.tsv
 */
export function registerConstrain(program: Command): void {
  program
    .command('constrain')
    .description('write the constraint file (allowed tags of every corpus form type) and a coverage report')
    .argument('[corpus]', 'corpus: plain text or CoNLL-U (- for standard input)')
    .requiredOption('-m, --model <file>', 'model file (from formfold learn)')
    .requiredOption('-o, --output <file>', 'constraint file to write (- for standard output)')
    .addOption(
      new Option('--level <level>', 'allowed tags: UPOS, or full UPOS|FEATS')
        .choices(['upos', 'full'])
        .default('upos'),
    )
    .addOption(
      new Option('--format <format>', 'constraint file format').choices(['tsv', 'jsonl']).default('tsv'),
    )
    .option('--report <file>', 'write the coverage report as JSON')
    .addOption(
      new Option('--corpus-format <format>', 'read the corpus as this format (default: sniffed)').choices([
        'text',
        'conllu',
      ]),
    )
    .option('--lexicon', 'no corpus: every form the model knows (the whole-lexicon file)')
    .option('--min-score <x>', 'drop predicted and guessed analyses scoring below x', number)
    .option(
      '--sources <list>',
      'sources that may constrain (attested,predicted,guessed)',
      list(SOURCE_ORDER, 'a source'),
    )
    .option('--best-source-only', "keep only the analyses of a form's best source")
    .option(
      '--exclude-gold <tags>',
      'report figures leave out tokens with these gold UPOS (e.g. PUNCT,NUM,SYM)',
      list(UPOS_TAGS, 'a UPOS tag'),
    )
    .option('--top <n>', 'lookup: at most n predicted or guessed candidates per form', number)
    .option('--no-guess', 'lookup: no guesses for forms the model does not index (they stay unconstrained)')
    .option('--report-top <n>', 'uncovered forms and gold misses listed in the report', number, 20)
    .option('--conllu <file>', 'also write the CoNLL-U corpus with allowed UPOS in MISC')
    .option('--token-tags <where>', 'couple with per-token tags read from upos or misc:KEY (needs --conllu)')
    .option('--allowed-key <name>', 'MISC attribute for the allowed tags', 'Allowed')
    .option('--skip-bad', 'count bad corpus lines instead of stopping at the first')
    .action((corpus: string | undefined, opts: RawOptions) =>
      runCommand(() => {
        preferSmallHeap()
        return runConstrain(checked(corpus, opts))
      }),
    )
}

/** Turn raw options into a run, or exit 2 with the reason. */
function checked(corpus: string | undefined, o: RawOptions): ConstrainRun {
  const fail = (message: string): never => {
    process.stderr.write(`formfold constrain: ${message}\n`)
    process.exit(EXIT.badInput)
  }
  if (o.lexicon && corpus !== undefined) fail('give a corpus or --lexicon, not both')
  if (!o.lexicon && corpus === undefined) fail('missing corpus (or --lexicon for every form the model knows)')
  const tokenTags = o.tokenTags === undefined ? undefined : parseTokenTagSource(o.tokenTags)
  if (o.tokenTags !== undefined && !tokenTags)
    fail(`--token-tags "${o.tokenTags}": expected upos or misc:KEY`)
  if (tokenTags && !o.conllu)
    fail('--token-tags needs --conllu FILE (the coupled constraints are written there)')
  if (o.conllu) {
    if (o.lexicon) fail('--conllu needs a CoNLL-U corpus, not --lexicon')
    if (corpus === '-') fail('--conllu reads the corpus twice: give a file, not standard input')
    if (o.level !== 'upos') fail('--conllu writes UPOS constraints: use --level upos')
    if (o.corpusFormat === 'text') fail('--conllu needs a CoNLL-U corpus')
  }
  if (!/^[A-Za-z][A-Za-z0-9_.-]*$/.test(o.allowedKey))
    fail(`--allowed-key "${o.allowedKey}" is not a MISC name`)
  if (o.output === o.report || (o.conllu && (o.conllu === o.output || o.conllu === o.report))) {
    fail('output, report and CoNLL-U files must differ')
  }
  return {
    model: o.model,
    corpus: o.lexicon ? null : corpus!,
    output: o.output,
    format: o.format,
    report: o.report,
    corpusFormat: o.corpusFormat,
    options: {
      level: o.level,
      minScore: o.minScore,
      sources: o.sources as CandidateSource[] | undefined,
      bestSourceOnly: Boolean(o.bestSourceOnly),
      excludeGold: o.excludeGold,
      top: o.reportTop,
    },
    lookup: { top: o.top, minScore: o.minScore, guess: o.guess },
    conllu: o.conllu ? { path: o.conllu, tokenTags, key: o.allowedKey } : undefined,
    skipBad: Boolean(o.skipBad),
  }
}
