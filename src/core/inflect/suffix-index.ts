// Member suffixes per paradigm: how long a word-final string a lemma shares with the paradigm's members.

/** A reversed-letter trie of the member lemmas of one paradigm, with member counts per node. */
export class SuffixIndex {
  private readonly nodes: Map<string, number>[] = [new Map()]
  private readonly counts: number[] = [0]
  private readonly ends: number[] = [0]

  /** Add a member lemma (lowercased by the caller). */
  add(word: string): void {
    let node = 0
    this.counts[0]!++
    const chars = [...word]
    for (let i = chars.length - 1; i >= 0; i--) {
      const c = chars[i]!
      let next = this.nodes[node]!.get(c)
      if (next === undefined) {
        next = this.nodes.length
        this.nodes.push(new Map())
        this.counts.push(0)
        this.ends.push(0)
        this.nodes[node]!.set(c, next)
      }
      node = next
      this.counts[node]!++
    }
    this.ends[node]!++
  }

  /**
   * The longest suffix of `word` shared with some member, its member count, and whether a whole member is
   * a suffix of `word` (a compound ending in a member word). `exclude` leaves one copy of `word` out.
   * @example idx.longestShared('aasfliege', false) // { length: 6, count: 2, wholeMember: true }
   */
  longestShared(word: string, exclude: boolean): { length: number; count: number; wholeMember: boolean } {
    const chars = [...word]
    let node = 0
    let length = 0
    let count = this.counts[0]! - (exclude ? 1 : 0)
    let wholeMember = false
    for (let i = chars.length - 1; i >= 0; i--) {
      const next = this.nodes[node]!.get(chars[i]!)
      if (next === undefined) break
      const c = this.counts[next]! - (exclude ? 1 : 0)
      if (c <= 0) break
      node = next
      length++
      count = c
      const endsHere = this.ends[node]! - (exclude && i === 0 ? 1 : 0)
      if (endsHere > 0 && i > 0) wholeMember = true
    }
    return { length, count, wholeMember }
  }
}
