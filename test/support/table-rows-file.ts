// Reading a small, trusted table-rows file synchronously (fixtures and benches; user input goes through src/formats).
import { readFileSync } from 'node:fs'
import { type Entry, rowsToEntries } from '../../src/core/lexicon/entry.ts'

/**
 * `lemma<TAB>form<TAB>upos<TAB>feats` rows of a file as entries; `#` comments and blank lines skipped.
 * @example readTableRowsFile(new URL('./de-noun.tsv', import.meta.url))[0].lemma // 'Tag'
 */
export function readTableRowsFile(path: URL | string): Entry[] {
  const rows = readFileSync(path, 'utf8')
    .split('\n')
    .filter((l) => l && !l.startsWith('#'))
    .map((l) => {
      const [lemma, form, upos, feats] = l.split('\t') as [string, string, string, string]
      return { lemma, form, upos, feats }
    })
  return rowsToEntries(rows)
}
