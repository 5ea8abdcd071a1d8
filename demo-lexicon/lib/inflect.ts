// Builds a lemma's table from its class and root by applying the class's endings and the sound rules.
import type { Harmony, WordClass } from '../grammar/types.ts'
import { canonicalFeats } from './feats.ts'
import { applyAssimilation, applyHarmony, gradate, gradationSite, harmonyOf, shorten } from './phonology.ts'

/** One row of a table: a cell (full, canonical FEATS) and its form. */
export interface Row {
  feats: string
  form: string
}

/** The harmony a root takes in a class: that of the root followed by its citation ending's fixed vowels. */
export function classHarmony(cls: WordClass, root: string): Harmony {
  const citation = cls.endings[0] ?? ''
  const fixed = citation.replace(/^.*-/, '').replace(/[AOT*]/g, '')
  return harmonyOf(root + fixed)
}

/**
 * One form: prefix + (short) stem + suffix, with harmony, assimilation and gradation applied.
 * @example
 * inflectCell(V1, 'lokka', 've-ttO') // 'velokatto'
 */
export function inflectCell(cls: WordClass, root: string, ending: string): string {
  const harmony = classHarmony(cls, root)
  const dash = ending.indexOf('-')
  const prefix = dash < 0 ? '' : applyHarmony(ending.slice(0, dash), harmony)
  let suffix = dash < 0 ? ending : ending.slice(dash + 1)
  let stem = root
  if (suffix.startsWith('*')) {
    stem = shorten(root)
    suffix = suffix.slice(1)
  }
  let body = stem + applyAssimilation(applyHarmony(suffix, harmony), stem)
  const site = cls.gradation ? gradationSite(stem) : null
  if (site) body = gradate(body, site)
  return prefix + body
}

/** The cell list of a part of speech, given its classes' data. */
export type CellList = readonly string[]

/**
 * The full table of a root in a class; `inherent` (e.g. `Gender=Fem`) is merged into every cell.
 * @example
 * inflectTable(N1, NOUN_CELLS, 'talv')[0] // { feats: 'Case=Nom|Gender=Fem|Number=Sing', form: 'talva' }
 */
export function inflectTable(cls: WordClass, cells: CellList, root: string): Row[] {
  if (cells.length !== cls.endings.length) {
    throw new Error(`class ${cls.id}: ${cls.endings.length} endings for ${cells.length} cells`)
  }
  const inherent = cls.gender ? `Gender=${cls.gender}` : '_'
  return cells.map((cell, i) => ({
    feats: canonicalFeats(cell, inherent),
    form: inflectCell(cls, root, cls.endings[i]!),
  }))
}
