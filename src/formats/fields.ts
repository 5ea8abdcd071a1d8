// Field checks shared by the lexicon formats: non-empty words, UPOS tags, canonical FEATS.
import { canonicalizeFeats, type FeatsResult, isUpos } from '../core/lexicon/feats.ts'
import type { Problem, ProblemCode } from '../core/lexicon/problem.ts'

/** Where a line came from. */
export interface Where {
  file: string
  line: number
}

/** What a line parser returns: a record, a problem, or `null` for a line with no data (blank, comment). */
export type LineResult<T> = { value: T; languageSpecific?: string[] } | { problem: Problem } | null

/** A parser of one line of a line-based format. */
export type LineParser<T> = (text: string, at: Where) => LineResult<T>

/**
 * A problem located at a line.
 * @example problemAt('bad-upos', 'unknown UPOS "NN"', { file: 'a.tsv', line: 3 })
 */
export function problemAt(code: ProblemCode, message: string, at: Where): Problem {
  return { code, message, file: at.file, line: at.line }
}

/**
 * Longest lemma or form, in UTF-16 code units after NFC (the HTTP API's form limit is the same). Aligning a
 * lemma with a form costs their product in time and memory, so without a bound one long line could take
 * minutes or exhaust memory while learning.
 */
export const MAX_WORD_CHARS = 256

// C1 controls too: text decoded as Latin-1 and encoded again carries them (the HTTP API refuses them in forms).
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is its purpose
const CONTROL_OR_TAB = /[\u0000-\u001F\u007F-\u009F]/
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

/**
 * Check a lemma or form: not blank, and (for values decoded from JSON escapes) no control characters,
 * tabs or lone surrogates, which no TSV line could carry; no U+FEFF (the BOM of a second file joined to a
 * first); at most `MAX_WORD_CHARS` long. Returns the NFC value or a problem.
 * @example checkWord('ha\u0308us', 'lemma', at) // { value: 'häus' }
 */
export function checkWord(value: string, field: string, at: Where): { value: string } | { problem: Problem } {
  if (value.trim() === '') return { problem: problemAt('empty-field', `${field} is empty`, at) }
  if (CONTROL_OR_TAB.test(value)) {
    return {
      problem: problemAt('control-char', `${field} "${value}" contains a tab or control character`, at),
    }
  }
  if (value.includes('\uFEFF')) {
    const message = `${field} "${value}" contains U+FEFF, a byte order mark inside the file (were files joined?)`
    return { problem: problemAt('control-char', message, at) }
  }
  if (LONE_SURROGATE.test(value)) {
    return { problem: problemAt('bad-utf8', `${field} contains a lone surrogate`, at) }
  }
  const nfc = value.normalize('NFC')
  if (nfc.length > MAX_WORD_CHARS) {
    const message = `${field} is ${nfc.length} characters long (at most ${MAX_WORD_CHARS})`
    return { problem: problemAt('word-too-long', message, at) }
  }
  return { value: nfc }
}

/**
 * Check a UPOS tag against the 17 universal tags.
 * @example checkUpos('NN', at) // problem 'bad-upos'
 */
export function checkUpos(upos: string, at: Where): Problem | undefined {
  if (isUpos(upos)) return undefined
  return problemAt('bad-upos', `unknown UPOS "${upos}" (expected one of the 17 UD tags, e.g. NOUN)`, at)
}

/**
 * Bundles already canonicalized, so every row with the same FEATS shares one string: a dictionary of a million
 * rows has a few hundred distinct bundles, and one string each keeps memory and later lookups small. Bounded.
 */
const FEATS_SEEN = new Map<string, FeatsResult>()
const FEATS_SEEN_MAX = 10_000

/**
 * Canonicalize a FEATS bundle, locating any problem at the line.
 * @example checkFeats('Number=Sing|Case=Nom', at) // { feats: 'Case=Nom|Number=Sing', languageSpecific: [] }
 */
export function checkFeats(
  raw: string,
  at: Where,
): { feats: string; languageSpecific: string[] } | { problem: Problem } {
  let result = FEATS_SEEN.get(raw)
  if (!result) {
    if (FEATS_SEEN.size >= FEATS_SEEN_MAX) FEATS_SEEN.clear()
    result = canonicalizeFeats(raw)
    FEATS_SEEN.set(raw, result)
  }
  if (!result.ok) return { problem: { ...result.problem, file: at.file, line: at.line } }
  return { feats: result.feats, languageSpecific: result.languageSpecific }
}
