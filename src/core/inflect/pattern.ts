// Paradigm patterns: a form as literals and stem variables, extracted by longest-common-subsequence.
// Method: paradigm extraction by longest common subsequence, Ahlberg, Forsberg & Hulden (2014),
// "Semi-supervised learning of morphological paradigms and lexicons", EACL. The common subsequence is
// found by aligning every form to the lemma and keeping the lemma letters that survive in all forms.
import { alignLemmaForm } from './align.ts'

/** A pattern part: a literal string, or the index of a stem variable (0-based). */
export type Part = string | number

/** A pattern: the concatenation of its parts. `['ge', 0, 't']` is ge + x1 + t. */
export type Pattern = Part[]

/** The abstract shape of one table: the lemma's pattern and each form's pattern. */
export interface TablePattern {
  lemma: Pattern
  /** Same order as the input forms. */
  forms: Pattern[]
  /** The variables' contents for the table's own lemma. */
  stems: string[]
  /** Variable 0 is an open prefix that may be empty. */
  openPrefix: boolean
}

/**
 * Extract the patterns of a table: variables are the runs of lemma letters kept by every form.
 * @example extractPattern('Vater', ['Väter']).forms[0] // [0, 'ä', 1]
 */
export function extractPattern(lemma: string, forms: readonly string[]): TablePattern {
  const letters = [...lemma]
  const n = letters.length
  const maps = forms.map((f) => alignLemmaForm(lemma, f))
  const kept: number[] = []
  for (let p = 0; p < n; p++) if (maps.every((m) => m[p]! >= 0)) kept.push(p)
  // Variable runs: consecutive kept lemma positions that are also consecutive in every form.
  const runOf = new Array<number>(n).fill(-1)
  const runs: number[][] = []
  for (let t = 0; t < kept.length; t++) {
    const p = kept[t]!
    const prev = kept[t - 1]
    const joins = prev === p - 1 && maps.every((m) => m[p] === m[prev]! + 1)
    if (!joins || runs.length === 0) runs.push([])
    runs[runs.length - 1]!.push(p)
    runOf[p] = runs.length - 1
  }
  const stems = runs.map((r) => r.map((p) => letters[p]).join(''))
  const lemmaPattern = render(letters, (p) => runOf[p]!)
  const formPatterns = forms.map((f, k) => {
    const fl = [...f]
    const back = new Array<number>(fl.length).fill(-1)
    for (const p of kept) back[maps[k]![p]!] = runOf[p]!
    return render(fl, (q) => back[q]!)
  })
  // A lemma that does not start with a stem letter (a prefix change, a suppletive table) gets an open
  // leading variable, empty here, so the pattern also fits compounds ending in the same word.
  if (typeof lemmaPattern[0] !== 'number') {
    const shift = (pt: Pattern): Pattern => [0, ...pt.map((x) => (typeof x === 'number' ? x + 1 : x))]
    return { lemma: shift(lemmaPattern), forms: formPatterns.map(shift), stems: ['', ...stems], openPrefix: true }
  }
  return { lemma: lemmaPattern, forms: formPatterns, stems, openPrefix: false }
}

/**
 * The prefix-stem pattern of a table: one variable, the longest prefix the lemma shares with every form,
 * and each word's rest as a literal ending; null when some form shares no first letter with the lemma.
 * Stem changes near the end (consonant gradation, lautata → lauttaa) then sit in the endings, where tables
 * of one class get one pattern, instead of splitting the stem into variables around letters kept by chance.
 * @example prefixPattern('lautata', ['lauttaa']).forms[0] // [0, 'taa']
 */
export function prefixPattern(lemma: string, forms: readonly string[]): TablePattern | null {
  const letters = [...lemma]
  let n = letters.length
  for (const f of forms) {
    const fl = [...f]
    let k = 0
    while (k < n && k < fl.length && fl[k] === letters[k]) k++
    n = k
  }
  if (n < 1) return null
  const pt = (w: string): Pattern => {
    const rest = [...w].slice(n).join('')
    return rest ? [0, rest] : [0]
  }
  return { lemma: pt(lemma), forms: forms.map(pt), stems: [letters.slice(0, n).join('')], openPrefix: false }
}

function render(letters: string[], varAt: (i: number) => number): Pattern {
  const out: Pattern = []
  let lit = ''
  let last = -1
  for (let i = 0; i < letters.length; i++) {
    const v = varAt(i)
    if (v < 0) {
      lit += letters[i]
      last = -1
      continue
    }
    if (lit) out.push(lit)
    lit = ''
    if (v !== last) out.push(v)
    last = v
  }
  if (lit) out.push(lit)
  return out
}

/** Fill a pattern with stem contents. */
export function fillPattern(pattern: Pattern, stems: readonly string[]): string {
  let s = ''
  for (const part of pattern) s += typeof part === 'number' ? stems[part] : part
  return s
}

/** A readable rendering: `ge+x1+t`. */
export function showPattern(pattern: Pattern): string {
  return pattern.map((p) => (typeof p === 'number' ? `x${p + 1}` : p)).join('+') || '∅'
}

/** The stable text key of a pattern (used to compare paradigms). */
export function patternKey(pattern: Pattern): string {
  return pattern.map((p) => (typeof p === 'number' ? `\u0001${p}` : p)).join('\u0002')
}
