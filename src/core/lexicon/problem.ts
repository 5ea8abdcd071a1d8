// Problems as data: every reader and core step reports these; the CLI and HTTP layers format them.

/** Codes of every problem formfold reports (a catalogue: the message is written at the edge). */
export type ProblemCode =
  | 'bad-upos'
  | 'bad-feats'
  | 'bad-columns'
  | 'empty-field'
  | 'bad-json'
  | 'bad-entry'
  | 'bad-utf8'
  | 'nul-byte'
  | 'control-char'
  | 'line-too-long'
  | 'word-too-long'
  | 'unreadable-file'
  | 'no-entries'
  | 'conflict'
  | 'bad-conllu'
  | 'bad-model'
  | 'unknown-lemma'

/** One problem: what went wrong, and where (file and 1-based line when it comes from a file). */
export interface Problem {
  code: ProblemCode
  message: string
  file?: string
  line?: number
}

/** `file:line: message`, the form every command-line error takes. */
export function formatProblem(p: Problem): string {
  const where = p.file ? (p.line ? `${p.file}:${p.line}: ` : `${p.file}: `) : p.line ? `line ${p.line}: ` : ''
  return `${where}${p.message}`
}

/** Thrown by a core step when a caller asked for "throw on first problem". */
export class ProblemError extends Error {
  readonly problem: Problem
  constructor(problem: Problem) {
    super(formatProblem(problem))
    this.problem = problem
  }
}
