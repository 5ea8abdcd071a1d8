// Property-based checks (fast-check): any input gives one item per line and fails only with a Problem.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ProblemError } from '../../src/core/lexicon/problem.ts'
import { type LexiconFormat, readLexicon, readLines, streamConllu } from '../../src/formats/index.ts'
import { chunked, collect } from './helpers.ts'

/** Lines of an input as the readers number them: split at LF, no line after a final LF. */
function countLines(text: string | Uint8Array): number {
  const lf = typeof text === 'string' ? '\n' : 10
  let n = 0
  for (let i = 0; i < text.length; i++) if (text[i] === lf) n++
  const last = text[text.length - 1]
  return text.length === 0 ? 0 : last === lf ? n : n + 1
}

// Lines of any UTF-16 (lone surrogates too), with tabs, CRs, controls and format-like fragments mixed in.
const piece = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 12 }),
  fc.constantFrom('\t', '\r', '\u0000', '{', '#', 'NOUN', 'Case=Nom', '1-2', '_', '\uFEFF'),
)
const line = fc.array(piece, { maxLength: 6 }).map((parts) => parts.join(''))
const text = fc.array(line, { maxLength: 12 }).map((lines) => lines.join('\n'))
const bytes = fc.uint8Array({ maxLength: 200 })
const cuts = fc.array(fc.nat({ max: 200 }), { maxLength: 5 })
const format = fc.constantFrom<LexiconFormat | undefined>(undefined, 'rows', 'entries', 'lemmas')

/** Run a read; a ProblemError is an allowed outcome, anything else thrown fails the property. */
async function problemOr<T>(run: () => Promise<T>): Promise<T | ProblemError> {
  try {
    return await run()
  } catch (error) {
    if (error instanceof ProblemError) return error
    throw error
  }
}

describe('readers on random input', () => {
  it('readLines yields exactly one item per input line, numbered 1…n, from strings and split bytes', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(text, bytes), cuts, async (input, at) => {
        const source =
          typeof input === 'string'
            ? input
            : chunked(
                input,
                at.filter((c) => c <= input.length),
              )
        const items = await collect(readLines(source, { file: 'p' }))
        expect(items.map((i) => i.line)).toEqual(Array.from({ length: countLines(input) }, (_, i) => i + 1))
        for (const item of items) {
          if (item.problem) expect(item.problem).toMatchObject({ file: 'p', line: item.line })
          else expect(item.text.normalize('NFC')).toBe(item.text)
        }
      }),
      { numRuns: 300 },
    )
  })

  it('readLexicon with skipBad never loses a line and throws nothing but a Problem', async () => {
    await fc.assert(
      fc.asyncProperty(text, format, async (input, fmt) => {
        const result = await problemOr(() =>
          readLexicon(input, { file: 'p.tsv', format: fmt, skipBad: true }),
        )
        if (result instanceof ProblemError) expect(result.problem.code).toBe('no-entries')
        else expect(result.lines + result.skipped).toBe(countLines(input))
      }),
      { numRuns: 300 },
    )
  })

  it('readLexicon without skipBad fails only with a located Problem', async () => {
    await fc.assert(
      fc.asyncProperty(text, format, async (input, fmt) => {
        const result = await problemOr(() => readLexicon(input, { file: 'p.tsv', format: fmt }))
        if (result instanceof ProblemError && result.problem.code !== 'no-entries') {
          expect(result.problem.line).toBeGreaterThan(0)
          expect(result.problem.file).toBe('p.tsv')
        }
      }),
      { numRuns: 300 },
    )
  })

  it('streamConllu with skipBad never loses a line and throws nothing but a Problem', async () => {
    await fc.assert(
      fc.asyncProperty(text, async (input) => {
        const reader = streamConllu(input, { file: 'p.conllu', skipBad: true })
        await collect(reader)
        expect(reader.summary.lines + reader.summary.skipped).toBe(countLines(input))
      }),
      { numRuns: 300 },
    )
  })
})
