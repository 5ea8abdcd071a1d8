// Learning on several threads. Each part of speech's cell rankers and predicted tables depend only on the
// shared start (the paradigm book and the whole-table ranker), so worker threads take whole UPOS groups
// while this thread trains the table ranker and then its own group. The model is the same byte for byte
// whatever the number of threads (test/cli/threaded-learn.test.ts).
import { availableParallelism } from 'node:os'
import { getHeapStatistics } from 'node:v8'
import { Worker } from 'node:worker_threads'
import { learnCells, learnEdits, learnFromLexicon, startLearning, twinBook } from '../core/inflect/learn.ts'
import { trainTableRanker } from '../core/inflect/table-ranker.ts'
import type { Entry } from '../core/lexicon/entry.ts'
import { buildLexicon, type LexEntry, type Lexicon } from '../core/lexicon/lexicon.ts'
import { packEntries } from '../core/lexicon/lexicon-pack.ts'
import {
  assembleModel,
  buildModel,
  type CorpusCounts,
  keepAll,
  modelFromInflection,
} from '../core/model/build-model.ts'
import { decodeAllCellRules } from '../core/model/cell-rules-codec.ts'
import { DEFAULT_MODEL_OPTIONS, type KeptTable, type Model, type ModelOptions } from '../core/model/model.ts'
import { roundModelWeights } from '../core/model/weights-codec.ts'
import type { WorkerDone, WorkerRankers, WorkerStart } from './learn-worker.ts'

/** Threads `formfold learn` uses unless told: one per core, at most 8. */
export function defaultJobs(): number {
  return Math.max(1, Math.min(8, availableParallelism()))
}

/**
 * Fewer tables than this are learned on one thread: starting a thread (loading its code) takes about a second,
 * and learning them takes a few.
 */
export const THREADED_FROM_TABLES = 10_000

/**
 * Learn a model as buildModel does, on up to `jobs` threads: on one with a corpus, with a single UPOS, or
 * with fewer than `fromTables` tables.
 * @example (await buildModelThreaded(entries, {}, undefined, 2)).index.formCount // as buildModel(entries)
 */
export async function buildModelThreaded(
  entries: Iterable<Entry>,
  opts: Partial<ModelOptions> = {},
  corpus?: CorpusCounts,
  jobs = defaultJobs(),
  fromTables = THREADED_FROM_TABLES,
): Promise<Model> {
  if (corpus || jobs < 2) return buildModel(entries, opts, corpus)
  const options = { ...DEFAULT_MODEL_OPTIONS, ...opts }
  // Threads load their code (about a second or two) while this one builds the lexicon and the book: started
  // now when the entries are surely enough to use them, and stopped unused if the split needs fewer.
  const list = Array.isArray(entries) ? (entries as Entry[]) : [...entries]
  const spawned: GroupWorker[] = []
  const spawn = () => {
    const w = new GroupWorker(options)
    spawned.push(w)
    return w
  }
  try {
    if (list.length >= fromTables) for (let k = 1; k < jobs; k++) spawn()
    const lexicon = buildLexicon(list)
    const groups = planGroups(lexicon, jobs)
    const tables = lexicon.entries.reduce((n, e) => n + (e.cells ? 1 : 0), 0)
    if (groups.length < 2 || tables < fromTables)
      return modelFromInflection(learnFromLexicon(lexicon, options.learn), options)
    const workers = spawned.slice(0, groups.length - 1)
    for (const w of spawned.slice(workers.length)) void w.worker.terminate()
    const learn = options.learn
    const start = startLearning(lexicon, learn)
    const { book, finder, members } = twinBook(lexicon, start, learn)
    const { alternations } = start
    for (let k = 0; k < groups.length - 1; k++) {
      workers[k] ??= spawn()
      workers[k]!.start(lexicon, new Set(groups[k + 1]), book, members, alternations)
    }
    const weights = trainTableRanker(lexicon, book, finder, alternations, learn)
    const edits = learnEdits(lexicon, book, learn)
    for (const w of workers) w.rankers({ weights, ...(edits && { edits }) })
    // This thread's group, and every bare lemma of a UPOS without tables (no paradigm: no table kept).
    const mine = new Set(groups[0])
    const elsewhere = new Set(groups.slice(1).flat())
    const base = { lexicon, book, alternations, weights, finder, options: learn, ...(edits && { edits }) }
    const own = learnCells(lexicon, alternations, learn, mine)
    const kept = keepAll(
      roundModelWeights({ ...base, cells: own }, options.weightDecimals),
      options,
      (e) => !elsewhere.has(e.upos),
    )
    const cellsOf = new Map(groups[0]!.map((u) => [u, own.filter((c) => c.upos === u)]))
    for (const w of workers) {
      const done = await w.result
      const decoded = decodeAllCellRules(
        done.cells,
        w.entries,
        (u) => lexicon.cellKeys[u] ?? [],
        alternations,
        learn.twins,
      )
      for (const u of w.upos)
        cellsOf.set(
          u,
          decoded.filter((c) => c.upos === u),
        )
      done.kept.forEach((k, i) => {
        if (k) kept[w.index[i]!] = k as KeptTable[]
      })
    }
    // Cells in the order one thread learns them: UPOS by UPOS as the lexicon lists them.
    const cells = Object.keys(lexicon.cellKeys).flatMap((u) => cellsOf.get(u) ?? [])
    const inflection = roundModelWeights({ ...base, cells }, options.weightDecimals)
    return assembleModel(inflection, kept, options)
  } finally {
    for (const w of spawned) void w.worker.terminate()
  }
}

/**
 * The UPOS tags with tables split into at most `jobs` groups of about equal work (entries, largest first,
 * each to the lightest group); this thread takes the first. A heuristic: any split gives the same model.
 * @example planGroups(lexicon, 2) // [['NOUN'], ['ADJ', 'VERB']]
 */
export function planGroups(lexicon: Lexicon, jobs: number): string[][] {
  const size = new Map<string, number>()
  for (const e of lexicon.entries) if (lexicon.cellKeys[e.upos]) size.set(e.upos, (size.get(e.upos) ?? 0) + 1)
  const tags = [...size.keys()].sort((a, b) => size.get(b)! - size.get(a)! || (a < b ? -1 : 1))
  const groups: { tags: string[]; load: number }[] = []
  for (const u of tags) {
    if (groups.length < jobs) groups.push({ tags: [u], load: size.get(u)! })
    else {
      const light = groups.reduce((a, g) => (g.load < a.load ? g : a))
      light.tags.push(u)
      light.load += size.get(u)!
    }
  }
  return groups.map((g) => g.tags)
}

/** One worker thread learning the cells and predicted tables of a group of UPOS tags. */
class GroupWorker {
  readonly worker: Worker
  /** The group's tags, its entries in lexicon order, and the lexicon number of each (set by `start`). */
  upos: ReadonlySet<string> = new Set()
  readonly entries: LexEntry[] = []
  readonly index: number[] = []
  readonly result: Promise<WorkerDone>

  constructor(private readonly options: ModelOptions) {
    const limit = Math.ceil(getHeapStatistics().heap_size_limit / 2 ** 20)
    this.worker = new Worker(new URL('./learn-worker.mjs', import.meta.url), {
      resourceLimits: { maxOldGenerationSizeMb: limit },
    })
    this.result = new Promise<WorkerDone>((resolve, reject) => {
      this.worker.once('message', (m: WorkerDone | { error: string }) =>
        'error' in m ? reject(new Error(`learning thread: ${m.error}`)) : resolve(m),
      )
      this.worker.once('error', reject)
      this.worker.once('exit', (code) => reject(new Error(`learning thread stopped (exit code ${code})`)))
    })
    this.result.catch(() => {}) // awaited in turn; an early failure is not unhandled meanwhile
  }

  /** Give the thread its group and the shared start: it learns the group's cell rankers. */
  start(
    lexicon: Lexicon,
    upos: ReadonlySet<string>,
    book: WorkerStart['book'],
    members: string[][],
    alternations: WorkerStart['alternations'],
  ): void {
    this.upos = upos
    lexicon.entries.forEach((e, i) => {
      if (!upos.has(e.upos)) return
      this.entries.push(e)
      this.index.push(i)
    })
    const cellKeys = Object.fromEntries([...upos].map((u) => [u, lexicon.cellKeys[u]!]))
    const start: WorkerStart = {
      packed: packEntries(this.entries),
      cellKeys,
      inflectional: lexicon.inflectional,
      book: { paradigms: book.paradigms, memberOf: this.index.map((i) => book.memberOf[i]!) },
      members,
      alternations,
      options: this.options,
    }
    this.worker.postMessage(start)
  }

  rankers(r: WorkerRankers): void {
    this.worker.postMessage(r)
  }
}
