// Counting the forms of raw-text corpora (plain text or CoNLL-U), streamed, for `formfold learn --corpus`.
import { createReadStream } from 'node:fs'
import { openCorpus } from '../formats/index.ts'
import { ownCopy } from '../core/lexicon/own-copy.ts'

/** Form → count over all files (exact spellings; memory grows with the vocabulary, not the text). */
export async function countCorpusForms(paths: string[], opts: { skipBad: boolean }): Promise<{ counts: Map<string, number>; tokens: number }> {
  const counts = new Map<string, number>()
  let tokens = 0
  for (const path of paths) {
    const corpus = await openCorpus(path === '-' ? process.stdin : createReadStream(path), {
      file: path === '-' ? '<stdin>' : path,
      skipBad: opts.skipBad,
    })
    for await (const t of corpus) {
      const n = counts.get(t.form)
      if (n === undefined) counts.set(ownCopy(t.form), 1)
      else counts.set(t.form, n + 1)
      tokens++
    }
  }
  return { counts, tokens }
}
