// The page in real headless Chromium, against the app under Node: search a form, open its table, browse a
// paradigm, paste a sentence and see its coverage chart. The forms and sentence come from the gold CoNLU-U
// sample demo-lexicon/gold.conllu (its LEMMA/UPOS columns are the expected answers).
import { mkdir } from 'node:fs/promises'
import { fileURLToPath } from 'node:url'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type NodeServer, startNodeServer } from '../../src/node.ts'
import { type Browser, launchChromium } from './chromium.ts'
import { type GoldToken, goldSentences, lemmaOnly } from './gold.ts'

const root = fileURLToPath(new URL('../../', import.meta.url))
const ARTIFACTS = `${root}test-artifacts/`

let server: NodeServer
let browser: Browser
let page: Page
let target: GoldToken
let sentence: { text: string; tokens: GoldToken[] }

beforeAll(async () => {
  const sentences = await goldSentences(`${root}demo-lexicon/gold.conllu`)
  const bare = await lemmaOnly(`${root}demo-lexicon/lemmas.tsv`)
  // A noun form of a lemma the dictionary lists without a table: only a predicted table can license it.
  const pick = sentences
    .flatMap((s) => s.tokens)
    .find(
      (t) => t.upos === 'NOUN' && bare.has(t.lemma) && t.form !== t.lemma && t.form === t.form.toLowerCase(),
    )
  expect(pick, 'gold.conllu has an inflected form of a lemma-only noun').toBeDefined()
  target = pick!
  sentence = sentences.find((s) => s.tokens.some((t) => t === target))!
  server = await startNodeServer({ port: 0 })
  browser = await launchChromium()
  page = await browser.context.newPage()
  await mkdir(ARTIFACTS, { recursive: true })
}, 60_000)

afterAll(async () => {
  await browser?.close()
  await server?.close()
})

describe('the page at /', () => {
  it('names the model, warns that predicted forms are hypotheses, and labels every control', async () => {
    const res = await page.goto(`${server.url}/`)
    expect(res?.status()).toBe(200)
    await expect.poll(() => page.textContent('#model-line')).toMatch(/^Model “demo”.*\d+ paradigms/)
    expect(await page.textContent('.caution')).toMatch(
      /Predicted forms are hypotheses\..*not normative forms/s,
    )
    const unlabelled = await page.$$eval('input, select, textarea', (els) =>
      els.filter((el) => (el as HTMLInputElement).labels?.length === 0).map((el) => el.id),
    )
    expect(unlabelled).toEqual([])
    // The paradigm list is filled at start-up from the model.
    await page.waitForSelector('#paradigms-list tbody tr')
  })

  it('lists the candidates of a searched form, the gold analysis among them, marked predicted', async () => {
    await page.focus('#search-input')
    await page.keyboard.type(target.form)
    await page.keyboard.press('Enter')
    const row = page
      .locator('#search-results tbody tr', { hasText: target.lemma })
      .filter({ hasText: target.upos })
      .first()
    await row.waitFor()
    expect(await row.locator('.tag').textContent()).toContain('predicted')
    expect(await page.textContent('#search-status')).toMatch(/candidates? for “/)
    const header = await page.$$eval('#search-results thead th', (ths) => ths.map((th) => th.textContent))
    expect(header).toEqual(['Lemma', 'UPOS', 'FEATS', 'Source', 'Score', 'Paradigm'])
  })

  it('opens the lemma table from the keyboard, its predicted cells hatched and labelled with a confidence', async () => {
    const open = page
      .getByRole('button', { name: `Open the table of ${target.lemma}, ${target.upos}` })
      .first()
    await open.focus()
    await page.keyboard.press('Enter')
    await page.waitForSelector('#table-results .lemma-table')
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('table-h')
    const cell = page.locator('#table-results td.cell-predicted', {
      has: page.locator('.form', { hasText: new RegExp(`^${target.form}$`) }),
    })
    await cell.first().waitFor()
    expect(await cell.first().textContent()).toMatch(/predicted · confidence [01]\.\d\d/)
    const look = await cell.first().evaluate((el) => {
      const s = getComputedStyle(el)
      return { background: s.backgroundImage, outline: s.outlineStyle }
    })
    expect(look.background).toContain('repeating-linear-gradient')
    expect(look.outline).toBe('dashed')
    expect(await page.textContent('#table-results .review')).toContain('hypothesis')
    // The demo model learned with its corpus: predicted cells say whether the text attests their form.
    const notes = await page.locator('#table-results td.cell-predicted .corpus').allTextContents()
    expect(notes.length).toBeGreaterThan(0)
    for (const n of notes) expect(n).toMatch(/^(✓ seen [\d,]+× in the corpus|– not in the corpus)$/)
    expect(notes.some((n) => n.includes('seen'))).toBe(true)
  })

  it('shows a paradigm with the rule of each cell and its example lemma', async () => {
    await page.locator('#table-results .table-facts button.linkish').first().click()
    await page.waitForSelector('#paradigm-detail table.rules tbody tr')
    const rules = await page.$$eval('#paradigm-detail table.rules tbody tr', (trs) =>
      trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim())),
    )
    expect(rules.length).toBeGreaterThanOrEqual(12)
    for (const [rule, form] of rules) {
      expect(rule).toMatch(/x1/)
      expect(form).not.toBe('—')
    }
  })

  it('charts the coverage of a pasted sentence and offers its constraint file', async () => {
    await page.fill('#coverage-text', sentence.text)
    await page.click('#coverage-form button[type=submit]')
    await page.waitForSelector('#coverage-results svg.bar')
    const bars = await page.$$eval('#coverage-results svg.bar', (svgs) =>
      svgs.map((s) => s.getAttribute('aria-label')),
    )
    expect(bars).toHaveLength(2)
    expect(bars[0]).toMatch(
      /^Tokens: attested [\d.]+ %, predicted [\d.]+ %, guessed [\d.]+ %, no candidate [\d.]+ %$/,
    )
    const counts = await page.$$eval('#coverage-results table.legend tbody tr', (trs) =>
      trs.map((tr) => Number(tr.querySelectorAll('td')[0]!.textContent!.replace(/,/g, ''))),
    )
    // Word tokens of the gold sentence: every token but punctuation (the text reader counts words only).
    expect(counts.reduce((a, b) => a + b, 0)).toBe(sentence.tokens.filter((t) => t.upos !== 'PUNCT').length)
    expect(counts[1]).toBeGreaterThan(0)
    const link = page.locator('#coverage-download')
    expect(await link.getAttribute('download')).toBe('constraints.tsv')
    const [download] = await Promise.all([page.waitForEvent('download'), link.click()])
    expect(download.suggestedFilename()).toBe('constraints.tsv')
    await page.screenshot({ path: `${ARTIFACTS}page.png`, fullPage: true })
    if (process.env.FORMFOLD_DOCS_SCREENSHOT)
      await page.screenshot({ path: `${root}docs/page.png`, fullPage: true })
  })
})
