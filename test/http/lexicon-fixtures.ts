// Small lexicon uploads for the learning suite: demo-language tables and lemma-only entries in each input format.
import type { Entry } from '../../src/core/lexicon/entry.ts'
import { canonicalizeFeats } from '../../src/core/lexicon/feats.ts'
import { buildModel } from '../../src/core/model/build-model.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import { encodeModel } from '../../src/core/model/encode-model.ts'
import { entryToJson, readLexicon, toJsonLines } from '../../src/formats/index.ts'
import { DEMO_MODEL_TEXT } from '../../src/http/demo-model.generated.ts'

/** How many tables and lemma-only entries the small lexicon has (every n-th of the demo dictionary's). */
const TABLES = 48
const LEMMA_ONLY = 12

/** The small lexicon in every format the write route reads. */
export interface SmallLexicon {
  entries: Entry[]
  /** Table rows of the entries with a table (`lemma<TAB>form<TAB>upos<TAB>feats`). */
  rowsTsv: string
  /** Every entry, lemma-only ones without `forms`. */
  entriesJsonl: string
  /** The lemma-only entries as a lemma list (`lemma<TAB>upos<TAB>feats`). */
  lemmasTsv: string
}

let small: SmallLexicon | undefined

/**
 * Tables and lemma-only entries of the demo language (the dictionary the embedded demo model was learned
 * from), spread over its UPOS: small enough to learn in a moment in either runtime.
 * @example smallLexicon().rowsTsv.split('\n')[0] // 'ahma\tahma\tADJ\tCase=Nom|Degree=Pos|Number=Sing'
 */
export function smallLexicon(): SmallLexicon {
  if (small) return small
  const lex = decodeModel(DEMO_MODEL_TEXT).inflection.lexicon.entries
  const withTable = lex.filter((e) => e.cells)
  const bare = lex.filter((e) => !e.cells)
  const every = <T>(xs: T[], n: number) =>
    xs.filter((_, i) => i % Math.floor(xs.length / n) === 0).slice(0, n)
  const entries: Entry[] = [
    ...every(withTable, TABLES).map((e) => ({
      lemma: e.lemma,
      upos: e.upos,
      feats: '_',
      forms: e.cells!.flatMap((c) =>
        c.forms.map((form) => ({ form, feats: withInherent(e.inherent, c.key) })),
      ),
    })),
    ...every(bare, LEMMA_ONLY).map((e) => ({ lemma: e.lemma, upos: e.upos, feats: e.inherent })),
  ]
  const rows = entries.flatMap((e) =>
    (e.forms ?? []).map((f) => `${e.lemma}\t${f.form}\t${e.upos}\t${f.feats}\n`),
  )
  const lemmas = entries.filter((e) => !e.forms).map((e) => `${e.lemma}\t${e.upos}\t${e.feats}\n`)
  small = {
    entries,
    rowsTsv: rows.join(''),
    entriesJsonl: toJsonLines(entries.map(entryToJson)),
    lemmasTsv: lemmas.join(''),
  }
  return small
}

function withInherent(inherent: string, cell: string): string {
  if (inherent === '_') return cell
  const r = canonicalizeFeats(`${inherent}|${cell}`)
  if (!r.ok) throw new Error(r.problem.message)
  return r.feats
}

/**
 * The model file `formfold learn` writes for a lexicon text: its reader, `buildModel` and `encodeModel`,
 * as `src/cli/learn-command.ts` calls them.
 * @example await learnedLikeTheCli(smallLexicon().rowsTsv, 'tables.tsv')
 */
export async function learnedLikeTheCli(text: string, file: string): Promise<string> {
  const read = await readLexicon(new TextEncoder().encode(text), { file, skipBad: false })
  return encodeModel(buildModel(read.entries))
}

/**
 * Hex SHA-256 of a text's UTF-8 bytes.
 * @example await sha256OfText('abc') // 'ba7816bf…'
 */
export async function sha256OfText(text: string): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text))
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('')
}

/**
 * Gzip bytes with the web `CompressionStream` (the same in Node and workerd).
 * @example await gzip(new TextEncoder().encode('a\tNOUN\n'))
 */
export async function gzip(bytes: Uint8Array): Promise<Uint8Array<ArrayBuffer>> {
  const stream = new Blob([bytes as Uint8Array<ArrayBuffer>])
    .stream()
    .pipeThrough(new CompressionStream('gzip'))
  return new Uint8Array(await new Response(stream).arrayBuffer())
}
