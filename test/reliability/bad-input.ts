// The shared check of the input-error tables: `formfold learn FILE -o out.json` exits 2 at file:line and writes nothing.
import { describe, expect, it } from 'vitest'
import { workdir } from './cli.ts'

/** One bad input: the whole file, and the message expected after `file:line: `. */
export interface BadCase {
  name: string
  file: string
  data: string | Uint8Array
  says: string
  /** The bad line (default 3). */
  line?: number
}

/** Two good table rows, so the bad one is line 3. */
export const GOOD = 'vessa\tvessa\tNOUN\tCase=Nom|Number=Sing\nvessa\tvessat\tNOUN\tCase=Nom|Number=Plur\n'

const encoder = new TextEncoder()

/** Text followed by raw bytes and a line feed. */
export function withBytes(head: string, ...bytes: number[]): Uint8Array {
  return new Uint8Array([...encoder.encode(head), ...bytes, 0x0a])
}

/** UTF-8 text followed by a line written in Latin-1 (as an old export would be). */
export function latin1(head: string, line: string): Uint8Array {
  return new Uint8Array([...encoder.encode(head), ...Buffer.from(line, 'latin1')])
}

/**
 * Register one test per case: exit 2, the message at `file:line`, no stack trace, no file left beside the input.
 * @example describeBadInput('table rows', [{ name: 'an unknown UPOS', file: 'bad.tsv', data, says: 'unknown UPOS "NN"' }])
 */
export function describeBadInput(title: string, cases: BadCase[]): void {
  describe(title, () => {
    it.concurrent.each(cases)('$name: exits 2 naming the line, writing nothing', async (c) => {
      const w = await workdir({ [c.file]: c.data })
      try {
        const r = await w.run(['learn', c.file, '-o', 'out.json'])
        expect(r.code).toBe(2)
        expect(r.stderr).toContain(`formfold: ${c.file}:${c.line ?? 3}: ${c.says}`)
        expect(r.stderr).not.toMatch(/\bat \S+ \(|node:internal/)
        expect(await w.list()).toEqual([c.file])
      } finally {
        await w.dispose()
      }
    })
  })
}
