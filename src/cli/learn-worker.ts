// A learning thread (see threaded-learn.ts): learns the cell rankers of its UPOS group, then, given the
// table ranker, predicts the group's bare lemmas; sends back the cells as a model file has them.
import { parentPort } from 'node:worker_threads'
import type { Alternations } from '../core/inflect/alternations.ts'
import { CandidateFinder } from '../core/inflect/candidates.ts'
import type { EditFactors } from '../core/inflect/edit-factor.ts'
import type { ParadigmBook } from '../core/inflect/extract.ts'
import { learnCells } from '../core/inflect/learn.ts'
import type { RankerWeights } from '../core/inflect/ranker.ts'
import type { Lexicon } from '../core/lexicon/lexicon.ts'
import { type PackedEntries, unpackEntries } from '../core/lexicon/lexicon-pack.ts'
import { keepAll } from '../core/model/build-model.ts'
import { type CellRulesJson, encodeAllCellRules } from '../core/model/cell-rules-codec.ts'
import type { KeptTable, ModelOptions } from '../core/model/model.ts'
import { roundModelWeights } from '../core/model/weights-codec.ts'

/** What a learning thread is given first: its group's entries and the shared start. */
export interface WorkerStart {
  packed: PackedEntries
  cellKeys: Record<string, string[]>
  inflectional: Record<string, string[]>
  /** The book, with `memberOf` for the group's entries. */
  book: ParadigmBook
  members: string[][]
  alternations: Alternations
  options: ModelOptions
}

/** What it is given once the table ranker is trained. */
export interface WorkerRankers {
  weights: RankerWeights
  edits?: EditFactors
}

/** What it sends back: its cells (as a model file writes them, over its entries) and kept tables per entry. */
export interface WorkerDone {
  cells: CellRulesJson[]
  kept: (KeptTable[] | null)[]
}

const port = parentPort
if (!port) throw new Error('learn-worker.ts runs as a worker thread (see threaded-learn.ts)')
let started: { s: WorkerStart; lexicon: Lexicon; cells: ReturnType<typeof learnCells> } | undefined

port.on('message', (m: WorkerStart | WorkerRankers) => {
  try {
    if ('packed' in m) {
      const lexicon: Lexicon = {
        entries: unpackEntries(m.packed),
        cellKeys: m.cellKeys,
        inflectional: m.inflectional,
        problems: [],
      }
      started = { s: m, lexicon, cells: learnCells(lexicon, m.alternations, m.options.learn) }
      return
    }
    if (!started) throw new Error('table ranker before start')
    const { s, lexicon, cells } = started
    const learn = s.options.learn
    const finder = new CandidateFinder(s.book.paradigms, s.members, s.alternations, learn.twins)
    const model = {
      lexicon,
      book: s.book,
      alternations: s.alternations,
      weights: m.weights,
      finder,
      cells,
      options: learn,
      ...(m.edits && { edits: m.edits }),
    }
    const kept = keepAll(roundModelWeights(model, s.options.weightDecimals), s.options)
    const json = encodeAllCellRules(
      cells,
      lexicon.entries,
      (u) => lexicon.cellKeys[u] ?? [],
      s.options.weightDecimals,
    )
    const done: WorkerDone = { cells: json, kept }
    port.postMessage(done)
  } catch (e) {
    port.postMessage({ error: e instanceof Error ? (e.stack ?? e.message) : String(e) })
  }
})
