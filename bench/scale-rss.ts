// Peak resident memory of a child process fed on standard input: `/usr/bin/time -v` when present, else VmHWM.
import { spawn } from 'node:child_process'
import { once } from 'node:events'
import { existsSync, openSync, readFileSync } from 'node:fs'

/** What a measured child did: exit code, wall seconds, peak RSS in MB, and how the peak was read. */
export interface PeakRun {
  exit: number | null
  seconds: number
  peakRssMB: number | null
  method: 'time -v' | 'VmHWM' | 'none'
  stderrTail: string
}

const TIME = '/usr/bin/time'

/** VmHWM (peak resident set) of a live process in kB, or null once it is gone (Linux only). */
function vmHwm(pid: number): number | null {
  try {
    const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))
    return m ? Number(m[1]) : null
  } catch {
    return null
  }
}

/**
 * Run `argv` with its stdout to /dev/null, write every line of `input` to its stdin, and read its peak RSS.
 * @example await peakRss([process.execPath, 'bin/formfold.js', 'expand', '-m', 'm.json', '-'], lines())
 */
export async function peakRss(argv: string[], input: Iterable<string>, cwd?: string): Promise<PeakRun> {
  const timed = existsSync(TIME)
  const [command, ...rest] = timed ? [TIME, '-v', ...argv] : argv
  const devNull = openSync('/dev/null', 'w')
  const child = spawn(command!, rest, { cwd, stdio: ['pipe', devNull, 'pipe'] })
  let stderr = ''
  child.stderr!.on('data', (d: Buffer) => {
    stderr += d.toString()
    if (stderr.length > 200_000) stderr = stderr.slice(-100_000)
  })
  let sampled = 0
  const sampler = timed
    ? undefined
    : setInterval(() => {
        sampled = Math.max(sampled, vmHwm(child.pid!) ?? 0)
      }, 50)
  const t0 = performance.now()
  let batch = ''
  for (const line of input) {
    batch += line
    if (batch.length < 1 << 16) continue
    if (!child.stdin!.write(batch)) await once(child.stdin!, 'drain')
    batch = ''
  }
  child.stdin!.end(batch)
  const [code] = (await once(child, 'close')) as [number | null]
  if (sampler) clearInterval(sampler)
  const seconds = Math.round((performance.now() - t0) / 100) / 10
  const maxKb = /Maximum resident set size \(kbytes\): (\d+)/.exec(stderr)?.[1]
  const peakKb = timed ? (maxKb ? Number(maxKb) : null) : sampled || null
  return {
    exit: code,
    seconds,
    peakRssMB: peakKb === null ? null : Math.round(peakKb / 1024),
    method: timed ? (maxKb ? 'time -v' : 'none') : sampled ? 'VmHWM' : 'none',
    stderrTail: stderr.trim().split('\n').slice(-3).join('\n'),
  }
}
