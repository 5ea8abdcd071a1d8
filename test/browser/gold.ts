// The expected answers of the browser test: sentences of the gold CoNLL-U sample and the lemma-only entries.
import { readFile } from 'node:fs/promises'

/** One word of a gold sentence (multi-word tokens and empty nodes are not in the demo sample). */
export interface GoldToken {
  form: string
  lemma: string
  upos: string
  feats: string
}

/**
 * The sentences of a CoNLL-U file with their `# text` and words.
 * @example (await goldSentences('demo-lexicon/gold.conllu'))[0].text // 'Sänšepet jošoi toisivat ašti jonelan.'
 */
export async function goldSentences(path: string): Promise<{ text: string; tokens: GoldToken[] }[]> {
  const out: { text: string; tokens: GoldToken[] }[] = []
  for (const block of (await readFile(path, 'utf8')).split(/\n\s*\n/)) {
    const lines = block.split('\n').filter(Boolean)
    const text = lines.find((l) => l.startsWith('# text = '))?.slice('# text = '.length)
    const tokens = lines
      .filter((l) => /^\d+\t/.test(l))
      .map((l) => l.split('\t'))
      .map((c) => ({ form: c[1]!, lemma: c[2]!, upos: c[3]!, feats: c[5]! }))
    if (text && tokens.length > 0) out.push({ text, tokens })
  }
  return out
}

/**
 * The lemmas of a lemma list (`lemma<TAB>upos[<TAB>feats]`).
 * @example (await lemmaOnly('demo-lexicon/lemmas.tsv')).has('ahma') // true
 */
export async function lemmaOnly(path: string): Promise<Set<string>> {
  const lemmas = new Set<string>()
  for (const line of (await readFile(path, 'utf8')).split('\n')) {
    if (!line || line.startsWith('#')) continue
    lemmas.add(line.split('\t')[0]!)
  }
  return lemmas
}
