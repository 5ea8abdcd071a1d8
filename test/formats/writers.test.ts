// Writers: TSV rows with optional source/score columns, JSON lines, byte streams; round trips via the readers.
import { describe, expect, it } from 'vitest'
import type { Entry } from '../../src/core/lexicon/entry.ts'
import { ProblemError } from '../../src/core/lexicon/problem.ts'
import {
  encodeLines,
  entryToJson,
  formatScore,
  formatTableRow,
  readEntries,
  readLines,
  readTableRows,
  tableRowsToTsv,
  toJsonLines,
  type WritableRow,
  writeTableRows,
} from '../../src/formats/index.ts'
import { collect, thrownProblem } from './helpers.ts'

const rows: WritableRow[] = [
  { lemma: 'vessa', form: 'vessa', upos: 'NOUN', feats: 'Number=Sing', source: 'attested', score: 1 },
  { lemma: 'vessa', form: 'vessat', upos: 'NOUN', feats: 'Number=Plur', source: 'predicted', score: 2 / 3 },
]

describe('table-rows writer', () => {
  it('writes the table-rows format, which reads back to the same rows', async () => {
    const tsv = tableRowsToTsv(rows, { comments: ['predicted by the model'] })
    expect(tsv).toBe(
      '# predicted by the model\nvessa\tvessa\tNOUN\tNumber=Sing\nvessa\tvessat\tNOUN\tNumber=Plur\n',
    )
    const back = await readTableRows(tsv, { file: 'out.tsv' })
    expect(back.rows.map(({ lemma, form, upos, feats }) => ({ lemma, form, upos, feats }))).toEqual(
      rows.map(({ lemma, form, upos, feats }) => ({ lemma, form, upos, feats })),
    )
  })

  it('adds source and score columns on request, which the rows reader does not take as input', async () => {
    const lines = [...writeTableRows(rows, { scores: true })]
    expect(lines).toEqual([
      'vessa\tvessa\tNOUN\tNumber=Sing\tattested\t1\n',
      'vessa\tvessat\tNOUN\tNumber=Plur\tpredicted\t0.6667\n',
    ])
    expect(await thrownProblem(() => readTableRows(lines.join(''), { file: 'scored.tsv' }))).toEqual({
      code: 'bad-columns',
      where: 'scored.tsv:1',
    })
  })

  it.each([
    [1, '1'],
    [0, '0'],
    [0.5, '0.5'],
    [0.81249, '0.8125'],
    [1e-7, '0'],
    [12.3, '12.3'],
  ])('formats score %d as %s', (score, text) => {
    expect(formatScore(score)).toBe(text)
  })

  it('refuses a field that would break the TSV, and scores that are missing or not finite', () => {
    expect(() => formatTableRow({ ...rows[0]!, form: 'a\tb' })).toThrow(ProblemError)
    expect(() => formatTableRow({ lemma: 'a', form: 'a', upos: 'X', feats: '_' }, { scores: true })).toThrow(
      TypeError,
    )
    expect(() => formatScore(Number.NaN)).toThrow(TypeError)
  })
})

describe('JSON-lines writer', () => {
  it('writes entries that read back to the same entries', async () => {
    const entries: Entry[] = [
      { lemma: 'miral', upos: 'VERB', feats: '_', file: 'a.tsv', line: 3 },
      {
        lemma: 'vessa',
        upos: 'NOUN',
        feats: 'Gender=Fem',
        forms: [{ form: 'vessat', feats: 'Number=Plur' }],
      },
    ]
    const text = toJsonLines(entries.map(entryToJson))
    expect(text.split('\n')[0]).toBe('{"lemma":"miral","upos":"VERB","feats":"_"}')
    const back = await readEntries(text, { file: 'e.jsonl' })
    expect(back.entries.map(entryToJson)).toEqual(entries.map(entryToJson))
  })

  it('keeps one value on one line even when strings hold line breaks', () => {
    expect(toJsonLines([{ form: 'a\nb' }, 1])).toBe('{"form":"a\\nb"}\n1\n')
  })
})

describe('encodeLines', () => {
  it('streams written lines as UTF-8 bytes that the line reader reads back', async () => {
    async function* lazy() {
      yield* writeTableRows(rows)
    }
    for (const source of [writeTableRows(rows), lazy()]) {
      const items = await collect(readLines(encodeLines(source), { file: 'stream' }))
      expect(items.map((i) => i.text)).toEqual([
        'vessa\tvessa\tNOUN\tNumber=Sing',
        'vessa\tvessat\tNOUN\tNumber=Plur',
      ])
    }
  })
})
