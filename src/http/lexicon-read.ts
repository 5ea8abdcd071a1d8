// Reading an uploaded lexicon with the CLI's reader; bad lines, an empty body or the wrong format become 422s.

import type { Problem } from '../core/lexicon/problem.ts'
import { ProblemError } from '../core/lexicon/problem.ts'
import {
  type LexiconFormat,
  type LexiconReadResult,
  type LineParser,
  parseEntryLine,
  parseLemmaLine,
  parseTableRow,
  readLexicon,
  readLines,
  sniffLexiconLine,
  streamRecords,
} from '../formats/index.ts'
import { ApiError } from './api-error.ts'
import type { UploadBody } from './upload-body.ts'

/** The name problems of an upload carry as their `file`. */
export const UPLOAD_FILE = 'upload'

/** How each format is named in messages. */
const FORMAT_NAMES: Record<LexiconFormat, string> = {
  rows: 'table rows (lemma, form, UPOS, FEATS)',
  entries: 'entries (one JSON object a line)',
  lemmas: 'a lemma list (lemma, UPOS[, FEATS])',
}

const PARSERS: Record<LexiconFormat, LineParser<unknown>> = {
  rows: parseTableRow,
  entries: parseEntryLine,
  lemmas: parseLemmaLine,
}

/**
 * Read an upload as `formfold learn` reads a file (`readLexicon`: the same format sniffing, checks and NFC).
 * Every bad line is counted and the first few kept with their line numbers; unless `skipBad`, any bad line
 * refuses the upload (422). An upload with no entries at all is a 422 saying how it was read.
 * @example const read = await readUpload(openUpload(c, limit, tooBig), 'entries', false)
 */
export async function readUpload(
  body: UploadBody,
  format: LexiconFormat | undefined,
  skipBad: boolean,
): Promise<LexiconReadResult> {
  let read: LexiconReadResult
  try {
    read = await readLexicon(body.chunks, { file: UPLOAD_FILE, format, skipBad: true })
  } catch (err) {
    if (err instanceof ProblemError && err.problem.code === 'no-entries')
      throw await nothingRead(body, format, err.problem)
    throw err
  }
  if (read.skipped > 0 && !skipBad) throw badLines(read)
  return read
}

/** Some lines did not read: the first few, and what to do. */
function badLines(read: LexiconReadResult): ApiError {
  const first = read.problems[0]!
  const lines = read.skipped === 1 ? 'line' : 'lines'
  const message =
    `${read.skipped} ${lines} of the upload did not read as ${FORMAT_NAMES[read.format]}; nothing was published. ` +
    `Line ${first.line}: ${first.message}. Fix them, or add ?skipBad=1 to learn from the rest`
  return new ApiError(422, first.code, message, {
    format: read.format,
    lines: read.lines + read.skipped,
    skipped: read.skipped,
    problems: read.problems,
  })
}

/**
 * Nothing read: say so for an empty body; otherwise read the start of the body again, as the format chosen
 * (or sniffed, as `readLexicon` does), to show the first bad lines.
 */
async function nothingRead(
  body: UploadBody,
  given: LexiconFormat | undefined,
  problem: Problem,
): Promise<ApiError> {
  if (body.bytes === 0) {
    return new ApiError(422, 'no-entries', 'the body is empty; nothing was published', {
      problems: [problem],
    })
  }
  const prefix = body.prefix()
  const format = given ?? (await sniffFormat(prefix))
  const again = streamRecords(prefix, PARSERS[format], { file: UPLOAD_FILE, skipBad: true })
  for await (const _ of again) {
    // only the problems are wanted
  }
  const how = given ? FORMAT_NAMES[format] : `${FORMAT_NAMES[format]}, as its first data line suggests`
  return new ApiError(
    422,
    'no-entries',
    `no line of the upload read as ${how}; nothing was published: ${problem.message}`,
    { format, problems: again.summary.problems.length > 0 ? again.summary.problems : [problem] },
  )
}

/** The format `readLexicon` sniffs from the first data lines (table rows when none says otherwise). */
async function sniffFormat(bytes: Uint8Array): Promise<LexiconFormat> {
  for await (const item of readLines(bytes, { file: UPLOAD_FILE })) {
    if (item.problem) continue
    const format = sniffLexiconLine(item.text)
    if (format) return format
  }
  return 'rows'
}
