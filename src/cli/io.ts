// Command-line I/O: read lexicon sources from files, write outputs atomically, report problems and exit.
import { createReadStream } from 'node:fs'
import { rename, rm, writeFile } from 'node:fs/promises'
import { basename, dirname, join } from 'node:path'
import { type Entry, formatProblem, type Problem, ProblemError } from '../core/index.ts'
import { type LexiconFormat, readLexicon } from '../formats/index.ts'

/** Exit codes of every command. */
export const EXIT = { done: 0, failed: 1, badInput: 2 } as const

/** What reading all the sources gave: the entries, and what was skipped (with `--skip-bad`). */
export interface SourcesRead {
  entries: Entry[]
  skipped: number
  problems: Problem[]
  languageSpecific: string[]
}

/** Read every source file (table rows, entries, lemma lists; format sniffed per file unless given). */
export async function readSources(
  paths: string[],
  opts: { skipBad: boolean; format?: LexiconFormat },
): Promise<SourcesRead> {
  const out: SourcesRead = { entries: [], skipped: 0, problems: [], languageSpecific: [] }
  for (const path of paths) {
    const file = path === '-' ? '<stdin>' : path
    const r = await readLexicon(path === '-' ? process.stdin : createReadStream(path), {
      file,
      skipBad: opts.skipBad,
      format: opts.format,
    }).catch((err: unknown) => {
      throw unreadable(err, file)
    })
    out.entries.push(...r.entries)
    out.skipped += r.skipped
    out.problems.push(...r.problems)
    for (const f of r.languageSpecific) if (!out.languageSpecific.includes(f)) out.languageSpecific.push(f)
  }
  return out
}

/** Errors of opening a path the user named: bad usage (exit 2), not a failure of formfold. */
const USAGE_ERRORS = new Set(['ENOENT', 'EISDIR', 'ENOTDIR', 'EACCES', 'EPERM'])

/** A file that cannot be opened as a ProblemError naming it; any other error as it is. */
function unreadable(err: unknown, file: string): unknown {
  const code = (err as NodeJS.ErrnoException | undefined)?.code
  if (err instanceof ProblemError || code === undefined || !USAGE_ERRORS.has(code)) return err
  const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a directory' : code
  return new ProblemError({ code: 'unreadable-file', file, message: `cannot read the file (${why})` })
}

/** Write a file under a temporary name and rename it when complete: no partial output, ever. */
export async function writeAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`)
  try {
    await writeFile(tmp, data)
    await rename(tmp, path)
  } catch (err) {
    await rm(tmp, { force: true })
    // Name the file the user asked for, not the temporary one.
    throw new Error(`cannot write ${path}: ${(err as NodeJS.ErrnoException).code ?? String(err)}`)
  }
}

/** Run a command body: a ProblemError becomes `file:line: message` and exit 2; anything else exit 1. */
export async function runCommand(body: () => Promise<void>): Promise<void> {
  try {
    await body()
  } catch (caught) {
    // A path the user named that cannot be opened is bad usage (exit 2), whichever command met it.
    const path = (caught as NodeJS.ErrnoException | undefined)?.path
    const err = path ? unreadable(caught, path) : caught
    if (err instanceof ProblemError) {
      process.stderr.write(`formfold: ${formatProblem(err.problem)}\n`)
      process.exit(EXIT.badInput)
    }
    process.stderr.write(`formfold: ${err instanceof Error ? err.message : String(err)}\n`)
    process.exit(EXIT.failed)
  }
}

/** Print the skipped-lines summary of a `--skip-bad` run. */
export function reportSkipped(read: SourcesRead): void {
  if (read.skipped === 0) return
  process.stderr.write(`skipped ${read.skipped} bad line(s); first ones:\n`)
  for (const p of read.problems) process.stderr.write(`  ${formatProblem(p)}\n`)
}
