// UD FEATS helpers: merge bundles, sort features case-insensitively, check a bundle's shape.

const FEATURE = /^[A-Z][A-Za-z0-9]*(\[[a-z0-9]+\])?=[A-Z0-9][A-Za-z0-9]*(,[A-Z0-9][A-Za-z0-9]*)*$/

/** Case-insensitive order of feature names, as CoNLL-U asks. */
function byName(a: string, b: string): number {
  const x = a.toLowerCase()
  const y = b.toLowerCase()
  return x < y ? -1 : x > y ? 1 : 0
}

/**
 * Merges FEATS bundles (`_` is empty) into one sorted bundle.
 * @example
 * canonicalFeats('Number=Sing|Case=Nom', 'Gender=Fem') // 'Case=Nom|Gender=Fem|Number=Sing'
 */
export function canonicalFeats(...bundles: string[]): string {
  const parts = bundles.flatMap((b) => (b === '_' || b === '' ? [] : b.split('|')))
  if (parts.length === 0) return '_'
  return [...new Set(parts)].sort(byName).join('|')
}

/**
 * Why a FEATS string is not canonical, or null when it is.
 * @example
 * featsProblem('Number=Sing|Case=Nom') // 'features not sorted or repeated'
 */
export function featsProblem(feats: string): string | null {
  if (feats === '_') return null
  const parts = feats.split('|')
  for (const p of parts) if (!FEATURE.test(p)) return `malformed feature "${p}"`
  const names = parts.map((p) => p.split('=')[0]!)
  for (let i = 1; i < names.length; i++) {
    if (byName(names[i - 1]!, names[i]!) >= 0) return 'features not sorted or repeated'
  }
  return null
}

/** True when the bundle has every feature of `wanted`. */
export function hasAll(feats: string, wanted: readonly string[]): boolean {
  const have = new Set(feats.split('|'))
  return wanted.every((w) => have.has(w))
}
