// The model as `formfold constrain` uses it: a name and version for the header, an analyzer, its forms.
import { createHash } from 'node:crypto'
import { basename } from 'node:path'
import type { Analyzer } from '../core/constrain/index.ts'
import { type AnalyzeOptions, analyzeForm } from '../core/lookup/analyze.ts'
import { readModel } from '../core/model/decode-model.ts'
import { ProblemError } from '../core/lexicon/problem.ts'
import { MODEL_VERSION } from '../core/model/encode-model.ts'
import { EXIT } from './io.ts'
import { readModelText } from './model-file.ts'

/** What the command needs of a model file. */
export interface ConstrainModel {
  name: string
  version: string
  /** `sha256:` and the first 16 hex digits of the file's hash. */
  digest: string
  analyzer: Analyzer
  forms(): Iterable<string>
}

/**
 * Read a model file (exit 2 when it is missing; a bad file throws its `bad-model` problem).
 * @example const { analyzer } = await loadConstrainModel('en.model.json')
 */
export async function loadConstrainModel(path: string, lookup: AnalyzeOptions = {}): Promise<ConstrainModel> {
  let text: string
  try {
    text = await readModelText(path)
  } catch (err) {
    process.stderr.write(`formfold constrain: ${(err as Error).message}\n`)
    process.exit(EXIT.badInput)
  }
  const read = readModel(text)
  if (!read.ok) throw new ProblemError({ ...read.problem, file: path })
  const model = read.model
  // The file's own format version (decoding checked it); the header names it.
  const version = /"version"\s*:\s*"([^"]*)"/.exec(text.slice(0, 500))?.[1] ?? MODEL_VERSION
  return {
    name: basename(path)
      .replace(/\.gz$/i, '')
      .replace(/\.json$/i, '')
      .replace(/\.model$/i, ''),
    version,
    digest: `sha256:${createHash('sha256').update(text).digest('hex').slice(0, 16)}`,
    analyzer: (form, ctx) => analyzeForm(model, form, { ...lookup, ...ctx }).candidates,
    forms: () => model.index.forms(),
  }
}
