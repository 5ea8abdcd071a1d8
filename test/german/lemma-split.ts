// A deterministic lemma-level split of table rows: a lemma's whole table goes to one side, chosen by a hash.
import { createHash } from 'node:crypto'
import type { TableRow } from '../../src/core/lexicon/entry.ts'

/** A stable 32-bit number for a lemma (SHA-256 of its UTF-8, first four bytes), independent of row order. */
export function lemmaHash(lemma: string): number {
  return createHash('sha256').update(lemma, 'utf8').digest().readUInt32BE(0)
}

export interface LemmaSplit {
  train: TableRow[]
  test: TableRow[]
  trainLemmas: number
  testLemmas: number
}

/**
 * Split rows by lemma: a lemma whose hash falls in the first `testShare` of the range is a test lemma.
 * `maxTrain`/`maxTest` keep only the lemmas of each side with the smallest hashes (a deterministic sample).
 * @example splitByLemma(rows, { testShare: 0.1, maxTest: 300 }).testLemmas // 300
 */
export function splitByLemma(
  rows: readonly TableRow[],
  opts: { testShare: number; maxTrain?: number; maxTest?: number },
): LemmaSplit {
  const hashes = new Map<string, number>()
  for (const r of rows) if (!hashes.has(r.lemma)) hashes.set(r.lemma, lemmaHash(r.lemma))
  const cut = Math.floor(opts.testShare * 2 ** 32)
  const byHash = [...hashes].sort((a, b) => a[1] - b[1] || (a[0] < b[0] ? -1 : 1))
  const testSide = byHash.filter(([, h]) => h < cut).map(([l]) => l)
  const trainSide = byHash.filter(([, h]) => h >= cut).map(([l]) => l)
  const test = new Set(testSide.slice(0, opts.maxTest ?? testSide.length))
  const train = new Set(trainSide.slice(0, opts.maxTrain ?? trainSide.length))
  return {
    train: rows.filter((r) => train.has(r.lemma)),
    test: rows.filter((r) => test.has(r.lemma)),
    trainLemmas: train.size,
    testLemmas: test.size,
  }
}
