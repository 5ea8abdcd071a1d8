// The English real-text check on the whole Brown corpus: coverage before and after the model, recall, ambiguity;
// with --with-corpus also after learning with the measured Brown text itself as raw-text corpus.
// Run: npm run bench:brown -- [--json] [--files N] [--model FILE] [--save-model FILE] [--with-corpus]
import { readFileSync, writeFileSync } from 'node:fs'
import { parseArgs } from 'node:util'
import { corpusChangedLemmas } from '../src/core/model/build-model.ts'
import { decodeModel } from '../src/core/model/decode-model.ts'
import { encodeModel } from '../src/core/model/encode-model.ts'
import {
  brownCounts,
  dictionaryAnalyzer,
  englishModel,
  measureEnglish,
  modelAnalyzer,
  predictedAttestation,
} from '../test/english/english-check.ts'
import { brownFiles } from '../test/fixtures/english/brown-corpus.ts'
import { englishDictionary } from '../test/fixtures/english/english-lexicon.ts'

const { values } = parseArgs({
  options: {
    json: { type: 'boolean', default: false },
    files: { type: 'string' },
    model: { type: 'string' },
    'save-model': { type: 'string' },
    'with-corpus': { type: 'boolean', default: false },
  },
})

const log = (text: string) => process.stderr.write(`${text}\n`)
const seconds = (t0: number) => ((performance.now() - t0) / 1000).toFixed(1)

const dictionary = await englishDictionary()
log(
  `dictionary: ${dictionary.lemmas.length} WordNet lemmas, ${dictionary.closedClass.length} closed-class entries, ${dictionary.tables.length} tables`,
)
let t0 = performance.now()
const model = values.model ? decodeModel(readFileSync(values.model, 'utf8')) : englishModel(dictionary)
log(
  `model: ${model.index.formCount} forms, ${model.inflection.book.paradigms.length} paradigms (${seconds(t0)} s)`,
)
if (values['save-model']) writeFileSync(values['save-model'], encodeModel(model))

// --files N takes every (500 / N)-th file, so a smaller run still spans all fifteen genres.
const all = brownFiles()
const step = values.files ? Math.max(1, Math.round(all.length / Number(values.files))) : 1
const files = all.filter((_, i) => i % step === 0)
t0 = performance.now()
const { figures, after } = await measureEnglish(files, dictionaryAnalyzer(dictionary), modelAnalyzer(model))
log(`constrained ${files.length} Brown files, ${figures.tokens} tokens in scope (${seconds(t0)} s)`)

const result: Record<string, unknown> = {
  coverageBefore: round(figures.coverageBefore),
  coverageAfter: round(figures.coverageAfter),
  recallAfter: round(figures.recallAfter),
  ambiguityAfter: round(figures.ambiguityAfter),
  singleTagShare: round(figures.singleTagShare),
  tokens: figures.tokens,
}

// The same check after learning with the measured text as raw-text corpus (formfold learn --corpus): its
// counts move bare lemmas between candidate tables. Also: of the forms only predicted (no table lists
// them), the share the text attests, without and with it.
if (values['with-corpus']) {
  const corpus = brownCounts(files)
  t0 = performance.now()
  const withCorpus = englishModel(dictionary, dictionary.lemmas, corpus)
  log(`model with ${corpus.tokens} corpus tokens (${corpus.counts.size} forms): ${seconds(t0)} s`)
  const changed = corpusChangedLemmas(withCorpus)
  const m = await measureEnglish(files, dictionaryAnalyzer(dictionary), modelAnalyzer(withCorpus))
  const plain = predictedAttestation(model, corpus.counts)
  const informed = predictedAttestation(withCorpus, corpus.counts)
  result.withCorpus = {
    coverageAfter: round(m.figures.coverageAfter),
    recallAfter: round(m.figures.recallAfter),
    ambiguityAfter: round(m.figures.ambiguityAfter),
    singleTagShare: round(m.figures.singleTagShare),
    changedLemmas: changed,
    predictedForms: informed.forms,
    predictedAttestedShare: round(informed.attested / Math.max(1, informed.forms)),
    predictedFormsWithout: plain.forms,
    predictedAttestedShareWithout: round(plain.attested / Math.max(1, plain.forms)),
  }
}

if (values.json) {
  process.stdout.write(`${JSON.stringify(result)}\n`)
} else {
  for (const [key, value] of Object.entries(result))
    process.stdout.write(`${key.padEnd(16)}${typeof value === 'object' ? JSON.stringify(value) : value}\n`)
  const s = after.tokens.shares
  process.stdout.write(
    `after by source  attested ${pct(s.attested)}  predicted ${pct(s.predicted)}  guessed ${pct(s.guessed)}  none ${pct(s.none)}\n`,
  )
  process.stdout.write(
    `most frequent uncovered: ${after.uncovered.map((u) => `${u.form} (${u.count})`).join(', ')}\n`,
  )
  const missed = after.gold?.missed ?? []
  process.stdout.write(
    `most frequent misses: ${missed.map((m) => `${m.form}/${m.gold} (${m.count})`).join(', ')}\n`,
  )
}

function round(x: number): number {
  return Math.round(x * 10_000) / 10_000
}

function pct(x: number): string {
  return `${(x * 100).toFixed(1)}%`
}
