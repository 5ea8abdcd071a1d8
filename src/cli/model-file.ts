// Reading a model file from disk, with the model reader's problems turned into exit-2 errors.
import { readFile } from 'node:fs/promises'
import { ProblemError } from '../core/index.ts'
import { readModel } from '../core/model/decode-model.ts'
import type { Model } from '../core/model/model.ts'

/** Load and check a model file; a bad or newer-version file is a ProblemError naming the file. */
export async function loadModelFile(path: string): Promise<Model> {
  let text: string
  try {
    text = await readFile(path, 'utf8')
  } catch {
    throw new ProblemError({ code: 'bad-model', file: path, message: 'cannot read the model file' })
  }
  const r = readModel(text)
  if (!r.ok) throw new ProblemError({ ...r.problem, file: path })
  return r.model
}
