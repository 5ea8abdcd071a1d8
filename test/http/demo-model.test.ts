// The embedded demo model is the one demo-lexicon/ gives today (regenerate: npm run build:demo-model).
import { describe, expect, it } from 'vitest'
import { generatedIsCurrent } from '../../scripts/build-demo-model.ts'

describe('the embedded demo model', () => {
  it('is current with demo-lexicon/ and the learner', { timeout: 180_000 }, async () => {
    expect(
      await generatedIsCurrent(),
      'src/http/demo-model.generated.ts is stale: run npm run build:demo-model',
    ).toBe(true)
  })
})
