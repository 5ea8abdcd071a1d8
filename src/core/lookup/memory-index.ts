// The whole form index in memory: one hash lookup to a slot, the slot's analyses packed in typed arrays.
import type { FormIndex, IndexedAnalysis, IndexSource } from './form-index.ts'
import { foldDiacritics } from './normalize.ts'

const SOURCES: readonly IndexSource[] = ['attested', 'predicted']

/** Who an analysis belongs to: the lemma and UPOS of a lexicon entry. */
export interface IndexOwner {
  lemma: string
  upos: string
}

/**
 * Collects (form, analysis) records, then packs them: records of one form end up contiguous and in answer
 * order (score, source, lemma, UPOS, FEATS), so the same input always gives the same index.
 * @example
 * const b = new FormIndexBuilder()
 * b.add('Tage', 0, 'Case=Nom|Number=Plur', 'attested', 1, 0)
 * b.build([{ lemma: 'Tag', upos: 'NOUN' }], ['NOUN-1']).get('Tage')?.[0]?.lemma // 'Tag'
 */
export class FormIndexBuilder {
  private readonly slots = new Map<string, number>()
  private readonly slot: number[] = []
  private readonly entry: number[] = []
  private readonly feats: number[] = []
  private readonly paradigm: number[] = []
  private readonly score: number[] = []
  private readonly source: number[] = []
  private readonly featsIds = new Map<string, number>()

  /** Add one analysis of `form`; `entry` and `paradigm` index the tables given to `build` (-1: no paradigm). */
  add(
    form: string,
    entry: number,
    feats: string,
    source: IndexSource,
    score: number,
    paradigm: number,
  ): void {
    let s = this.slots.get(form)
    if (s === undefined) {
      s = this.slots.size
      this.slots.set(form, s)
    }
    let f = this.featsIds.get(feats)
    if (f === undefined) {
      f = this.featsIds.size
      this.featsIds.set(feats, f)
    }
    this.slot.push(s)
    this.entry.push(entry)
    this.feats.push(f)
    this.paradigm.push(paradigm)
    this.score.push(score)
    this.source.push(source === 'attested' ? 0 : 1)
  }

  /** Pack the records (a counting sort by slot keeps each form's records in insertion order). */
  build(owners: readonly IndexOwner[], paradigmIds: readonly string[]): MemoryFormIndex {
    const nForms = this.slots.size
    const n = this.slot.length
    const start = new Int32Array(nForms + 1)
    for (let i = 0; i < n; i++) start[this.slot[i]! + 1]!++
    for (let s = 0; s < nForms; s++) start[s + 1]! += start[s]!
    const fill = start.slice(0, nForms)
    const packed: PackedRecords = {
      entry: new Int32Array(n),
      feats: new Int32Array(n),
      paradigm: new Int32Array(n),
      score: new Float64Array(n),
      source: new Uint8Array(n),
    }
    for (let i = 0; i < n; i++) {
      const at = fill[this.slot[i]!]!++
      packed.entry[at] = this.entry[i]!
      packed.feats[at] = this.feats[i]!
      packed.paradigm[at] = this.paradigm[i]!
      packed.score[at] = this.score[i]!
      packed.source[at] = this.source[i]!
    }
    const featsTable = [...this.featsIds.keys()]
    sortSlots(start, packed, owners, featsTable)
    return new MemoryFormIndex(this.slots, start, packed, owners, featsTable, paradigmIds)
  }
}

/** Order each form's analyses as answers list them (see `compareCandidates`), once, at build time. */
function sortSlots(
  start: Int32Array,
  r: PackedRecords,
  owners: readonly IndexOwner[],
  feats: readonly string[],
): void {
  const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0)
  const order = (i: number, j: number) =>
    r.score[j]! - r.score[i]! ||
    r.source[i]! - r.source[j]! ||
    cmp(owners[r.entry[i]!]!.lemma, owners[r.entry[j]!]!.lemma) ||
    cmp(owners[r.entry[i]!]!.upos, owners[r.entry[j]!]!.upos) ||
    cmp(feats[r.feats[i]!]!, feats[r.feats[j]!]!)
  for (let s = 0; s + 1 < start.length; s++) {
    const from = start[s]!
    const to = start[s + 1]!
    if (to - from < 2) continue
    const idx = Array.from({ length: to - from }, (_, k) => from + k).sort(order)
    const copy = idx.map(
      (i) => [r.entry[i]!, r.feats[i]!, r.paradigm[i]!, r.score[i]!, r.source[i]!] as const,
    )
    copy.forEach(([e, f, p, sc, so], k) => {
      r.entry[from + k] = e
      r.feats[from + k] = f
      r.paradigm[from + k] = p
      r.score[from + k] = sc
      r.source[from + k] = so
    })
  }
}

interface PackedRecords {
  entry: Int32Array
  feats: Int32Array
  paradigm: Int32Array
  score: Float64Array
  source: Uint8Array
}

/** The in-memory implementation of `FormIndex`; build it with `FormIndexBuilder`. */
export class MemoryFormIndex implements FormIndex {
  private foldMap: Map<string, string[]> | undefined
  /** Answers built so far, by slot: allocated whole, so filling it in any order keeps it a packed array. */
  private readonly answers: (readonly IndexedAnalysis[] | undefined)[]

  constructor(
    private readonly slots: ReadonlyMap<string, number>,
    private readonly start: Int32Array,
    private readonly records: PackedRecords,
    private readonly owners: readonly IndexOwner[],
    private readonly featsTable: readonly string[],
    private readonly paradigmIds: readonly string[],
  ) {
    this.answers = new Array(slots.size).fill(undefined)
  }

  get formCount(): number {
    return this.slots.size
  }

  get analysisCount(): number {
    return this.records.entry.length
  }

  get(form: string): readonly IndexedAnalysis[] | undefined {
    const s = this.slots.get(form)
    if (s === undefined) return undefined
    return this.answers[s] ?? this.materialize(s)
  }

  /** A form's answer, built on its first lookup and shared (frozen) from then on. */
  private materialize(s: number): readonly IndexedAnalysis[] {
    const r = this.records
    const end = this.start[s + 1]!
    const out: IndexedAnalysis[] = []
    for (let i = this.start[s]!; i < end; i++) {
      const owner = this.owners[r.entry[i]!]!
      const p = r.paradigm[i]!
      out.push({
        lemma: owner.lemma,
        upos: owner.upos,
        feats: this.featsTable[r.feats[i]!]!,
        source: SOURCES[r.source[i]!]!,
        score: r.score[i]!,
        paradigm: p >= 0 ? this.paradigmIds[p]! : null,
      })
    }
    for (const a of out) Object.freeze(a)
    this.answers[s] = Object.freeze(out)
    return out
  }

  folded(folded: string): readonly string[] {
    if (!this.foldMap) {
      // Built on first use only: folding is off by default.
      const m = new Map<string, string[]>()
      for (const form of this.slots.keys()) {
        const key = foldDiacritics(form)
        const list = m.get(key)
        if (list) list.push(form)
        else m.set(key, [form])
      }
      this.foldMap = m
    }
    return this.foldMap.get(folded) ?? []
  }

  load(_keys: Iterable<string>): Promise<void> {
    return Promise.resolve()
  }

  session(): FormIndex {
    return this
  }

  forms(): Iterable<string> {
    return this.slots.keys()
  }

  async *formGroups(): AsyncIterable<readonly string[]> {
    yield [...this.slots.keys()]
  }
}
