// Candidate paradigms for a lemma: those whose lemma pattern fits it, with the shared ranking features.
import { type Alternations, mirror, type TwinOptions } from './alternations.ts'
import { featureNames as names } from './feature-names.ts'
import { harmonyClass, harmonyLetters, literalLetters } from './harmony.ts'
import { fitOfMatch, type MatchView, matchView, viewStems } from './match-view.ts'
import type { Paradigm } from './paradigm.ts'
import { codePoints, SuffixIndex } from './suffix-index.ts'
import { letterSides, paradigmSide, tiedClasses } from './twins.ts'

/** One applicable paradigm for a lemma. */
export interface Candidate {
  paradigm: number
  stems: string[]
  shared: string[]
  /** Length of the longest word-final string shared with a member. */
  sfx: number
}

/**
 * The suffix index of one member list, built once per list: rule rankers of cells that split the tables
 * alike are given the same lists (see decodeAllCellRules), and an index is never changed once built.
 */
const suffixIndexes = new WeakMap<readonly string[], SuffixIndex>()
function suffixIndexOf(members: readonly string[]): SuffixIndex {
  let idx = suffixIndexes.get(members)
  if (!idx) {
    idx = new SuffixIndex(members.map((m) => m.toLowerCase()))
    suffixIndexes.set(members, idx)
  }
  return idx
}

/** No member left out (a lemma that is not a training table): one map, only read. */
const NONE_LEFT_OUT: ReadonlyMap<number, string> = new Map()

/** Paradigms of one book, indexed for fast candidate search and analogy features. */
export class CandidateFinder {
  private readonly byUpos = new Map<string, number[]>()
  /** Per UPOS, paradigms by the literal their lemma pattern ends with ('' when it ends with a stem). */
  private readonly byEnding = new Map<string, Map<string, number[]>>()
  /** Per UPOS, the distinct lengths of those literals, ascending. */
  private readonly endingLengths = new Map<string, number[]>()
  private readonly suffixes: SuffixIndex[]
  /** Per paradigm: what its cells put before the stem, as one signature shared by paradigms alike there. */
  private readonly leftEdits: string[]
  /** Per paradigm: its signature's number; per signature: its feature name, and its names with a lemma start. */
  private readonly leftId: number[]
  private readonly leftNames: string[] = []
  private readonly leftStarts: Map<string, string>[] = []
  /** Per paradigm: the side of the learned swap its literals take (-1: none), and each letter's side. */
  private readonly sides: number[]
  private readonly letterSide: Map<string, Record<string, number>>
  private readonly analogyMembers: number[]
  /** Per paradigm: what matching a lemma reads of it, in records of one shape. */
  private readonly views: MatchView[]
  /** Per paradigm: whether its mirror image is a paradigm too (a twin, or in the book). */
  private readonly paired: boolean[]
  /** Per UPOS with a swap: the side of each letter that marks a lemma's harmony class (harmony.ts). */
  private readonly harmony: Map<string, Record<string, number>>
  /** Per paradigm with a twin: the twin, and per twin: its original. */
  private readonly partner: (number | undefined)[]

  constructor(
    readonly paradigms: readonly Paradigm[],
    memberLemmas: readonly string[][],
    private readonly alternations: Alternations = {},
    private readonly twinOptions?: TwinOptions,
  ) {
    paradigms.forEach((p, i) => {
      const list = this.byUpos.get(p.upos) ?? []
      list.push(i)
      this.byUpos.set(p.upos, list)
      const last = p.lemma[p.lemma.length - 1]
      const ending = typeof last === 'string' ? last : ''
      const groups = this.byEnding.get(p.upos) ?? new Map<string, number[]>()
      groups.set(ending, [...(groups.get(ending) ?? []), i])
      this.byEnding.set(p.upos, groups)
    })
    for (const [upos, groups] of this.byEnding)
      this.endingLengths.set(
        upos,
        [...new Set([...groups.keys()].map((e) => e.length))].sort((a, b) => a - b),
      )
    this.leftEdits = paradigms.map(leftEdits)
    const leftIds = new Map<string, number>()
    this.leftId = this.leftEdits.map((left) => {
      let id = leftIds.get(left)
      if (id === undefined) {
        id = leftIds.size
        leftIds.set(left, id)
        this.leftNames.push(`L:${left}`)
        this.leftStarts.push(new Map())
      }
      return id
    })
    this.letterSide = new Map(
      Object.entries(alternations).map(([u, swap]) => [
        u,
        letterSides(
          paradigms.filter((p) => p.upos === u),
          swap,
        ),
      ]),
    )
    this.sides = paradigms.map((p) => {
      const ls = this.letterSide.get(p.upos)
      return ls ? paradigmSide(p, ls) : -1
    })
    const tied = tiedClasses(paradigms, alternations)
    this.paired = paradigms.map((p, i) => p.twinOf !== undefined || tied[i] !== i)
    paradigms.forEach((p, i) => {
      if (p.twinOf !== undefined) this.paired[p.twinOf] = true
      if (tied[i] !== i) this.paired[tied[i]!] = true
    })
    // Harmony letters from the members of learned paradigms (a twin's mirrored members would mix sides).
    this.harmony = new Map(
      [...this.letterSide].map(([u, ls]) => [
        u,
        harmonyLetters(
          ls,
          paradigms.map((p, i) => (p.upos === u && p.twinOf === undefined ? this.sides[i]! : -1)),
          memberLemmas.map((ms) => ms.map((m) => m.toLowerCase())),
          literalLetters(paradigms.filter((p) => p.upos === u)),
        ),
      ]),
    )
    this.partner = paradigms.map((p) => p.twinOf)
    paradigms.forEach((p, i) => {
      if (p.twinOf !== undefined) this.partner[p.twinOf] = i
    })
    this.analogyMembers = paradigms.map((_, i) => memberLemmas[i]?.length ?? 0)
    this.views = paradigms.map(matchView)
    this.suffixes = paradigms.map((_, i) => suffixIndexOf(memberLemmas[i] ?? []))
  }

  /**
   * Whether a lemma's harmony letters (harmony.ts) are all on one side: a mirrored training copy that is not
   * (a swap that changes a-ä but leaves u) would teach the harmony features the opposite of the rule.
   * @example finder.oneSide('käivättu', 'NOUN') // false when u is a back letter
   */
  oneSide(lemma: string, upos: string): boolean {
    const letters = this.harmony.get(upos)
    if (!letters) return true
    let seen = -1
    for (const c of lemma.toLowerCase()) {
      const s = letters[c]
      if (s === undefined) continue
      if (seen >= 0 && s !== seen) return false
      seen = s
    }
    return true
  }

  /** UPOS tags that have paradigms. */
  uposTags(): string[] {
    return [...this.byUpos.keys()]
  }

  /**
   * The paradigms that apply to a lemma. `memberOf` names the paradigm the lemma itself belongs to when it is
   * a training table, so its own letters are left out of the analogy features (leave-one-out), and its mirror
   * image out of that paradigm's twin (or of the original, for a twin).
   * @example finder.find('Mantel', 'NOUN').map((c) => c.paradigm) // [0, 3, 8]
   */
  find(lemma: string, upos: string, memberOf = -1): Candidate[] {
    const out: Candidate[] = []
    const lower = lemma.toLowerCase()
    const skip = this.leftOut(lower, upos, memberOf)
    const letters = this.harmony.get(upos)
    const cls = letters ? harmonyClass(lower, letters) : -1
    const codes = codePoints(lower)
    const starts: string[] = []
    for (let k = 1; k <= Math.min(4, lower.length - 3); k++) starts.push(lower.slice(0, k))
    const startNames: (string[] | undefined)[] = []
    for (const i of this.applicable(lemma, upos)) {
      const v = this.views[i]!
      if (!lemma.startsWith(v.first)) continue
      const stems = viewStems(v, lemma)
      if (!stems) continue
      const fit = fitOfMatch(stems, v)
      const excluded = skip.get(i)
      const leave = excluded === undefined ? false : excluded === lower ? true : codePoints(excluded)
      const sfx =
        leave === false
          ? this.suffixes[i]!.lastShared(lemma, codes)
          : this.suffixes[i]!.longestSharedCodes(codes, leave)
      const shared = this.sharedFeatures(v, i, sfx, stems, fit, excluded !== undefined)
      this.sideFeatures(i, lower, cls, shared)
      // Word-initial choices (a participle prefix or not) pooled across paradigms, tied to the lemma's start.
      const left = this.leftId[i]!
      shared.push(this.leftNames[left]!)
      let lefts = startNames[left]
      if (!lefts) {
        lefts = this.startNames(left, starts)
        startNames[left] = lefts
      }
      for (const name of lefts) shared.push(name)
      out.push({ paradigm: i, stems, shared, sfx: sfx.length })
    }
    // Relative analogy: how this paradigm's longest shared suffix compares with the best candidate's.
    let best = 0
    let second = 0
    for (const c of out) {
      if (c.sfx > best) [best, second] = [c.sfx, best]
      else if (c.sfx > second) second = c.sfx
    }
    for (const c of out) {
      const gap = Math.max(-4, Math.min(4, c.sfx - (c.sfx === best ? second : best)))
      c.shared.push(names.rel(gap), names.relLength(gap, Math.min(c.sfx, 8)))
    }
    return out
  }

  /** The names `L:<left edits>|<start>` of a left-edit signature with each of a lemma's starts (made once). */
  private startNames(left: number, starts: readonly string[]): string[] {
    const known = this.leftStarts[left]!
    return starts.map((start) => {
      let name = known.get(start)
      if (name === undefined) {
        name = `${this.leftNames[left]}|${start}`
        known.set(start, name)
      }
      return name
    })
  }

  /**
   * The member to leave out of each paradigm's analogy index for a training lemma: the lemma itself in its
   * own paradigms, and its mirror image in their mirror partners (a twin's members are its original's,
   * mirrored), so no candidate draws on the example itself.
   */
  private leftOut(lower: string, upos: string, own: number): ReadonlyMap<number, string> {
    if (own < 0) return NONE_LEFT_OUT
    const out = new Map<number, string>()
    out.set(own, lower)
    const partner = this.partner[own]
    const swap = this.alternations[upos]
    if (partner === undefined || !swap) return out
    const image = mirror(lower, swap)
    if (image !== lower) out.set(partner, image)
    return out
  }

  /** Paradigms of `upos` whose lemma pattern's final literal ends the lemma, in book order. */
  private applicable(lemma: string, upos: string): number[] {
    const groups = this.byEnding.get(upos)
    if (!groups) return []
    const out: number[] = []
    // Only the lengths some ending has, shortest first (as every length would be tried).
    for (const k of this.endingLengths.get(upos)!) {
      if (k > lemma.length) break
      const g = groups.get(k === 0 ? '' : lemma.slice(lemma.length - k))
      if (g) out.push(...g)
    }
    return groups.size === 1 ? out : out.sort((a, b) => a - b)
  }

  private sharedFeatures(
    p: MatchView,
    index: number,
    { length, count, wholeMember }: { length: number; count: number; wholeMember: boolean },
    stems: string[],
    fit: number,
    self: boolean,
  ): string[] {
    const len = Math.min(length, 8)
    // A twin's size is its original's (its mirrored members).
    const members = (p.twinOf < 0 ? p.members : this.analogyMembers[index]!) - (self ? 1 : 0)
    const vars = stems.length - (p.openPrefix ? 1 : 0)
    const deficit = Math.min(6, 6 * vars - fit)
    const f = [
      names.sfx(len),
      names.sfxCount(len, count),
      names.size(Math.floor(Math.log2(members + 1))),
      names.fit(deficit),
    ]
    if (wholeMember) f.push('whole')
    if (p.openPrefix) f.push(stems[0] ? 'open:used' : 'open:empty')
    if (members <= 0) f.push('orphan')
    if (p.twinOf >= 0) f.push('twin', names.twinSfx(len))
    return f
  }

  /** Whether the lemma has letters of the paradigm's side of a learned swap, and of the other side. */
  private sideFeatures(i: number, lower: string, cls: number, out: string[]): void {
    const side = this.sides[i]!
    if (side < 0) return
    const p = this.paradigms[i]!
    const twin = p.twinOf !== undefined
    const paired = this.paired[i]!
    if (this.twinOptions?.harmony) {
      // The lemma's class against the paradigm's side, shared and per paradigm (neutral words: learned).
      out.push(`hv:${side}:${cls}`, `hv:${cls}|${i}`)
    }
    if (!(paired || this.twinOptions?.sides)) return
    const letters = this.letterSide.get(p.upos)!
    let hasOwn = 0
    let hasOther = 0
    for (const c of lower) {
      const s = letters[c]
      if (s === side) hasOwn = 1
      else if (s !== undefined) hasOther = 1
    }
    const tag = `${hasOwn}${hasOther}`
    // Within a mirror pair the lemma's letters choose the side; elsewhere they are weaker evidence.
    const kind = paired ? 'pair' : 'solo'
    out.push(`${kind}:hs:${tag}`, `${kind}:hs:${side}:${tag}`)
    if (twin) out.push(`twin:hs:${tag}`)
  }
}

/** The literals a paradigm's forms have before their first stem letter, where they differ from the lemma's. */
function leftEdits(p: Paradigm): string {
  const first = p.openPrefix ? 1 : 0
  const lead = (pt: readonly (string | number)[]) => {
    const part = pt[first]
    return typeof part === 'string' ? part : ''
  }
  const lemmaLead = lead(p.lemma)
  const out: string[] = []
  p.cells.forEach((c, i) => {
    const f = c.forms[0]
    if (f && lead(f) !== lemmaLead) out.push(`${i}=${lead(f)}`)
  })
  return out.join(',')
}
