// Stem shapes summed as the stems come: what stemShapes (extract.ts) makes of a list of stem contents,
// without keeping the list (a cell's rules see every table of their UPOS, one stem list each).
import type { StemShape } from './paradigm.ts'

const SHAPE_SAMPLE = 24

/** One stem variable's tally. */
interface VarTally {
  freq: Map<string, number>
  first: string
  last: string
  minLength: number
  maxLength: number
}

/**
 * The shapes of the stem contents added so far, as stemShapes(all of them) gives them.
 * @example const t = new StemTally(); t.add(['Kan', 'l']); t.shapes()[0].seen // ['Kan']
 */
export class StemTally {
  /** Null until the first stems: their length fixes the variables, as stemShapes takes it from the first. */
  private vars: VarTally[] | null = null

  add(stems: readonly string[]): void {
    this.vars ??= stems.map(() => ({
      freq: new Map<string, number>(),
      first: '',
      last: '',
      minLength: Number.POSITIVE_INFINITY,
      maxLength: 0,
    }))
    for (let v = 0; v < this.vars.length; v++) {
      const t = this.vars[v]!
      const x = stems[v] ?? ''
      t.freq.set(x, (t.freq.get(x) ?? 0) + 1)
      if (x && !t.first.includes(x[0]!)) t.first += x[0]
      if (x && !t.last.includes(x[x.length - 1]!)) t.last += x[x.length - 1]
      t.minLength = Math.min(t.minLength, x.length)
      t.maxLength = Math.max(t.maxLength, x.length)
    }
  }

  shapes(): StemShape[] {
    return (this.vars ?? []).map((t) => ({
      seen: [...t.freq]
        .sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1))
        .slice(0, SHAPE_SAMPLE)
        .map(([s]) => s),
      first: [...t.first].sort().join(''),
      last: [...t.last].sort().join(''),
      minLength: t.minLength,
      maxLength: t.maxLength,
    }))
  }
}
