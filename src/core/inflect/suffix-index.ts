// Member suffixes per paradigm: how long a word-final string a lemma shares with the paradigm's members.

/**
 * The member lemmas of one paradigm, reversed and sorted, built once from the whole list and never changed.
 * The members sharing a word's last d letters are one run of that order, so following a word from its end
 * narrows a range by binary search on the next letter. Two typed arrays hold it all (the letters end to end
 * and where each member starts): about 2 bytes a letter, where a trie needs a node of 16 bytes per letter
 * of each member's distinct ending. A dictionary-sized model keeps one per paradigm and per cell rule.
 */
export class SuffixIndex {
  /** The reversed members' letters (code points, or UTF-16 units when all fit), in sorted order. */
  private readonly text: Uint16Array | Int32Array
  /** Member k is text[start[k]] … text[start[k + 1]] − 1. */
  private readonly start: Int32Array

  /**
   * Index the given member lemmas (lowercased by the caller; a word listed twice counts twice).
   * @example new SuffixIndex(['aasfliege', 'fliege']).longestShared('stubenfliege', false).length // 6
   */
  constructor(words: Iterable<string> = []) {
    const reversed = [...words].map((w) => codePoints(w).reverse())
    reversed.sort(compareCodes)
    let letters = 0
    let wide = false
    for (const r of reversed) {
      letters += r.length
      for (const c of r) if (c > 0xffff) wide = true
    }
    this.text = wide ? new Int32Array(letters) : new Uint16Array(letters)
    this.start = new Int32Array(reversed.length + 1)
    let at = 0
    reversed.forEach((r, k) => {
      this.start[k] = at
      this.text.set(r, at)
      at += r.length
    })
    this.start[reversed.length] = at
  }

  /**
   * The first member in [lo, hi) whose letter d is at least c (members there share letters 0 … d − 1); a
   * member's letter past its end counts as −1, so a member that ends sorts before its extensions. The inner
   * loop of every candidate search: it reads the arrays directly.
   */
  private lowerBound(lo: number, hi: number, d: number, c: number): number {
    const text = this.text
    const start = this.start
    while (lo < hi) {
      const m = (lo + hi) >> 1
      const at = start[m]! + d
      if ((at < start[m + 1]! ? text[at]! : -1) < c) lo = m + 1
      else hi = m
    }
    return lo
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
    return this.longestSharedCodes(
      codePoints(word),
      typeof exclude === 'string' ? codePoints(exclude) : exclude,
    )
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
    let lo = 0
    let hi = this.start.length - 1
    let length = 0
    let count = hi - (out ? 1 : 0)
    let wholeMember = false
    // The excluded member shares the path while its letters from the end are the word's.
    let onPath = out !== null
    for (let i = chars.length - 1; i >= 0; i--) {
      const d = chars.length - 1 - i
      const c = chars[i]!
      const a = this.lowerBound(lo, hi, d, c)
      const b = this.lowerBound(a, hi, d, c + 1)
      if (a === b) break
      onPath = onPath && d < out!.length && out![out!.length - 1 - d] === c
      const n = b - a - (onPath ? 1 : 0)
      if (n <= 0) break
      lo = a
      hi = b
      length++
      count = n
      // Members that end here sort first in their run.
      let ends = 0
      while (a + ends < b && this.start[a + ends + 1]! - this.start[a + ends]! === d + 1) ends++
      if (ends - (onPath && d === out!.length - 1 ? 1 : 0) > 0 && i > 0) wholeMember = true
    }
    return { length, count, wholeMember }
  }

  /** The word lastShared last looked up, and what it found. */
  private lastWord = ''
  private lastFound: { length: number; count: number; wholeMember: boolean } | null = null

  /**
   * As longestSharedCodes(chars, false), remembering the last word: rules of cells that split the tables
   * alike share an index, and a candidate search asks each cell about the same lemma in turn.
   * @example idx.lastShared('aasfliege', codePoints('aasfliege')).length // 6
   */
  lastShared(
    word: string,
    chars: readonly number[],
  ): { length: number; count: number; wholeMember: boolean } {
    if (word !== this.lastWord || !this.lastFound) {
      this.lastFound = this.longestSharedCodes(chars, false)
      this.lastWord = word
    }
    return this.lastFound
  }

  /**
   * Whether some member is a proper suffix of `word` (the word's last letters, not all of it) at least
   * `minUnits` UTF-16 units long.
   * @example new SuffixIndex(['bauer']).endsWithMember('gitarrenbauer', 3) // true
   */
  endsWithMember(word: string, minUnits: number): boolean {
    const chars = codePoints(word)
    let lo = 0
    let hi = this.start.length - 1
    let units = 0
    for (let i = chars.length - 1; i > 0; i--) {
      const d = chars.length - 1 - i
      const c = chars[i]!
      const a = this.lowerBound(lo, hi, d, c)
      const b = this.lowerBound(a, hi, d, c + 1)
      if (a === b) return false
      lo = a
      hi = b
      units += c > 0xffff ? 2 : 1
      // Members that end here sort first in their run.
      if (units >= minUnits && this.start[a + 1]! - this.start[a]! === d + 1) return true
    }
    return false
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
