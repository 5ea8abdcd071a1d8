// Member suffixes per paradigm: how long a word-final string a lemma shares with the paradigm's members.

/**
 * A reversed-letter trie of the member lemmas of one paradigm, with member counts per node, built once from
 * the whole list and never changed. Nodes are numbered breadth-first, so a node's children are consecutive
 * numbers, sorted by letter: four typed arrays hold the whole trie (16 bytes a node), where a map of edges
 * would hold a boxed number and an entry per edge. A dictionary-sized model keeps one per paradigm and per
 * cell rule, so this is most of what its candidate finders weigh.
 */
export class SuffixIndex {
  /** Children of node n are nodes first[n] … first[n + 1] − 1. */
  private readonly first: Int32Array
  /** The letter (code point) on the edge into each node; the root's is −1. */
  private readonly letter: Int32Array
  /** Members whose reversed letters pass through each node. */
  private readonly counts: Int32Array
  /** Members that end at each node. */
  private readonly ends: Int32Array

  /**
   * Index the given member lemmas (lowercased by the caller; a word listed twice counts twice).
   * @example new SuffixIndex(['aasfliege', 'fliege']).longestShared('stubenfliege', false).length // 6
   */
  constructor(words: Iterable<string> = []) {
    const reversed = [...words].map((w) => codePoints(w).reverse())
    reversed.sort(compareCodes)
    // Breadth-first over ranges of the sorted words: a node is the range sharing its first `depth` letters.
    const lo: number[] = [0]
    const hi: number[] = [reversed.length]
    const depth: number[] = [0]
    const letter: number[] = [-1]
    const first: number[] = []
    const ends: number[] = []
    for (let n = 0; n < lo.length; n++) {
      const d = depth[n]!
      let i = lo[n]!
      const end = hi[n]!
      // Words that end here sort first in their range (a prefix sorts before its extensions).
      while (i < end && reversed[i]!.length === d) i++
      ends.push(i - lo[n]!)
      first.push(lo.length)
      while (i < end) {
        const c = reversed[i]![d]!
        let j = i + 1
        while (j < end && reversed[j]![d] === c) j++
        lo.push(i)
        hi.push(j)
        depth.push(d + 1)
        letter.push(c)
        i = j
      }
    }
    first.push(lo.length)
    this.first = Int32Array.from(first)
    this.letter = Int32Array.from(letter)
    this.counts = Int32Array.from(lo, (l, n) => hi[n]! - l)
    this.ends = Int32Array.from(ends)
  }

  /** The child of `node` along letter `c`, or −1 (binary search among its sorted children). */
  private child(node: number, c: number): number {
    let a = this.first[node]!
    let b = this.first[node + 1]! - 1
    while (a <= b) {
      const m = (a + b) >> 1
      const x = this.letter[m]!
      if (x === c) return m
      if (x < c) a = m + 1
      else b = m - 1
    }
    return -1
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
      const next = this.child(node, chars[i]!)
      if (next < 0) break
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

/** Code-point sequences in lexicographic order (a prefix first). */
function compareCodes(a: readonly number[], b: readonly number[]): number {
  const n = Math.min(a.length, b.length)
  for (let i = 0; i < n; i++) if (a[i] !== b[i]) return a[i]! - b[i]!
  return a.length - b.length
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
