// Writes sentences as plain text (sentence-initial capital, no space before punctuation) and as CoNLL-U.
import type { Token } from './phrases.ts'
import type { Rng } from './prng.ts'

/** Upper-cases the first letter (Unicode-aware; š -> Š, ä -> Ä). */
export function capitalize(word: string): string {
  const [first = '', ...rest] = [...word]
  return first.toUpperCase() + rest.join('')
}

function forms(tokens: readonly Token[]): string[] {
  return tokens.map((t, i) => (i === 0 ? capitalize(t.form) : t.form))
}

/**
 * The sentence as text: words separated by spaces, punctuation attached to the word before it.
 * @example
 * sentenceText(tokens) // 'Vorko lokkava talvan.'
 */
export function sentenceText(tokens: readonly Token[]): string {
  const f = forms(tokens)
  let out = ''
  for (const [i, t] of tokens.entries()) {
    if (i > 0 && t.upos !== 'PUNCT') out += ' '
    out += f[i]
  }
  return out
}

/**
 * One CoNLL-U sentence block (comments, ten columns per word, ending in a blank line).
 * @example
 * conlluSentence('demo-gold-0001', tokens).split('\n')[0] // '# sent_id = demo-gold-0001'
 */
export function conlluSentence(id: string, tokens: readonly Token[]): string {
  const f = forms(tokens)
  const lines = [`# sent_id = ${id}`, `# text = ${sentenceText(tokens)}`]
  for (const [i, t] of tokens.entries()) {
    const head = t.head ? tokens.indexOf(t.head) + 1 : 0
    if (t.head && head === 0) throw new Error(`head of "${t.form}" is not in its sentence`)
    const next = tokens[i + 1]
    const misc = next && next.upos === 'PUNCT' ? 'SpaceAfter=No' : '_'
    lines.push([i + 1, f[i], t.lemma, t.upos, '_', t.feats, head, t.deprel, '_', misc].join('\t'))
  }
  return `${lines.join('\n')}\n\n`
}

/** Groups sentence texts into paragraphs of 4–9 sentences, one paragraph a line, blank lines between. */
export function paragraphs(rng: Rng, texts: readonly string[]): string {
  const out: string[] = []
  for (let i = 0; i < texts.length; ) {
    const n = 4 + rng.int(6)
    out.push(texts.slice(i, i + n).join(' '))
    i += n
  }
  return `${out.join('\n\n')}\n`
}
