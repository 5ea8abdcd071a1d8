// One place that turns every failure into `{error:{code,message,details}}`: thrown errors, 404s, zod issues.
import type { Context, ErrorHandler, NotFoundHandler } from 'hono'
import { HTTPException } from 'hono/http-exception'
import type { ContentfulStatusCode } from 'hono/utils/http-status'
import type { ZodError } from 'zod'
import { ProblemError } from '../core/lexicon/problem.ts'
import { ApiError, type ApiErrorCode, problemError } from './api-error.ts'

/** The code Hono's own exceptions (malformed JSON, media type, auth) map to, by status. */
const CODE_BY_STATUS: Record<number, ApiErrorCode> = {
  400: 'invalid-request',
  401: 'unauthorized',
  404: 'not-found',
  405: 'method-not-allowed',
  413: 'too-large',
  415: 'unsupported-media-type',
}

/**
 * The error as an `ApiError`. Anything unrecognized is an internal fault: it is logged, and the answer
 * says only that (no stack, no message from inside).
 * @example toApiError(new HTTPException(415)).code // 'unsupported-media-type'
 */
export function toApiError(err: unknown): ApiError {
  if (err instanceof ApiError) return err
  if (err instanceof ProblemError) return problemError(err.problem)
  if (err instanceof HTTPException) {
    const status = err.status as ContentfulStatusCode
    const code = CODE_BY_STATUS[status] ?? (status < 500 ? 'invalid-request' : 'internal')
    const message = err.message || (status === 401 ? 'a bearer token is required' : 'the request was refused')
    return new ApiError(
      status,
      code,
      err.message === 'Malformed JSON in request body' ? 'body is not valid JSON' : message,
    )
  }
  console.error('formfold: internal error', err)
  return new ApiError(500, 'internal', 'internal error')
}

/**
 * `app.onError`: every thrown error becomes the JSON error body. A library exception that already carries a
 * JSON answer in our shape (the bearer guard's, with its `WWW-Authenticate` challenge) is passed on as is.
 */
export const onError: ErrorHandler = (err, c) => {
  if (err instanceof HTTPException && err.res?.headers.get('content-type')?.startsWith('application/json')) {
    return err.getResponse()
  }
  const api = toApiError(err)
  return c.json(api.toBody(), api.status)
}

/** `app.notFound`: an unknown path is a 404 in the same shape. */
export const onNotFound: NotFoundHandler = (c) =>
  c.json(
    new ApiError(404, 'not-found', `no route for ${c.req.method} ${new URL(c.req.url).pathname}`).toBody(),
    404,
  )

/** One zod issue as the API reports it: where, what kind, and zod's own message. */
export interface IssueDetail {
  path: string
  code: string
  message: string
}

/**
 * zod issues as details: the dotted path inside the request part (`query`, `json`, `param`).
 * @example issueDetails('json', err) // [{ path: 'json.forms.0', code: 'invalid_type', message: '…' }]
 */
export function issueDetails(target: string, error: ZodError): IssueDetail[] {
  return error.issues.map((i) => ({
    path: [target, ...i.path.map(String)].join('.'),
    code: i.code,
    message: i.message,
  }))
}

/**
 * The validation hook of every OpenAPI route: a request that does not match its schema is a 400.
 * @example new OpenAPIHono({ defaultHook: validationHook })
 */
export function validationHook(
  result: { success: true } | { success: false; error: ZodError; target?: string },
  _c: Context,
): void {
  if (result.success) return
  const details = issueDetails(result.target ?? 'request', result.error)
  const first = details[0]
  const message = first ? `${first.path}: ${first.message}` : 'the request does not match the schema'
  throw new ApiError(400, 'invalid-request', message, { issues: details })
}
