// Checks the written table and lemma files: columns, FEATS, NFC, inherent gender, and the minimum counts.
import { featsProblem } from './feats.ts'

/** The 17 UPOS tags of Universal Dependencies v2. */
export const UPOS = new Set([
  'ADJ',
  'ADP',
  'ADV',
  'AUX',
  'CCONJ',
  'DET',
  'INTJ',
  'NOUN',
  'NUM',
  'PART',
  'PRON',
  'PROPN',
  'PUNCT',
  'SCONJ',
  'SYM',
  'VERB',
  'X',
])

/** One table row as read back. */
export interface TableRow {
  lemma: string
  form: string
  upos: string
  feats: string
}

/** Counts over one table file. */
export interface TableStats {
  rows: number
  lemmasByPos: Map<string, number>
  cellsByPos: Map<string, number>
  syncreticTables: number
  variantCells: number
  /** Noun, verb and adjective tables with fewer cells than the part of speech has. */
  defective: string[]
  forms: Set<string>
  lemmas: Map<string, TableRow[]>
}

/** Throws with every problem found, each naming file and line. */
export function fail(problems: string[]): void {
  if (problems.length > 0)
    throw new Error(`demo data checks failed:\n  ${problems.slice(0, 30).join('\n  ')}`)
}

/** A cell's name without the inherent Gender (so noun cells of all genders count once). */
function cellName(feats: string): string {
  return feats
    .split('|')
    .filter((f) => !f.startsWith('Gender='))
    .join('|')
}

function lines(text: string): string[] {
  if (!text.endsWith('\n')) throw new Error('file does not end with a newline')
  return text.slice(0, -1).split('\n')
}

/**
 * Reads and checks a table file (`lemma<TAB>form<TAB>UPOS<TAB>FEATS`).
 * @example
 * checkTables('talva\ttalva\tNOUN\tCase=Nom|Gender=Fem|Number=Sing\n', 'tables.tsv').rows // 1
 */
export function checkTables(text: string, file: string): TableStats {
  const problems: string[] = []
  if (text.normalize('NFC') !== text) problems.push(`${file}: not NFC`)
  const lemmas = new Map<string, TableRow[]>()
  const all = lines(text)
  for (const [i, line] of all.entries()) {
    const where = `${file}:${i + 1}`
    const cols = line.split('\t')
    if (cols.length !== 4) {
      problems.push(`${where}: ${cols.length} columns`)
      continue
    }
    const [lemma, form, upos, feats] = cols as [string, string, string, string]
    if (cols.some((c) => c === '' || /\s/.test(c))) problems.push(`${where}: empty field or whitespace`)
    if (!UPOS.has(upos)) problems.push(`${where}: UPOS ${upos}`)
    const fp = featsProblem(feats)
    if (fp) problems.push(`${where}: ${fp}`)
    const key = `${lemma}\t${upos}`
    lemmas.set(key, [...(lemmas.get(key) ?? []), { lemma, form, upos, feats }])
  }
  const lemmasByPos = new Map<string, number>()
  const cellSets = new Map<string, Set<string>>()
  const forms = new Set<string>()
  let syncreticTables = 0
  let variantCells = 0
  for (const [key, rows] of lemmas) {
    const upos = rows[0]!.upos
    lemmasByPos.set(upos, (lemmasByPos.get(upos) ?? 0) + 1)
    const cells = new Map<string, string[]>()
    for (const r of rows) {
      forms.add(r.form)
      cells.set(r.feats, [...(cells.get(r.feats) ?? []), r.form])
      if (!cellSets.has(upos)) cellSets.set(upos, new Set())
      cellSets.get(upos)!.add(cellName(r.feats))
    }
    variantCells += [...cells.values()].filter((f) => f.length > 1).length
    const firstForms = [...cells.values()].map((f) => f[0]!)
    if (new Set(firstForms).size < firstForms.length) syncreticTables++
    if (upos === 'NOUN') {
      const genders = new Set(rows.map((r) => r.feats.match(/Gender=\w+/)?.[0] ?? 'none'))
      if (genders.size !== 1 || genders.has('none')) problems.push(`${file}: ${key} gender not constant`)
    }
    if (upos === 'VERB' || upos === 'AUX') {
      const part = cells.get('Tense=Past|VerbForm=Part')
      if (part && upos === 'VERB' && !part.every((f) => f.startsWith('ve')))
        problems.push(`${key}: no ve- prefix`)
    }
  }
  const cellsByPos = new Map([...cellSets].map(([p, s]) => [p, s.size]))
  const defective: string[] = []
  for (const [key, rows] of lemmas) {
    const upos = rows[0]!.upos
    if (!['NOUN', 'VERB', 'ADJ'].includes(upos)) continue
    const own = new Set(rows.map((r) => cellName(r.feats)))
    if (own.size < (cellsByPos.get(upos) ?? 0)) defective.push(key.split('\t')[0]!)
  }
  fail(problems)
  return {
    rows: all.length,
    lemmasByPos,
    cellsByPos,
    syncreticTables,
    variantCells,
    defective,
    forms,
    lemmas,
  }
}

/**
 * Checks the bare-lemma list against its gold tables and the table file (no lemma in both).
 * @example
 * checkBareList(listText, goldStats, tableStats) // the number of listed lemmas
 */
export function checkBareList(text: string, gold: TableStats, tables: TableStats): number {
  const problems: string[] = []
  if (text.normalize('NFC') !== text) problems.push('lemmas.tsv: not NFC')
  const listed = new Set<string>()
  for (const [i, line] of lines(text).entries()) {
    const where = `lemmas.tsv:${i + 1}`
    const cols = line.split('\t')
    if (cols.length !== 3) {
      problems.push(`${where}: ${cols.length} columns`)
      continue
    }
    const [lemma, upos, inherent] = cols as [string, string, string]
    const key = `${lemma}\t${upos}`
    listed.add(key)
    if (!UPOS.has(upos)) problems.push(`${where}: UPOS ${upos}`)
    if (featsProblem(inherent)) problems.push(`${where}: ${featsProblem(inherent)}`)
    if (upos === 'NOUN' && !/^Gender=(Masc|Fem|Neut)$/.test(inherent))
      problems.push(`${where}: noun without Gender`)
    if (upos !== 'NOUN' && inherent !== '_') problems.push(`${where}: unexpected inherent features`)
    if (tables.lemmas.has(key)) problems.push(`${where}: ${lemma} also has a table`)
    const rows = gold.lemmas.get(key)
    if (!rows) problems.push(`${where}: ${lemma} missing from lemmas-gold.tsv`)
    else if (upos === 'NOUN' && !rows.every((r) => r.feats.includes(inherent)))
      problems.push(`${where}: gold gender`)
  }
  for (const key of gold.lemmas.keys())
    if (!listed.has(key)) problems.push(`lemmas-gold.tsv: ${key} not listed`)
  fail(problems)
  return listed.size
}
