// Letter alternations learned from the paradigm book: pairs of paradigms alike in every way but a consistent
// swap of letters in their literals (a vowel-harmony pair such as -ssa / -ssä) are counted per letter pair.
import type { Paradigm } from './paradigm.ts'
import type { Pattern } from './pattern.ts'

/** How alternations are learned (0 paradigm pairs: off). */
export interface TwinOptions {
  /** A letter pair is kept when at least this many pairs of paradigms of one UPOS differ by it … */
  minPairs: number
  /**
   * … and at least this many times as many as any other pair sharing one of its letters: a true
   * alternation (vowel harmony) pairs each letter with one partner, while stem-vowel classes that happen to
   * mirror each other pair a vowel with several (German a/o, a/u, o/u).
   */
  dominance: number
  /** Rank every paradigm whose literals use swapped letters by whether the lemma has letters of its side. */
  sides: boolean
  /** Also train the table ranker on mirrored copies of the tables whose paradigm has a twin. */
  mirrorTables: boolean
  /** The same for the cell rule rankers (a table's cell whose rule has a twin). */
  mirrorCells: boolean
  /** A paradigm and its mirror image share their lemma-shape weights (see `tiedClasses`). */
  tie: boolean
  /** Rank paradigms using swapped letters by the lemma's harmony class (harmony.ts; absent: off). */
  harmony?: boolean
}

export const DEFAULT_TWIN_OPTIONS: TwinOptions = {
  minPairs: 3,
  dominance: 2,
  sides: false,
  mirrorTables: true,
  mirrorCells: false,
  tie: false,
  harmony: true,
}

/** Per UPOS, the learned letter swap: each letter maps to its partner (an involution). */
export type Alternations = Record<string, Record<string, string>>

/**
 * Learn letter swaps from the paradigm book. Two paradigms of one UPOS with the same structure (stem
 * variables, and literals of the same lengths in the same places) that become each other under a swap of
 * letters count once for each swapped pair; pairs seen often enough are kept, most frequent first, each
 * letter in at most one pair, and only a pair the example lemmas follow too (more of them have the letter
 * their paradigm's literals use than its partner: on balance one per paradigm pair).
 * Deterministic: the result depends only on the paradigms and their order.
 * @example learnAlternations(book.paradigms, DEFAULT_TWIN_OPTIONS) // { NOUN: { a: 'ä', ä: 'a', o: 'ö', ö: 'o' } }
 */
export function learnAlternations(
  paradigms: readonly Paradigm[],
  opts: TwinOptions | undefined,
): Alternations {
  const out: Alternations = {}
  if (!opts || opts.minPairs <= 0) return out
  const groups = new Map<string, Paradigm[]>()
  for (const p of paradigms) {
    if (p.twinOf !== undefined) continue
    const k = structureKey(p)
    const g = groups.get(k)
    if (g) g.push(p)
    else groups.set(k, [p])
  }
  const counts = new Map<string, Map<string, number>>()
  const agreement = new Map<string, Map<string, number>>()
  for (const g of groups.values()) {
    for (let i = 0; i < g.length; i++) {
      for (let j = i + 1; j < g.length; j++) {
        const swap = swapBetween(literals(g[i]!), literals(g[j]!))
        if (!swap) continue
        const m = counts.get(g[i]!.upos) ?? new Map<string, number>()
        counts.set(g[i]!.upos, m)
        const a = agreement.get(g[i]!.upos) ?? new Map<string, number>()
        agreement.set(g[i]!.upos, a)
        for (const pair of swap) {
          m.set(pair, (m.get(pair) ?? 0) + 1)
          a.set(pair, (a.get(pair) ?? 0) + lemmaAgreement(g[i]!, g[j]!, pair))
        }
      }
    }
  }
  for (const [upos, m] of [...counts].sort((a, b) => (a[0] < b[0] ? -1 : 1))) {
    const rival = (pair: string) =>
      Math.max(0, ...[...m].filter(([q]) => q !== pair && [...q].some((ch) => pair.includes(ch))).map(([, c]) => c))
    const kept = [...m]
      .filter(
        ([pair, c]) =>
          c >= opts.minPairs &&
          c >= (opts.dominance ?? 0) * rival(pair) &&
          (agreement.get(upos)!.get(pair) ?? 0) >= c,
      )
      .sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1))
    const swap: Record<string, string> = {}
    for (const [pair] of kept) {
      const [x, y] = [...pair]
      if (x === undefined || y === undefined || swap[x] !== undefined || swap[y] !== undefined) continue
      swap[x] = y
      swap[y] = x
    }
    if (Object.keys(swap).length > 0) out[upos] = swap
  }
  return out
}

/**
 * Whether the members' own letters follow the swap (as vowel harmony does, and a stem-vowel change does
 * not): over the example lemmas of both paradigms, those with the letter their paradigm's literals use
 * minus those with its partner.
 */
function lemmaAgreement(p: Paradigm, q: Paradigm, pair: string): number {
  const [x, y] = [...pair] as [string, string]
  const pUsesX = literals(p).some((l) => l.includes(x))
  const [px, qx] = pUsesX ? [x, y] : [y, x]
  const side = (lemmas: readonly string[], own: string, other: string) =>
    lemmas.reduce(
      (n, l) => n + (l.toLowerCase().includes(own) ? 1 : 0) - (l.toLowerCase().includes(other) ? 1 : 0),
      0,
    )
  return side(p.examples, px, qx) + side(q.examples, qx, px)
}

/** Apply a letter swap to a string (letters outside the swap stay). */
export function mirror(s: string, swap: Readonly<Record<string, string>>): string {
  let out = ''
  for (const c of s) out += swap[c] ?? c
  return out
}

/** Apply a letter swap to the literals of a pattern. */
export function mirrorPattern(pt: Pattern, swap: Readonly<Record<string, string>>): Pattern {
  return pt.map((x) => (typeof x === 'string' ? mirror(x, swap) : x))
}

/** Every literal of a paradigm in a fixed order: the lemma's, then each cell's variants. */
function literals(p: Paradigm): string[] {
  const out: string[] = []
  const add = (pt: Pattern) => {
    for (const x of pt) if (typeof x === 'string') out.push(x)
  }
  add(p.lemma)
  for (const c of p.cells) for (const f of c.forms) add(f)
  return out
}

/** The paradigm with each literal replaced by its length in letters. */
function structureKey(p: Paradigm): string {
  const shape = (pt: Pattern) =>
    pt.map((x) => (typeof x === 'number' ? `v${x}` : `l${[...x].length}`)).join('.')
  const cells = p.cells.map((c) => `${c.key}=${c.forms.map(shape).join(',')}`).join(';')
  return `${p.upos}|${p.openPrefix ? 1 : 0}|${shape(p.lemma)}|${cells}`
}

/**
 * The letter pairs (each as its two letters, sorted) of the swap that turns literals `a` into `b`, or null
 * when no swap does (a letter changing in one place and kept, or changed otherwise, in another).
 */
function swapBetween(a: readonly string[], b: readonly string[]): string[] | null {
  const to = new Map<string, string>()
  const kept = new Set<string>()
  for (let i = 0; i < a.length; i++) {
    const x = [...a[i]!]
    const y = [...b[i]!]
    if (x.length !== y.length) return null
    for (let k = 0; k < x.length; k++) {
      const p = x[k]!
      const q = y[k]!
      if (p === q) {
        kept.add(p)
        continue
      }
      if ((to.get(p) ?? q) !== q || (to.get(q) ?? p) !== p) return null
      to.set(p, q)
      to.set(q, p)
    }
  }
  if (to.size === 0) return null
  for (const c of kept) if (to.has(c)) return null
  const pairs = new Set<string>()
  for (const [p, q] of to) pairs.add(p < q ? p + q : q + p)
  return [...pairs].sort()
}
