// The committed paradigm book (paradigms/) is current, and what it shows agrees with the demo lexicon's tables.
import { readdir, readFile } from 'node:fs/promises'
import { fileURLToPath } from 'node:url'
import { beforeAll, describe, expect, it } from 'vitest'
import { type BookFiles, bookFiles, readDemoEntries } from '../../scripts/build-paradigm-book.ts'
import { extractParadigms } from '../../src/core/inflect/extract.ts'
import { stemKindOf } from '../../src/core/inflect/learn.ts'
import type { Entry } from '../../src/core/lexicon/entry.ts'
import { buildLexicon } from '../../src/core/lexicon/lexicon.ts'

const dir = fileURLToPath(new URL('../../paradigms/', import.meta.url))

interface BookCell {
  feats: string
  rule: string[]
  example?: string[]
}
interface BookParadigm {
  id: string
  members: number
  examples: string[]
  inherent?: Record<string, number>
  lemma: string
  cells: BookCell[]
}

let entries: Entry[]
let fresh: BookFiles
let committed: Map<string, string>

beforeAll(async () => {
  entries = await readDemoEntries()
  const lexicon = buildLexicon(entries)
  fresh = bookFiles(lexicon, extractParadigms(lexicon, stemKindOf(lexicon)))
  committed = new Map()
  for (const name of (await readdir(dir)).filter((f) => f.endsWith('.json')).sort()) {
    committed.set(name, await readFile(dir + name, 'utf8'))
  }
}, 60_000) // choosing the stem cut learns twice on the demo tables: seconds on a loaded 2-core machine

const book = (upos: string): BookParadigm[] =>
  JSON.parse(committed.get(`${upos}.json`) ?? '{"paradigms":[]}').paradigms

describe('paradigms/', () => {
  it('holds exactly the files `npm run paradigms` writes', () => {
    expect([...committed.keys()].sort(), 'run `npm run paradigms` and commit paradigms/').toEqual(
      [...fresh.keys()].sort(),
    )
  })

  it('is byte for byte what `npm run paradigms` writes now', () => {
    for (const [name, text] of fresh) {
      expect(committed.get(name) === text, `paradigms/${name} is stale: run \`npm run paradigms\``).toBe(true)
    }
  })

  // Source: the table counts per UPOS stated in demo-lexicon/README.md ("Files", tables.tsv).
  it.each([
    ['NOUN', 167],
    ['VERB', 91],
    ['ADJ', 59],
    ['AUX', 1],
    ['PRON', 6],
    ['ADP', 4],
    ['CCONJ', 2],
    ['SCONJ', 1],
    ['ADV', 3],
  ])('counts every %s table once (%i tables)', (upos, tables) => {
    const members = book(upos).reduce((n, p) => n + p.members, 0)
    expect(members).toBe(tables)
    const index = JSON.parse(committed.get('index.json')!)
    expect(index.books.find((b: { upos: string }) => b.upos === upos)).toMatchObject({
      tables,
      members: tables,
    })
  })

  it("shows rules whose example column is the example lemma's own table in tables.tsv", () => {
    const lexicon = buildLexicon(entries)
    const byLemma = new Map(lexicon.entries.filter((e) => e.cells).map((e) => [`${e.lemma}\t${e.upos}`, e]))
    let checked = 0
    let gaps = 0
    for (const upos of ['NOUN', 'VERB', 'ADJ', 'PRON', 'AUX']) {
      for (const p of book(upos)) {
        const entry = byLemma.get(`${p.examples[0]}\t${upos}`)
        expect(entry, `${p.id}: example ${p.examples[0]} has a table`).toBeDefined()
        for (const cell of p.cells) {
          const gold = entry!.cells!.find((c) => c.key === cell.feats)?.forms
          // A defective example lemma lacks some cells of its paradigm: nothing to compare there.
          if (!gold) {
            gaps++
            continue
          }
          expect(cell.example, `${p.id} ${cell.feats}`).toEqual(gold)
          checked++
        }
      }
    }
    // 67 noun, 40 verb, 28 adjective paradigms of 12, 24 and 15 cells; the first example of a paradigm is
    // its most typical member, never one of the five defective lemmas, so every cell is compared.
    expect(checked).toBeGreaterThan(2000)
    expect(gaps).toBe(0)
  })

  // Source: the class table of demo-lexicon/README.md (class N1 lokka, N2 möppö; V1 lokkara; A1 sūkka).
  it.each([
    ['NOUN', 'lokka', 'Case=Acc|Number=Sing', 'lokan'],
    ['NOUN', 'lokka', 'Case=Loc|Number=Plur', 'lokoissa'],
    ['NOUN', 'möppö', 'Case=Gen|Number=Sing', 'möppövi'],
    ['VERB', 'lokkara', 'Tense=Past|VerbForm=Part', 'velokatto'],
    ['ADJ', 'sūkka', 'Case=Nom|Degree=Sup|Number=Sing', 'pasūkka'],
  ])('gives %s %s its %s form %s through the rule of its paradigm', (upos, lemma, feats, form) => {
    const lexicon = buildLexicon(entries)
    const extracted = extractParadigms(lexicon, stemKindOf(lexicon))
    const at = lexicon.entries.findIndex((e) => e.lemma === lemma && e.upos === upos)
    const id = extracted.paradigms[extracted.memberOf[at]!]!.id
    const shown = book(upos).find((p) => p.id === id)!
    const rule = shown.cells.find((c) => c.feats === feats)!.rule[0]!
    // The lemma pattern and the cell rule, read as the book prints them (x1+a … ve+x1+tto).
    const stems = matchShown(shown.lemma, lemma)
    expect(
      rule
        .split('+')
        .map((part) => (/^x\d+$/.test(part) ? stems[Number(part.slice(1)) - 1] : part))
        .join(''),
    ).toBe(form)
  })
})

/** The stems of a lemma under a printed lemma pattern (`x1+a`, `x1+kk+x2+a`), as a reader would find them. */
function matchShown(pattern: string, lemma: string): string[] {
  const parts = pattern.split('+')
  const re = new RegExp(
    `^${parts.map((p) => (/^x\d+$/.test(p) ? '(.+?)' : p.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'))).join('')}$`,
  )
  const m = re.exec(lemma)
  expect(m, `${lemma} fits ${pattern}`).not.toBeNull()
  return m!.slice(1)
}
