// Running the command line as a user does: `node bin/formfold.js …` in a fresh temporary directory.
import { spawn } from 'node:child_process'
import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'

/** The launcher `npx formfold` runs. */
export const BIN = fileURLToPath(new URL('../../bin/formfold.js', import.meta.url))

/** The project's demo lexicon (invented language, demo-lexicon/README.md). */
export const DEMO = fileURLToPath(new URL('../../demo-lexicon/', import.meta.url))

/** What a run gave: exit code (null when killed by a signal), the signal, both streams as text. */
export interface RunResult {
  code: number | null
  signal: NodeJS.Signals | null
  stdout: string
  stderr: string
}

export interface RunOptions {
  stdin?: string | Uint8Array
  /** Called with the child once it has started (to signal it, for instance). */
  started?: (child: ReturnType<typeof spawn>) => void
}

/** A temporary directory holding the inputs of one test; removed by `dispose`. */
export interface Workdir {
  dir: string
  path(name: string): string
  write(name: string, data: string | Uint8Array): Promise<void>
  read(name: string): Promise<Buffer>
  /** File names in the directory, hidden ones (temporary files) included, sorted. */
  list(): Promise<string[]>
  run(args: string[], options?: RunOptions): Promise<RunResult>
  dispose(): Promise<void>
}

/**
 * Make a working directory with the given files.
 * @example const w = await workdir({ 'bad.tsv': 'a\tb\n' }); const r = await w.run(['learn', 'bad.tsv', '-o', 'out.json'])
 */
export async function workdir(files: Record<string, string | Uint8Array> = {}): Promise<Workdir> {
  const dir = await mkdtemp(join(tmpdir(), 'formfold-reliability-'))
  const w: Workdir = {
    dir,
    path: (name) => join(dir, name),
    write: (name, data) => writeFile(join(dir, name), data),
    read: (name) => readFile(join(dir, name)),
    list: async () => (await readdir(dir)).sort(),
    run: (args, options) => formfold(args, dir, options),
    dispose: () => rm(dir, { recursive: true, force: true }),
  }
  for (const [name, data] of Object.entries(files)) await w.write(name, data)
  return w
}

/**
 * Run `formfold ARGS…` in `cwd` and collect its exit and output.
 * @example await formfold(['--help'], dir) // { code: 0, stdout: 'Usage: formfold …', … }
 */
export function formfold(args: string[], cwd: string, options: RunOptions = {}): Promise<RunResult> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [BIN, ...args], { cwd, stdio: ['pipe', 'pipe', 'pipe'] })
    const out: Buffer[] = []
    const err: Buffer[] = []
    child.stdout.on('data', (b: Buffer) => out.push(b))
    child.stderr.on('data', (b: Buffer) => err.push(b))
    child.on('error', reject)
    child.on('close', (code, signal) =>
      resolve({
        code,
        signal,
        stdout: Buffer.concat(out).toString('utf8'),
        stderr: Buffer.concat(err).toString('utf8'),
      }),
    )
    child.stdin.on('error', () => {}) // a command that exits before reading stdin closes the pipe
    child.stdin.end(options.stdin ?? '')
    options.started?.(child)
  })
}
