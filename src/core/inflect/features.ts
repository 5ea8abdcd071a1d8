// Lemma-shape features for choosing a paradigm: suffixes, prefixes, length, case, inherent features.
// In the spirit of the discriminative paradigm classifier of Ahlberg, Forsberg & Hulden (2015), NAACL.

export interface FeatureOptions {
  maxSuffix: number
  maxPrefix: number
  /** Add one feature per distinct letter of the lemma. */
  letters: boolean
}

export const DEFAULT_FEATURE_OPTIONS: FeatureOptions = { maxSuffix: 7, maxPrefix: 4, letters: false }

/**
 * The shape features of a lemma (they are weighted per paradigm by the ranker).
 * @example lemmaFeatures('Aasfliege', 'Gender=Fem').includes('s3:ege') // true
 */
export function lemmaFeatures(lemma: string, inherent: string, opts = DEFAULT_FEATURE_OPTIONS): string[] {
  const w = [...lemma.toLowerCase()]
  const n = w.length
  const out = ['b', `len:${Math.min(n, 14)}`]
  if (lemma[0] && lemma[0] !== lemma[0].toLowerCase()) out.push('cap')
  for (let k = 1; k <= Math.min(n, opts.maxSuffix); k++) out.push(`s${k}:${w.slice(n - k).join('')}`)
  for (let k = 1; k <= Math.min(n - 3, opts.maxPrefix); k++) out.push(`p${k}:${w.slice(0, k).join('')}`)
  // Which letters the word has at all: long-distance agreement such as vowel harmony depends on them.
  if (opts.letters) for (const c of new Set(w)) out.push(`c:${c}`)
  if (inherent !== '_') {
    const s2 = w.slice(Math.max(0, n - 2)).join('')
    for (const f of inherent.split('|')) out.push(`i:${f}`, `i:${f}|s2:${s2}`)
  }
  return out
}
