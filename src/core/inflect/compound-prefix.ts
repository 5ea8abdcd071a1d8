// Compounds: a lemma that ends in another known lemma of its UPOS (Gitarrenbauer, Bauer; verstoßen, stoßen)
// inflects by that head, and its first letters belong to the modifier, so its prefix features are left out,
// in training and in prediction alike. Otherwise one compound teaches its modifier's start to every lemma
// that shares it (Gitarrenbauer → Gitarre takes no plural ending).
import type { LexEntry } from '../lexicon/lexicon.ts'

/** The lemmas of a lexicon's tables per UPOS, and the prefix features they make a compound drop. */
export class ModifierFilter {
  private readonly known = new Set<string>()

  /**
   * @param entries the training tables (entries without `cells` are ignored)
   * @param minHead the shortest head, in letters
   */
  constructor(
    entries: Iterable<Pick<LexEntry, 'lemma' | 'upos' | 'cells'>>,
    readonly minHead: number,
  ) {
    for (const e of entries) if (e.cells) this.known.add(`${e.upos}\u0000${e.lemma.toLowerCase()}`)
  }

  /**
   * Whether a proper final part of the lemma, at least `minHead` letters, is a known lemma of the UPOS.
   * @example new ModifierFilter(entries, 3).hasHead('Gitarrenbauer', 'NOUN') // true when Bauer is known
   */
  hasHead(lemma: string, upos: string): boolean {
    const w = lemma.toLowerCase()
    for (let k = 1; k <= w.length - this.minHead; k++)
      if (this.known.has(`${upos}\u0000${w.slice(k)}`)) return true
    return false
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
