// Entries `.jsonl`: one `{"lemma","upos","feats"?,"forms"?:[{"form","feats"}]}` object a line.
import type { Entry, FormRow } from '../core/lexicon/entry.ts'
import type { Problem } from '../core/lexicon/problem.ts'
import { checkFeats, checkUpos, checkWord, type LineResult, problemAt, type Where } from './fields.ts'
import type { TextInput } from './input.ts'
import type { ReadOptions, ReadSummary } from './read-summary.ts'
import { streamRecords } from './record-reader.ts'

const ENTRY_KEYS = new Set(['lemma', 'upos', 'feats', 'forms'])
const FORM_KEYS = new Set(['form', 'feats'])

/**
 * Parse one JSON line into an entry; `forms` absent means a lemma-only entry. Unknown keys are
 * rejected so a misspelt `"form"` cannot silently drop a table.
 * @example parseEntryLine('{"lemma":"vessa","upos":"NOUN","forms":[{"form":"vessat","feats":"Number=Plur"}]}', at)
 */
export function parseEntryLine(text: string, at: Where): LineResult<Entry> {
  if (text.trim() === '') return null
  let data: unknown
  try {
    data = JSON.parse(text)
  } catch (error) {
    return { problem: problemAt('bad-json', `not valid JSON (${(error as Error).message})`, at) }
  }
  const bad = (message: string) => ({ problem: problemAt('bad-entry', message, at) })
  if (!isObject(data)) return bad('an entry must be a JSON object')
  const unknown = Object.keys(data).find((k) => !ENTRY_KEYS.has(k))
  if (unknown !== undefined) return bad(`unknown key "${unknown}" (expected lemma, upos, feats, forms)`)
  if (typeof data.lemma !== 'string') return bad('"lemma" must be a string')
  if (typeof data.upos !== 'string') return bad('"upos" must be a string')
  if (data.feats !== undefined && typeof data.feats !== 'string') return bad('"feats" must be a string')
  const lemma = checkWord(data.lemma, 'lemma', at)
  if ('problem' in lemma) return lemma
  const badUpos = checkUpos(data.upos, at)
  if (badUpos) return { problem: badUpos }
  const feats = checkFeats(data.feats ?? '_', at)
  if ('problem' in feats) return feats
  const languageSpecific = [...feats.languageSpecific]
  const entry: Entry = {
    lemma: lemma.value,
    upos: data.upos,
    feats: feats.feats,
    file: at.file,
    line: at.line,
  }
  if (data.forms !== undefined) {
    const forms = parseForms(data.forms, at, languageSpecific)
    if ('problem' in forms) return forms
    entry.forms = forms.value
  }
  return { value: entry, languageSpecific }
}

function parseForms(
  raw: unknown,
  at: Where,
  languageSpecific: string[],
): { value: FormRow[] } | { problem: Problem } {
  const bad = (message: string) => ({ problem: problemAt('bad-entry', message, at) })
  if (!Array.isArray(raw)) return bad('"forms" must be an array of {"form","feats"}')
  if (raw.length === 0) return bad('"forms" is empty (omit it for a lemma-only entry)')
  const forms: FormRow[] = []
  for (const [i, item] of raw.entries()) {
    if (!isObject(item)) return bad(`forms[${i}] must be an object {"form","feats"}`)
    const unknown = Object.keys(item).find((k) => !FORM_KEYS.has(k))
    if (unknown !== undefined) return bad(`unknown key "${unknown}" in forms[${i}] (expected form, feats)`)
    if (typeof item.form !== 'string') return bad(`forms[${i}].form must be a string`)
    if (typeof item.feats !== 'string') return bad(`forms[${i}].feats must be a string`)
    const form = checkWord(item.form, `forms[${i}].form`, at)
    if ('problem' in form) return form
    const feats = checkFeats(item.feats, at)
    if ('problem' in feats) return feats
    languageSpecific.push(...feats.languageSpecific)
    forms.push({ form: form.value, feats: feats.feats })
  }
  return { value: forms }
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
}

/**
 * Read a whole entries file. Throws `ProblemError` at the first bad line unless `skipBad`.
 * @example const { entries } = await readEntries('{"lemma":"vessa","upos":"NOUN"}\n', { file: 'e.jsonl' })
 */
export async function readEntries(
  input: TextInput,
  options: ReadOptions,
): Promise<ReadSummary & { entries: Entry[] }> {
  const reader = streamRecords(input, parseEntryLine, options)
  const entries: Entry[] = []
  for await (const entry of reader) entries.push(entry)
  return { ...reader.summary, entries }
}
