// Leave-one-out analogy features: a training lemma is left out of its own paradigm's member index, and its
// mirror image out of that paradigm's twin. Finnish words and forms from memory of a grammar handbook.
import { describe, expect, it } from 'vitest'
import { DEFAULT_TWIN_OPTIONS, learnAlternations } from '../../../src/core/inflect/alternations.ts'
import { CandidateFinder } from '../../../src/core/inflect/candidates.ts'
import { extractParadigms } from '../../../src/core/inflect/extract.ts'
import { SuffixIndex } from '../../../src/core/inflect/suffix-index.ts'
import { withTwins } from '../../../src/core/inflect/twins.ts'
import { rowsToEntries } from '../../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../../src/core/lexicon/lexicon.ts'

describe('SuffixIndex.longestShared leaving a member out', () => {
  const idx = new SuffixIndex(['äväin', 'pelin'])

  it('counts the left-out member only where its letters follow the word', () => {
    expect(idx.longestShared('avain', false)).toEqual({ length: 2, count: 2, wholeMember: false })
    expect(idx.longestShared('avain', 'äväin')).toEqual({ length: 2, count: 1, wholeMember: false })
    expect(idx.longestShared('pelin', true)).toEqual({ length: 2, count: 1, wholeMember: false })
    expect(idx.longestShared('pelin', false).length).toBe(5)
  })
})

describe('CandidateFinder leave-one-out with twins (Finnish, from memory)', () => {
  const CELLS = ['Case=Nom', 'Case=Ine', 'Case=Ela', 'Case=Ade', 'Case=Par']
  const table = (forms: string[]) =>
    forms.map((form, i) => ({ lemma: forms[0]!, form, upos: 'NOUN', feats: CELLS[i]! }))
  const rows = [
    ...table(['talo', 'talossa', 'talosta', 'talolla', 'taloa']),
    ...table(['kylä', 'kylässä', 'kylästä', 'kylällä', 'kylää']),
    ...table(['nainen', 'naisessa', 'naisesta', 'naisella', 'naista']),
    ...table(['ihminen', 'ihmisessä', 'ihmisestä', 'ihmisellä', 'ihmistä']),
    // avain (key) and puhelin (telephone) are back words; no front word of their class is given.
    ...table(['avain', 'avaimessa', 'avaimesta', 'avaimella', 'avainta']),
    ...table(['puhelin', 'puhelimessa', 'puhelimesta', 'puhelimella', 'puhelinta']),
  ]
  const lex = buildLexicon(rowsToEntries(rows))
  const book = extractParadigms(lex)
  const alt = learnAlternations(book.paradigms, { ...DEFAULT_TWIN_OPTIONS, minPairs: 2 })
  const own: string[][] = book.paradigms.map(() => [])
  book.memberOf.forEach((p, i) => own[p]!.push(lex.entries[i]!.lemma))
  const { paradigms, members } = withTwins(book.paradigms, own, alt)
  const finder = new CandidateFinder(paradigms, members, alt, DEFAULT_TWIN_OPTIONS)
  const avain = lex.entries.findIndex((e) => e.lemma === 'avain')
  const home = book.memberOf[avain]!
  const twin = paradigms.findIndex((p) => p.twinOf === home)

  it('has a twin whose analogy members are the mirrored members', () => {
    expect(alt).toEqual({ NOUN: { a: 'ä', ä: 'a' } })
    expect(twin).toBeGreaterThan(0)
    expect(members[twin]).toEqual(['äväin'])
  })

  it('leaves the lemma out of its paradigm and its mirror image out of the twin', () => {
    const asTest = finder.find('avain', 'NOUN')
    const asTraining = finder.find('avain', 'NOUN', home)
    const sfx = (cs: typeof asTest, i: number) => cs.find((c) => c.paradigm === i)!.sfx
    expect(sfx(asTest, home)).toBe(5)
    expect(sfx(asTest, twin)).toBe(2)
    expect(sfx(asTraining, home)).toBe(2) // what is left: puhelin shares -in
    expect(sfx(asTraining, twin)).toBe(0)
  })

  it('tells a lemma whose harmony letters are all on one side from a mixed one', () => {
    expect(finder.oneSide('äväin', 'NOUN')).toBe(true)
    expect(finder.oneSide('puhelin', 'NOUN')).toBe(true)
    expect(finder.oneSide('käivättä', 'NOUN')).toBe(true)
    expect(finder.oneSide('kaivättu', 'NOUN')).toBe(false)
    expect(finder.oneSide('kaivättu', 'VERB')).toBe(true) // no swap learned for verbs
  })
})
