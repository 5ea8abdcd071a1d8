// Twin paradigms: a paradigm with a learned letter swap applied to all its literals (a back-vowel class
// mirrored as its front-vowel class), offered as an extra candidate when the book lacks it. Never attested.
import { type Alternations, mirror, mirrorPattern } from './alternations.ts'
import { type Paradigm, paradigmShapeKey, type StemShape } from './paradigm.ts'

/**
 * The twins of a book (or of one cell's rules), in book order: one per paradigm whose literals the swap of
 * its UPOS changes, unless a paradigm of that shape exists already. A twin has no members; `twinOf` is the
 * index of its original. Twins never duplicate each other (a swap is its own inverse).
 * @example twinParadigms(book.paradigms, { NOUN: { a: 'ä', ä: 'a' } })[0].id // 'NOUN-3-twin'
 */
export function twinParadigms(paradigms: readonly Paradigm[], alt: Alternations): Paradigm[] {
  const shapes = new Set(paradigms.map((p) => paradigmShapeKey(p.upos, p.lemma, p.openPrefix, p.cells)))
  const out: Paradigm[] = []
  paradigms.forEach((p, i) => {
    const swap = alt[p.upos]
    if (!swap || p.twinOf !== undefined) return
    const lemma = mirrorPattern(p.lemma, swap)
    const cells = p.cells.map((c) => ({ key: c.key, forms: c.forms.map((f) => mirrorPattern(f, swap)) }))
    const key = paradigmShapeKey(p.upos, lemma, p.openPrefix, cells)
    if (shapes.has(key)) return
    shapes.add(key)
    const twin: Paradigm = {
      id: `${p.id}-twin`,
      upos: p.upos,
      lemma,
      openPrefix: p.openPrefix,
      cells,
      members: 0,
      examples: [],
      twinOf: i,
    }
    if (p.shapes) twin.shapes = p.shapes.map((s) => mirrorShape(s, swap))
    out.push(twin)
  })
  return out
}

/**
 * The analogy members of each twin: its original's member lemmas that the swap changes, mirrored.
 * @example twinMembers(twins, members, alt)[0] // ['tälö', ...]
 */
export function twinMembers(
  twins: readonly Paradigm[],
  members: readonly string[][],
  alt: Alternations,
): string[][] {
  return twins.map((t) => mirrored(members[t.twinOf!] ?? [], alt[t.upos]!))
}

/** The lemmas the swap changes, mirrored (lowercased). */
function mirrored(lemmas: readonly string[], swap: Readonly<Record<string, string>>): string[] {
  const out: string[] = []
  for (const m of lemmas) {
    const x = mirror(m.toLowerCase(), swap)
    if (x !== m.toLowerCase()) out.push(x)
  }
  return out
}

/**
 * A paradigm list with its twins appended, and the member lemmas of each (twins: their mirrored members).
 * Learning and reading a model file both build the book this way, so indices agree.
 * @example withTwins(paradigms, members, alt).paradigms.length >= paradigms.length // true
 */
export function withTwins(
  paradigms: readonly Paradigm[],
  members: readonly string[][],
  alt: Alternations,
): { paradigms: Paradigm[]; members: string[][] } {
  const twins = twinParadigms(paradigms, alt)
  return { paradigms: [...paradigms, ...twins], members: [...members, ...twinMembers(twins, members, alt)] }
}

/**
 * For each paradigm, the class whose local ranking weights it shares: a paradigm and its mirror image (its
 * twin, or a paradigm of the book that the swap turns it into) share the lower index, so lemma shape
 * chooses the pair and the lemma's letters (the side features) choose within it.
 * @example tiedClasses(paradigms, alt)[twinIndex] === paradigms[twinIndex].twinOf // true
 */
export function tiedClasses(paradigms: readonly Paradigm[], alt: Alternations): number[] {
  const at = new Map(paradigms.map((p, i) => [paradigmShapeKey(p.upos, p.lemma, p.openPrefix, p.cells), i]))
  return paradigms.map((p, i) => {
    const swap = alt[p.upos]
    if (!swap) return i
    const cells = p.cells.map((c) => ({ key: c.key, forms: c.forms.map((f) => mirrorPattern(f, swap)) }))
    const j = at.get(paradigmShapeKey(p.upos, mirrorPattern(p.lemma, swap), p.openPrefix, cells))
    return j === undefined ? i : Math.min(i, j)
  })
}

/**
 * The two sides of a swap as seen in a list of paradigms: swapped letters are on opposite sides, and letters
 * that one paradigm's literals use together are on the same side (a-o-u against ä-ö-y). Side 0 holds the
 * first letter in code-point order; a letter whose side the paradigms contradict is left out.
 * @example letterSides(paradigms, { a: 'ä', ä: 'a', o: 'ö', ö: 'o' }) // { a: 0, o: 0, ä: 1, ö: 1 }
 */
export function letterSides(
  paradigms: readonly Paradigm[],
  swap: Readonly<Record<string, string>>,
): Record<string, number> {
  // Union-find with parity: parent[x] and parity of x relative to its parent.
  const parent = new Map<string, string>()
  const parity = new Map<string, number>()
  const find = (x: string): [string, number] => {
    let p = 0
    let r = x
    while (parent.get(r) !== r) {
      p ^= parity.get(r)!
      r = parent.get(r)!
    }
    return [r, p]
  }
  const bad = new Set<string>()
  const join = (x: string, y: string, d: number) => {
    const [rx, px] = find(x)
    const [ry, py] = find(y)
    if (rx === ry) {
      if ((px ^ py) !== d) bad.add(rx)
      return
    }
    const [lo, hi] = rx < ry ? [rx, ry] : [ry, rx]
    parent.set(hi, lo)
    parity.set(hi, px ^ py ^ d)
    if (bad.has(hi)) bad.add(lo)
  }
  const letters = Object.keys(swap).sort()
  for (const c of letters) {
    parent.set(c, c)
    parity.set(c, 0)
  }
  for (const c of letters) if (c < swap[c]!) join(c, swap[c]!, 1)
  for (const p of paradigms) {
    const used = [...usedLetters(p, swap)].sort()
    for (let i = 1; i < used.length; i++) if (swap[used[0]!] !== used[i]) join(used[0]!, used[i]!, 0)
  }
  const out: Record<string, number> = {}
  for (const c of letters) {
    const [r, p] = find(c)
    if (bad.has(r)) continue
    // Side 0 is the side of the group's first letter.
    out[c] = p ^ find(r)[1]
  }
  return out
}

/** The side (0 or 1) a paradigm's literals take, or -1 when they use no swapped letter or both sides. */
export function paradigmSide(p: Paradigm, sides: Readonly<Record<string, number>>): number {
  let side = -1
  for (const c of usedLetters(p, sides)) {
    const s = sides[c]
    if (s === undefined) continue
    if (side >= 0 && s !== side) return -1
    side = s
  }
  return side
}

function usedLetters(p: Paradigm, letters: Readonly<Record<string, unknown>>): Set<string> {
  const used = new Set<string>()
  const add = (pt: readonly (string | number)[]) => {
    for (const x of pt)
      if (typeof x === 'string') for (const c of x) if (letters[c] !== undefined) used.add(c)
  }
  add(p.lemma)
  for (const c of p.cells) for (const f of c.forms) add(f)
  return used
}

function mirrorShape(s: StemShape, swap: Readonly<Record<string, string>>): StemShape {
  const letters = (x: string) => [...new Set(mirror(x, swap))].sort().join('')
  return {
    seen: s.seen.map((x) => mirror(x, swap)),
    first: letters(s.first),
    last: letters(s.last),
    minLength: s.minLength,
    maxLength: s.maxLength,
  }
}
