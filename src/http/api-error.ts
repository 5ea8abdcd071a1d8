// The one error type of the HTTP layer: a status, a code from a catalogue, a message and structured details.
import type { ContentfulStatusCode } from 'hono/utils/http-status'
import type { Problem } from '../core/lexicon/problem.ts'

/**
 * Codes of every error the service answers with. 4xx codes describe the request; the 5xx codes are faults
 * of storage or the service itself and never come from bad input.
 */
export type ApiErrorCode =
  | 'invalid-request'
  | 'bad-json'
  | 'bad-utf8'
  | 'unauthorized'
  | 'not-found'
  | 'unknown-model'
  | 'unknown-lemma'
  | 'unknown-paradigm'
  | 'unknown-version'
  | 'method-not-allowed'
  | 'version-served'
  | 'read-only-model'
  | 'too-large'
  | 'unsupported-media-type'
  | 'invalid-content'
  | 'bad-encoding'
  | 'store-failed'
  | 'missing-shards'
  | 'internal'

/** The JSON body of every error response. */
export interface ErrorBody {
  error: { code: ApiErrorCode | Problem['code']; message: string; details: unknown }
}

/**
 * An error a handler throws; the error handler turns it into `{error:{code,message,details}}`.
 * @example throw new ApiError(404, 'unknown-model', 'no model named "xx"', { model: 'xx' })
 */
export class ApiError extends Error {
  readonly status: ContentfulStatusCode
  readonly code: ApiErrorCode | Problem['code']
  readonly details: unknown

  constructor(
    status: ContentfulStatusCode,
    code: ApiErrorCode | Problem['code'],
    message: string,
    details: unknown = null,
  ) {
    super(message)
    this.status = status
    this.code = code
    this.details = details
  }

  /** The response body. */
  toBody(): ErrorBody {
    return { error: { code: this.code, message: this.message, details: this.details } }
  }
}

/**
 * A problem in uploaded content (a bad line, a corrupt model) as a 422 carrying the problem itself.
 * @example problemError({ code: 'bad-upos', message: 'unknown UPOS "NOUNN"', line: 3 }).status // 422
 */
export function problemError(problem: Problem): ApiError {
  return new ApiError(422, problem.code, problem.message, { problems: [problem] })
}

/**
 * The 413 answer for a body over a limit, naming the bound and, when there is one, the command that has none.
 * @example tooLarge('request body', 1048576, 'formfold expand')
 */
export function tooLarge(what: string, limit: number, instead?: string): ApiError {
  const hint = instead ? `; for more, use \`${instead}\`` : ''
  return new ApiError(413, 'too-large', `${what} is larger than ${limit}${hint}`, { limit })
}
