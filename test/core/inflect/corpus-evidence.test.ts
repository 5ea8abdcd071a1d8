// Raw text choosing between candidate tables: unit rules, and the gain on the demo language's own corpus
// (demo-lexicon/: invented data of this project; lemmas-gold.tsv holds the true tables of the bare lemmas).
import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { learnForEvaluation, scoreInflection } from '../../../src/core/evaluate/evaluate.ts'
import { corpusEvidence, rerankByCorpus } from '../../../src/core/inflect/corpus-evidence.ts'
import { buildLexicon, type Lexicon } from '../../../src/core/lexicon/lexicon.ts'
import { readTableRowsFile } from '../../support/table-rows-file.ts'

const demo = (name: string) => new URL(`../../../demo-lexicon/${name}`, import.meta.url)

function readRows(name: string): Lexicon {
  return buildLexicon(readTableRowsFile(demo(name)))
}

const empty = buildLexicon([])
const cell = (key: string, form: string) => ({ key, form })

describe('rerankByCorpus', () => {
  const ev = corpusEvidence(new Map([['Fenstern', 3], ['Tische', 5000]]), empty)

  it('prefers the table whose distinctive form the corpus attests', () => {
    const r = rerankByCorpus(ev, [
      { score: 0.7, cells: [cell('Sg', 'Fenster'), cell('Pl', 'Fenstere')] },
      { score: 0.3, cells: [cell('Sg', 'Fenster'), cell('Pl', 'Fenstern')] },
    ])
    expect(r.scores[1]).toBeGreaterThan(r.scores[0]!)
    expect(r.scores[0]! + r.scores[1]!).toBeCloseTo(1, 10)
  })

  it('ignores forms every candidate shares, and changes nothing without evidence', () => {
    const r = rerankByCorpus(ev, [
      { score: 0.6, cells: [cell('Sg', 'Fenstern'), cell('Pl', 'Xa')] },
      { score: 0.4, cells: [cell('Sg', 'Fenstern'), cell('Pl', 'Xb')] },
    ])
    expect(r.scores[0]).toBeGreaterThan(r.scores[1]!)
  })

  it('damps very frequent forms to the same cap', () => {
    const r = rerankByCorpus(ev, [
      { score: 0.5, cells: [cell('Pl', 'Tische')] },
      { score: 0.5, cells: [cell('Pl', 'Fenstern')] },
    ])
    expect(r.evidence[0]).toBe(ev.cap)
  })

  it('does not count a form that a dictionary table gives to another lemma', () => {
    const lex = buildLexicon([{ lemma: 'Fenstern', upos: 'VERB', feats: '_', forms: [{ form: 'Fenstern', feats: 'VerbForm=Inf' }] }])
    const claimed = corpusEvidence(new Map([['Fenstern', 3]]), lex)
    const r = rerankByCorpus(claimed, [
      { score: 0.7, cells: [cell('Pl', 'Fenstere')] },
      { score: 0.3, cells: [cell('Pl', 'Fenstern')] },
    ])
    expect(r.evidence).toEqual([0, 0])
    expect(r.scores[0]).toBeCloseTo(0.7, 10)
  })
})

describe('rerankByCorpus, syncretism', () => {
  it('a syncretic table gains nothing from the citation form it repeats in other cells', () => {
    // Fenster: Sg Fenster, Pl Fenster (syncretic) vs Pl Fenstern; the corpus has the citation form many times
    // and the plural once. The citation form fills more cells of the first table but tells nothing.
    const ev = corpusEvidence(new Map([['Fenster', 40], ['Fenstern', 1]]), empty)
    const r = rerankByCorpus(ev, [
      { score: 0.5, cells: [cell('Nom|Sg', 'Fenster'), cell('Dat|Sg', 'Fenster'), cell('Nom|Pl', 'Fenster'), cell('Dat|Pl', 'Fenster')] },
      { score: 0.5, cells: [cell('Nom|Sg', 'Fenster'), cell('Dat|Sg', 'Fenster'), cell('Nom|Pl', 'Fenster'), cell('Dat|Pl', 'Fenstern')] },
    ])
    expect(r.evidence[0]).toBe(0)
    expect(r.evidence[1]).toBeGreaterThan(0)
    expect(r.scores[1]).toBeGreaterThan(r.scores[0]!)
  })

  it('forms named neutral count neither way', () => {
    const ev = corpusEvidence(new Map([['Fenster', 40]]), empty)
    const r = rerankByCorpus(ev, [{ score: 0.6, cells: [cell('', 'Fenster')] }, { score: 0.4, cells: [cell('', 'Fenstern')] }], new Set(['Fenster']))
    expect(r.evidence).toEqual([0, 0])
    expect(r.scores[0]).toBeCloseTo(0.6, 10)
  })
})

describe('the demo corpus', () => {
  it('raises table accuracy on the bare lemmas of the demo language', () => {
    const train = readRows('tables.tsv')
    const gold = readRows('lemmas-gold.tsv')
    const counts = new Map<string, number>()
    const words = new Intl.Segmenter(undefined, { granularity: 'word' })
    for (const line of readFileSync(demo('corpus.txt'), 'utf8').split('\n'))
      for (const s of words.segment(line.normalize('NFC'))) if (s.isWordLike) counts.set(s.segment, (counts.get(s.segment) ?? 0) + 1)
    const model = learnForEvaluation(train)
    const without = scoreInflection(model, gold)
    const withText = scoreInflection({ ...model, corpus: corpusEvidence(counts, model.lexicon) }, gold)
    // Measured: table 0.695 → 0.869, form 0.888 → 0.968 (npx vitest run test/core/inflect/corpus-evidence.test.ts).
    expect(withText.tableAccuracy - without.tableAccuracy).toBeGreaterThan(0.1)
    expect(withText.formAccuracy).toBeGreaterThan(without.formAccuracy)
  }, 120_000)
})
