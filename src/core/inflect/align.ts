// Pairwise alignment of a lemma with one form: which lemma letters survive, in as few contiguous runs as possible.

/** Score tables reused by every alignment (grown when a pair needs more). */
let scratch0 = new Float64Array(256)
let scratch1 = new Float64Array(256)

/**
 * Align lemma and form: maximize matched letters, then minimize the number of contiguous runs.
 * Returns, for each lemma position, the form position it maps to or -1.
 * Ties go to matches nearest the end of the words (inflection is mostly at the right edge).
 * @example alignLemmaForm('geben', 'gegeben') // [2, 3, 4, 5, 6]
 */
export function alignLemmaForm(lemma: string, form: string): number[] {
  const a = [...lemma]
  const b = [...form]
  const n = a.length
  const m = b.length
  const W = 1000
  const NEG = -1e9
  const w = m + 1
  // s0[i][j]: best score of a[0..i) vs b[0..j) ending without a match at (i-1, j-1); s1: ending with one.
  // Both are scratch buffers reused across calls; every cell read below is written first.
  const size = (n + 1) * w
  if (scratch0.length < size) {
    scratch0 = new Float64Array(size * 2)
    scratch1 = new Float64Array(size * 2)
  }
  const s0 = scratch0
  const s1 = scratch1
  for (let i = 0; i <= n; i++) {
    for (let j = 0; j <= m; j++) {
      const k = i * w + j
      if (i === 0 || j === 0) {
        s0[k] = 0
        s1[k] = NEG
        continue
      }
      s0[k] = Math.max(s0[k - w]!, s1[k - w]!, s0[k - 1]!, s1[k - 1]!)
      if (a[i - 1] === b[j - 1]) {
        const d = k - w - 1
        s1[k] = Math.max(s1[d]! + W, s0[d]! + W - 1)
      } else s1[k] = NEG
    }
  }
  const map = new Array<number>(n).fill(-1)
  let i = n
  let j = m
  let inMatch = s1[n * w + m]! >= s0[n * w + m]!
  while (i > 0 && j > 0) {
    const k = i * w + j
    if (inMatch) {
      map[i - 1] = j - 1
      const d = k - w - 1
      inMatch = s1[d]! + W >= s0[d]! + W - 1 && s1[d]! > NEG / 2
      i--
      j--
      continue
    }
    const cur = s0[k]!
    if (s1[k - w]! === cur) {
      i--
      inMatch = true
    } else if (s0[k - w]! === cur) i--
    else if (s1[k - 1]! === cur) {
      j--
      inMatch = true
    } else j--
  }
  return map
}
