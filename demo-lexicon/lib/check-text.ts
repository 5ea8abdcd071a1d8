// Checks the corpus (NFC, word count, use of table-less lemmas, unknown words) and the gold CoNLL-U file.
import { fail, type TableStats, UPOS } from './check-lexicon.ts'
import { featsProblem } from './feats.ts'

const DEPRELS = new Set([
  'root',
  'nsubj',
  'obj',
  'iobj',
  'obl',
  'amod',
  'nmod',
  'acl',
  'case',
  'cc',
  'conj',
  'mark',
  'advcl',
  'advmod',
  'xcomp',
  'cop',
  'punct',
])

/** Counts over the corpus. */
export interface CorpusStats {
  words: number
  punctuation: number
  /** Tokens whose form is found only in the gold tables of bare lemmas (they need prediction). */
  predictedOnly: number
  /** Tokens whose form is in no table at all (place names). */
  unknown: number
}

/** Lower-cases the first letter, undoing sentence-initial capitals. */
function uncap(word: string): string {
  const [first = '', ...rest] = [...word]
  return first.toLowerCase() + rest.join('')
}

/**
 * Checks the corpus and counts its tokens with `Intl.Segmenter` (word granularity).
 * @example
 * checkCorpus('Vorko lokkava.\n', tables, gold).words // 2
 */
export function checkCorpus(text: string, tables: TableStats, gold: TableStats): CorpusStats {
  const problems: string[] = []
  if (text.normalize('NFC') !== text) problems.push('corpus.txt: not NFC')
  const stats: CorpusStats = { words: 0, punctuation: 0, predictedOnly: 0, unknown: 0 }
  for (const s of new Intl.Segmenter('und', { granularity: 'word' }).segment(text)) {
    if (!s.isWordLike) {
      if (/\S/.test(s.segment)) stats.punctuation++
      continue
    }
    stats.words++
    const form = uncap(s.segment)
    if (tables.forms.has(form)) continue
    if (gold.forms.has(form)) stats.predictedOnly++
    else stats.unknown++
  }
  fail(problems)
  return stats
}

/** Checks one sentence block, adding to `problems`; returns its word count. */
function checkSentence(block: string, where: string, known: Set<string>, problems: string[]): number {
  const lines = block.split('\n')
  const comments = lines.filter((l) => l.startsWith('#'))
  const words = lines.filter((l) => !l.startsWith('#')).map((l) => l.split('\t'))
  const textLine = comments.find((c) => c.startsWith('# text = '))
  if (!comments.some((c) => c.startsWith('# sent_id = ')) || !textLine) problems.push(`${where}: comments`)
  let rebuilt = ''
  const heads: number[] = []
  for (const [i, cols] of words.entries()) {
    if (cols.length !== 10) {
      problems.push(`${where}: ${cols.length} columns`)
      continue
    }
    const [id, form, lemma, upos, xpos, feats, head, deprel, deps, misc] = cols as Ten
    if (id !== String(i + 1)) problems.push(`${where}: ID ${id}`)
    if (!UPOS.has(upos) || xpos !== '_' || deps !== '_') problems.push(`${where}: UPOS/XPOS/DEPS of ${form}`)
    if (featsProblem(feats)) problems.push(`${where}: ${featsProblem(feats)}`)
    const h = Number(head)
    if (!Number.isInteger(h) || h < 0 || h > words.length || h === i + 1)
      problems.push(`${where}: HEAD ${head}`)
    heads.push(h)
    if ((h === 0) !== (deprel === 'root')) problems.push(`${where}: root marking`)
    if (!DEPRELS.has(deprel)) problems.push(`${where}: DEPREL ${deprel}`)
    if (misc !== '_' && misc !== 'SpaceAfter=No') problems.push(`${where}: MISC ${misc}`)
    rebuilt += form + (misc === 'SpaceAfter=No' || i === words.length - 1 ? '' : ' ')
    const analysis = `${i === 0 ? uncap(form) : form}\t${lemma}\t${upos}\t${feats}`
    if (upos !== 'PUNCT' && upos !== 'PROPN' && !known.has(analysis))
      problems.push(`${where}: unknown ${analysis}`)
  }
  if (heads.filter((h) => h === 0).length !== 1) problems.push(`${where}: not exactly one root`)
  for (let start = 1; start <= heads.length; start++) {
    let at = start
    for (let steps = 0; at !== 0 && steps <= heads.length; steps++) at = heads[at - 1] ?? 0
    if (at !== 0) problems.push(`${where}: cycle through word ${start}`)
  }
  if (textLine && textLine.slice('# text = '.length) !== rebuilt) problems.push(`${where}: # text differs`)
  return words.length
}

type Ten = [string, string, string, string, string, string, string, string, string, string]

/**
 * Checks a CoNLL-U file: comments, ten columns, IDs, one root, a tree, `# text` matching the forms,
 * and each word's analysis found in the tables (place names excepted). Returns the token count.
 * @example
 * checkConllu(conlluText, tables, gold) // number of tokens
 */
export function checkConllu(text: string, tables: TableStats, gold: TableStats): number {
  const problems: string[] = []
  if (text.normalize('NFC') !== text) problems.push('gold.conllu: not NFC')
  const known = new Set<string>()
  for (const t of [tables, gold]) {
    for (const rows of t.lemmas.values()) {
      for (const r of rows) known.add(`${r.form}\t${r.lemma}\t${r.upos}\t${r.feats}`)
    }
  }
  if (!text.endsWith('\n\n')) problems.push('gold.conllu: last sentence not closed by a blank line')
  let tokens = 0
  for (const [b, block] of text.slice(0, -2).split('\n\n').entries()) {
    tokens += checkSentence(block, `gold.conllu sentence ${b + 1}`, known, problems)
  }
  fail(problems)
  return tokens
}
