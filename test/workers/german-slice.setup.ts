// Global setup of the workers project (runs in Node): the German verb slice and the model `formfold learn` makes
// of it; a small German model of the three npm sets for the sharded-serving test.
import { execFile } from 'node:child_process'
import { createHash } from 'node:crypto'
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { promisify } from 'node:util'
import type { TestProject } from 'vitest/node'
import { germanVerbSlice } from '../support/german-verb-slice.ts'
import { germanSampleModel } from './german-sample.ts'

/** Lemmas in the slice the workers suite uploads (a tenth of them without their tables). */
export const SLICE_LEMMAS = 2000

/** What the setup hands to the tests inside workerd (`inject('germanVerbSlice')`). */
export interface ProvidedSlice {
  /** The upload: entries as JSON lines. */
  jsonl: string
  /** The npm tables of the lemma-only entries (lemma → rows), to check predicted analyses against. */
  withheld: Record<string, { form: string; feats: string }[]>
  /** The model file the command line wrote for the same JSON lines, spawned as a user would run it. */
  cli: { sha256: string; bytes: number; seconds: number }
}

declare module 'vitest' {
  export interface ProvidedContext {
    germanVerbSlice: ProvidedSlice
    /** The model file of `germanSampleModel()` (test/workers/sharded-german.test.ts shards and serves it). */
    germanSampleModel: string
  }
}

/**
 * Build the slice from the installed npm package, run `formfold learn` on it, and provide both.
 * @example globalSetup: ['./test/workers/german-slice.setup.ts']
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const slice = germanVerbSlice(SLICE_LEMMAS)
  const dir = await mkdtemp(join(tmpdir(), 'formfold-slice-'))
  const source = join(dir, 'verbs.jsonl')
  const model = join(dir, 'verbs.model.json')
  await writeFile(source, slice.jsonl)
  const t0 = performance.now()
  await promisify(execFile)(process.execPath, ['bin/formfold.js', 'learn', source, '-o', model], {
    cwd: project.config.root,
  })
  const seconds = (performance.now() - t0) / 1000
  const bytes = await readFile(model)
  project.provide('germanSampleModel', germanSampleModel())
  project.provide('germanVerbSlice', {
    jsonl: slice.jsonl,
    withheld: slice.withheld,
    cli: { sha256: createHash('sha256').update(bytes).digest('hex'), bytes: bytes.byteLength, seconds },
  })
  return () => rm(dir, { recursive: true, force: true })
}
