// Standard input copied to a private temporary file, so a command that reads its input twice (check whole
// first, then stream) keeps bounded memory on a pipe too.
import { createWriteStream } from 'node:fs'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { pipeline } from 'node:stream/promises'

/**
 * Copy stdin to a new temporary file; returns its path and a cleanup that removes it.
 * @example const { path, done } = await spoolStdin(); try { read(path) } finally { await done() }
 */
export async function spoolStdin(): Promise<{ path: string; done: () => Promise<void> }> {
  const dir = await mkdtemp(join(tmpdir(), 'formfold-stdin-'))
  const path = join(dir, 'stdin')
  const done = () => rm(dir, { recursive: true, force: true })
  try {
    await pipeline(process.stdin, createWriteStream(path))
  } catch (e) {
    await done()
    throw e
  }
  return { path, done }
}
