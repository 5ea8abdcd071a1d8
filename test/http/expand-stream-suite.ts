// Streaming expansion: the first rows leave before the last lemma is expanded (run under Node and in workerd).
import { describe, expect, it } from 'vitest'
import { expandLemma } from '../../src/core/inflect/expand.ts'
import { decodeModel } from '../../src/core/model/decode-model.ts'
import { DEMO_MODEL_TEXT } from '../../src/http/demo-model.generated.ts'
import { expansionStream } from '../../src/http/expand-stream.ts'
import type { LemmaRequest } from '../../src/http/lemma-requests.ts'

/** Bare nouns of demo-lexicon/lemmas.tsv, repeated into a long list. */
const LEMMAS: LemmaRequest[] = Array.from({ length: 500 }, (_, i) => ({
  lemma: ['baskerka', 'almen', 'baršū'][i % 3]!,
  upos: 'NOUN',
  feats: ['Gender=Fem', 'Gender=Masc', 'Gender=Fem'][i % 3]!,
}))

/**
 * Register the streaming suite.
 * @example describeExpandStream()
 */
export function describeExpandStream(): void {
  describe('streaming expansion', { timeout: 30_000 }, () => {
    for (const format of ['jsonl', 'tsv'] as const) {
      it(`sends the first ${format} rows before the last lemma is processed`, async () => {
        const model = decodeModel(DEMO_MODEL_TEXT)
        let expanded = 0
        const expand = (r: LemmaRequest) => {
          expanded++
          return expandLemma(model.inflection, r.lemma, r.upos, r.feats)
        }
        const reader = expansionStream(LEMMAS, expand, format, true).getReader()
        let text = ''
        while (!text.includes('baskerka')) text += new TextDecoder().decode((await reader.read()).value)
        expect(expanded).toBeGreaterThan(0)
        expect(expanded).toBeLessThan(LEMMAS.length)
        await reader.cancel()
        expect(expanded).toBeLessThan(LEMMAS.length)
      })
    }
  })
}
