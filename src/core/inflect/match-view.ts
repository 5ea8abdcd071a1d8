// A paradigm as candidate search reads it: its lemma pattern, stem shapes and sizes in one record of one
// shape (paradigms and cell rules are objects of several shapes), and the best stem split without cutting
// out the others.
import { beginSearch, isHighSurrogate, MAX_MATCHES, type Paradigm, type StemShape } from './paradigm.ts'
import type { Pattern } from './pattern.ts'

/** A stem shape as StemShape. */
interface ShapeView {
  /** The seen contents by length (most are not the length asked for: they need no comparing). */
  seenByLength: readonly (readonly string[] | undefined)[]
  first: string
  last: string
  minLength: number
  maxLength: number
}

/** What finding candidates needs of one paradigm. */
export interface MatchView {
  lemma: Pattern
  openPrefix: boolean
  /** The literal the lemma pattern starts with, or '' when it starts with a stem. */
  first: string
  shapes: ShapeView[] | null
  members: number
  /** The paradigm it mirrors (twins.ts), or -1. */
  twinOf: number
  /** When the lemma pattern is one stem between two literals (either may be ''), they: matchSingle's case. */
  single: { before: string; after: string } | null
  /** The lemma pattern and open prefix as one string: views with the same key match a lemma the same ways. */
  key: string
}

/**
 * The match view of a paradigm.
 * @example matchView(p).first // 'ge' for a lemma pattern ['ge', 0, 'en']
 */
export function matchView(p: Paradigm): MatchView {
  const head = p.lemma[0]
  return {
    lemma: p.lemma,
    openPrefix: p.openPrefix,
    first: typeof head === 'string' ? head : '',
    shapes: p.shapes ? p.shapes.map(shapeView) : null,
    members: p.members,
    twinOf: p.twinOf ?? -1,
    single: singleStem(p.lemma),
    key: `${p.openPrefix ? 'o' : 'c'}${JSON.stringify(p.lemma)}`,
  }
}

/** The literals around the only stem of a lemma pattern, where matchSingle (paradigm.ts) decides alone. */
function singleStem(lemma: Pattern): { before: string; after: string } | null {
  let at = -1
  for (let i = 0; i < lemma.length; i++) {
    if (typeof lemma[i] !== 'number') continue
    if (at >= 0) return null
    at = i
  }
  if (at < 0 || lemma[at] !== 0 || lemma.length > at + 2 || at > 1) return null
  return {
    before: at === 1 ? (lemma[0] as string) : '',
    after: at + 1 < lemma.length ? (lemma[at + 1] as string) : '',
  }
}

function shapeView(s: StemShape): ShapeView {
  const seenByLength: string[][] = []
  for (const x of s.seen) {
    const list = seenByLength[x.length]
    if (list) list.push(x)
    else seenByLength[x.length] = [x]
  }
  return { seenByLength, first: s.first, last: s.last, minLength: s.minLength, maxLength: s.maxLength }
}

/**
 * How well stem contents fit what the paradigm's members had: stemFit of paradigm.ts on a view.
 * @example viewFit(['Kan', 'l'], matchView(p)) // 4
 */
export function viewFit(stems: readonly string[], v: MatchView): number {
  const shapes = v.shapes
  if (!shapes) return 0
  let fit = 0
  for (let i = 0; i < stems.length; i++) {
    const s = stems[i]!
    const sh = shapes[i]
    if (!sh) continue
    if (s.length >= 2 && sh.seenByLength[s.length]?.includes(s)) fit += 3
    if (s.length >= sh.minLength && s.length <= sh.maxLength) fit += 1
    if (s && sh.first.includes(s[0]!)) fit += 1
    if (s && sh.last.includes(s[s.length - 1]!)) fit += 1
  }
  return fit
}

/**
 * The stem contents of a lemma under a paradigm (the best-fitting match), or null: matchStems on a view.
 * The ways to match are searched as matchAll does, in its order and up to its bound; the first of those
 * that fit best (viewFit, by stem bounds) is cut out of the lemma. The ways depend only on the lemma pattern,
 * so they are found once per lemma and pattern (cell rules of many cells share patterns) and only scored
 * per view.
 * @example viewStems(matchView(p), 'Mantel') // ['Mant', 'l']
 */
export function viewStems(v: MatchView, lemma: string): string[] | null {
  lastFit = -1
  if (v.single) {
    // As matchSingle: the one stem is what the literals leave.
    const { before, after } = v.single
    const end = lemma.length - after.length
    if (end < before.length + (v.openPrefix ? 0 : 1) || !lemma.startsWith(before) || !lemma.endsWith(after))
      return null
    if (end < lemma.length && isHighSurrogate(lemma.charCodeAt(end - 1))) return null
    return [lemma.slice(before.length, end)]
  }
  const m = matchesOf(v, lemma)
  if (m.count === 0) return null
  const vars = m.vars
  const spans = m.spans
  let best = 0
  let bestFit = 0
  const shapes = v.shapes
  if (shapes) {
    for (let k = 0; k < m.count; k++) {
      const fit = spanFit(shapes, lemma, spans, k * vars, vars)
      if (k === 0 || fit > bestFit) {
        best = k
        bestFit = fit
      }
    }
  }
  lastFit = bestFit
  const stems: string[] = []
  for (let i = 0; i < vars; i++) {
    const at = 2 * (best * vars + i)
    stems.push(lemma.slice(spans[at]!, spans[at + 1]!))
  }
  return stems
}

/** The viewFit of the stems the last viewStems call returned when its search scored them already, else -1. */
let lastFit = -1

/**
 * viewFit of the stems viewStems has just returned for this view (the search knows it when it had to choose).
 * @example const stems = viewStems(v, 'Mantel'); stems && fitOfMatch(stems, v) // 4
 */
export function fitOfMatch(stems: readonly string[], v: MatchView): number {
  return lastFit >= 0 ? lastFit : viewFit(stems, v)
}

/** The ways one lemma matches one lemma pattern: `count` matches of `vars` (from, to) spans, end to end. */
interface Matches {
  count: number
  vars: number
  spans: number[]
}

/** The matches of the lemma last asked about, by pattern key (a candidate search asks about one lemma). */
let matchedWord = ''
const matchesByKey = new Map<string, Matches>()

function matchesOf(v: MatchView, lemma: string): Matches {
  if (lemma !== matchedWord) {
    matchesByKey.clear()
    matchedWord = lemma
  }
  let m = matchesByKey.get(v.key)
  if (!m) {
    const s = search
    s.view = v
    s.word = lemma
    s.found = 0
    beginSearch(s, v.lemma, lemma.length)
    s.spans = []
    step(s, 0, 0)
    m = { count: s.found, vars: s.vars, spans: s.spans }
    s.word = ''
    s.spans = []
    matchesByKey.set(v.key, m)
  }
  return m
}

/** The state of one search, reused (matching is synchronous); `dead` as in paradigm.ts. */
const search = {
  view: null as unknown as MatchView,
  word: '',
  found: 0,
  vars: 0,
  from: new Int32Array(8),
  to: new Int32Array(8),
  /** The complete matches found, as Matches.spans. */
  spans: [] as number[],
  dead: new Int32Array(256),
  call: 0,
}

function step(s: typeof search, part: number, pos: number): void {
  const { view, word } = s
  const lemma = view.lemma
  const n = word.length
  if (s.found >= MAX_MATCHES) return
  const state = part * (n + 1) + pos
  if (s.dead[state] === s.call) return
  const before = s.found
  if (part === lemma.length) {
    if (pos === n) found(s)
  } else {
    const p = lemma[part]!
    if (typeof p === 'string') {
      if (word.startsWith(p, pos)) step(s, part + 1, pos + p.length)
    } else {
      const min = p === 0 && view.openPrefix ? 0 : 1
      const next = lemma[part + 1]
      if (typeof next === 'string') {
        // A variable followed by a literal can only end where that literal starts: its places, last first.
        let end = word.lastIndexOf(next, n)
        while (end >= pos + min) {
          if (!(end < n && isHighSurrogate(word.charCodeAt(end - 1)))) {
            s.from[p] = pos
            s.to[p] = end
            step(s, part + 1, end)
          }
          if (end === 0) break
          end = word.lastIndexOf(next, end - 1)
        }
      } else if (next === undefined) {
        // The last part: the variable takes the rest.
        if (n >= pos + min) {
          s.from[p] = pos
          s.to[p] = n
          step(s, part + 1, n)
        }
      } else {
        for (let end = n; end >= pos + min; end--) {
          if (end < n && isHighSurrogate(word.charCodeAt(end - 1))) continue
          s.from[p] = pos
          s.to[p] = end
          step(s, part + 1, end)
        }
      }
    }
  }
  if (s.found === before) s.dead[state] = s.call
}

/** A complete match: its spans recorded. */
function found(s: typeof search): void {
  for (let i = 0; i < s.vars; i++) s.spans.push(s.from[i]!, s.to[i]!)
  s.found++
}

/** viewFit of match k's stems (spans from `at`), by their bounds in `word` (no substring made). */
function spanFit(
  shapes: readonly ShapeView[],
  word: string,
  spans: readonly number[],
  at: number,
  vars: number,
): number {
  let fit = 0
  for (let i = 0; i < vars; i++) {
    const sh = shapes[i]
    if (!sh) continue
    const a = spans[2 * (at + i)]!
    const b = spans[2 * (at + i) + 1]!
    const len = b - a
    if (len >= 2 && seenAt(sh.seenByLength[len], word, a)) fit += 3
    if (len >= sh.minLength && len <= sh.maxLength) fit += 1
    if (len > 0 && sh.first.includes(word[a]!)) fit += 1
    if (len > 0 && sh.last.includes(word[b - 1]!)) fit += 1
  }
  return fit
}

/** Whether some seen content (of one length) is what `word` has from `at` (no substring made). */
function seenAt(seen: readonly string[] | undefined, word: string, at: number): boolean {
  if (seen) for (const x of seen) if (word.startsWith(x, at)) return true
  return false
}
