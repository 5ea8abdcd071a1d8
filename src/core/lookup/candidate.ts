// Candidates of a form: their order (score, then source, then a stable tie-break) and how duplicates merge.

/** Where a candidate comes from: a dictionary table, a table the model assigned to a bare lemma, or the guesser. */
export type CandidateSource = 'attested' | 'predicted' | 'guessed'

/**
 * One candidate analysis of a form.
 * @example { lemma: 'Mantel', upos: 'NOUN', feats: 'Case=Dat|Number=Plur', source: 'guessed', score: 0.81, paradigm: 'NOUN-4' }
 */
export interface Candidate {
  lemma: string
  upos: string
  feats: string
  source: CandidateSource
  score: number
  paradigm: string | null
}

const RANK: Record<CandidateSource, number> = { attested: 0, predicted: 1, guessed: 2 }

/**
 * The order of candidates: higher score first; then attested, predicted, guessed; then lemma, UPOS, FEATS
 * by code unit, so the order never depends on where the candidates came from.
 * @example [b, a].sort(compareCandidates)
 */
export function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    b.score - a.score ||
    RANK[a.source] - RANK[b.source] ||
    cmp(a.lemma, b.lemma) ||
    cmp(a.upos, b.upos) ||
    cmp(a.feats, b.feats)
  )
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}

/**
 * Merge candidate lists: one candidate per analysis (lemma, UPOS, FEATS); attested beats predicted beats
 * guessed, and within a source the higher score wins. The result is sorted.
 * @example mergeCandidates([[guessedTage], [attestedTage]])[0].source // 'attested'
 */
export function mergeCandidates(lists: readonly (readonly Candidate[])[]): Candidate[] {
  const best = new Map<string, Candidate>()
  for (const list of lists) {
    for (const c of list) {
      const key = `${c.lemma}\t${c.upos}\t${c.feats}`
      const had = best.get(key)
      if (!had || RANK[c.source] < RANK[had.source] || (c.source === had.source && c.score > had.score))
        best.set(key, c)
    }
  }
  return [...best.values()].sort(compareCandidates)
}

/**
 * Apply the bounds of an answer: guessed and predicted candidates below `minScore` go, and only `top`
 * candidates stay — but attested ones are facts from the dictionary and are never cut. Input sorted.
 * @example boundCandidates(sorted, 5, 0.05).length <= Math.max(5, attestedCount) // true
 */
export function boundCandidates(sorted: readonly Candidate[], top: number, minScore: number): Candidate[] {
  const out: Candidate[] = []
  for (const c of sorted) {
    if (c.source === 'attested') out.push(c)
    else if (c.score >= minScore && out.length < top) out.push(c)
  }
  return out
}
