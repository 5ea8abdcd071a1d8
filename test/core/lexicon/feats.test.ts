// FEATS canonicalization, checked against the CoNLL-U rules of UD v2 (features sorted case-insensitively,
// several values comma-joined and sorted, `_` for none; universal values checked) — from memory of the spec.
import { describe, expect, it } from 'vitest'
import { canonicalizeFeats, mergeFeats } from '../../../src/core/lexicon/feats.ts'

describe('canonicalizeFeats', () => {
  it.each([
    ['Number=Sing|Case=Nom', 'Case=Nom|Number=Sing'],
    ['_', '_'],
    ['', '_'],
    ['PronType=Rel,Int', 'PronType=Int,Rel'],
    ['Number[psor]=Plur|Number=Sing', 'Number=Sing|Number[psor]=Plur'],
    ['VerbForm=Fin|Mood=Ind|Tense=Pres', 'Mood=Ind|Tense=Pres|VerbForm=Fin'],
  ])('canonicalizes %s', (raw, want) => {
    const r = canonicalizeFeats(raw)
    expect(r.ok && r.feats).toBe(want)
  })

  it.each([['Case=Nominative'], ['case=Nom'], ['Case'], ['Case=Nom|Case=Acc'], ['Case=nom']])('rejects %s', (raw) => {
    const r = canonicalizeFeats(raw)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.problem.code).toBe('bad-feats')
  })

  it('accepts language-specific features and reports them', () => {
    const r = canonicalizeFeats('InfForm=1|Case=Ess')
    expect(r).toEqual({ ok: true, feats: 'Case=Ess|InfForm=1', languageSpecific: ['InfForm=1'] })
  })

  it('merges inherent and cell features', () => {
    expect(mergeFeats('Gender=Fem', 'Number=Plur|Case=Dat')).toBe('Case=Dat|Gender=Fem|Number=Plur')
  })
})
