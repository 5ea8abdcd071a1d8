// The line reader: UTF-8 across chunks, BOM, CRLF, control characters, length limit, NFC.
import { describe, expect, it } from 'vitest'
import { MAX_LINE_CHARS, readLines } from '../../src/formats/index.ts'
import { bytes, chunked, collect, utf8 } from './helpers.ts'

const file = 'in.txt'
const read = (input: Parameters<typeof readLines>[0], maxLineChars?: number) =>
  collect(readLines(input, { file, maxLineChars }))
const texts = async (input: Parameters<typeof readLines>[0]) =>
  (await read(input)).map((i) => i.text ?? i.problem)

describe('readLines', () => {
  it.each([
    ['strips a leading BOM from a string', '\uFEFFa\nb', ['a', 'b']],
    ['accepts CRLF line breaks', 'a\r\nb\r\n', ['a', 'b']],
    ['keeps a blank line and reads no line after a final LF', 'a\n\nb\n', ['a', '', 'b']],
    ['reads a last line without LF', 'a\nb', ['a', 'b']],
    ['reads nothing from an empty input', '', []],
    ['keeps TAB', 'a\tb', ['a\tb']],
    // Unicode Standard Annex #15: e + U+0301 composes to U+00E9 under NFC.
    ['normalizes every line to NFC', 'cafe\u0301\n', ['caf\u00e9']],
    ['keeps a U+FEFF that is not the first character of the input', 'a\n\uFEFFb', ['a', '\uFEFFb']],
  ])('%s', async (_name, input, expected) => {
    expect(await texts(input)).toEqual(expected)
    expect(await texts(utf8(input))).toEqual(expected)
  })

  it.each([
    ['a NUL byte', 'ok\na\u0000b\n', 'nul-byte', 'NUL byte at character 2'],
    ['a bell character', 'ok\na\u0007\n', 'control-char', 'control character U+0007 at character 2'],
    [
      'a carriage return inside a line',
      'ok\na\rb\n',
      'control-char',
      'control character U+000D at character 2',
    ],
    [
      'an escape counted by code point',
      'ok\n\u{1F600}\u001b\n',
      'control-char',
      'control character U+001B at character 2',
    ],
  ])('rejects %s on its line', async (_name, input, code, message) => {
    for (const source of [input, utf8(input)]) {
      const items = await read(source)
      expect(items.map((i) => i.line)).toEqual([1, 2])
      expect(items[1]!.problem).toEqual({ code, message, file, line: 2 })
    }
  })

  // Byte sequences invalid per RFC 3629 / Unicode Standard ch. 3 (Table 3-7, well-formed UTF-8).
  it.each([
    ['a lone continuation byte', [0x80]],
    ['a lead byte followed by ASCII', [0xc3, 0x28]],
    ['an overlong encoding of "/"', [0xc0, 0xaf]],
    ['an encoded surrogate', [0xed, 0xa0, 0x80]],
    ['a truncated 3-byte sequence', [0xe2, 0x82]],
    ['a byte never used in UTF-8', [0xff]],
  ])('reports %s as bad-utf8 on its line and reads on', async (_name, bad) => {
    const items = await read(bytes('first\n', 'x', bad, 'y\n', 'third\n'))
    expect(items).toEqual([
      { line: 1, text: 'first' },
      { line: 2, problem: { code: 'bad-utf8', message: 'line is not valid UTF-8', file, line: 2 } },
      { line: 3, text: 'third' },
    ])
  })

  it('reports a lone surrogate in string input as bad-utf8', async () => {
    const items = await read('a\n\uD800b\n')
    expect(items[1]!.problem?.code).toBe('bad-utf8')
  })

  it('decodes a multi-byte character and a BOM split across chunks', async () => {
    const data = bytes([0xef, 0xbb, 0xbf], 'caf\u00e9\r\n\u{1F600}\n')
    for (const cuts of [[1], [2], [7], [8], [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]]) {
      expect(await texts(chunked(data, cuts))).toEqual(['caf\u00e9', '\u{1F600}'])
    }
  })

  it('detects invalid UTF-8 split across a chunk boundary', async () => {
    // 0xE2 0x82 starts a 3-byte sequence; the next chunk continues with ASCII instead of 0x80–0xBF.
    const data = bytes('ok\n', 'a', [0xe2, 0x82], 'b\nnext\n')
    for (const cut of [4, 5, 6]) {
      const items = await read(chunked(data, [cut]))
      expect(items.map((i) => i.problem?.code ?? i.text)).toEqual(['ok', 'bad-utf8', 'next'])
    }
  })

  it('reads a stream of bytes: a web ReadableStream and a Request body', async () => {
    const body = new Request('http://localhost/', { method: 'POST', body: 'a\tNOUN\r\nb\tVERB\n' }).body!
    expect(await texts(body)).toEqual(['a\tNOUN', 'b\tVERB'])
    expect(await texts(new Response('x\ny').body!)).toEqual(['x', 'y'])
  })

  it('rejects a line over the named limit, from a string and from chunks, and reads on', async () => {
    const long = 'x'.repeat(MAX_LINE_CHARS + 1)
    const exact = 'y'.repeat(MAX_LINE_CHARS)
    const input = `${exact}\r\n${long}\nz\n`
    const data = utf8(input)
    for (const source of [input, chunked(data, [1000, 70_000, 70_001, 140_000])]) {
      const items = await read(source)
      expect(items.map((i) => (i.problem ? i.problem.code : i.text.length))).toEqual([
        MAX_LINE_CHARS,
        'line-too-long',
        1,
      ])
      expect(items[1]!.problem).toEqual({
        code: 'line-too-long',
        message: `line is longer than ${MAX_LINE_CHARS} characters`,
        file,
        line: 2,
      })
    }
  })

  it('takes a smaller limit from the options, counting characters not bytes', async () => {
    const items = await read(utf8('\u00e9\u00e9\u00e9\n\u00e9\u00e9\u00e9\u00e9\n'), 3)
    expect(items.map((i) => i.problem?.code ?? i.text)).toEqual(['\u00e9\u00e9\u00e9', 'line-too-long'])
  })
})
