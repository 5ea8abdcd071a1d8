// Streaming expansion: tables of a lemma list as JSON lines or TSV rows, computed one lemma per pull.
import type { ExpandedTable } from '../core/inflect/expand.ts'
import { encodeLines } from '../formats/encode-lines.ts'
import { formatJsonLine } from '../formats/jsonl-writer.ts'
import { formatTableRow } from '../formats/rows-writer.ts'
import type { LemmaRequest } from './lemma-requests.ts'

/** The two streamed formats: one JSON object a line (a table per lemma), or TSV table rows. */
export type ExpandFormat = 'jsonl' | 'tsv'

/** Media types of the two formats. */
export const EXPAND_MEDIA_TYPES: Record<ExpandFormat, string> = {
  jsonl: 'application/jsonl; charset=utf-8',
  tsv: 'text/tab-separated-values; charset=utf-8',
}

/**
 * The format an `Accept` header asks for: TSV for `text/tab-separated-values` (or `text/tsv`), else JSON lines.
 * @example expandFormat('text/tab-separated-values') // 'tsv'
 */
export function expandFormat(accept: string | undefined): ExpandFormat {
  return /\btext\/(tab-separated-values|tsv)\b/i.test(accept ?? '') ? 'tsv' : 'jsonl'
}

/** How one lemma is expanded (null: no learned paradigm applies). */
export type Expander = (request: LemmaRequest) => ExpandedTable | null

/**
 * The lines of an expansion, one lemma's table per line group. A lemma no paradigm fits is said so, in
 * place: a JSON line with `table: null`, or a `#` comment in TSV (which the table-rows reader skips).
 * @example [...expansionLines([{ lemma: 'vessa', upos: 'NOUN', feats: '_' }], expand, 'tsv', true)]
 */
export function* expansionLines(
  lemmas: Iterable<LemmaRequest>,
  expand: Expander,
  format: ExpandFormat,
  scores: boolean,
): Generator<string> {
  if (format === 'tsv') yield `# lemma\tform\tupos\tfeats${scores ? '\tsource\tscore' : ''}\n`
  for (const request of lemmas) {
    const table = expand(request)
    if (format === 'jsonl') {
      yield `${formatJsonLine(table ?? { lemma: request.lemma, upos: request.upos, inherent: request.feats, table: null })}\n`
      continue
    }
    if (!table) {
      yield `# no paradigm applies: ${request.lemma}\t${request.upos}\n`
      continue
    }
    let out = ''
    for (const f of table.forms) {
      const row = {
        lemma: table.lemma,
        form: f.form,
        upos: table.upos,
        feats: f.feats,
        source: f.source,
        score: f.score,
      }
      out += `${formatTableRow(row, { scores })}\n`
    }
    yield out
  }
}

/**
 * The expansion as a byte stream: each pull computes the next lemma only, so the first rows leave before
 * the last lemma is expanded, and a client that stops reading stops the work.
 * @example new Response(expansionStream(lemmas, expand, 'jsonl', false), { headers: { 'content-type': EXPAND_MEDIA_TYPES.jsonl } })
 */
export function expansionStream(
  lemmas: Iterable<LemmaRequest>,
  expand: Expander,
  format: ExpandFormat,
  scores: boolean,
): ReadableStream<Uint8Array> {
  return encodeLines(expansionLines(lemmas, expand, format, scores))
}
