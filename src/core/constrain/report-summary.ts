// The coverage report as a few readable lines (what the command line prints on stderr).
import type { CoverageFigures, CoverageReport } from './coverage-report.ts'

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
