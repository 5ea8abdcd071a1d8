// Sulvašti phrases for the corpus: tokens with dependency links, noun phrases, clauses.
import { canonicalFeats } from './feats.ts'
import type { Entry, Lexicon } from './lexicon.ts'
import { type Rng, zipfSampler } from './prng.ts'

/** A word of a sentence with its gold analysis and its dependency head (null for the root). */
export interface Token {
  form: string
  lemma: string
  upos: string
  feats: string
  head: Token | null
  deprel: string
}

type Pick = () => Entry

/** Bare lemmas draw ranks from a range this many times wider than lemmas with tables. */
const BARE_RANK_FACTOR = 3

/** The words sentences are made of, each part of speech drawn with Zipf-like frequencies. */
export class Vocabulary {
  readonly nouns: Pick
  readonly verbs: Pick
  readonly adjectives: Pick
  readonly places: readonly Entry[]
  readonly byLemma: Map<string, Entry>
  private readonly cells = new Map<Entry, Map<string, string[]>>()

  /** Table lemmas and bare lemmas are mixed before ranking, so forms of both occur. */
  constructor(
    readonly rng: Rng,
    lex: Lexicon,
  ) {
    const all = [...lex.tables, ...lex.bare]
    this.byLemma = new Map(all.map((e) => [e.lemma, e]))
    const special = new Set(['sattara', 'volla'])
    // Lemmas with tables tend to rank higher, as frequent words are the ones dictionaries give tables for.
    const keyed = all.map((e) => ({ e, key: rng.next() * (lex.bare.includes(e) ? BARE_RANK_FACTOR : 1) }))
    keyed.sort((a, b) => a.key - b.key)
    const ranked = (upos: string): Pick =>
      zipfSampler(
        rng,
        keyed.map((k) => k.e).filter((e) => e.upos === upos && !special.has(e.lemma)),
        12,
      )
    this.nouns = ranked('NOUN')
    this.verbs = ranked('VERB')
    this.adjectives = ranked('ADJ')
    this.places = lex.places
    for (const e of [...all, ...lex.places]) {
      const m = new Map<string, string[]>()
      for (const r of e.rows) m.set(r.feats, [...(m.get(r.feats) ?? []), r.form])
      this.cells.set(e, m)
    }
  }

  /** The entry of a fixed lemma (function words, modal, copula…). */
  entry(lemma: string): Entry {
    const e = this.byLemma.get(lemma)
    if (!e) throw new Error(`no entry ${lemma}`)
    return e
  }

  /** A token for a cell of an entry (cell FEATS without inherent features); a variant form at random. */
  token(e: Entry, cell: string, deprel = 'dep', head: Token | null = null): Token | null {
    const feats = canonicalFeats(cell, e.inherent)
    const forms = this.cells.get(e)?.get(feats)
    if (!forms) return null
    return { form: this.rng.pick(forms), lemma: e.lemma, upos: e.upos, feats, head, deprel }
  }

  /** Draws lemmas until one has the cell. */
  draw(pick: Pick, cell: string, deprel = 'dep'): Token {
    for (let i = 0; i < 200; i++) {
      const t = this.token(pick(), cell, deprel)
      if (t) return t
    }
    throw new Error(`no lemma with cell ${cell}`)
  }

  /** The token of a fixed lemma's cell, which must exist. */
  fixed(lemma: string, cell: string, deprel = 'dep'): Token {
    const t = this.token(this.entry(lemma), cell, deprel)
    if (!t) throw new Error(`${lemma} has no cell ${cell}`)
    return t
  }
}

/** A run of tokens and the one that heads it. */
export interface Phrase {
  tokens: Token[]
  head: Token
}

/** Singular about two times in three. */
export function someNumber(rng: Rng): 'Sing' | 'Plur' {
  return rng.chance(0.68) ? 'Sing' : 'Plur'
}

/** A noun phrase: [genitive possessor] [participle] [adjective] noun, all agreeing where they inflect. */
export function nounPhrase(v: Vocabulary, kase: string, number: string, nested = false): Phrase {
  const rng = v.rng
  const head = v.draw(v.nouns, `Case=${kase}|Number=${number}`)
  const before: Token[] = []
  if (!nested && rng.chance(0.09)) {
    const owner = nounPhrase(v, 'Gen', someNumber(rng), true)
    owner.head.head = head
    owner.head.deprel = 'nmod'
    before.push(...owner.tokens)
  }
  if (rng.chance(0.05)) {
    const tense = rng.chance(0.5) ? 'Pres' : 'Past'
    before.push({ ...v.draw(v.verbs, `Tense=${tense}|VerbForm=Part`, 'acl'), head })
  }
  if (rng.chance(0.32)) {
    before.push({ ...v.draw(v.adjectives, `Case=${kase}|Degree=Pos|Number=${number}`, 'amod'), head })
  }
  return { tokens: [...before, head], head }
}

/** A place name in a case (singular), as a one-word phrase. */
export function placePhrase(v: Vocabulary, kase: string): Phrase {
  const head = v.token(v.rng.pick(v.places), `Case=${kase}|Number=Sing`)!
  return { tokens: [head], head }
}

/** An adposition with its noun phrase (or place name) in the case it governs; the noun heads it. */
export function adpositionPhrase(v: Vocabulary, adp: Entry): Phrase {
  const kase = adp.governs!
  const np =
    adp.lemma === 'sel' && v.rng.chance(0.25) ? placePhrase(v, kase) : nounPhrase(v, kase, someNumber(v.rng))
  const marker = v.fixed(adp.lemma, '_', 'case')
  marker.head = np.head
  return { tokens: [marker, ...np.tokens], head: np.head }
}
