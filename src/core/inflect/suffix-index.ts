// Member suffixes per paradigm: how long a word-final string a lemma shares with the paradigm's members.

/** Edges of all nodes in one map, keyed by node × CODE_SPAN + code point (a map per node costs far more). */
const CODE_SPAN = 0x110000

/** A reversed-letter trie of the member lemmas of one paradigm, with member counts per node. */
export class SuffixIndex {
  private readonly edges = new Map<number, number>()
  private readonly counts: number[] = [0]
  private readonly ends: number[] = [0]

  /** Add a member lemma (lowercased by the caller). */
  add(word: string): void {
    let node = 0
    this.counts[0]!++
    const chars = [...word]
    for (let i = chars.length - 1; i >= 0; i--) {
      const key = node * CODE_SPAN + chars[i]!.codePointAt(0)!
      let next = this.edges.get(key)
      if (next === undefined) {
        next = this.counts.length
        this.counts.push(0)
        this.ends.push(0)
        this.edges.set(key, next)
      }
      node = next
      this.counts[node]!++
    }
    this.ends[node]!++
  }

  /**
   * The longest suffix of `word` shared with some member, its member count, and whether a whole member is
   * a suffix of `word` (a compound ending in a member word). `exclude` leaves one member out: `word` itself
   * (true), or another member (a string), counted only where its letters follow the same path.
   * @example idx.longestShared('aasfliege', false) // { length: 6, count: 2, wholeMember: true }
   */
  longestShared(
    word: string,
    exclude: boolean | string,
  ): { length: number; count: number; wholeMember: boolean } {
    return this.longestSharedCodes(codePoints(word), typeof exclude === 'string' ? codePoints(exclude) : exclude)
  }

  /**
   * As longestShared, given the word's code points (made once for many indexes); `exclude` true, false, or
   * the code points of the other member left out.
   * @example idx.longestSharedCodes(codePoints('aasfliege'), false).length // 6
   */
  longestSharedCodes(
    chars: readonly number[],
    exclude: boolean | readonly number[],
  ): { length: number; count: number; wholeMember: boolean } {
    const out = exclude === true ? chars : exclude === false ? null : exclude
    let node = 0
    let length = 0
    let count = this.counts[0]! - (out ? 1 : 0)
    let wholeMember = false
    // The excluded member shares the path while its letters from the end are the word's.
    let onPath = out !== null
    for (let i = chars.length - 1; i >= 0; i--) {
      const next = this.edges.get(node * CODE_SPAN + chars[i]!)
      if (next === undefined) break
      const d = chars.length - 1 - i
      onPath = onPath && d < out!.length && out![out!.length - 1 - d] === chars[i]
      const c = this.counts[next]! - (onPath ? 1 : 0)
      if (c <= 0) break
      node = next
      length++
      count = c
      const endsHere = this.ends[node]! - (onPath && d === out!.length - 1 ? 1 : 0)
      if (endsHere > 0 && i > 0) wholeMember = true
    }
    return { length, count, wholeMember }
  }
}

/**
 * The code points of a word, one per letter.
 * @example codePoints('aß') // [97, 223]
 */
export function codePoints(word: string): number[] {
  const out: number[] = []
  for (const c of word) out.push(c.codePointAt(0)!)
  return out
}
