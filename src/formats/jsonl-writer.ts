// Write JSON lines: one compact JSON value a line; entries in the `.jsonl` input format.
import type { Entry } from '../core/lexicon/entry.ts'

/** An entry as the entries format writes it: no reader bookkeeping (`file`, `line`). */
export interface EntryJson {
  lemma: string
  upos: string
  feats: string
  forms?: { form: string; feats: string }[]
}

/**
 * The entries-format object of an entry (`forms` only when it has a table).
 * @example entryToJson({ lemma: 'vessa', upos: 'NOUN', feats: '_', file: 'a.tsv', line: 3 }) // { lemma: 'vessa', upos: 'NOUN', feats: '_' }
 */
export function entryToJson(entry: Entry): EntryJson {
  const out: EntryJson = { lemma: entry.lemma, upos: entry.upos, feats: entry.feats }
  if (entry.forms) out.forms = entry.forms.map(({ form, feats }) => ({ form, feats }))
  return out
}

/**
 * One JSON line (no line break; JSON escapes any inside strings).
 * @example formatJsonLine({ form: 'vessat' }) // '{"form":"vessat"}'
 */
export function formatJsonLine(value: unknown): string {
  const text = JSON.stringify(value)
  if (text === undefined) throw new TypeError(`cannot write ${typeof value} as JSON`)
  return text
}

/**
 * The lines of a JSON-lines file, each ending in LF.
 * @example for (const chunk of writeJsonLines(entries.map(entryToJson))) stdout.write(chunk)
 */
export function* writeJsonLines(values: Iterable<unknown>): Generator<string> {
  for (const value of values) yield `${formatJsonLine(value)}\n`
}

/**
 * A whole JSON-lines file as one string.
 * @example toJsonLines([{ a: 1 }, { a: 2 }]) // '{"a":1}\n{"a":2}\n'
 */
export function toJsonLines(values: Iterable<unknown>): string {
  let out = ''
  for (const chunk of writeJsonLines(values)) out += chunk
  return out
}
