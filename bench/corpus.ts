// Simulation (documented as one): how much raw text helps choose between candidate tables. A pseudo-corpus
// is made of the held-out lemmas' gold forms, each kept with probability 0.5 (seeded), plus all training
// forms; tables are predicted with and without it. German: train → dev. Spanish and Finnish: dev → test,
// with test forms used only as raw text without tags (the one place test forms are used). Reads
// ../shared/bench-data/ddn13 beside the checkout and skips cleanly when it is missing.
import { createReadStream, existsSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { buildLexicon, type Lexicon, learnForEvaluation, scoreInflection } from '../src/core/index.ts'
import { corpusEvidence, DEFAULT_CORPUS_OPTIONS } from '../src/core/inflect/corpus-evidence.ts'
import { readLexicon } from '../src/formats/index.ts'
import { pseudoCorpus } from '../test/support/pseudo-corpus.ts'

const DATA = fileURLToPath(new URL('../../shared/bench-data/ddn13/', import.meta.url))
const SETS = [
  ['de-noun', 'train', 'dev'],
  ['de-verb', 'train', 'dev'],
  ['es-verb', 'dev', 'test'],
  ['fi-nounadj', 'dev', 'test'],
  ['fi-verb', 'dev', 'test'],
] as const

async function lexicon(file: string): Promise<Lexicon> {
  return buildLexicon((await readLexicon(createReadStream(file), { file, format: 'rows' })).entries)
}

async function main(): Promise<void> {
  if (!existsSync(DATA)) {
    console.log('bench:corpus: ../shared/bench-data/ddn13 is not beside this checkout; skipped')
    return
  }
  const weight = Number(process.env.CORPUS_WEIGHT ?? DEFAULT_CORPUS_OPTIONS.weight)
  const absence = Number(process.env.CORPUS_ABSENCE ?? DEFAULT_CORPUS_OPTIONS.absence)
  const rows = []
  const only = process.env.SETS?.split(',')
  for (const [set, trainSplit, evalSplit] of SETS) {
    if (only && !only.includes(set)) continue
    const train = await lexicon(`${DATA}${set}-${trainSplit}.tsv`)
    const test = await lexicon(`${DATA}${set}-${evalSplit}.tsv`)
    const model = learnForEvaluation(train)
    const without = scoreInflection(model, test)
    const ev = corpusEvidence(pseudoCorpus(train, test, 0.5, 1), model.lexicon, { ...DEFAULT_CORPUS_OPTIONS, weight, absence })
    const withText = scoreInflection({ ...model, corpus: ev }, test)
    rows.push({
      set,
      scoredOn: evalSplit,
      tableWithout: without.tableAccuracy.toFixed(3),
      tableWith: withText.tableAccuracy.toFixed(3),
      formWithout: without.formAccuracy.toFixed(4),
      formWith: withText.formAccuracy.toFixed(4),
      tableGain: (withText.tableAccuracy - without.tableAccuracy).toFixed(3),
    })
    console.error(`${set} done`)
  }
  if (process.argv.includes('--json')) console.log(JSON.stringify(rows))
  else console.table(rows)
}

await main()
