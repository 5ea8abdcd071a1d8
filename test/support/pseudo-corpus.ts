// A pseudo-corpus for simulations: every training form once, each held-out gold form kept with a probability.
import type { Lexicon } from '../../src/core/index.ts'
import { mulberry32 } from '../../src/core/inflect/ranker.ts'

/**
 * Form counts of a simulated raw text (seeded, so the same every run).
 * @example pseudoCorpus(train, dev, 0.5, 1).get('Aale') // 1
 */
export function pseudoCorpus(train: Lexicon, heldOut: Lexicon, keep: number, seed: number): Map<string, number> {
  const rand = mulberry32(seed)
  const counts = new Map<string, number>()
  const add = (f: string) => counts.set(f, (counts.get(f) ?? 0) + 1)
  for (const e of train.entries) for (const c of e.cells ?? []) for (const f of c.forms) add(f)
  for (const e of heldOut.entries) for (const c of e.cells ?? []) for (const f of c.forms) if (rand() < keep) add(f)
  return counts
}
