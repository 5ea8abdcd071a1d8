// The line reader every format builds on: strict UTF-8, one BOM, CRLF, no control characters, NFC.
import type { Problem, ProblemCode } from '../core/lexicon/problem.ts'
import { byteChunks, type TextInput } from './input.ts'
import { splitByteLines, splitStringLines } from './line-split.ts'

/** Longest accepted line, in UTF-16 code units after the line break is removed (64 Ki). */
export const MAX_LINE_CHARS = 64 * 1024

/** A line of input: its NFC text, or the problem that made it unreadable. Exactly one per input line. */
export type LineItem =
  | { line: number; text: string; problem?: undefined }
  | { line: number; problem: Problem; text?: undefined }

export interface LineOptions {
  /** Name used in problems (a path or an upload name). */
  file: string
  maxLineChars?: number
}

// C0 controls other than TAB; LF never reaches here, a CR before LF is removed first.
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is its purpose
const CONTROL = /[\u0000-\u0008\u000A-\u001F]/
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

/**
 * Read lines from bytes or a string. Bytes are decoded as UTF-8 with a fatal decoder, line by line, so
 * a bad sequence (even one split across chunks) is reported on its own line and reading goes on.
 * @example for await (const item of readLines('\uFEFFa\r\nb', { file: 'x.tsv' })) item.text // 'a', then 'b'
 */
export async function* readLines(input: TextInput, options: LineOptions): AsyncGenerator<LineItem> {
  const maxChars = options.maxLineChars ?? MAX_LINE_CHARS
  let line = 0
  if (typeof input === 'string') {
    for (const raw of splitStringLines(input, maxChars + 1)) {
      line++
      if (raw !== null && LONE_SURROGATE.test(raw)) {
        yield failed('bad-utf8', 'line has a lone surrogate, which UTF-8 cannot encode', options.file, line)
      } else yield checkLine(raw, line, options.file, maxChars)
    }
    return
  }
  const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true })
  // A UTF-16 code unit takes at most 3 UTF-8 bytes; +1 for a CR.
  for await (const raw of splitByteLines(byteChunks(input), maxChars * 3 + 1)) {
    line++
    let text: string | null = null
    if (raw !== null) {
      try {
        text = decoder.decode(raw)
      } catch {
        yield failed('bad-utf8', 'line is not valid UTF-8', options.file, line)
        continue
      }
    }
    yield checkLine(text, line, options.file, maxChars)
  }
}

/**
 * Check one decoded line (`null`: longer than the byte cap) and normalize it to NFC.
 * @example checkLine('a\r', 1, 'x', 10) // { line: 1, text: 'a' }
 */
export function checkLine(raw: string | null, line: number, file: string, maxChars: number): LineItem {
  if (raw === null) return tooLong(file, line, maxChars)
  let text = raw
  if (line === 1 && text.charCodeAt(0) === 0xfeff) text = text.slice(1)
  if (text.endsWith('\r')) text = text.slice(0, -1)
  if (text.length > maxChars) return tooLong(file, line, maxChars)
  const at = text.search(CONTROL)
  if (at !== -1) {
    const column = [...text.slice(0, at)].length + 1
    if (text.charCodeAt(at) === 0) return failed('nul-byte', `NUL byte at character ${column}`, file, line)
    const code = text.charCodeAt(at).toString(16).toUpperCase().padStart(4, '0')
    return failed('control-char', `control character U+${code} at character ${column}`, file, line)
  }
  return { line, text: text.normalize('NFC') }
}

function tooLong(file: string, line: number, maxChars: number): LineItem {
  return failed('line-too-long', `line is longer than ${maxChars} characters`, file, line)
}

function failed(code: ProblemCode, message: string, file: string, line: number): LineItem {
  return { line, problem: { code, message, file, line } }
}
