// Member suffixes per paradigm: how long a word-final string a lemma shares with the paradigm's members.

/** A reversed-letter trie of the member lemmas of one paradigm, with member counts per node. */
export class SuffixIndex {
  /**
   * Edges of all nodes in one open-addressing table of (node, code point) → child, in typed arrays: a Map
   * keyed by node × code span needs keys past the small-integer range, and each lookup then allocates.
   */
  private edgeNode = new Int32Array(8).fill(-1)
  private edgeCode = new Int32Array(8)
  private edgeChild = new Int32Array(8)
  private edgeCount = 0
  private readonly counts: number[] = [0]
  private readonly ends: number[] = [0]

  /** Add a member lemma (lowercased by the caller). */
  add(word: string): void {
    let node = 0
    this.counts[0]!++
    const chars = [...word]
    for (let i = chars.length - 1; i >= 0; i--) {
      const code = chars[i]!.codePointAt(0)!
      let next = this.child(node, code)
      if (next < 0) {
        next = this.counts.length
        this.counts.push(0)
        this.ends.push(0)
        this.link(node, code, next)
      }
      node = next
      this.counts[node]!++
    }
    this.ends[node]!++
  }

  /** The child of `node` by `code`, or -1. */
  private child(node: number, code: number): number {
    const keys = this.edgeNode
    const mask = keys.length - 1
    for (let h = slotOf(node, code) & mask; keys[h] !== -1; h = (h + 1) & mask)
      if (keys[h] === node && this.edgeCode[h] === code) return this.edgeChild[h]!
    return -1
  }

  private link(node: number, code: number, next: number): void {
    if (2 * (this.edgeCount + 1) > this.edgeNode.length) this.grow()
    this.put(node, code, next)
    this.edgeCount++
  }

  private put(node: number, code: number, next: number): void {
    const keys = this.edgeNode
    const mask = keys.length - 1
    let h = slotOf(node, code) & mask
    while (keys[h] !== -1) h = (h + 1) & mask
    keys[h] = node
    this.edgeCode[h] = code
    this.edgeChild[h] = next
  }

  private grow(): void {
    const [nodes, codes, children] = [this.edgeNode, this.edgeCode, this.edgeChild]
    this.edgeNode = new Int32Array(nodes.length * 2).fill(-1)
    this.edgeCode = new Int32Array(nodes.length * 2)
    this.edgeChild = new Int32Array(nodes.length * 2)
    for (let h = 0; h < nodes.length; h++) if (nodes[h] !== -1) this.put(nodes[h]!, codes[h]!, children[h]!)
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

/**
 * The code points of a word, one per letter.
 * @example codePoints('aß') // [97, 223]
 */
export function codePoints(word: string): number[] {
  const out: number[] = []
  for (const c of word) out.push(c.codePointAt(0)!)
  return out
}

function slotOf(node: number, code: number): number {
  const h = Math.imul(node ^ Math.imul(code, 0x85ebca77), 0x9e3779b1)
  return h ^ (h >>> 15)
}
