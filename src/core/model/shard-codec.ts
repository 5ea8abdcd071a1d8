// One shard file of a sharded model: the form-index records of the forms routed to it (see FORMAT.md).
import type { LexEntry } from '../lexicon/lexicon.ts'
import { ProblemError } from '../lexicon/problem.ts'
import type { IndexedAnalysis } from '../lookup/form-index.ts'
import { FormIndexBuilder, type MemoryFormIndex } from '../lookup/memory-index.ts'

export const SHARD_FORMAT = 'formfold-shard'
export const SHARD_VERSION = '1.0'

/** A shard file: its place, its FEATS bundles, and per form `[form, entry, feats, (paradigm, score×10⁴)…]`. */
export interface ShardJson {
  format: typeof SHARD_FORMAT
  version: string
  shard: number
  shards: number
  feats: string[]
  forms: (string | number)[][]
}

/** What a shard's numbers refer to: the model's entries, their paradigms, the paradigm ids. */
export interface ShardContext {
  entries: readonly LexEntry[]
  memberOf: readonly number[]
  paradigmIds: readonly string[]
}

/** Entry index of (lemma, UPOS) and paradigm index of an id, for writing shards. */
export interface ShardIds {
  entry: ReadonlyMap<string, number>
  paradigm: ReadonlyMap<string, number>
}

/**
 * Write one shard: the given forms in the given order, each with its analyses in answer order. An
 * attested analysis is `entry, feats` (its score is 1, its paradigm the entry's own); a predicted one
 * adds `paradigm, score×10⁴`.
 * @example encodeShard(0, 4, [['Tage', model.index.get('Tage')!]], ids)
 */
export function encodeShard(
  shard: number,
  shards: number,
  forms: readonly (readonly [string, readonly IndexedAnalysis[]])[],
  ids: ShardIds,
): string {
  const feats: string[] = []
  const featsId = new Map<string, number>()
  const rows = forms.map(([form, analyses]) => {
    const row: (string | number)[] = [form]
    for (const a of analyses) {
      const e = ids.entry.get(`${a.lemma}\t${a.upos}`)
      if (e === undefined) throw new Error(`${form}: no entry ${a.lemma} (${a.upos})`)
      let f = featsId.get(a.feats)
      if (f === undefined) {
        f = feats.push(a.feats) - 1
        featsId.set(a.feats, f)
      }
      row.push(e, f)
      if (a.source === 'predicted') {
        row.push(a.paradigm === null ? -1 : ids.paradigm.get(a.paradigm)!, Math.round(a.score * 1e4))
      }
    }
    return row
  })
  const json: ShardJson = { format: SHARD_FORMAT, version: SHARD_VERSION, shard, shards, feats, forms: rows }
  return JSON.stringify(json)
}

/**
 * Read a shard into an in-memory index of its forms; throws `ProblemError` (`bad-model`) when the text is
 * not the shard `shard` of `shards` or refers to entries, FEATS or paradigms that do not exist.
 * @example decodeShard(text, 2, 8, context).get('Tage')
 */
export function decodeShard(text: string, shard: number, shards: number, ctx: ShardContext): MemoryFormIndex {
  let json: ShardJson
  try {
    json = JSON.parse(text)
  } catch {
    throw bad(shard, 'not JSON')
  }
  if (!json || json.format !== SHARD_FORMAT || !Array.isArray(json.forms) || !Array.isArray(json.feats))
    throw bad(shard, `not a ${SHARD_FORMAT} file`)
  if (String(json.version).split('.')[0] !== SHARD_VERSION.split('.')[0])
    throw bad(shard, `version ${json.version} is not readable by this reader (${SHARD_VERSION})`)
  if (json.shard !== shard || json.shards !== shards)
    throw bad(shard, `it is shard ${json.shard} of ${json.shards}, not ${shard} of ${shards}`)
  const builder = new FormIndexBuilder()
  for (const row of json.forms) {
    const form = row[0]
    if (typeof form !== 'string' || !Array.isArray(row)) throw bad(shard, 'malformed form row')
    let i = 1
    while (i < row.length) {
      const e = row[i++] as number
      const feats = json.feats[row[i++] as number]
      const entry = ctx.entries[e]
      if (!entry || typeof feats !== 'string') throw bad(shard, `${form}: bad entry or FEATS reference`)
      if (entry.cells) {
        builder.add(form, e, feats, 'attested', 1, ctx.memberOf[e] ?? -1)
        continue
      }
      const p = row[i++] as number
      const score = row[i++] as number
      if (!Number.isInteger(p) || p >= ctx.paradigmIds.length || !Number.isInteger(score))
        throw bad(shard, `${form}: bad paradigm or score`)
      builder.add(form, e, feats, 'predicted', score / 1e4, p)
    }
  }
  return builder.build(ctx.entries, ctx.paradigmIds)
}

function bad(shard: number, message: string): ProblemError {
  return new ProblemError({ code: 'bad-model', message: `model shard ${shard}: ${message}` })
}
