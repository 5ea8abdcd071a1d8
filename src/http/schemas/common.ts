// Schemas shared by the routes: model names, forms, analyses, tables, the error body.
import { z } from '@hono/zod-openapi'
import { canonicalizeFeats, isUpos } from '../../core/lexicon/feats.ts'
import { MAX_FORM_CHARS, MAX_MODEL_NAME_CHARS } from '../limits.ts'

// C0 controls, DEL and C1 controls: never part of a word form.
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is its purpose
const CONTROL = /[\u0000-\u001F\u007F-\u009F]/

/** A model name as a query parameter: `?model=` (default: the default model). */
export const ModelQuery = z
  .string()
  .regex(/^[a-z0-9][a-z0-9._-]*$/, 'a model name is lowercase letters, digits, ".", "_" or "-"')
  .max(MAX_MODEL_NAME_CHARS)
  .optional()
  .openapi({
    param: { name: 'model', in: 'query' },
    example: 'demo',
    description: 'Model name (default: the demo model).',
  })

/** One word form: non-empty, at most `MAX_FORM_CHARS`, no control characters or NUL. */
export const Form = z
  .string()
  .min(1, 'a form must not be empty')
  .max(MAX_FORM_CHARS, `a form is at most ${MAX_FORM_CHARS} characters`)
  .refine((s) => !CONTROL.test(s), 'a form must not contain control characters or NUL')
  .openapi({ example: 'vessat' })

/** A lemma: the same constraints as a form. */
export const Lemma = Form.openapi({ example: 'vessa' })

/** One of the 17 UD UPOS tags. */
export const Upos = z
  .string()
  .refine(isUpos, 'not one of the 17 UD UPOS tags (e.g. NOUN, VERB, ADJ)')
  .openapi({ example: 'NOUN', description: 'A UD UPOS tag.' })

/** A FEATS bundle as in CoNLL-U (`_` for none), canonicalized; a malformed bundle is refused. */
export const Feats = z
  .string()
  .max(512)
  .transform((raw, ctx) => {
    const r = canonicalizeFeats(raw)
    if (r.ok) return r.feats
    ctx.addIssue({ code: 'custom', message: r.problem.message })
    return z.NEVER
  })
  .openapi({ example: 'Case=Nom|Number=Plur', type: 'string' })

/** Where an analysis or a form comes from. */
export const Source = z.enum(['attested', 'predicted', 'guessed']).openapi('Source')

/** One candidate analysis of a form. */
export const Candidate = z
  .object({
    lemma: z.string(),
    upos: z.string(),
    feats: z.string(),
    source: Source,
    score: z.number().min(0).max(1),
    paradigm: z.string().nullable(),
  })
  .openapi('Candidate')

/** One form of a table: attested (from the dictionary) or predicted (from a paradigm), with its score. */
export const TableForm = z
  .object({
    form: z.string(),
    feats: z.string(),
    cell: z.string(),
    source: z.enum(['attested', 'predicted']),
    score: z.number(),
    corpus: z
      .number()
      .int()
      .min(0)
      .optional()
      .openapi({ description: 'how often the corpus the model learned with has this form (models learned with --corpus)' }),
  })
  .openapi('TableForm')

/** A lemma's table. */
export const Table = z
  .object({
    lemma: z.string(),
    upos: z.string(),
    inherent: z.string(),
    source: z.enum(['attested', 'predicted']),
    paradigm: z.string().nullable(),
    score: z.number(),
    forms: z.array(TableForm),
    alternatives: z.array(
      z.object({
        paradigm: z.string(),
        score: z.number(),
        cells: z.array(z.object({ key: z.string(), forms: z.array(z.string()) })),
      }),
    ),
  })
  .openapi('Table')

/** The body of every error answer. */
export const ErrorBody = z
  .object({
    error: z.object({
      code: z.string().openapi({ example: 'invalid-request' }),
      message: z.string(),
      details: z.unknown(),
    }),
  })
  .openapi('Error')

/** The error responses a route documents, by status. */
export function errorResponses(...statuses: (400 | 401 | 404 | 409 | 413 | 415 | 422 | 503)[]) {
  const describe: Record<number, string> = {
    400: 'The request does not match the schema (bad JSON, wrong types, missing fields).',
    401: 'A write without the bearer token.',
    404: 'Unknown model, lemma, paradigm or version.',
    409: 'The version is served, or the model is embedded.',
    413: 'A body or list over its limit.',
    415: 'The body is not of a media type the route reads.',
    422: 'The content is invalid (bad lines, a corrupt model).',
    503: 'Storage failed; what was served before still is.',
  }
  return Object.fromEntries(
    statuses.map((s) => [
      s,
      { description: describe[s]!, content: { 'application/json': { schema: ErrorBody } } },
    ]),
  )
}
