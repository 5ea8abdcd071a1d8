// Assembles the Sulvašti lexicon: lemmas with tables, bare lemmas (gold tables kept aside), place names.
import { ADJ_CELLS, ADJ_CLASSES } from '../grammar/adjectives.ts'
import { FUNCTION_WORDS, PRONOUNS } from '../grammar/closed-class.ts'
import { EXCEPTIONAL_TABLES } from '../grammar/exceptions.ts'
import { CORE_LEMMAS, PLACE_NAMES, VARIANT_FORMS } from '../grammar/lexemes.ts'
import { NOUN_CELLS, NOUN_CLASSES } from '../grammar/nouns.ts'
import type { ClosedTable, ExceptionalTable, WordClass } from '../grammar/types.ts'
import { VERB_CELLS, VERB_CLASSES } from '../grammar/verbs.ts'
import { canonicalFeats, hasAll } from './feats.ts'
import { inflectTable, type Row } from './inflect.ts'
import type { Rng } from './prng.ts'
import { fitsShape, makeRoot, stratumKey } from './roots.ts'

/** A lemma with its table (attested, or the gold table of a bare lemma). */
export interface Entry {
  lemma: string
  upos: string
  /** Inherent features, `_` for none. */
  inherent: string
  rows: Row[]
  origin: 'core' | 'generated' | 'irregular' | 'defective' | 'closed' | 'place'
  classId?: string
  root?: string
  gloss?: string
  governs?: string
}

/** Everything the files are written from. */
export interface Lexicon {
  tables: Entry[]
  bare: Entry[]
  places: Entry[]
}

/** Every regular class. */
export const ALL_CLASSES: readonly WordClass[] = [...NOUN_CLASSES, ...VERB_CLASSES, ...ADJ_CLASSES]

/** The cell list of a class's part of speech. */
export function cellsOf(cls: WordClass): readonly string[] {
  return cls.upos === 'NOUN' ? NOUN_CELLS : cls.upos === 'VERB' ? VERB_CELLS : ADJ_CELLS
}

function classById(id: string): WordClass {
  const cls = ALL_CLASSES.find((c) => c.id === id)
  if (!cls) throw new Error(`unknown class ${id}`)
  return cls
}

function regular(cls: WordClass, root: string, origin: Entry['origin'], gloss?: string): Entry {
  if (!fitsShape(root, cls.root)) throw new Error(`root "${root}" does not fit class ${cls.id}`)
  const rows = inflectTable(cls, cellsOf(cls), root)
  const inherent = cls.gender ? `Gender=${cls.gender}` : '_'
  const entry: Entry = { lemma: rows[0]!.form, upos: cls.upos, inherent, rows, origin, classId: cls.id, root }
  if (gloss) entry.gloss = gloss
  return entry
}

function exceptional(t: ExceptionalTable): Entry {
  let rows: Row[]
  if (t.forms) rows = t.forms.map(([cell, form]) => ({ feats: canonicalFeats(cell, t.inherent), form }))
  else {
    const cls = classById(t.classId!)
    rows = regular(cls, t.root!, t.kind).rows.map((r) => {
      const cell = Object.keys(t.overrides ?? {}).find((c) => canonicalFeats(c, t.inherent) === r.feats)
      return cell ? { feats: r.feats, form: t.overrides![cell]! } : r
    })
    rows = rows.filter((r) => !(t.drop ?? []).some((d) => hasAll(r.feats, d)))
  }
  if (rows[0]?.form !== t.lemma) throw new Error(`exceptional table ${t.lemma} starts with ${rows[0]?.form}`)
  return {
    lemma: t.lemma,
    upos: t.upos,
    inherent: t.inherent,
    rows,
    origin: t.kind,
    gloss: t.gloss,
    ...(t.classId ? { classId: t.classId } : {}),
  }
}

function closed(t: ClosedTable): Entry {
  const rows = t.forms.map(([cell, form]) => ({ feats: canonicalFeats(cell, t.inherent), form }))
  return {
    lemma: t.lemma,
    upos: t.upos,
    inherent: t.inherent,
    rows,
    origin: 'closed',
    gloss: t.gloss,
    ...(t.governs ? { governs: t.governs } : {}),
  }
}

/** Draws roots of a class until one is new and (optionally) shows the wanted stratum. */
function draw(rng: Rng, cls: WordClass, used: Set<string>, want?: (key: string) => boolean): Entry | null {
  for (let tries = 0; tries < 20000; tries++) {
    const root = makeRoot(rng, cls.root)
    if (want && !want(stratumKey(cls, root))) continue
    const entry = regular(cls, root, 'generated')
    if (used.has(entry.lemma)) continue
    used.add(entry.lemma)
    return entry
  }
  return null
}

/**
 * Builds the lexicon. Table lemmas of each class show every stratum (harmony, alternating cluster…)
 * that the class's roots can show; bare lemmas show only strata the tables show, so all are learnable.
 * @example
 * const lex = buildLexicon(makeRng(20240611))
 * lex.tables.length // about 320
 */
export function buildLexicon(rng: Rng): Lexicon {
  const tables: Entry[] = [
    ...EXCEPTIONAL_TABLES.map(exceptional),
    ...PRONOUNS.map(closed),
    ...FUNCTION_WORDS.map(closed),
  ]
  const used = new Set(tables.map((e) => e.lemma))
  const places = PLACE_NAMES.map((p) => ({
    ...regular(classById(p.classId), p.root, 'place'),
    upos: 'PROPN',
  }))
  for (const p of places) used.add(p.lemma.toLowerCase())
  for (const c of CORE_LEMMAS) {
    const entry = regular(classById(c.classId), c.root, 'core', c.gloss)
    if (used.has(entry.lemma)) throw new Error(`core lemma ${entry.lemma} twice`)
    used.add(entry.lemma)
    for (const v of VARIANT_FORMS.filter((x) => x.lemma === entry.lemma)) {
      const feats = canonicalFeats(v.feats, entry.inherent)
      const at = entry.rows.findIndex((r) => r.feats === feats)
      if (at < 0) throw new Error(`variant for missing cell ${entry.lemma} ${feats}`)
      entry.rows.splice(at + 1, 0, { feats, form: v.form })
    }
    tables.push(entry)
  }
  const bare: Entry[] = []
  for (const cls of ALL_CLASSES) {
    const own = tables.filter((e) => e.origin === 'core' && e.classId === cls.id)
    const covered = new Set(own.map((e) => stratumKey(cls, e.root!)))
    const possible = new Set<string>()
    for (let i = 0; i < 4000; i++) possible.add(stratumKey(cls, makeRoot(rng, cls.root)))
    for (const key of [...possible].sort()) {
      if (covered.has(key)) continue
      const entry = draw(rng, cls, used, (k) => k === key)
      if (entry) {
        own.push(entry)
        covered.add(key)
      }
    }
    while (own.length < cls.tables) own.push(draw(rng, cls, used)!)
    tables.push(...own.filter((e) => e.origin === 'generated'))
    for (let i = 0; i < cls.bare; i++) bare.push(draw(rng, cls, used, (k) => covered.has(k))!)
  }
  const order = (a: Entry, b: Entry): number =>
    a.upos < b.upos ? -1 : a.upos > b.upos ? 1 : a.lemma < b.lemma ? -1 : a.lemma > b.lemma ? 1 : 0
  return { tables: tables.sort(order), bare: bare.sort(order), places }
}
