// Fuzz targets for the readers: lexicon files, JSON entries and corpora, as strings and as chunked byte streams.
import fc from 'fast-check'
import { ProblemError } from '../../src/core/lexicon/problem.ts'
import {
  type LexiconFormat,
  MAX_WORD_CHARS,
  openCorpus,
  readLexicon,
  readTableRows,
  tableRowsToTsv,
} from '../../src/formats/index.ts'
import { chunking, feats, noisyText, rawFeats, rowsToTsv, table, upos, word } from './arbitraries.ts'
import { check, chunks, countLines, type FuzzTarget, problemOr } from './target.ts'

const encoder = new TextEncoder()
const format = fc.constantFrom<LexiconFormat | undefined>(undefined, 'rows', 'entries', 'lemmas')
// biome-ignore lint/suspicious/noControlCharactersInRegex: a read word must hold none
const CONTROL = /[\u0000-\u001F]/

/** Rows, with some fields swapped for malformed ones, as TSV with noise spliced in. */
const messyTsv = noisyText(
  fc
    .array(
      fc.tuple(table, fc.option(rawFeats, { freq: 3 }), fc.option(fc.string({ maxLength: 6 }), { freq: 4 })),
      { maxLength: 4 },
    )
    .map((tables) =>
      tables
        .map(([rows, badFeats, badUpos]) =>
          rowsToTsv(
            rows.map((r, i) => ({
              ...r,
              feats: i === 0 && badFeats !== null ? badFeats : r.feats,
              upos: i === 1 && badUpos !== null ? badUpos : r.upos,
            })),
          ),
        )
        .join(''),
    ),
)

/** The same text as a string, or as UTF-8 bytes in random chunks. */
const delivered = (text: fc.Arbitrary<string>) =>
  fc.tuple(text, fc.boolean(), chunking).map(([t, asString, cuts]) => ({
    text: t,
    input: () => (asString ? t : chunks(encoder.encode(t), cuts)),
  }))

/** An entries line: an object with some of the keys, each of a random JSON type, or any JSON. */
const entryLine = fc.oneof(
  fc
    .record(
      {
        lemma: fc.oneof(word, fc.jsonValue()),
        upos: fc.oneof(upos, fc.jsonValue()),
        feats: fc.oneof(feats, fc.jsonValue()),
        forms: fc.oneof(
          fc.array(
            fc.record(
              { form: fc.oneof(word, fc.jsonValue()), feats: fc.oneof(feats, rawFeats) },
              { requiredKeys: [] },
            ),
            { maxLength: 3 },
          ),
          fc.jsonValue(),
        ),
      },
      { requiredKeys: [] },
    )
    .map((o) => JSON.stringify(o)),
  fc.jsonValue().map((v) => JSON.stringify(v)),
)

export const readerTargets: FuzzTarget[] = [
  {
    name: 'readers: messy lexicon files',
    checks:
      'readLexicon on noisy rows in any format, string or chunked bytes: entries or a located ProblemError; with skipBad every line is read or counted',
    property: () =>
      fc.asyncProperty(delivered(messyTsv), format, fc.boolean(), async ({ text, input }, fmt, skipBad) => {
        const r = await problemOr(() => readLexicon(input(), { file: 'f.tsv', format: fmt, skipBad }))
        if (r instanceof ProblemError) {
          check(r.problem.file === 'f.tsv', () => `problem without its file: ${JSON.stringify(r.problem)}`)
          if (r.problem.code !== 'no-entries')
            check(!skipBad && (r.problem.line ?? 0) > 0, () => `unlocated: ${JSON.stringify(r.problem)}`)
          return
        }
        // The byte reader sees the text's UTF-8: lone surrogates become U+FFFD, never a lost line.
        check(
          r.lines + r.skipped === countLines(text),
          () => `lines ${r.lines} + skipped ${r.skipped} ≠ ${countLines(text)}`,
        )
        for (const e of r.entries) {
          for (const w of [e.lemma, ...(e.forms ?? []).map((f) => f.form)]) {
            check(
              w.trim() !== '' && w.length <= MAX_WORD_CHARS && !CONTROL.test(w) && w === w.normalize('NFC'),
              () => `bad word read: ${JSON.stringify(w)}`,
            )
          }
        }
      }),
  },
  {
    name: 'readers: rows written and read back',
    checks: 'tableRowsToTsv then readTableRows gives the same rows, from a string and from chunked bytes',
    property: () =>
      fc.asyncProperty(fc.array(table, { minLength: 1, maxLength: 3 }), chunking, async (tables, cuts) => {
        const rows = tables.flat()
        const tsv = tableRowsToTsv(rows)
        for (const input of [tsv, chunks(encoder.encode(tsv), cuts)]) {
          const back = await readTableRows(input, { file: 'w.tsv' })
          const got = back.rows.map(({ lemma, form, upos, feats }) => ({ lemma, form, upos, feats }))
          check(
            JSON.stringify(got) === JSON.stringify(rows),
            () => `round trip changed rows: ${JSON.stringify(got)}`,
          )
        }
      }),
  },
  {
    name: 'readers: JSON entries of any shape',
    checks:
      'readLexicon (entries) on objects with wrong types and random JSON: entries or a located ProblemError',
    property: () =>
      fc.asyncProperty(
        fc.array(entryLine, { minLength: 1, maxLength: 5 }),
        fc.boolean(),
        async (lines, skipBad) => {
          const text = `${lines.join('\n')}\n`
          const r = await problemOr(() => readLexicon(text, { file: 'e.jsonl', skipBad }))
          if (r instanceof ProblemError)
            return check(r.problem.code === 'no-entries' || (r.problem.line ?? 0) > 0, 'unlocated problem')
          check(r.lines + r.skipped === countLines(text), 'a line was lost')
        },
      ),
  },
  {
    name: 'readers: corpora',
    checks:
      'openCorpus (text, CoNLL-U, sniffed) on noisy text and CoNLL-U-like lines: tokens or a ProblemError; no token is blank',
    property: () =>
      fc.asyncProperty(
        delivered(
          noisyText(
            fc
              .array(
                fc.oneof(
                  word,
                  fc.constantFrom(
                    '1\tVessa\tvessa\tNOUN\t_\tCase=Nom\t0\troot\t_\t_',
                    '1-2\tdel\t_\t_\t_\t_\t_\t_\t_\t_',
                    '1.1\tx\t_\t_\t_\t_\t_\t_\t_\t_',
                    '# sent_id = 1',
                    '',
                    '.',
                  ),
                ),
                { maxLength: 12 },
              )
              .map((ws) => ws.join('\n')),
          ),
        ),
        fc.constantFrom<'text' | 'conllu' | undefined>(undefined, 'text', 'conllu'),
        fc.boolean(),
        async ({ input }, fmt, skipBad) => {
          const r = await problemOr(async () => {
            const corpus = await openCorpus(input(), { file: 'c.txt', format: fmt, skipBad, checkTags: true })
            for await (const token of corpus)
              check(token.form !== '' && token.line > 0, () => `bad token ${JSON.stringify(token)}`)
            return corpus.summary
          })
          if (r instanceof ProblemError)
            check(!skipBad && (r.problem.line ?? 0) > 0, () => `unlocated: ${JSON.stringify(r.problem)}`)
        },
      ),
  },
]
