// A lexicon upload learned into a new model version: read, bounded, learned as `formfold learn` does, published.
import type { Context } from 'hono'
import type { Entry } from '../core/lexicon/entry.ts'
import type { Problem } from '../core/lexicon/problem.ts'
import { buildModel } from '../core/model/build-model.ts'
import { encodeModel } from '../core/model/encode-model.ts'
import type { LexiconFormat } from '../formats/index.ts'
import { ApiError } from './api-error.ts'
import type { AppEnv } from './env.ts'
import { readUpload } from './lexicon-read.ts'
import { MAX_LEARN_LEMMAS, MAX_LEARN_ROWS, MAX_LEXICON_BYTES } from './limits.ts'
import type { VersionInfo } from './store/model-store.ts'
import { openUpload, type UploadBody } from './upload-body.ts'

/** The way around every upload limit: learn locally, then publish the model file. */
export const CLI_PATH = '`formfold learn LEXICON -o MODEL`, then `formfold publish -m MODEL --name NAME`'

/** What learning an upload found, besides the stored version's summary. */
export interface LearnReport {
  format: LexiconFormat
  gzip: boolean
  /** Bytes of the lexicon after gzip was undone. */
  uploadBytes: number
  /** Input lines, and bad lines skipped (only with `skipBad`), the first few with their line numbers. */
  lines: number
  skipped: number
  problems: Problem[]
  languageSpecific: string[]
  tables: number
  lemmaOnly: number
  /** Lemma-only entries that got predicted tables; the others fit no learned paradigm. */
  predicted: number
  /** Notes of merging the entries (conflicting inherent features…), the first few. */
  notes: Problem[]
}

/** The answer to a learned upload: the version, how it was learned, and where the time went. */
export interface LearnedVersion extends VersionInfo {
  name: string
  learned: LearnReport
  /** Reading, learning and publishing, and the whole request, in milliseconds. */
  milliseconds: { read: number; learn: number; publish: number; total: number }
}

const NOTE_EXAMPLES = 5

/**
 * Learn the lexicon of a request body and publish it as the next version of `name`: the same reader,
 * `buildModel` and `encodeModel` as `formfold learn`, so both give the same model file, byte for byte.
 * Nothing is published unless every step succeeds.
 * @example const v = await learnUpload(c, 'de-verbs', 'entries', false) // { version: 3, learned: {...}, ... }
 */
export async function learnUpload(
  c: Context<AppEnv>,
  name: string,
  format: LexiconFormat | undefined,
  skipBad: boolean,
): Promise<LearnedVersion> {
  const t0 = performance.now()
  c.var.models.assertWritable(name)
  const body = openUpload(c, MAX_LEXICON_BYTES, () =>
    tooLargeToLearn(`the lexicon is larger than ${MAX_LEXICON_BYTES} bytes`, { bytes: MAX_LEXICON_BYTES }),
  )
  const { text, learned, readAt: t1 } = await readAndLearn(body, format, skipBad)
  const t2 = performance.now()
  const info = await c.var.models.publish(name, new TextEncoder().encode(text), {
    skippedLines: learned.skipped,
    learnMs: Math.round(t2 - t1),
  })
  const t3 = performance.now()
  const ms = (a: number, b: number) => Math.round(b - a)
  return {
    name,
    ...info,
    learned,
    milliseconds: { read: ms(t0, t1), learn: ms(t1, t2), publish: ms(t2, t3), total: ms(t0, t3) },
  }
}

/**
 * Read, check the size, learn and encode, in a scope of its own: the entries and the model are garbage once the
 * file text exists, before publishing decodes the file again (memory is the edge's tightest resource).
 */
async function readAndLearn(
  body: UploadBody,
  format: LexiconFormat | undefined,
  skipBad: boolean,
): Promise<{ text: string; learned: LearnReport; readAt: number }> {
  const read = await readUpload(body, format, skipBad)
  checkLearnable(read.entries)
  const readAt = performance.now()
  const { text, report } = learn(read.entries)
  const learned: LearnReport = {
    format: read.format,
    gzip: body.gzip,
    uploadBytes: body.bytes,
    lines: read.lines + read.skipped,
    skipped: read.skipped,
    problems: read.problems,
    languageSpecific: read.languageSpecific,
    ...report,
  }
  return { text, learned, readAt }
}

/** Learn and encode, as `formfold learn` does, with the counts its summary prints. */
function learn(entries: Entry[]): {
  text: string
  report: Pick<LearnReport, 'tables' | 'lemmaOnly' | 'predicted' | 'notes'>
} {
  const model = buildModel(entries)
  const lex = model.inflection.lexicon
  const tables = lex.entries.reduce((n, e) => n + (e.cells ? 1 : 0), 0)
  const predicted = model.kept.reduce((n, k) => n + (k && k.length > 0 ? 1 : 0), 0)
  const notes = lex.problems.slice(0, NOTE_EXAMPLES)
  return {
    text: encodeModel(model),
    report: { tables, lemmaOnly: lex.entries.length - tables, predicted, notes },
  }
}

/** 413 for a lexicon with more lemmas or table rows than the service learns within its CPU budget. */
function checkLearnable(entries: Entry[]): void {
  const lemmas = entries.length
  const rows = entries.reduce((n, e) => n + (e.forms?.length ?? 0), 0)
  const limit = { lemmas: MAX_LEARN_LEMMAS, rows: MAX_LEARN_ROWS }
  if (lemmas > MAX_LEARN_LEMMAS) {
    throw tooLargeToLearn(
      `the lexicon has ${lemmas} lemmas, more than the ${MAX_LEARN_LEMMAS} an upload may have`,
      limit,
      {
        lemmas,
        rows,
      },
    )
  }
  if (rows > MAX_LEARN_ROWS) {
    throw tooLargeToLearn(
      `the lexicon has ${rows} table rows, more than the ${MAX_LEARN_ROWS} an upload may have`,
      limit,
      {
        lemmas,
        rows,
      },
    )
  }
}

function tooLargeToLearn(
  what: string,
  limit: Record<string, number>,
  lexicon?: Record<string, number>,
): ApiError {
  const message = `${what} (the service learns within its CPU budget); learn it with ${CLI_PATH}`
  return new ApiError(413, 'too-large', message, lexicon ? { limit, lexicon } : { limit })
}
