// `npm run demo`: learn the Sulvašti demo lexicon, write the paradigm book, expansions and corpus constraints,
// then serve the page and the API on 127.0.0.1 (PORT, default 8787) with that model, printing URLs and samples.
import { startNodeServer } from '../src/node.ts'
import {
  CONSTRAINTS_FILE,
  constrainDemoCorpus,
  EXPANDED_FILE,
  expandBareLemmas,
  learnDemoModel,
  MODEL_FILE,
  REPORT_FILE,
  ROOT,
  writeDemoBook,
} from './demo-steps.ts'

/** The name the demo serves its freshly learned model under (the default model of the app). */
const MODEL_NAME = 'sulvasti'
const started = performance.now()
const say = (line = '') => process.stdout.write(`${line}\n`)
const pct = (x: number) => `${(x * 100).toFixed(1)} %`
const indent = (lines: string[]) => lines.map((l) => `      ${l.replaceAll('\t', '  ')}`)

process.chdir(ROOT)
const port = Number(process.env.PORT ?? 8787)
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  process.stderr.write(`demo: PORT must be a port number, not "${process.env.PORT}"\n`)
  process.exit(2)
}

say('formfold demo: Sulvašti, an invented language (demo-lexicon/README.md)')
const { model, seconds, bytes } = await learnDemoModel()
const entries = model.inflection.lexicon.entries
const tables = entries.filter((e) => e.cells).length
const learnedParadigms = model.inflection.book.paradigms.filter((p) => p.twinOf === undefined).length
say(
  `  learned ${learnedParadigms} paradigms (and ${model.inflection.book.paradigms.length - learnedParadigms} letter-alternation twins) ` +
    `from ${tables} tables and ${entries.length - tables} ` +
    `lemma-only entries (with demo-lexicon/corpus.txt choosing their tables) in ${seconds.toFixed(1)} s → ` +
    `${MODEL_FILE} (${(bytes / 1e6).toFixed(1)} MB)`,
)

const book = await writeDemoBook(model)
say(`  paradigm book → paradigms/: ${book.map(([name, n]) => `${name} ${n}`).join(', ')}, index.json`)
const p =
  model.inflection.book.paradigms.find((x) => x.upos === 'NOUN') ?? model.inflection.book.paradigms[0]!
say(
  indent([
    `${p.id}: ${p.members} tables, e.g. ${p.examples.join(', ')}; ${p.cells.length} cells (rules in paradigms/${p.upos}.json)`,
  ]).join('\n'),
)

const expanded = await expandBareLemmas(model)
say(
  `  expanded ${expanded.tables} lemma-only entries → ${EXPANDED_FILE} (${expanded.rows} rows: lemma form upos feats source score)`,
)
say(indent(expanded.sample).join('\n'))
if (expanded.missing.length > 0)
  say(`      no paradigm applies to ${expanded.missing.length}: ${expanded.missing.slice(0, 5).join(', ')}`)

const { report, rows } = await constrainDemoCorpus()
const s = report.tokens.shares
say(
  `  constraints of demo-lexicon/corpus.txt → ${CONSTRAINTS_FILE}, report → ${REPORT_FILE}\n` +
    `      ${report.tokens.total} tokens, ${report.types.total} form types; token coverage ${pct(report.tokens.coverage)} ` +
    `(attested ${pct(s.attested ?? 0)}, predicted ${pct(s.predicted ?? 0)}, guessed ${pct(s.guessed ?? 0)}, none ${pct(s.none ?? 0)}); ` +
    `ambiguity ${report.ambiguity.toFixed(2)}`,
)
// A sample row of each source: the most frequent attested, predicted, guessed and uncovered form types.
const sample = ['attested', 'predicted', 'guessed', 'none']
  .map((src) => rows.find((r) => r[2] === src))
  .filter((r) => r !== undefined)
say(indent(sample.map((r) => r.join('\t'))).join('\n'))

let server: Awaited<ReturnType<typeof startNodeServer>>
try {
  server = await startNodeServer({ port, modelFile: MODEL_FILE, modelName: MODEL_NAME })
} catch (err) {
  const busy = (err as { code?: string }).code === 'EADDRINUSE'
  process.stderr.write(
    `demo: cannot listen on 127.0.0.1:${port}${busy ? ' (in use; set PORT=…)' : ''}: ${String(err)}\n`,
  )
  process.exit(1)
}
const url = server.url
// Samples from the running server: the most frequent predicted corpus form, and a lemma-only noun.
const form = rows.find((r) => r[2] === 'predicted')?.[0] ?? rows[0]?.[0] ?? 'a'
const analyzed = (await (await fetch(`${url}/v1/analyze?form=${encodeURIComponent(form)}`)).json()) as {
  candidates: { lemma: string; upos: string; feats: string; source: string; score: number }[]
}
const bare = entries.find((e) => !e.cells && e.upos === 'NOUN') ?? entries.find((e) => !e.cells)
const lemmaPath = bare ? `/v1/lemmas/${encodeURIComponent(bare.lemma)}?upos=${bare.upos}` : '/v1/lemmas/a'
const table = (await (await fetch(url + lemmaPath)).json()) as {
  tables?: {
    source: string
    paradigm: string
    score: number
    forms: { form: string; cell: string; score: number }[]
  }[]
}
const t = table.tables?.[0]

say()
say(
  `serving model "${MODEL_NAME}" on ${url} (ready ${((performance.now() - started) / 1000).toFixed(1)} s after start)`,
)
say(`  page         ${url}/`)
say(`  analyze      ${url}/v1/analyze?form=${encodeURIComponent(form)}`)
for (const c of analyzed.candidates.slice(0, 2))
  say(`      ${c.lemma} ${c.upos} ${c.feats} ${c.source} ${c.score.toFixed(2)}`)
say(`  lemma table  ${url}${lemmaPath}`)
if (t) {
  say(
    `      ${t.source} by ${t.paradigm}, table probability ${t.score.toFixed(2)}: ${t.forms
      .slice(0, 4)
      .map((f) => `${f.form} (${f.score.toFixed(2)})`)
      .join(', ')} …`,
  )
}
say(`  paradigms    ${url}/v1/paradigms?upos=NOUN   and ${url}/v1/paradigms/${p.id}`)
say(`  constraints  POST ${url}/v1/constraints (text/plain body)`)
say(`  API          ${url}/openapi.json`)
say('Predicted forms are hypotheses to review, not normative forms. Ctrl-C stops.')

const stop = () => void server.close().then(() => process.exit(0))
process.once('SIGINT', stop)
process.once('SIGTERM', stop)
