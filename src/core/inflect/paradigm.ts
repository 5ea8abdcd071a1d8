// A paradigm: an abstract table (a pattern per cell over stem variables) and how to apply it to a lemma.
import { fillPattern, type Pattern, patternKey, showPattern } from './pattern.ts'

/** One cell of a paradigm: its FEATS and the pattern of each variant form. */
export interface ParadigmCell {
  key: string
  forms: Pattern[]
}

/**
 * An abstract table shared by many lemmas.
 * @example { id: 'NOUN-1', upos: 'NOUN', lemma: [0], openPrefix: false, cells: [...], members: 412, examples: ['Tag'] }
 */
export interface Paradigm {
  id: string
  upos: string
  lemma: Pattern
  openPrefix: boolean
  cells: ParadigmCell[]
  /** Tables of the lexicon that follow it (defective ones included). */
  members: number
  /** Member lemmas, most typical first (a few). */
  examples: string[]
  /** Per stem variable, what the members had there. */
  shapes?: StemShape[]
  /** A twin (see twins.ts): the index of the paradigm it mirrors. Twins have no members of their own. */
  twinOf?: number
}

/** The stable text identity of a paradigm's shape (cells sorted by key, variants sorted). */
export function paradigmShapeKey(
  upos: string,
  lemma: Pattern,
  openPrefix: boolean,
  cells: ParadigmCell[],
): string {
  const cellPart = [...cells]
    .sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0))
    .map((c) => `${c.key}=${c.forms.map(patternKey).sort().join('\u0003')}`)
    .join('\u0004')
  return `${upos}\u0005${openPrefix ? 1 : 0}\u0005${patternKey(lemma)}\u0005${cellPart}`
}

/** What the members of a paradigm had in each stem variable: used to choose among several ways to match. */
export interface StemShape {
  /** Contents seen (a bounded sample, most frequent first). */
  seen: string[]
  first: string
  last: string
  minLength: number
  maxLength: number
}

export const MAX_MATCHES = 64

/** What a stem search reuses between searches: stem bounds, and dead (part, position) marks stamped by search. */
export interface SearchScratch {
  vars: number
  dead: Int32Array
  from: Int32Array
  to: Int32Array
  call: number
}

/**
 * Ready the scratch for searching `pattern` over a word of `length` letters: count its stem variables, grow
 * the arrays if needed, and take a new stamp (clearing the marks when the stamps wrap round).
 * @example beginSearch(scratch, [0, 'en'], 'sagen'.length); scratch.vars // 1
 */
export function beginSearch(s: SearchScratch, pattern: Pattern, length: number): void {
  s.vars = 0
  for (const p of pattern) if (typeof p === 'number' && p >= s.vars) s.vars = p + 1
  const states = (pattern.length + 1) * (length + 1)
  if (states > s.dead.length) s.dead = new Int32Array(2 * states)
  if (s.vars > s.from.length) {
    s.from = new Int32Array(2 * s.vars)
    s.to = new Int32Array(2 * s.vars)
  }
  s.call = (s.call + 1) | 0
  if (s.call === 0) {
    s.dead.fill(0)
    s.call = 1
  }
}

/**
 * Every way a lemma fits a lemma pattern (stem variables non-empty, an open prefix may be empty), greedy first.
 * @example matchAll([0, 'a', 1], false, 'Kanal') // [['Kan', 'l'], ['K', 'nal']]
 */
export function matchAll(lemma: Pattern, openPrefix: boolean, word: string): string[][] {
  const single = matchSingle(lemma, openPrefix, word)
  if (single !== undefined) return single
  const search = searchState
  search.lemma = lemma
  search.openPrefix = openPrefix
  search.word = word
  search.out = []
  beginSearch(search, lemma, word.length)
  step(search, 0, 0)
  const out = search.out
  search.out = []
  search.word = ''
  return out
}

/**
 * The state of one matchAll search, reused by every search (matching is synchronous): the stem bounds so
 * far, and the (part, position) pairs known to lead to no match, marked with the search's number — without
 * them, many adjacent variables are exponential.
 */
const searchState = {
  lemma: [] as Pattern,
  openPrefix: false,
  word: '',
  out: [] as string[][],
  vars: 0,
  from: new Int32Array(8),
  to: new Int32Array(8),
  dead: new Int32Array(256),
  call: 0,
}

function step(s: typeof searchState, part: number, pos: number): void {
  const { lemma, word, out } = s
  const n = word.length
  if (out.length >= MAX_MATCHES) return
  const state = part * (n + 1) + pos
  if (s.dead[state] === s.call) return
  const before = out.length
  if (part === lemma.length) {
    if (pos === n) {
      const stems: string[] = []
      for (let v = 0; v < s.vars; v++) stems.push(word.slice(s.from[v]!, s.to[v]!))
      out.push(stems)
    }
  } else {
    const p = lemma[part]!
    if (typeof p === 'string') {
      if (word.startsWith(p, pos)) step(s, part + 1, pos + p.length)
    } else {
      const min = p === 0 && s.openPrefix ? 0 : 1
      // A variable followed by a literal can only end where that literal starts.
      const next = lemma[part + 1]
      for (let end = n; end >= pos + min; end--) {
        if (end < n && isHighSurrogate(word.charCodeAt(end - 1))) continue
        if (typeof next === 'string' && !word.startsWith(next, end)) continue
        if (next === undefined && end !== n) continue
        s.from[p] = pos
        s.to[p] = end
        step(s, part + 1, end)
      }
    }
  }
  if (out.length === before) s.dead[state] = s.call
}

/**
 * matchAll for a pattern with one variable (most rules): literal, variable, literal — one match at most, so
 * no search. Undefined for other patterns.
 */
export function matchSingle(lemma: Pattern, openPrefix: boolean, word: string): string[][] | undefined {
  let at = -1
  for (let i = 0; i < lemma.length; i++) {
    if (typeof lemma[i] !== 'number') continue
    if (at >= 0) return undefined
    at = i
  }
  if (at < 0 || lemma[at] !== 0 || lemma.length > at + 2 || at > 1) return undefined
  const before = at === 1 ? (lemma[0] as string) : ''
  const after = at + 1 < lemma.length ? (lemma[at + 1] as string) : ''
  const end = word.length - after.length
  const min = openPrefix ? 0 : 1
  if (end < before.length + min || !word.startsWith(before) || !word.endsWith(after)) return []
  if (end < word.length && isHighSurrogate(word.charCodeAt(end - 1))) return []
  return [[word.slice(before.length, end)]]
}

export function isHighSurrogate(c: number): boolean {
  return c >= 0xd800 && c <= 0xdbff
}

/** How well stem contents fit what the paradigm's members had (higher is better). */
export function stemFit(stems: readonly string[], shapes: readonly StemShape[] | undefined): number {
  if (!shapes) return 0
  let fit = 0
  for (let i = 0; i < stems.length; i++) {
    const s = stems[i]!
    const sh = shapes[i]
    if (!sh) continue
    if (s.length >= 2 && sh.seen.includes(s)) fit += 3
    if (s.length >= sh.minLength && s.length <= sh.maxLength) fit += 1
    if (s && sh.first.includes(s[0]!)) fit += 1
    if (s && sh.last.includes(s[s.length - 1]!)) fit += 1
  }
  return fit
}

/** The stem contents of a lemma under a paradigm (the best-fitting match), or null when it does not apply. */
export function matchStems(
  p: Pick<Paradigm, 'lemma' | 'openPrefix' | 'shapes'>,
  lemma: string,
): string[] | null {
  const all = matchAll(p.lemma, p.openPrefix, lemma)
  if (all.length <= 1) return all[0] ?? null
  let best = all[0]!
  let bestFit = stemFit(best, p.shapes)
  for (let i = 1; i < all.length; i++) {
    const f = stemFit(all[i]!, p.shapes)
    if (f > bestFit) {
      best = all[i]!
      bestFit = f
    }
  }
  return best
}

/**
 * Apply a paradigm to a lemma: the forms of each cell, or null when it does not apply.
 * @example applyParadigm(p, 'Mantel') // [['Mantel'], ['Mantels'], ['Mäntel'], ...]
 */
export function applyParadigm(
  p: Pick<Paradigm, 'lemma' | 'openPrefix' | 'cells' | 'shapes'>,
  lemma: string,
): string[][] | null {
  const stems = matchStems(p, lemma)
  if (!stems) return null
  return p.cells.map((c) => c.forms.map((f) => fillPattern(f, stems)))
}

/** A readable description of each cell's rule, for the paradigm book. */
export function describeParadigm(p: Paradigm): { lemma: string; cells: { feats: string; rule: string[] }[] } {
  return {
    lemma: showPattern(p.lemma),
    cells: p.cells.map((c) => ({ feats: c.key, rule: c.forms.map(showPattern) })),
  }
}
