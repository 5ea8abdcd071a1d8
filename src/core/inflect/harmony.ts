// Harmony classes: the two sides of a learned letter swap, widened to the letters that the member lemmas of
// one side's paradigms use and the other side's do not (a-o-u against ä-ö-y), and a lemma's class from them.
import type { Paradigm } from './paradigm.ts'

/** A letter joins a side when at least this many member lemmas of that side have it … */
export const HARMONY_MIN_LEMMAS = 3
/**
 * … and the other side's lemmas have it at most this fraction as often as its own side's, relative to how
 * many lemmas each side has (an odds ratio: compounds may mix sides; letters both use stay out).
 */
export const HARMONY_MAX_ODDS = 0.25

/**
 * Letter sides widened by the member lemmas: `sides` are the swapped letters' sides; each paradigm has a
 * side (-1: none) and member lemmas (lowercased). A letter outside the swap joins the side whose members
 * have it often enough and nearly alone; letters both sides use (e, i in Finnish, consonants) stay out.
 * @example harmonyLetters({ a: 0, ä: 1 }, [0, 1], [['talo', 'kuva'], ['kynä', 'pöytä']]) // { a: 0, ä: 1, o: 0, … }
 */
export function harmonyLetters(
  sides: Readonly<Record<string, number>>,
  paradigmSides: readonly number[],
  members: readonly (readonly string[])[],
  usable?: ReadonlySet<string>,
): Record<string, number> {
  const counts = new Map<string, [number, number]>()
  const totals = [0, 0]
  paradigmSides.forEach((side, i) => {
    if (side !== 0 && side !== 1) return
    for (const lemma of members[i] ?? []) {
      totals[side]!++
      for (const c of new Set(lemma)) {
        if (sides[c] !== undefined || (usable && !usable.has(c))) continue
        const n = counts.get(c) ?? [0, 0]
        n[side]!++
        counts.set(c, n)
      }
    }
  })
  const out: Record<string, number> = { ...sides }
  for (const [c, n] of [...counts].sort((a, b) => (a[0] < b[0] ? -1 : 1))) {
    for (const side of [0, 1]) {
      const own = n[side]!
      const other = n[1 - side]!
      if (own >= HARMONY_MIN_LEMMAS && other * totals[side]! <= HARMONY_MAX_ODDS * own * totals[1 - side]!)
        out[c] = side
    }
  }
  return out
}

/**
 * A lemma's harmony class: the side of its last letter that has one, or -1 when none does (a word of
 * neutral letters only; the ranker learns which side such words take).
 * @example harmonyClass('perinteinen', { a: 0, ä: 1, o: 0, y: 1 }) // -1
 */
export function harmonyClass(lower: string, letters: Readonly<Record<string, number>>): number {
  const w = [...lower]
  for (let i = w.length - 1; i >= 0; i--) {
    const s = letters[w[i]!]
    if (s !== undefined) return s
  }
  return -1
}

/**
 * The letters a list of paradigms writes in its literals (a harmony letter is one some ending varies in).
 * @example literalLetters(book.paradigms).has('ä') // true for Finnish nouns
 */
export function literalLetters(paradigms: readonly Paradigm[]): Set<string> {
  const out = new Set<string>()
  const add = (pt: readonly (string | number)[]) => {
    for (const x of pt) if (typeof x === 'string') for (const c of x.toLowerCase()) out.add(c)
  }
  for (const p of paradigms) {
    add(p.lemma)
    for (const c of p.cells) for (const f of c.forms) add(f)
  }
  return out
}
