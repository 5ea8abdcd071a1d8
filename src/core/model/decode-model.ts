// Reading a model file: check format and version, rebuild the inflection model and the form index.
import { learnAlternations } from '../inflect/alternations.ts'
import { learnEditFactors } from '../inflect/edit-factor.ts'
import { CandidateFinder } from '../inflect/candidates.ts'
import type { InflectionModel } from '../inflect/learn.ts'
import type { Paradigm } from '../inflect/paradigm.ts'
import { tiedClasses, twinMembers, twinParadigms } from '../inflect/twins.ts'
import type { Cell, LexEntry } from '../lexicon/lexicon.ts'
import { type Problem, ProblemError } from '../lexicon/problem.ts'
import { assembleModel } from './build-model.ts'
import { decodeAllCellRules } from './cell-rules-codec.ts'
import { checkModelJson, smokeTestModel } from './check-model.ts'
import { decodeCorpus } from './corpus-codec.ts'
import { MODEL_FORMAT, MODEL_VERSION, type ModelJson } from './encode-model.ts'
import type { KeptTable, Model } from './model.ts'
import { decodeParadigm, shareCellForms } from './paradigm-codec.ts'
import { decodeTable, type TableJson } from './table-codec.ts'
import { decodeWeights } from './weights-codec.ts'

/**
 * Read a model file, or say why not (code `bad-model`): not JSON, not a formfold model, a newer major
 * version than this reader, or contents that do not fit together.
 * @example readModel(text).ok // true
 */
export function readModel(text: string): { ok: true; model: Model } | { ok: false; problem: Problem } {
  try {
    return { ok: true, model: decodeModel(text) }
  } catch (err) {
    if (err instanceof ProblemError) return { ok: false, problem: err.problem }
    return { ok: false, problem: { code: 'bad-model', message: `model file: ${(err as Error).message}` } }
  }
}

/**
 * Read a model file; throws `ProblemError` (code `bad-model`) where `readModel` returns the problem.
 * @example decodeModel(encodeModel(model)).index.formCount === model.index.formCount // true
 */
export function decodeModel(text: string): Model {
  let json: ModelJson
  try {
    json = JSON.parse(text)
  } catch {
    throw bad('not JSON')
  }
  const head = decodeModelHead(json)
  const model = assembleModel(head.inflection, head.kept, head.options)
  if (head.corpusTokens !== undefined) model.corpusTokens = head.corpusTokens
  smokeTestModel(model)
  return model
}

/** A model without its form index: what a sharded model's manifest carries besides its shard list. */
export type ModelHead = Omit<Model, 'index'>

/** How a head is read. */
export interface HeadOptions {
  /**
   * Keep each attested table as its compact record and decode it whenever it is read (every record is still
   * decoded and checked once while reading): a sharded model's head at the edge, where decoded tables
   * would be most of an isolate's memory (about 190 MB for the whole German model) and few are ever read.
   * A bare lemma's kept tables that carry cells of their own are kept so too.
   */
  lazyTables?: boolean
}

/**
 * Check a parsed model file and rebuild everything but the form index (a sharded model reads its index
 * from shards); throws `ProblemError` (`bad-model`) like `decodeModel`.
 * @example decodeModelHead(JSON.parse(text)).inflection.book.paradigms.length // 31
 */
export function decodeModelHead(json: ModelJson, opts: HeadOptions = {}): ModelHead {
  checkHeader(json)
  checkModelJson(json as unknown as Record<string, unknown>)
  const cellsOf = (u: string) => json.cellKeys[u] ?? []
  const learned = json.paradigms.map((p) => decodeParadigm(p, cellsOf(p.upos)))
  // Twins are derived from the book exactly as learning derives them (nothing of theirs is in the file).
  const twinOpts = json.options.learn.twins
  const alternations = learnAlternations(learned, twinOpts)
  const twins = twinParadigms(learned, alternations)
  const paradigms = [...learned, ...twins]
  shareCellForms(paradigms)
  const entries: LexEntry[] = []
  const memberOf: number[] = []
  const kept: (KeptTable[] | null)[] = []
  const books = new Map<string, Book>()
  const bookOf = (upos: string) => {
    let b = books.get(upos)
    if (!b) books.set(upos, (b = { paradigms, cellKeys: cellsOf(upos) }))
    return b
  }
  for (const [lemma, u, f, table] of json.entries) {
    const upos = json.upos[u]
    const inherent = json.feats[f]
    if (typeof lemma !== 'string' || upos === undefined || inherent === undefined)
      throw bad(`bad entry ${lemma}`)
    const t = decodeTable(lemma, table, paradigms, cellsOf(upos))
    if ('kept' in t) {
      entries.push({ lemma, upos, inherent, cells: null })
      memberOf.push(-1)
      kept.push(opts.lazyTables ? lazyKept(lemma, t.kept, table, bookOf(upos)) : t.kept)
    } else {
      entries.push(opts.lazyTables ? new LazyTableEntry(lemma, upos, inherent, table, bookOf(upos)) : { lemma, upos, inherent, cells: t.cells })
      memberOf.push(t.paradigm)
      kept.push(null)
    }
  }
  // The finder is rebuilt exactly as learning builds it: each paradigm's member lemmas, in entry order.
  const members: string[][] = learned.map(() => [])
  memberOf.forEach((p, i) => {
    if (p >= 0) members[p]!.push(entries[i]!.lemma)
  })
  members.push(...twinMembers(twins, members, alternations))
  const weights = decodeWeights(json.weights, json.featureNames)
  if (twinOpts?.tie) weights.classOf = tiedClasses(paradigms, alternations)
  const inflection: InflectionModel = {
    lexicon: { entries, cellKeys: json.cellKeys, inflectional: json.inflectional, problems: [] },
    book: { paradigms, memberOf },
    alternations,
    weights,
    finder: new CandidateFinder(paradigms, members, alternations, twinOpts),
    cells: decodeAllCellRules(json.cellRules ?? [], entries, cellsOf, alternations, twinOpts, json.featureNames),
    options: json.options.learn,
  }
  shareCellForms(inflection.cells.flatMap((c) => c.rules))
  // The edit factor is learned again from the stored tables, as learning made it (nothing of it is stored).
  if (json.options.learn.edits) {
    inflection.edits = learnEditFactors(entries, paradigms, memberOf, json.options.learn.ranker)
  }
  const corpus = decodeCorpus(json.corpus, inflection.lexicon)
  if (corpus) inflection.corpus = corpus
  const { tablesPerLemma, tableFloor, weightDecimals, learn } = json.options
  // Version 1.0 files written before completion existed have no such fields: completion off.
  const completion = json.options.completion ?? 0
  const completionTables = json.options.completionTables ?? tablesPerLemma
  const options = { tablesPerLemma, tableFloor, weightDecimals, learn, completion, completionTables }
  const head: ModelHead = { inflection, kept, options }
  if (json.corpus) head.corpusTokens = json.corpus.tokens
  return head
}

/**
 * An attested entry whose `cells` are decoded from its table record on every read: five fields and a getter
 * its class shares (a getter per entry would give every entry a closure and a hidden class of its own).
 * Written out (`JSON.stringify`) it is the plain entry.
 */
class LazyTableEntry implements LexEntry {
  constructor(
    readonly lemma: string,
    readonly upos: string,
    readonly inherent: string,
    private readonly table: TableJson,
    private readonly book: Book,
  ) {}

  get cells(): Cell[] {
    return (decodeTable(this.lemma, this.table, this.book.paradigms, this.book.cellKeys) as { cells: Cell[] }).cells
  }

  toJSON(): LexEntry {
    return { lemma: this.lemma, upos: this.upos, inherent: this.inherent, cells: this.cells }
  }
}

/** A UPOS's paradigms and cell keys, shared by the lazy tables of its entries. */
interface Book {
  paradigms: readonly Paradigm[]
  cellKeys: readonly string[]
}

/** Kept tables with cells of their own (mixed from cell predictions) as lazy tables; the others as they are. */
function lazyKept(lemma: string, tables: KeptTable[], json: TableJson, book: Book): KeptTable[] {
  const records = json as [number, number, ...unknown[]][]
  return tables.map((t, i) => (t.cells ? new LazyKeptTable(lemma, t, records[i]!, book) : t))
}

/**
 * A kept table whose `cells` are decoded from its record on every read (the class shares the getter).
 * Written out it is the plain kept table.
 */
class LazyKeptTable implements KeptTable {
  readonly paradigm: number
  readonly score: number
  readonly completes?: true

  constructor(
    private readonly lemma: string,
    t: KeptTable,
    private readonly record: [number, number, ...unknown[]],
    private readonly book: Book,
  ) {
    this.paradigm = t.paradigm
    this.score = t.score
    if (t.completes) this.completes = true
  }

  get cells(): Cell[] {
    const one = [this.record] as TableJson
    return (decodeTable(this.lemma, one, this.book.paradigms, this.book.cellKeys) as { kept: KeptTable[] }).kept[0]!
      .cells!
  }

  toJSON(): KeptTable {
    const out: KeptTable = { paradigm: this.paradigm, score: this.score, cells: this.cells }
    if (this.completes) out.completes = true
    return out
  }
}

function checkHeader(json: ModelJson): void {
  if (!json || typeof json !== 'object' || json.format !== MODEL_FORMAT)
    throw bad(`not a ${MODEL_FORMAT} file`)
  const major = Number(String(json.version).split('.')[0])
  const ours = Number(MODEL_VERSION.split('.')[0])
  if (!Number.isInteger(major)) throw bad(`unreadable version "${json.version}"`)
  if (major > ours) {
    throw bad(
      `format version ${json.version} is newer than this reader (${MODEL_VERSION}); upgrade formfold to read it`,
    )
  }
  if (major < ours)
    throw bad(`format version ${json.version} is older than ${MODEL_VERSION}; learn the model again`)
  for (const k of ['upos', 'feats', 'paradigms', 'entries'] as const)
    if (!Array.isArray(json[k])) throw bad(`missing "${k}"`)
  if (!json.weights || !json.options || !json.cellKeys) throw bad('missing weights, options or cellKeys')
}

function bad(message: string): ProblemError {
  return new ProblemError({ code: 'bad-model', message: `model file: ${message}` })
}
