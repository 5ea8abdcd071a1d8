// Inputs for the determinism checks: a small sample of the demo lexicon, and row shuffles that keep variant order.
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { DEMO } from './cli.ts'
import { mulberry32 } from '../../src/core/inflect/ranker.ts'

/** Lemmas with variant forms in one cell (two rows for the same lemma, UPOS and FEATS) in demo-lexicon/tables.tsv. */
export const VARIANT_LEMMAS = ['kelmä', 'talva', 'vorulla']

/** Lines of a demo-lexicon file, without the final empty line. */
export function demoLines(name: string): string[] {
  return readFileSync(join(DEMO, name), 'utf8')
    .split('\n')
    .filter((l) => l !== '')
}

/**
 * A small lexicon cut from the demo files: every table of the first `perUpos` lemmas of each UPOS, the lemmas
 * with variant forms, and the first `bare` lemma-list lines. Small enough to learn in well under a second.
 * @example const { tables, lemmas } = demoSample(6, 40)
 */
export function demoSample(perUpos: number, bare: number): { tables: string[]; lemmas: string[] } {
  const rows = demoLines('tables.tsv')
  const chosen = new Set<string>()
  const counts = new Map<string, number>()
  for (const row of rows) {
    const [lemma, , upos] = row.split('\t') as [string, string, string]
    const key = `${lemma}\t${upos}`
    if (chosen.has(key)) continue
    const n = counts.get(upos) ?? 0
    if (n < perUpos || VARIANT_LEMMAS.includes(lemma)) {
      chosen.add(key)
      counts.set(upos, n + 1)
    }
  }
  const tables = rows.filter((row) => {
    const [lemma, , upos] = row.split('\t')
    return chosen.has(`${lemma}\t${upos}`)
  })
  return { tables, lemmas: demoLines('lemmas.tsv').slice(0, bare) }
}

/**
 * Shuffle table rows (Fisher–Yates, seeded), then put the variants of each cell back in their first order:
 * rows of one (lemma, UPOS, FEATS) are not of equal priority (the first listed form is the preferred one),
 * every other order is. The positions a cell's rows take are shuffled; which variant sits first is not.
 * @example shuffleRows(['a\ta\tNOUN\t_', 'b\tb\tNOUN\t_'], 1) // the same two rows, in some order
 */
export function shuffleRows(rows: readonly string[], seed: number): string[] {
  const next = mulberry32(seed)
  const order = rows.map((_, i) => i)
  for (let i = order.length - 1; i > 0; i--) {
    const j = Math.floor(next() * (i + 1))
    ;[order[i], order[j]] = [order[j]!, order[i]!]
  }
  const cellOf = (row: string) => {
    const [lemma, , upos, feats] = row.split('\t')
    return `${lemma}\t${upos}\t${feats}`
  }
  const queues = new Map<string, string[]>()
  for (const row of rows) {
    const queue = queues.get(cellOf(row)) ?? []
    queue.push(row)
    queues.set(cellOf(row), queue)
  }
  return order.map((i) => queues.get(cellOf(rows[i]!))!.shift()!)
}

/** Lines as a file's text, LF after each. */
export function asFile(lines: readonly string[]): string {
  return lines.map((l) => `${l}\n`).join('')
}
