// Writes the Sulvašti demo files (tables, lemma list and gold, corpus, gold CoNLL-U), checks them, prints counts.
// Run: npx tsx demo-lexicon/generate.ts
import { writeFileSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { EXCEPTIONAL_TABLES } from './grammar/exceptions.ts'
import { checkBareList, checkTables } from './lib/check-lexicon.ts'
import { checkConllu, checkCorpus } from './lib/check-text.ts'
import { ALL_CLASSES, buildLexicon, type Entry } from './lib/lexicon.ts'
import { Vocabulary } from './lib/phrases.ts'
import { makeRng } from './lib/prng.ts'
import { conlluSentence, paragraphs, sentenceText } from './lib/render.ts'
import { sentence } from './lib/sentences.ts'

const SEED_LEXICON = 0x5a1f
const SEED_CORPUS = 0xc0de
const SEED_GOLD = 0x601d
const CORPUS_WORDS = 21_000
const GOLD_SENTENCES = 200

const here = dirname(fileURLToPath(import.meta.url))
const write = (name: string, text: string): void => writeFileSync(join(here, name), text.normalize('NFC'))

const tableRows = (entries: readonly Entry[]): string =>
  entries.flatMap((e) => e.rows.map((r) => `${e.lemma}\t${r.form}\t${e.upos}\t${r.feats}\n`)).join('')

const lex = buildLexicon(makeRng(SEED_LEXICON))
const tablesText = tableRows(lex.tables)
const goldTablesText = tableRows(lex.bare)
const listText = lex.bare.map((e) => `${e.lemma}\t${e.upos}\t${e.inherent}\n`).join('')

const corpusVocabulary = new Vocabulary(makeRng(SEED_CORPUS), lex)
const texts: string[] = []
for (let words = 0; words < CORPUS_WORDS; ) {
  const tokens = sentence(corpusVocabulary)
  words += tokens.filter((t) => t.upos !== 'PUNCT').length
  texts.push(sentenceText(tokens))
}
const corpusText = paragraphs(corpusVocabulary.rng, texts)

const goldVocabulary = new Vocabulary(makeRng(SEED_GOLD), lex)
let conlluText = ''
for (let i = 1; i <= GOLD_SENTENCES; i++) {
  conlluText += conlluSentence(`demo-gold-${String(i).padStart(4, '0')}`, sentence(goldVocabulary))
}

write('tables.tsv', tablesText)
write('lemmas-gold.tsv', goldTablesText)
write('lemmas.tsv', listText)
write('corpus.txt', corpusText)
write('gold.conllu', conlluText)

const tables = checkTables(tablesText, 'tables.tsv')
const gold = checkTables(goldTablesText, 'lemmas-gold.tsv')
const bareCount = checkBareList(listText, gold, tables)
const corpus = checkCorpus(corpusText, tables, gold)
const goldTokens = checkConllu(conlluText, tables, gold)

const irregular = EXCEPTIONAL_TABLES.filter((t) => t.kind === 'irregular').length
const classes = (upos: string): number => ALL_CLASSES.filter((c) => c.upos === upos).length
const minimums: [string, boolean][] = [
  ['>= 150 lemmas with tables', tables.lemmas.size >= 150],
  ['>= 5 noun classes', classes('NOUN') >= 5],
  ['>= 12 noun cells', (tables.cellsByPos.get('NOUN') ?? 0) >= 12],
  ['>= 20 verb cells', (tables.cellsByPos.get('VERB') ?? 0) >= 20],
  ['5-8 irregular tables', irregular >= 5 && irregular <= 8],
  ['3-5 defective tables', tables.defective.length >= 3 && tables.defective.length <= 5],
  ['>= 2 variant cells', tables.variantCells >= 2],
  ['>= 600 bare lemmas', bareCount >= 600],
  ['>= 20,000 corpus words', corpus.words >= 20_000],
  ['corpus uses forms only predictable', corpus.predictedOnly > 0],
  ['corpus has words in no dictionary', corpus.unknown > 0],
  ['>= 1,000 gold tokens', goldTokens >= 1000],
]
const failed = minimums.filter(([, ok]) => !ok).map(([name]) => name)
const byPos = (m: Map<string, number>): string => [...m].map(([p, n]) => `${p} ${n}`).join(', ')
console.log(`tables.tsv: ${tables.rows} rows, ${tables.lemmas.size} lemmas (${byPos(tables.lemmasByPos)})`)
console.log(`  distinct cells (FEATS without Gender) per part of speech: ${byPos(tables.cellsByPos)}`)
console.log(`  classes: NOUN ${classes('NOUN')}, VERB ${classes('VERB')}, ADJ ${classes('ADJ')}`)
console.log(`  irregular ${irregular}, defective ${tables.defective.length} (${tables.defective.join(', ')})`)
console.log(
  `  tables with syncretic cells ${tables.syncreticTables}, cells with variant forms ${tables.variantCells}`,
)
console.log(
  `lemmas.tsv: ${bareCount} bare lemmas (${byPos(gold.lemmasByPos)}); lemmas-gold.tsv: ${gold.rows} rows`,
)
console.log(
  `corpus.txt: ${corpus.words} words + ${corpus.punctuation} punctuation, ${texts.length} sentences; ` +
    `${corpus.predictedOnly} tokens only in bare lemmas' tables, ${corpus.unknown} in no table`,
)
console.log(`gold.conllu: ${GOLD_SENTENCES} sentences, ${goldTokens} tokens`)
if (failed.length > 0) {
  console.error(`minimums not met: ${failed.join('; ')}`)
  process.exit(1)
}
console.log('all checks passed')
