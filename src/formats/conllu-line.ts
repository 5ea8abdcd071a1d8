// One CoNLL-U line (UD v2 format): a syntactic word, a multi-word token range, or an empty node.
import { canonicalizeFeats, isUpos } from '../core/lexicon/feats.ts'
import type { Problem } from '../core/lexicon/problem.ts'
import { problemAt, type Where } from './fields.ts'

/** The ten CoNLL-U columns, in order (universaldependencies.org, "CoNLL-U Format"). */
export const CONLLU_COLUMNS = [
  'ID',
  'FORM',
  'LEMMA',
  'UPOS',
  'XPOS',
  'FEATS',
  'HEAD',
  'DEPREL',
  'DEPS',
  'MISC',
]

/** A syntactic word with its gold annotation (`_` where the corpus leaves a column unspecified). */
export interface ConlluWord {
  id: number
  form: string
  lemma: string
  upos: string
  xpos: string
  /** Canonical FEATS when tags are checked, else as written. */
  feats: string
  misc: string
  line: number
  /** Index of the surface token this word belongs to, in its sentence's `surface`. */
  token: number
}

export type ConlluLine =
  | { kind: 'word'; word: Omit<ConlluWord, 'token'>; languageSpecific: string[] }
  | { kind: 'range'; from: number; to: number; form: string; misc: string }
  | { kind: 'empty'; after: number; minor: number }

type Columns = [string, string, string, string, string, string, string, string, string, string]

const WORD_ID = /^[1-9][0-9]*$/
const RANGE_ID = /^([1-9][0-9]*)-([1-9][0-9]*)$/
const EMPTY_ID = /^(0|[1-9][0-9]*)\.([1-9][0-9]*)$/

/**
 * Parse a CoNLL-U word line (not a comment or blank line). With `checkTags`, UPOS must be a UD tag
 * or `_` and FEATS a well-formed bundle, canonicalized.
 * @example parseConlluLine('1-2\tdel\t_\t_\t_\t_\t_\t_\t_\t_', at, true) // { kind: 'range', from: 1, to: 2, … }
 */
export function parseConlluLine(
  text: string,
  at: Where,
  checkTags: boolean,
): ConlluLine | { problem: Problem } {
  const bad = (message: string) => ({ problem: problemAt('bad-conllu', message, at) })
  const cols = text.split('\t')
  if (cols.length !== 10) return bad(`expected 10 tab-separated columns, found ${cols.length}`)
  const empty = cols.indexOf('')
  if (empty !== -1) return bad(`column ${CONLLU_COLUMNS[empty]} is empty (write _ for unspecified)`)
  const [id, form, lemma, upos, xpos, rawFeats, , , , misc] = cols as Columns
  const range = RANGE_ID.exec(id)
  if (range) {
    const from = Number(range[1])
    const to = Number(range[2])
    if (to <= from) return bad(`multi-word token range ${id} must end after it starts`)
    return { kind: 'range', from, to, form, misc }
  }
  const node = EMPTY_ID.exec(id)
  if (node) return { kind: 'empty', after: Number(node[1]), minor: Number(node[2]) }
  if (!WORD_ID.test(id))
    return bad(`ID "${id}" is not a word ID (1, 2, …), a range (1-2) or an empty node (1.1)`)
  let feats = rawFeats
  let languageSpecific: string[] = []
  if (checkTags) {
    if (upos !== '_' && !isUpos(upos)) {
      return {
        problem: problemAt('bad-upos', `unknown UPOS "${upos}" (expected one of the 17 UD tags or _)`, at),
      }
    }
    const result = canonicalizeFeats(feats)
    if (!result.ok) return { problem: { ...result.problem, file: at.file, line: at.line } }
    feats = result.feats
    languageSpecific = result.languageSpecific
  }
  return {
    kind: 'word',
    word: { id: Number(id), form, lemma, upos, xpos, feats, misc, line: at.line },
    languageSpecific,
  }
}
