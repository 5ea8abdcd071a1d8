// Publishing through the write route: the token, the pointer move, and a corrupt upload that changes nothing served.
import { describe, expect, it } from 'vitest'
import { ADDED_LEMMA, corruptModels, modelV1, modelV2 } from './fixtures.ts'
import { freshName, json, type RouteTarget } from './route-target.ts'

const MODEL_TYPE = 'application/vnd.formfold.model+json'

function put(bytes: Uint8Array, token?: string): RequestInit {
  const headers: Record<string, string> = { 'content-type': MODEL_TYPE }
  if (token !== undefined) headers.authorization = `Bearer ${token}`
  return { method: 'PUT', headers, body: bytes as Uint8Array<ArrayBuffer> }
}

/** Which version answers for a model, and whether it knows the lemma only version 2 lists. */
async function served(
  t: RouteTarget,
  name: string,
): Promise<{ version: string | null; knowsAdded: boolean }> {
  const res = await t.fetch(`/v1/lemmas/${ADDED_LEMMA.lemma}?model=${name}`)
  await res.body?.cancel()
  return { version: res.headers.get('formfold-model-version'), knowsAdded: res.status === 200 }
}

/**
 * Register the publishing suite against a target.
 * @example describePublishing(() => target)
 */
export function describePublishing(target: () => RouteTarget): void {
  describe('publishing models', { timeout: 60_000 }, () => {
    it('refuses a write without the token, or with another token (401)', async () => {
      const t = target()
      const name = freshName('auth')
      for (const token of [undefined, 'not-the-token', `${t.token}x`]) {
        const { status, body } = await json(await t.fetch(`/v1/models/${name}`, put(modelV1, token)))
        expect([status, body.error.code]).toEqual([401, 'unauthorized'])
      }
      expect((await t.fetch(`/v1/analyze?form=lokan&model=${name}`)).status).toBe(404)
    })

    it('publishes, serves, and moves the pointer to a new version', async () => {
      const t = target()
      const name = freshName('pub')
      const first = await json(await t.fetch(`/v1/models/${name}`, put(modelV1, t.token)))
      expect([first.status, first.body.version, first.body.name]).toEqual([201, 1, name])
      expect(await served(t, name)).toEqual({ version: '1', knowsAdded: false })
      const second = await json(await t.fetch(`/v1/models/${name}`, put(modelV2(), t.token)))
      expect([second.status, second.body.version]).toEqual([201, 2])
      expect(await served(t, name)).toEqual({ version: '2', knowsAdded: true })
      const described = await json(await t.fetch(`/v1/models/${name}`))
      expect(described.body.served).toBe(2)
      expect(described.body.versions.map((v: { version: number }) => v.version)).toEqual([1, 2])
      const listed = await json(await t.fetch('/v1/models'))
      expect(listed.body.models).toContainEqual(expect.objectContaining({ name, served: 2, embedded: false }))
    })

    it('answers a corrupt upload with 422 and keeps serving the old version', async () => {
      const t = target()
      const name = freshName('corrupt')
      await t.fetch(`/v1/models/${name}`, put(modelV2(), t.token))
      for (const [, bytes] of corruptModels()) {
        const { status, body } = await json(await t.fetch(`/v1/models/${name}`, put(bytes, t.token)))
        expect(status).toBe(422)
        expect(typeof body.error.message).toBe('string')
      }
      expect(await served(t, name)).toEqual({ version: '1', knowsAdded: true })
      expect((await json(await t.fetch(`/v1/models/${name}`))).body.versions).toHaveLength(1)
    })

    it('deletes an unserved version, never the served one (409)', async () => {
      const t = target()
      const name = freshName('del')
      await t.fetch(`/v1/models/${name}`, put(modelV1, t.token))
      await t.fetch(`/v1/models/${name}`, put(modelV2(), t.token))
      const auth = { authorization: `Bearer ${t.token}` }
      expect((await t.fetch(`/v1/models/${name}/versions/1`, { method: 'DELETE' })).status).toBe(401)
      const served2 = await json(
        await t.fetch(`/v1/models/${name}/versions/2`, { method: 'DELETE', headers: auth }),
      )
      expect([served2.status, served2.body.error.code]).toEqual([409, 'version-served'])
      expect(
        (await t.fetch(`/v1/models/${name}/versions/1`, { method: 'DELETE', headers: auth })).status,
      ).toBe(204)
      expect(
        (await json(await t.fetch(`/v1/models/${name}`))).body.versions.map(
          (v: { version: number }) => v.version,
        ),
      ).toEqual([2])
    })

    it('keeps embedded models read-only, and wants a model file', async () => {
      const t = target()
      const demo = await json(await t.fetch('/v1/models/demo', put(modelV1, t.token)))
      expect([demo.status, demo.body.error.code]).toEqual([409, 'read-only-model'])
      const name = freshName('type')
      const wrongType = {
        ...put(modelV1, t.token),
        headers: { 'content-type': 'text/csv', authorization: `Bearer ${t.token}` },
      }
      expect((await t.fetch(`/v1/models/${name}`, wrongType)).status).toBe(415)
    })
  })
}
