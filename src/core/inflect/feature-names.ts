// Interned names of the shared ranking features: each name is made once and then reused, so finding the
// candidates of a lemma builds no strings for them and looking them up in a weights map rehashes nothing.

/** Names made once per key, for keys that are small integers (negative ones too). */
class ByNumber {
  private readonly names = new Map<number, string>()
  constructor(private readonly make: (n: number) => string) {}

  get(n: number): string {
    let s = this.names.get(n)
    if (s === undefined) {
      s = this.make(n)
      this.names.set(n, s)
    }
    return s
  }
}

const COUNT_BUCKETS = ['0', '1', '2', 'some', 'many'] as const
const sfx = new ByNumber((len) => `sfx:${len}`)
const twinSfx = new ByNumber((len) => `twin:sfx:${len}`)
// Key: length × buckets + bucket.
const sfxCount = new ByNumber(
  (k) => `sfxc:${Math.floor(k / COUNT_BUCKETS.length)}:${COUNT_BUCKETS[k % COUNT_BUCKETS.length]}`,
)
const size = new ByNumber((k) => `size:${k}`)
const fit = new ByNumber((d) => `fit:${d}`)
// Key: (gap + 4) × 9 + length (gap −4 … 4, length 0 … 8).
const rel = new ByNumber((k) => `rel:${Math.floor(k / 9) - 4}`)
const relLength = new ByNumber((k) => `rel:${Math.floor(k / 9) - 4}:${k % 9}`)

/**
 * The names of the shared analogy and stem-fit features (see CandidateFinder.find).
 * @example featureNames.sfxCount(3, 12) // 'sfxc:3:many'
 */
export const featureNames = {
  /** `sfx:<length>` */
  sfx: (len: number): string => sfx.get(len),
  /** `twin:sfx:<length>` */
  twinSfx: (len: number): string => twinSfx.get(len),
  /** `sfxc:<length>:<members bucket>`: the bucket of `count` is 0, 1, 2, some (3–9) or many (10+). */
  sfxCount: (len: number, count: number): string =>
    count >= 0 && Number.isInteger(count)
      ? sfxCount.get(len * COUNT_BUCKETS.length + (count >= 10 ? 4 : Math.min(count, 3)))
      : `sfxc:${len}:${count}`,
  /** `size:<log2 bucket>` */
  size: (bucket: number): string => size.get(bucket),
  /** `fit:<deficit>` */
  fit: (deficit: number): string => fit.get(deficit),
  /** `rel:<gap>` (gap −4 … 4) */
  rel: (gap: number): string => rel.get((gap + 4) * 9),
  /** `rel:<gap>:<length>` (gap −4 … 4, length 0 … 8) */
  relLength: (gap: number, len: number): string => relLength.get((gap + 4) * 9 + len),
}
