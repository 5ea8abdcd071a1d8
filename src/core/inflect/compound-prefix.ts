// Compounds: a lemma that ends in another known lemma of its UPOS (Gitarrenbauer, Bauer; verstoßen, stoßen)
// inflects by that head, and its first letters belong to the modifier, so its prefix features are left out,
// in training and in prediction alike. Otherwise one compound teaches its modifier's start to every lemma
// that shares it (Gitarrenbauer → Gitarre takes no plural ending).
import type { LexEntry } from '../lexicon/lexicon.ts'
import { SuffixIndex } from './suffix-index.ts'

/** The lemmas of a lexicon's tables per UPOS, and the prefix features they make a compound drop. */
export class ModifierFilter {
  /** Per UPOS, its tables' lemmas (lowercased) as a suffix index. */
  private readonly known = new Map<string, SuffixIndex>()

  /**
   * @param entries the training tables (entries without `cells` are ignored)
   * @param minHead the shortest head, in letters
   */
  constructor(
    entries: Iterable<Pick<LexEntry, 'lemma' | 'upos' | 'cells'>>,
    readonly minHead: number,
  ) {
    const lemmas = new Map<string, string[]>()
    for (const e of entries) {
      if (!e.cells) continue
      const list = lemmas.get(e.upos)
      if (list) list.push(e.lemma.toLowerCase())
      else lemmas.set(e.upos, [e.lemma.toLowerCase()])
    }
    for (const [upos, list] of lemmas) this.known.set(upos, new SuffixIndex(list))
  }

  /**
   * Whether a proper final part of the lemma, at least `minHead` letters, is a known lemma of the UPOS.
   * @example new ModifierFilter(entries, 3).hasHead('Gitarrenbauer', 'NOUN') // true when Bauer is known
   */
  hasHead(lemma: string, upos: string): boolean {
    return this.known.get(upos)?.endsWithMember(lemma.toLowerCase(), this.minHead) ?? false
  }

  /**
   * A lemma's shape features without the prefix ones (`p…`) when it has a known head.
   * @example filter.apply('Gitarrenbauer', 'NOUN', ['s1:r', 'p1:g']) // ['s1:r']
   */
  apply(lemma: string, upos: string, features: string[]): string[] {
    return this.hasHead(lemma, upos) ? features.filter((f) => !PREFIX.test(f)) : features
  }
}

/** A prefix feature's name (features.ts: `p3:bel`). */
const PREFIX = /^p\d+:/

const filters = new WeakMap<object, ModifierFilter>()

/** The filter of a lexicon's tables, made once per entries array. */
export function modifierFilterOf(entries: readonly LexEntry[], minHead: number): ModifierFilter {
  let f = filters.get(entries)
  if (!f || f.minHead !== minHead) {
    f = new ModifierFilter(entries, minHead)
    filters.set(entries, f)
  }
  return f
}
