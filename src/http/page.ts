// The page at `/`: one self-contained HTML document (markup, styles, a small vanilla script) over the JSON routes.
import type { Hono } from 'hono'
import type { AppEnv } from './env.ts'
import { CLIENT_CORE } from './page/client-core.ts'
import { CLIENT_COVERAGE } from './page/client-coverage.ts'
import { CLIENT_PARADIGMS } from './page/client-paradigms.ts'
import { CLIENT_SEARCH } from './page/client-search.ts'
import { CLIENT_START } from './page/client-start.ts'
import { CLIENT_TABLE } from './page/client-table.ts'
import { CLIENT_TABLE_GRID } from './page/client-table-grid.ts'
import { PAGE_BODY } from './page/markup.ts'
import { PAGE_STYLES } from './page/styles.ts'
import { PAGE_STYLES_PARTS } from './page/styles-parts.ts'

/** The client script: shared helpers first, then one part per tool, then the start-up code. */
const SCRIPT = [
  CLIENT_CORE,
  CLIENT_SEARCH,
  CLIENT_TABLE_GRID,
  CLIENT_TABLE,
  CLIENT_PARADIGMS,
  CLIENT_COVERAGE,
  CLIENT_START,
].join('\n')

/**
 * The whole page as one string (no external resources, so it works offline and under a strict CSP-less host).
 * @example pageHtml().startsWith('<!doctype html>') // true
 */
export function pageHtml(): string {
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<title>formfold — forms, tables and constraints</title>',
    `<style>${PAGE_STYLES}${PAGE_STYLES_PARTS}</style>`,
    '</head>',
    PAGE_BODY,
    `<script>${SCRIPT}</script>`,
    '</html>',
    '',
  ].join('\n')
}

const PAGE = pageHtml()

/**
 * Add `GET /` (the page) to an app.
 * @example registerPage(app); await app.request('/') // 200 text/html
 */
export function registerPage(app: Hono<AppEnv>): void {
  app.get('/', (c) => c.html(PAGE))
}
