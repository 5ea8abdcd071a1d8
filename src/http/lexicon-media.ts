// Which lexicon format an upload declares: its media type, a `format` parameter on it or in the query, or sniffing.
import type { LexiconFormat } from '../formats/index.ts'
import { ApiError } from './api-error.ts'

/** Media types of table rows and lemma lists (the `format` parameter, or sniffing, tells them apart). */
export const TSV_MEDIA_TYPES: readonly string[] = ['text/tab-separated-values']

/** Media types of entries, one JSON object a line. */
export const JSONL_MEDIA_TYPES: readonly string[] = ['application/jsonl', 'application/x-ndjson']

/** Every lexicon media type a write reads. */
export const LEXICON_MEDIA_TYPES: readonly string[] = [...TSV_MEDIA_TYPES, ...JSONL_MEDIA_TYPES]

const TSV_FORMATS: readonly LexiconFormat[] = ['rows', 'lemmas']

/** What a lexicon upload's headers and query say about its content. */
export interface LexiconMedia {
  /** The format to read; `undefined`: sniff it from the first data line, as `formfold learn` does. */
  format: LexiconFormat | undefined
}

/**
 * The `name=value` parameters of a Content-Type header, names lowercased, quotes removed.
 * @example mediaParameters('text/tab-separated-values; charset=UTF-8; format=lemmas') // { charset: 'UTF-8', format: 'lemmas' }
 */
export function mediaParameters(contentType: string): Record<string, string> {
  const out: Record<string, string> = {}
  for (const part of contentType.split(';').slice(1)) {
    const eq = part.indexOf('=')
    if (eq < 0) continue
    out[part.slice(0, eq).trim().toLowerCase()] = part
      .slice(eq + 1)
      .trim()
      .replace(/^"(.*)"$/, '$1')
  }
  return out
}

/**
 * The format of a lexicon upload, or `null` when the media type is not a lexicon one. `format` may come as a
 * media-type parameter or as the query's `format`; given twice it must agree, and it must fit the media type
 * (table rows and lemma lists are TSV, entries are JSON lines). Text is UTF-8 only.
 * @example lexiconMediaOf('application/jsonl', undefined) // { format: 'entries' }
 */
export function lexiconMediaOf(
  contentType: string,
  queryFormat: LexiconFormat | undefined,
): LexiconMedia | null {
  const type = contentType.split(';')[0]!.trim().toLowerCase()
  if (!LEXICON_MEDIA_TYPES.includes(type)) return null
  const params = mediaParameters(contentType)
  const charset = params.charset?.toLowerCase()
  if (charset !== undefined && charset !== 'utf-8' && charset !== 'utf8') {
    throw new ApiError(415, 'unsupported-media-type', `lexicons are read as UTF-8, not ${params.charset}`, {
      contentType,
    })
  }
  const given = params.format
  if (given !== undefined && given !== 'rows' && given !== 'entries' && given !== 'lemmas') {
    throw invalid(`format=${given} is not a lexicon format (rows, entries or lemmas)`, { format: given })
  }
  if (given !== undefined && queryFormat !== undefined && given !== queryFormat) {
    throw invalid(`the media type says format=${given} and the query format=${queryFormat}`, {
      format: [given, queryFormat],
    })
  }
  const format = (given as LexiconFormat | undefined) ?? queryFormat
  if (JSONL_MEDIA_TYPES.includes(type)) {
    if (format !== undefined && format !== 'entries') {
      throw invalid(`${type} carries entries; send ${format} as text/tab-separated-values`, { format })
    }
    return { format: 'entries' }
  }
  if (format !== undefined && !TSV_FORMATS.includes(format)) {
    throw invalid(`entries are JSON lines; send them as ${JSONL_MEDIA_TYPES[0]}`, { format })
  }
  return { format }
}

function invalid(message: string, details: Record<string, unknown>): ApiError {
  return new ApiError(400, 'invalid-request', message, details)
}
