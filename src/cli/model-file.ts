// Model files on disk: UTF-8 JSON, or the same JSON gzip-compressed (`*.gz` when written; told by its first
// two bytes when read), with the model reader's problems turned into exit-2 errors.
import { readFile } from 'node:fs/promises'
import { gunzipSync, gzipSync } from 'node:zlib'
import { ProblemError } from '../core/index.ts'
import type { ProblemCode } from '../core/lexicon/problem.ts'
import { readModel } from '../core/model/decode-model.ts'
import type { Model } from '../core/model/model.ts'

/** Whether `bytes` start as a gzip member does (RFC 1952: 0x1f 0x8b). */
export function isGzip(bytes: Uint8Array): boolean {
  return bytes.length >= 2 && bytes[0] === 0x1f && bytes[1] === 0x8b
}

/**
 * A model file's text from its bytes: gzip undone when the bytes are gzip, else read as UTF-8.
 * @example modelTextOfBytes(gzipModelText('{"format":"formfold-model"}')) // '{"format":"formfold-model"}'
 */
export function modelTextOfBytes(bytes: Uint8Array): string {
  return new TextDecoder().decode(isGzip(bytes) ? gunzipSync(bytes) : bytes)
}

/**
 * A model file's text gzip-compressed at the highest level: the same text gives the same bytes (the header
 * carries no time or name).
 * @example isGzip(gzipModelText('{}')) // true
 */
export function gzipModelText(text: string): Uint8Array {
  return new Uint8Array(gzipSync(text, { level: 9 }))
}

/** The bytes to write for a model whose file is `path`: gzip for `*.gz`, else the text as UTF-8. */
export function modelFileBytes(path: string, text: string): Uint8Array {
  return path.toLowerCase().endsWith('.gz') ? gzipModelText(text) : new TextEncoder().encode(text)
}

/**
 * Read a model file's text (gzip or not); an unreadable (code `unreadable`) or corrupt file is a ProblemError naming it.
 * @example const text = await readModelText('de.model.json.gz')
 */
export async function readModelText(path: string, unreadable: ProblemCode = 'unreadable-file'): Promise<string> {
  let bytes: Uint8Array
  try {
    bytes = new Uint8Array(await readFile(path))
  } catch {
    throw new ProblemError({ code: unreadable, file: path, message: 'cannot read the model file' })
  }
  try {
    return modelTextOfBytes(bytes)
  } catch {
    throw new ProblemError({ code: 'bad-model', file: path, message: 'the model file starts as gzip but does not decompress' })
  }
}

/** Load and check a model file; a bad or newer-version file is a ProblemError naming the file. */
export async function loadModelFile(path: string): Promise<Model> {
  const r = readModel(await readModelText(path, 'bad-model'))
  if (!r.ok) throw new ProblemError({ ...r.problem, file: path })
  return r.model
}
