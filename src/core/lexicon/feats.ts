// FEATS bundles: parse, validate and canonicalize `Feature=Value|…` exactly as CoNLL-U writes them.
import type { Problem } from './problem.ts'
import { UNIVERSAL_FEATURES, UPOS_TAGS } from './ud.ts'

const NAME = /^[A-Z][A-Za-z0-9]*(\[[a-z0-9]+\])?$/
const VALUE = /^[A-Z0-9][A-Za-z0-9]*$/
const UPOS_SET: ReadonlySet<string> = new Set(UPOS_TAGS)

/** UD's order: case-insensitive, then by code point so the order is total. */
export function compareFeatureKeys(a: string, b: string): number {
  const la = a.toLowerCase()
  const lb = b.toLowerCase()
  if (la !== lb) return la < lb ? -1 : 1
  return a < b ? -1 : a > b ? 1 : 0
}

/** A parsed bundle: feature name → its values (sorted). Empty object for `_`. */
export type FeatMap = Record<string, string[]>

export type FeatsResult = { ok: true; feats: string; languageSpecific: string[] } | { ok: false; problem: Problem }

/**
 * Canonicalize a FEATS string: sort features and values, join several values with commas, `_` for none.
 * Universal features must carry universal values; other well-formed names are language-specific.
 * @example canonicalizeFeats('Number=Sing|Case=Nom') // {ok:true, feats:'Case=Nom|Number=Sing', languageSpecific:[]}
 */
export function canonicalizeFeats(raw: string): FeatsResult {
  const text = raw.trim()
  if (text === '' || text === '_') return { ok: true, feats: '_', languageSpecific: [] }
  const map: FeatMap = {}
  const languageSpecific: string[] = []
  for (const part of text.split('|')) {
    const eq = part.indexOf('=')
    if (eq <= 0) return bad(`malformed feature "${part}" in "${raw}" (expected Feature=Value)`)
    const name = part.slice(0, eq)
    const values = part.slice(eq + 1).split(',')
    if (!NAME.test(name)) return bad(`malformed feature name "${name}" in "${raw}"`)
    if (map[name]) return bad(`feature "${name}" appears twice in "${raw}"`)
    const base = name.replace(/\[.*\]$/, '')
    const known = UNIVERSAL_FEATURES[base]
    for (const value of values) {
      if (!VALUE.test(value)) return bad(`malformed value "${value}" of ${name} in "${raw}"`)
      if (known && !known.includes(value)) {
        return bad(`"${value}" is not a universal value of ${base} (expected one of ${known.join(', ')})`)
      }
    }
    if (!known) languageSpecific.push(`${name}=${values.join(',')}`)
    map[name] = [...new Set(values)].sort(compareFeatureKeys)
  }
  return { ok: true, feats: formatFeats(map), languageSpecific }
}

function bad(message: string): FeatsResult {
  return { ok: false, problem: { code: 'bad-feats', message } }
}

/** Parse a canonical bundle into a map (no validation). */
export function parseFeats(feats: string): FeatMap {
  const map: FeatMap = {}
  if (feats === '_' || feats === '') return map
  for (const part of feats.split('|')) {
    const eq = part.indexOf('=')
    map[part.slice(0, eq)] = part.slice(eq + 1).split(',')
  }
  return map
}

/** Write a map as a canonical bundle. */
export function formatFeats(map: FeatMap): string {
  const names = Object.keys(map).sort(compareFeatureKeys)
  if (names.length === 0) return '_'
  return names.map((n) => `${n}=${map[n]!.join(',')}`).join('|')
}

/** Union of two canonical bundles (the second wins on a shared feature). */
export function mergeFeats(a: string, b: string): string {
  if (a === '_') return b
  if (b === '_') return a
  return formatFeats({ ...parseFeats(a), ...parseFeats(b) })
}

/** Keep only the named features of a canonical bundle. */
export function pickFeats(feats: string, keep: ReadonlySet<string>): string {
  const map = parseFeats(feats)
  const out: FeatMap = {}
  for (const [k, val] of Object.entries(map)) if (keep.has(k)) out[k] = val
  return formatFeats(out)
}

/** Is this one of the 17 UPOS tags? */
export function isUpos(tag: string): boolean {
  return UPOS_SET.has(tag)
}
