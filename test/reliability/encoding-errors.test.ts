// Unreadable lines: invalid UTF-8 in its several shapes, NUL and control characters, a line over the length limit.
import { MAX_LINE_CHARS } from '../../src/formats/index.ts'
import { type BadCase, describeBadInput, GOOD, latin1, withBytes } from './bad-input.ts'

const NOT_UTF8 = 'line is not valid UTF-8'

// Which byte sequences are ill-formed UTF-8: the Unicode Standard, chapter 3, table 3-7 (from memory).
const cases: BadCase[] = [
  {
    name: 'a byte that is never UTF-8 (FF)',
    file: 'bad.tsv',
    data: latin1(GOOD, 'vess\xff\ta\tNOUN\t_\n'),
    says: NOT_UTF8,
  },
  {
    name: 'Latin-1 text',
    file: 'bad.tsv',
    data: latin1(GOOD, 'h\xe4us\th\xe4us\tNOUN\t_\n'),
    says: NOT_UTF8,
  },
  {
    name: 'an overlong encoding (C0 AF)',
    file: 'bad.tsv',
    data: withBytes(`${GOOD}a`, 0xc0, 0xaf),
    says: NOT_UTF8,
  },
  {
    name: 'an encoded surrogate (ED A0 80)',
    file: 'bad.tsv',
    data: withBytes(`${GOOD}a`, 0xed, 0xa0, 0x80),
    says: NOT_UTF8,
  },
  {
    name: 'a truncated sequence',
    file: 'bad.tsv',
    data: withBytes(`${GOOD}vessa\tvess`, 0xc3),
    says: NOT_UTF8,
  },
  {
    name: 'UTF-16 with its byte order mark',
    file: 'bad.tsv',
    data: new Uint8Array([0xff, 0xfe, 0x61, 0x00, 0x0a, 0x00]),
    says: NOT_UTF8,
    line: 1,
  },
  {
    name: 'a NUL byte',
    file: 'bad.tsv',
    data: `${GOOD}vessa\tves\u0000san\tNOUN\tCase=Gen\n`,
    says: 'NUL byte at character 10',
  },
  {
    name: 'a control character',
    file: 'bad.tsv',
    data: `${GOOD}vessa\tvessan\u0007\tNOUN\tCase=Gen\n`,
    says: 'control character U+0007 at character 13',
  },
  {
    name: 'a lone CR line break',
    file: 'bad.tsv',
    data: `${GOOD}vessa\tvessan\tNOUN\tCase=Gen\rvessa\tvessa\tNOUN\t_\n`,
    says: 'control character U+000D at character 27',
  },
  {
    name: 'a byte order mark inside the file (two files joined)',
    file: 'bad.tsv',
    data: `${GOOD}\uFEFFvessa\tvessan\tNOUN\tCase=Gen\n`,
    says: 'lemma "\uFEFFvessa" contains U+FEFF, a byte order mark inside the file (were files joined?)',
  },
  {
    name: 'a C1 control character (text decoded as Latin-1 twice)',
    file: 'bad.tsv',
    data: `${GOOD}vessa\tvessan\u0085\tNOUN\tCase=Gen\n`,
    says: 'form "vessan\u0085" contains a tab or control character',
  },
  {
    name: 'a line over the length limit',
    file: 'bad.tsv',
    data: `${GOOD}vessa\t${'a'.repeat(MAX_LINE_CHARS)}\tNOUN\t_\n`,
    says: `line is longer than ${MAX_LINE_CHARS} characters`,
  },
]

describeBadInput('learn on unreadable lines', cases)
