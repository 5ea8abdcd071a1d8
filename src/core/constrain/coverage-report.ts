// The coverage report: how much of a corpus the constraints cover, by source, how ambiguous, how right;
// as JSON for programs and as a few readable lines for people.
import type { CandidateSource } from './analyzer.ts'
import { GOLD_JOIN } from './constrain-token.ts'
import type { FormStats } from './form-tally.ts'
import type { TypeConstraint } from './type-constraint.ts'

/** Counts or shares by a form's best source; `none`: no candidate, so unconstrained. */
export type SourceSplit = Record<CandidateSource | 'none', number>

export interface ReportOptions {
  /** Gold UPOS left out of every figure: a token whose words all carry one of these is not counted. */
  excludeGold?: readonly string[]
  /** How many uncovered forms and gold misses to list (default 20). */
  top?: number
}

/** Figures over tokens or over form types. `coverage` is the share with at least one allowed analysis. */
export interface CoverageFigures {
  total: number
  coverage: number
  counts: SourceSplit
  shares: SourceSplit
}

/** Agreement with a gold corpus, on UPOS. */
export interface GoldFigures {
  /** In-scope tokens with gold tags. */
  tokens: number
  /** Of which covered (these are the tokens recall is over). */
  covered: number
  /** Covered gold tokens whose gold UPOS (every word's, for a multi-word token) is allowed. */
  recall: number
  /** Of the gold tokens with a single allowed tag, the share where it is the gold tag. */
  singleTagAccuracy: number
  /** The most frequent (form, gold) pairs whose gold tag the constraint leaves out. */
  missed: { form: string; gold: string; allowed: string[]; count: number }[]
}

/**
 * The report. Token and type figures count only tokens in scope (see `ReportOptions.excludeGold`).
 * @example { tokens: { total: 1000, coverage: 0.97, … }, ambiguity: 1.6, singleTagShare: 0.62, gold: { recall: 0.98, … } }
 */
export interface CoverageReport {
  tokens: CoverageFigures & { excluded: number }
  types: CoverageFigures
  /** Mean allowed tags per covered token. */
  ambiguity: number
  /** Tokens whose constraint is exactly one tag, over all tokens in scope. */
  singleTagShare: number
  /** The most frequent forms with no candidate. */
  uncovered: { form: string; count: number }[]
  gold: GoldFigures | null
}

const split = (): SourceSplit => ({ attested: 0, predicted: 0, guessed: 0, none: 0 })
const ratio = (a: number, b: number): number => (b === 0 ? 0 : a / b)

/**
 * Accumulates the report one form type at a time, so rows can be written as they are made.
 * @example
 * const report = new ReportBuilder({ excludeGold: ['PUNCT', 'NUM', 'SYM'] })
 * for (const [form, stats] of tally.byFrequency()) report.add(constraintOf(form), stats)
 * report.finish().tokens.coverage // 0.97
 */
export class ReportBuilder {
  readonly #exclude: ReadonlySet<string>
  readonly #top: number
  readonly #tokens = split()
  readonly #types = split()
  #excluded = 0
  #allowedSum = 0
  #single = 0
  #gold = { tokens: 0, covered: 0, hits: 0, single: 0, singleHits: 0 }
  #anyGold = false
  readonly #uncovered: { form: string; count: number }[] = []
  readonly #missed: GoldFigures['missed'] = []

  constructor(options: ReportOptions = {}) {
    this.#exclude = new Set(options.excludeGold ?? [])
    this.#top = options.top ?? 20
  }

  /** Count one form type: its constraint and its corpus counts. */
  add(row: TypeConstraint, stats: FormStats): void {
    let inScope = stats.count
    const allowedUpos = row.allowed && new Set(row.allowed.map((tag) => tag.split('|')[0]!))
    for (const [key, n] of stats.gold ?? []) {
      const tags = key.split(GOLD_JOIN)
      if (tags.every((t) => this.#exclude.has(t))) {
        inScope -= n
        this.#excluded += n
        continue
      }
      this.#anyGold = true
      this.#gold.tokens += n
      if (!row.allowed || !allowedUpos) continue
      this.#gold.covered += n
      const hit = tags.every((t) => allowedUpos.has(t))
      if (hit) this.#gold.hits += n
      else this.#missed.push({ form: row.form, gold: key, allowed: row.allowed, count: n })
      if (row.allowed.length === 1) {
        this.#gold.single += n
        if (hit) this.#gold.singleHits += n
      }
    }
    if (inScope === 0) return
    this.#tokens[row.source] += inScope
    this.#types[row.source]++
    if (row.allowed) {
      this.#allowedSum += row.allowed.length * inScope
      if (row.allowed.length === 1) this.#single += inScope
    } else {
      this.#uncovered.push({ form: row.form, count: inScope })
    }
    if (this.#uncovered.length > this.#top * 4) trim(this.#uncovered, this.#top)
    if (this.#missed.length > this.#top * 4) trim(this.#missed, this.#top)
  }

  /** The report over everything added. */
  finish(): CoverageReport {
    const tokens = figures(this.#tokens)
    const g = this.#gold
    trim(this.#uncovered, this.#top)
    trim(this.#missed, this.#top)
    return {
      tokens: { ...tokens, excluded: this.#excluded },
      types: figures(this.#types),
      ambiguity: ratio(this.#allowedSum, tokens.total - this.#tokens.none),
      singleTagShare: ratio(this.#single, tokens.total),
      uncovered: [...this.#uncovered],
      gold: this.#anyGold
        ? {
            tokens: g.tokens,
            covered: g.covered,
            recall: ratio(g.hits, g.covered),
            singleTagAccuracy: ratio(g.singleHits, g.single),
            missed: [...this.#missed],
          }
        : null,
    }
  }
}

function figures(counts: SourceSplit): CoverageFigures {
  const total = counts.attested + counts.predicted + counts.guessed + counts.none
  const shares = split()
  for (const key of Object.keys(counts) as (keyof SourceSplit)[]) shares[key] = ratio(counts[key], total)
  return { total, coverage: ratio(total - counts.none, total), counts: { ...counts }, shares }
}

// Keep the `top` most frequent (stable on ties: earlier rows first, and rows arrive most frequent first).
function trim<T extends { count: number }>(list: T[], top: number): void {
  const kept = list
    .map((item, i) => ({ item, i }))
    .sort((a, b) => b.item.count - a.item.count || a.i - b.i)
    .slice(0, top)
    .map((x) => x.item)
  list.length = 0
  list.push(...kept)
}

const pct = (x: number): string => `${(x * 100).toFixed(1)}%`

function splitLine(label: string, f: CoverageFigures): string {
  const s = f.shares
  return (
    `${label.padEnd(7)}${String(f.total).padStart(10)}  covered ${pct(f.coverage).padStart(6)}` +
    `  (attested ${pct(s.attested)}, predicted ${pct(s.predicted)}, guessed ${pct(s.guessed)}, none ${pct(s.none)})`
  )
}

/**
 * A short account of a report, one fact a line, for people (the JSON report is for programs).
 * @example
 * formatReportSummary(report)
 * // tokens      1000  covered  97.0%  (attested 80.0%, predicted 12.0%, guessed 5.0%, none 3.0%)
 * // types        400  covered  90.0%  (…)
 * // ambiguity 1.62 allowed tags per covered token; single tag 61.0% of tokens
 * // uncovered: Xq (4), Zorbl (2)
 */
export function formatReportSummary(report: CoverageReport): string {
  const lines = [splitLine('tokens', report.tokens), splitLine('types', report.types)]
  if (report.tokens.excluded > 0) lines.push(`excluded ${report.tokens.excluded} tokens by their gold tag`)
  lines.push(
    `ambiguity ${report.ambiguity.toFixed(2)} allowed tags per covered token; ` +
      `single tag ${pct(report.singleTagShare)} of tokens`,
  )
  if (report.gold) {
    const g = report.gold
    lines.push(
      `gold: recall ${pct(g.recall)} over ${g.covered} covered tokens; ` +
        `single tags right ${pct(g.singleTagAccuracy)}`,
    )
  }
  if (report.uncovered.length > 0) {
    lines.push(`uncovered: ${report.uncovered.map((u) => `${u.form} (${u.count})`).join(', ')}`)
  }
  return lines.join('\n')
}
