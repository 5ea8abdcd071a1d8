// A paradigm as candidate search reads it: its lemma pattern, stem shapes and sizes in one record of one
// shape (paradigms and cell rules are objects of several shapes), and the stems seen as a set.
import { matchAll, type Paradigm, type StemShape } from './paradigm.ts'
import type { Pattern } from './pattern.ts'

/** A stem shape with its seen contents as a set (same meaning as StemShape). */
interface ShapeView {
  seen: ReadonlySet<string>
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
  }
}

function shapeView(s: StemShape): ShapeView {
  return { seen: new Set(s.seen), first: s.first, last: s.last, minLength: s.minLength, maxLength: s.maxLength }
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
    if (s.length >= 2 && sh.seen.has(s)) fit += 3
    if (s.length >= sh.minLength && s.length <= sh.maxLength) fit += 1
    if (s && sh.first.includes(s[0]!)) fit += 1
    if (s && sh.last.includes(s[s.length - 1]!)) fit += 1
  }
  return fit
}

/**
 * The stem contents of a lemma under a paradigm (the best-fitting match), or null: matchStems on a view.
 * @example viewStems(matchView(p), 'Mantel') // ['Mant', 'l']
 */
export function viewStems(v: MatchView, lemma: string): string[] | null {
  const all = matchAll(v.lemma, v.openPrefix, lemma)
  if (all.length <= 1) return all[0] ?? null
  let best = all[0]!
  let bestFit = viewFit(best, v)
  for (let i = 1; i < all.length; i++) {
    const f = viewFit(all[i]!, v)
    if (f > bestFit) {
      best = all[i]!
      bestFit = f
    }
  }
  return best
}
