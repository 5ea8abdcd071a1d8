// The page at `/`: a placeholder that points at the API description until the real page replaces it.
import type { Hono } from 'hono'
import type { AppEnv } from './env.ts'

const PLACEHOLDER = `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><title>formfold</title></head>
<body>
<h1>formfold</h1>
<p>Candidate analyses (lemma, UPOS, FEATS) for word forms, attested or predicted from learned paradigms.</p>
<p>Try <a href="/v1/analyze?form=test">/v1/analyze?form=…</a>; the whole API is described in
<a href="/openapi.json">/openapi.json</a>.</p>
</body>
</html>
`

/**
 * Add `GET /` to an app.
 * @example registerPage(app)
 */
export function registerPage(app: Hono<AppEnv>): void {
  app.get('/', (c) => c.html(PLACEHOLDER))
}
