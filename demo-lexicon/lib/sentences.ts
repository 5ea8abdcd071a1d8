// Sulvašti sentence templates: SVO clauses with agreement, coordination, modal, imperative, copula, weather.
import { FUNCTION_WORDS, PRONOUNS } from '../grammar/closed-class.ts'
import {
  adpositionPhrase,
  nounPhrase,
  type Phrase,
  placePhrase,
  someNumber,
  type Token,
  type Vocabulary,
} from './phrases.ts'

const ADPOSITIONS = FUNCTION_WORDS.filter((w) => w.upos === 'ADP')
const ADVERBS = FUNCTION_WORDS.filter((w) => w.upos === 'ADV')

interface Subject {
  tokens: Token[]
  head: Token | null
  person: string
  number: string
}

function punct(form: string, head: Token): Token {
  return { form, lemma: form, upos: 'PUNCT', feats: '_', head, deprel: 'punct' }
}

/** A subject: a noun phrase (3rd person), a pronoun, a place name, or nothing (1st/2nd person). */
function subject(v: Vocabulary): Subject {
  const r = v.rng.next()
  if (r < 0.58) {
    const number = someNumber(v.rng)
    return { ...nounPhrase(v, 'Nom', number), person: '3', number }
  }
  if (r < 0.6) return { ...placePhrase(v, 'Nom'), person: '3', number: 'Sing' }
  const p = v.rng.pick(PRONOUNS)
  const person = p.inherent.match(/Person=(\d)/)![1]!
  const number = p.inherent.match(/Number=(\w+)/)![1]!
  if (r < 0.86) {
    const t = v.fixed(p.lemma, 'Case=Nom')
    return { tokens: [t], head: t, person, number }
  }
  return { tokens: [], head: null, person: person === '3' ? '1' : person, number }
}

/** A pronoun in a case, as a one-word phrase. */
function pronounPhrase(v: Vocabulary, kase: string): Phrase {
  const t = v.fixed(v.rng.pick(PRONOUNS).lemma, `Case=${kase}`)
  return { tokens: [t], head: t }
}

/** Finite-verb FEATS for a person and number, in the present, past or conditional. */
function finite(v: Vocabulary, person: string, number: string): string {
  const r = v.rng.next()
  if (r < 0.45) return `Mood=Ind|Number=${number}|Person=${person}|Tense=Pres|VerbForm=Fin`
  if (r < 0.85) return `Mood=Ind|Number=${number}|Person=${person}|Tense=Past|VerbForm=Fin`
  return `Mood=Cnd|Number=${number}|Person=${person}|VerbForm=Fin`
}

/** Objects and adjuncts of a verb: [indirect object] [object] [adposition phrase]. */
function complements(v: Vocabulary, verb: Token, object = 0.9): Token[] {
  const out: Token[] = []
  if (v.rng.chance(0.12)) {
    const io = nounPhrase(v, 'Dat', someNumber(v.rng))
    io.head.head = verb
    io.head.deprel = 'iobj'
    out.push(...io.tokens)
  }
  if (v.rng.chance(object)) {
    const obj = v.rng.chance(0.1) ? pronounPhrase(v, 'Acc') : nounPhrase(v, 'Acc', someNumber(v.rng))
    obj.head.head = verb
    obj.head.deprel = 'obj'
    out.push(...obj.tokens)
  }
  if (v.rng.chance(0.3)) {
    const pp = adpositionPhrase(v, v.entry(v.rng.pick(ADPOSITIONS).lemma))
    pp.head.head = verb
    pp.head.deprel = 'obl'
    out.push(...pp.tokens)
  }
  return out
}

/** A clause: [adverb] subject verb complements; returns its tokens and its verb. */
export function clause(v: Vocabulary, verbLemma?: string): { tokens: Token[]; verb: Token } {
  const s = subject(v)
  const cell = finite(v, s.person, s.number)
  const verb = verbLemma ? v.fixed(verbLemma, cell) : v.draw(v.verbs, cell)
  if (s.head) {
    s.head.head = verb
    s.head.deprel = 'nsubj'
  }
  const front: Token[] = []
  if (v.rng.chance(0.08)) front.push(v.fixed(v.rng.pick(ADVERBS).lemma, '_', 'advmod'))
  for (const t of front) t.head = verb
  return { tokens: [...front, ...s.tokens, verb, ...complements(v, verb)], verb }
}

/** One sentence: its tokens (last is punctuation) with exactly one root. */
export function sentence(v: Vocabulary): Token[] {
  const rng = v.rng
  const r = rng.next()
  const end = (root: Token, tokens: Token[], mark = rng.chance(0.06) ? '?' : '.'): Token[] => {
    root.head = null
    root.deprel = 'root'
    return [...tokens, punct(mark, root)]
  }
  if (r < 0.12) {
    const a = clause(v)
    const b = clause(v)
    const cc = v.fixed(rng.chance(0.7) ? 'ot' : 'pūr', '_', 'cc')
    cc.head = b.verb
    b.verb.head = a.verb
    b.verb.deprel = 'conj'
    return end(a.verb, [...a.tokens, punct(',', b.verb), cc, ...b.tokens])
  }
  if (r < 0.2) {
    const a = clause(v)
    const b = clause(v)
    const mark = v.fixed('kuš', '_', 'mark')
    mark.head = b.verb
    b.verb.head = a.verb
    b.verb.deprel = 'advcl'
    return end(a.verb, [...a.tokens, punct(',', b.verb), mark, ...b.tokens])
  }
  if (r < 0.27) {
    const a = clause(v, 'volla')
    const at = a.tokens.indexOf(a.verb)
    const inf = v.draw(v.verbs, 'VerbForm=Inf', 'xcomp')
    inf.head = a.verb
    for (const t of a.tokens.slice(at + 1)) if (t.head === a.verb && t.deprel !== 'advmod') t.head = inf
    return end(a.verb, [...a.tokens.slice(0, at + 1), inf, ...a.tokens.slice(at + 1)])
  }
  if (r < 0.33) {
    const verb = v.draw(v.verbs, `Mood=Imp|Number=${someNumber(rng)}|Person=2|VerbForm=Fin`)
    return end(verb, [verb, ...complements(v, verb)], '!')
  }
  if (r < 0.39) {
    const conv = v.draw(v.verbs, 'VerbForm=Conv', 'advcl')
    const rest = complements(v, conv, 1)
    const main = clause(v)
    conv.head = main.verb
    return end(main.verb, [conv, ...rest, punct(',', conv), ...main.tokens])
  }
  if (r < 0.42) {
    const cells = ['Mood=Ind|Tense=Pres', 'Mood=Ind|Tense=Past', 'Mood=Cnd']
    const verb = v.fixed('sattara', `${rng.pick(cells)}|Number=Sing|Person=3|VerbForm=Fin`)
    const where = rng.chance(0.5) ? adpositionPhrase(v, v.entry('sel')) : null
    if (where) where.head.head = verb
    if (where) where.head.deprel = 'obl'
    return end(verb, [verb, ...(where?.tokens ?? [])])
  }
  if (r < 0.52) return copula(v, end)
  const a = clause(v)
  return end(a.verb, a.tokens)
}

/** Subject + ela + adjective (positive, comparative, or superlative when singular); the adjective is root. */
function copula(v: Vocabulary, end: (root: Token, tokens: Token[]) => Token[]): Token[] {
  const s = subject(v)
  const r = v.rng.next()
  const degree = r < 0.7 ? 'Pos' : r < 0.9 || s.number === 'Plur' ? 'Cmp' : 'Sup'
  const adj = v.draw(v.adjectives, `Case=Nom|Degree=${degree}|Number=${s.number}`)
  const tense = v.rng.chance(0.6) ? 'Pres' : 'Past'
  const cop = v.fixed(
    'ela',
    `Mood=Ind|Number=${s.number}|Person=${s.person}|Tense=${tense}|VerbForm=Fin`,
    'cop',
  )
  cop.head = adj
  if (s.head) {
    s.head.head = adj
    s.head.deprel = 'nsubj'
  }
  return end(adj, [...s.tokens, cop, adj])
}
