// The model store's behaviour, as one suite run against each BlobStore (memory under Node, R2 inside workerd).
import { describe, expect, it } from 'vitest'
import { ApiError } from '../../src/http/api-error.ts'
import { modelCodec, type ServedModel } from '../../src/http/served-model.ts'
import type { BlobStore } from '../../src/http/store/blob-store.ts'
import { ModelStore } from '../../src/http/store/model-store.ts'
import { FaultyBlobStore } from './faulty-blob-store.ts'
import { ADDED_LEMMA, corruptModels, modelV1, modelV2 } from './fixtures.ts'

/** The status and code a promise rejects with (an ApiError), for table-driven checks. */
async function refusal(p: Promise<unknown>): Promise<{ status: number; code: string }> {
  try {
    await p
  } catch (err) {
    if (err instanceof ApiError) return { status: err.status, code: err.code }
    throw err
  }
  throw new Error('expected a refusal')
}

const hasAdded = (m: ServedModel) => m.inflection.lexicon.entries.some((e) => e.lemma === ADDED_LEMMA.lemma)

/**
 * Register the suite for one kind of storage; `makeBlobs` gives a fresh, empty store per test.
 * @example describeModelStore('memory', () => new MemoryBlobStore())
 */
export function describeModelStore(label: string, makeBlobs: () => BlobStore): void {
  describe(`model store over ${label}`, { timeout: 60_000 }, () => {
    it('publishes a first version and serves it', async () => {
      const store = new ModelStore(makeBlobs(), modelCodec)
      const v = await store.publish('alpha', modelV1)
      expect(v.version).toBe(1)
      expect(v.bytes).toBe(modelV1.byteLength)
      expect(await store.names()).toEqual(['alpha'])
      expect((await store.pointer('alpha'))?.version).toBe(1)
      const loaded = await store.load('alpha')
      expect(loaded.version).toBe(1)
      expect(modelCodec.summarize(loaded.model)).toEqual(v.summary)
    })

    it('moves the pointer to a new version and keeps the old one loadable', async () => {
      const store = new ModelStore(makeBlobs(), modelCodec)
      await store.publish('alpha', modelV1)
      const v2 = await store.publish('alpha', modelV2())
      expect(v2.version).toBe(2)
      expect((await store.versions('alpha')).map((v) => v.version)).toEqual([1, 2])
      expect(hasAdded((await store.load('alpha')).model)).toBe(true)
      expect(hasAdded((await store.load('alpha', 1)).model)).toBe(false)
      expect((await store.versions('alpha'))[1]!.summary.bareLemmas).toBe(
        (await store.versions('alpha'))[0]!.summary.bareLemmas! + 1,
      )
    })

    for (const [what, bytes] of corruptModels()) {
      it(`refuses ${what} with 422 and leaves the served version`, async () => {
        const store = new ModelStore(makeBlobs(), modelCodec)
        await store.publish('alpha', modelV1)
        expect((await refusal(store.publish('alpha', bytes))).status).toBe(422)
        expect((await store.pointer('alpha'))?.version).toBe(1)
        expect((await store.versions('alpha')).map((v) => v.version)).toEqual([1])
      })
    }

    it('keeps the old version serving when the new one is stored damaged (a partial write)', async () => {
      const blobs = new FaultyBlobStore(makeBlobs())
      const store = new ModelStore(blobs, modelCodec)
      await store.publish('alpha', modelV1)
      blobs.fault = 'truncate-versions'
      expect(await refusal(store.publish('alpha', modelV2()))).toEqual({ status: 503, code: 'store-failed' })
      blobs.fault = 'none'
      expect((await store.versions('alpha')).map((v) => v.version)).toEqual([1])
      const served = await store.load('alpha')
      expect([served.version, hasAdded(served.model)]).toEqual([1, false])
    })

    it('keeps the old version serving when the pointer cannot be written', async () => {
      const blobs = new FaultyBlobStore(makeBlobs())
      const store = new ModelStore(blobs, modelCodec)
      await store.publish('alpha', modelV1)
      blobs.fault = 'fail-pointer'
      expect(await refusal(store.publish('alpha', modelV2()))).toEqual({ status: 503, code: 'store-failed' })
      blobs.fault = 'none'
      expect((await store.load('alpha')).version).toBe(1)
    })

    it('refuses to serve a stored version whose bytes no longer match their hash', async () => {
      const blobs = makeBlobs()
      const store = new ModelStore(blobs, modelCodec)
      await store.publish('alpha', modelV1)
      const [object] = (await blobs.list('models/alpha/versions/')).map((b) => b.key)
      const stored = (await blobs.get(object!))!
      await blobs.put(object!, modelV2(), stored.meta)
      expect(await refusal(store.load('alpha'))).toEqual({ status: 503, code: 'store-failed' })
    })

    it('deletes an unserved version, never the served one', async () => {
      const store = new ModelStore(makeBlobs(), modelCodec)
      await store.publish('alpha', modelV1)
      await store.publish('alpha', modelV2())
      expect(await refusal(store.deleteVersion('alpha', 2))).toEqual({ status: 409, code: 'version-served' })
      expect(await refusal(store.deleteVersion('alpha', 7))).toEqual({ status: 404, code: 'unknown-version' })
      await store.deleteVersion('alpha', 1)
      expect((await store.versions('alpha')).map((v) => v.version)).toEqual([2])
      expect(await refusal(store.load('alpha', 1))).toEqual({ status: 404, code: 'unknown-version' })
    })

    it('answers 404 for a name with nothing published', async () => {
      const store = new ModelStore(makeBlobs(), modelCodec)
      expect(await refusal(store.load('nothing'))).toEqual({ status: 404, code: 'unknown-model' })
      expect(await store.names()).toEqual([])
    })
  })
}
