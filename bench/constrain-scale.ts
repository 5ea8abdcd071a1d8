// Streams a synthetic 10-million-token corpus through `formfold constrain` on standard input and prints its peak memory.
// Run: npm run bench:constrain-scale -- [--tokens N] [--types N]
import { spawn } from 'node:child_process'
import { once } from 'node:events'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { parseArgs } from 'node:util'
import { DEMO_MODEL_TEXT } from '../src/http/demo-model.generated.ts'

const { values } = parseArgs({
  options: { tokens: { type: 'string', default: '10000000' }, types: { type: 'string', default: '1000000' } },
})
const tokens = Number(values.tokens)
const types = Number(values.types)

// A seeded generator (mulberry32), so every run streams the same corpus.
let seed = 0x5eed
const random = (): number => {
  seed = (seed + 0x6d2b79f5) | 0
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed)
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296
}

// Invented words of 2–6 syllables; frequencies fall off as 1/rank^0.9 (Zipf-like, as running text does).
const SYLLABLES = [
  'ka',
  'vo',
  'ši',
  'lū',
  'mer',
  'tö',
  'än',
  'ris',
  'pe',
  'ku',
  'sal',
  've',
  'nö',
  'dar',
  'ol',
  'im',
]
const vocabulary = new Set<string>()
while (vocabulary.size < types) {
  let word = ''
  for (let n = 2 + Math.floor(random() * 5); n > 0; n--)
    word += SYLLABLES[Math.floor(random() * SYLLABLES.length)]
  vocabulary.add(word)
}
const words = [...vocabulary]
const cumulative = new Float64Array(words.length)
let total = 0
for (let i = 0; i < words.length; i++) cumulative[i] = total += 1 / (i + 1) ** 0.9
const pick = (): string => {
  const x = random() * total
  let lo = 0
  let hi = words.length - 1
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if (cumulative[mid]! < x) lo = mid + 1
    else hi = mid
  }
  return words[lo]!
}

const dir = mkdtempSync(join(tmpdir(), 'formfold-scale-'))
const model = join(dir, 'demo.model.json')
writeFileSync(model, DEMO_MODEL_TEXT)
const child = spawn(
  process.execPath,
  ['bin/formfold.js', 'constrain', '-m', model, '-', '-o', join(dir, 'out.tsv'), '--no-guess'],
  { stdio: ['pipe', 'inherit', 'pipe'] },
)
let stderr = ''
child.stderr.on('data', (chunk: Buffer) => {
  stderr += chunk.toString()
})
const t0 = performance.now()
for (let written = 0; written < tokens; ) {
  const line: string[] = []
  for (let i = 0; i < 15 && written < tokens; i++, written++) line.push(pick())
  if (!child.stdin.write(`${line.join(' ')}.\n`)) await once(child.stdin, 'drain')
}
child.stdin.end()
const [code] = await once(child, 'close')
rmSync(dir, { recursive: true, force: true })
const last = stderr.trim().split('\n').at(-1) ?? ''
const peak = /peak memory (\d+) MB/.exec(last)?.[1]
process.stdout.write(
  `${JSON.stringify({ tokens, vocabulary: types, exit: code, seconds: Math.round((performance.now() - t0) / 100) / 10, peakMB: peak ? Number(peak) : null })}\n`,
)
process.stdout.write(`${last}\n`)
