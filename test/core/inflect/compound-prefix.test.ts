// Compound lemmas: prefix features left out when the lemma ends in a known lemma (its head).
import { describe, expect, it } from 'vitest'
import { ModifierFilter, modifierFilterOf } from '../../../src/core/inflect/compound-prefix.ts'
import { lemmaFeatures } from '../../../src/core/inflect/features.ts'

// German compounds inflect by their last part, the head (Grundwort; a handbook rule, e.g. Duden Grammatik,
// from memory): Gitarrenbauer as Bauer, verstoßen as stoßen.
const tables = [
  { lemma: 'Bauer', upos: 'NOUN', cells: [] },
  { lemma: 'stoßen', upos: 'VERB', cells: [] },
  { lemma: 'Tag', upos: 'NOUN', cells: null },
]

describe('ModifierFilter', () => {
  const f = new ModifierFilter(tables, 3)

  it('finds a known head of the same UPOS, of at least minHead letters, never the lemma itself', () => {
    expect(f.hasHead('Gitarrenbauer', 'NOUN')).toBe(true)
    expect(f.hasHead('verstoßen', 'VERB')).toBe(true)
    expect(f.hasHead('verstoßen', 'NOUN')).toBe(false)
    expect(f.hasHead('Bauer', 'NOUN')).toBe(false)
    // An entry without a table is no head.
    expect(f.hasHead('Sonntag', 'NOUN')).toBe(false)
  })

  it('drops only the prefix features of a compound', () => {
    const all = lemmaFeatures('Gitarrenbauer', '_')
    const kept = f.apply('Gitarrenbauer', 'NOUN', all)
    expect(kept).toEqual(all.filter((x) => !/^p\d+:/.test(x)))
    expect(kept).toContain('s5:bauer')
    expect(all.some((x) => x.startsWith('p4:'))).toBe(true)
    expect(f.apply('Gitarre', 'NOUN', lemmaFeatures('Gitarre', '_'))).toEqual(lemmaFeatures('Gitarre', '_'))
  })

  it('is made once per entries array and head length', () => {
    const entries = tables.map((t) => ({ ...t, inherent: '_' })) as Parameters<typeof modifierFilterOf>[0]
    expect(modifierFilterOf(entries, 3)).toBe(modifierFilterOf(entries, 3))
    expect(modifierFilterOf(entries, 4).minHead).toBe(4)
  })
})
