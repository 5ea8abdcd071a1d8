// The public surface of the readers and writers (runtime-agnostic: Node and the Workers runtime).
export { CONLLU_COLUMNS, type ConlluWord } from './conllu-line.ts'
export { type ConlluReadOptions, streamConllu } from './conllu-reader.ts'
export type { ConlluSentence, SurfaceToken } from './conllu-sentence.ts'
export { type CorpusFormat, type CorpusReadOptions, openCorpus, sniffCorpusLine } from './corpus-reader.ts'
export { encodeLines } from './encode-lines.ts'
export { parseEntryLine, readEntries } from './entries-jsonl.ts'
export { type LineParser, type LineResult, MAX_WORD_CHARS, type Where } from './fields.ts'
export type { ByteInput, TextInput } from './input.ts'
export { type EntryJson, entryToJson, formatJsonLine, toJsonLines, writeJsonLines } from './jsonl-writer.ts'
export { parseLemmaLine, readLemmaList } from './lemma-list.ts'
export {
  type LexiconFormat,
  type LexiconReadOptions,
  type LexiconReadResult,
  readLexicon,
  sniffLexiconLine,
} from './lexicon-reader.ts'
export { type LineItem, type LineOptions, MAX_LINE_CHARS, readLines } from './line-reader.ts'
export { MAX_PROBLEM_EXAMPLES, type Reader, type ReadOptions, type ReadSummary } from './read-summary.ts'
export { streamRecords } from './record-reader.ts'
export {
  type FormSource,
  formatScore,
  formatTableRow,
  type RowsWriteOptions,
  tableRowsToTsv,
  type WritableRow,
  writeTableRows,
} from './rows-writer.ts'
export { parseTableRow, readTableRows } from './table-rows.ts'
export { type CorpusToken, streamTextTokens, tokenizeLine } from './text-tokens.ts'
