// The zod schemas of the models routes: listings, versions, the publish query and the answer to a learned upload.
import { z } from '@hono/zod-openapi'

/** Counts that describe a version (a learned one adds `skippedLines` and `learnMs`). */
export const Summary = z.record(z.string(), z.number()).openapi('ModelSummary')

/** One stored version. */
export const Version = z
  .object({
    version: z.number().int(),
    sha256: z.string(),
    bytes: z.number().int(),
    createdAt: z.string(),
    summary: Summary,
  })
  .openapi('ModelVersion')

/** One line of `GET /v1/models`. */
export const Listing = z
  .object({
    name: z.string(),
    embedded: z.boolean(),
    default: z.boolean(),
    served: z.number().int().nullable(),
    summary: Summary,
  })
  .openapi('ModelListing')

/** `GET /v1/models/:name`: the version served and every stored version. */
export const Described = z
  .object({
    name: z.string(),
    embedded: z.boolean(),
    served: z.number().int().nullable(),
    versions: z.array(Version),
  })
  .openapi('ModelVersions')

/** The `:name` path segment. */
export const NameParam = z.object({
  name: z.string().openapi({ param: { name: 'name', in: 'path' }, example: 'demo' }),
})

/** The `:name` and `:v` path segments. */
export const VersionParams = NameParam.extend({
  v: z.coerce
    .number()
    .int()
    .positive()
    .openapi({ param: { name: 'v', in: 'path' }, example: 2 }),
})

/** The query of a publish: only a lexicon upload reads it. */
export const PublishQuery = z.object({
  format: z
    .enum(['rows', 'entries', 'lemmas'])
    .optional()
    .openapi({ description: 'The lexicon format (also as a media-type parameter); default: sniffed.' }),
  skipBad: z.enum(['0', '1', 'false', 'true']).optional().openapi({
    description: 'Learn from the lines that read, counting the bad ones (default: refuse the upload).',
  }),
})

const ProblemSchema = z
  .object({
    code: z.string(),
    message: z.string(),
    file: z.string().optional(),
    line: z.number().int().optional(),
  })
  .openapi('Problem')

/** The answer to a learned upload: the version published, what learning found, and the time taken. */
export const LearnedVersion = Version.extend({
  name: z.string(),
  learned: z.object({
    format: z.enum(['rows', 'entries', 'lemmas']),
    gzip: z.boolean(),
    uploadBytes: z.number().int(),
    lines: z.number().int(),
    skipped: z.number().int(),
    problems: z.array(ProblemSchema),
    languageSpecific: z.array(z.string()),
    tables: z.number().int(),
    lemmaOnly: z.number().int(),
    predicted: z.number().int(),
    notes: z.array(ProblemSchema),
  }),
  milliseconds: z.object({ read: z.number(), learn: z.number(), publish: z.number(), total: z.number() }),
}).openapi('LearnedVersion')
