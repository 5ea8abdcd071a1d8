// `formfold publish`'s two targets: a running service's write route (a Node server here) and wrangler's local R2.
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { getPlatformProxy } from 'wrangler'
import { publishLocal } from '../../src/cli/publish-command.ts'
import { publishToService } from '../../src/http/publish-client.ts'
import { modelCodec } from '../../src/http/served-model.ts'
import { ModelStore } from '../../src/http/store/model-store.ts'
import { R2BlobStore } from '../../src/http/store/r2-blob-store.ts'
import { type NodeServer, startNodeServer } from '../../src/node.ts'
import { corruptModels, modelV1 } from './fixtures.ts'

describe('publishing to a running service', { timeout: 60_000 }, () => {
  let server: NodeServer
  beforeAll(async () => {
    server = await startNodeServer({ port: 0, writeToken: 'publish-test-token' })
  })
  afterAll(() => server.close())

  it('publishes with the token, is refused without it, and refuses a corrupt file', async () => {
    const denied = await publishToService(server.url, 'shared', modelV1, 'wrong')
    expect([denied.ok, denied.status]).toEqual([false, 401])
    const done = await publishToService(server.url, 'shared', modelV1, 'publish-test-token')
    expect(done.ok && done.version.version).toBe(1)
    const [, corrupt] = corruptModels()[0]!
    const refused = await publishToService(server.url, 'shared', corrupt, 'publish-test-token')
    expect([refused.ok, refused.status]).toEqual([false, 422])
    const res = await fetch(`${server.url}/v1/analyze?form=lokan&model=shared`)
    expect([res.status, res.headers.get('formfold-model-version')]).toEqual([200, '1'])
  })
})

describe('publishing to local R2 through wrangler', { timeout: 120_000 }, () => {
  let dir: string
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'formfold-r2-'))
  })
  afterAll(() => rm(dir, { recursive: true, force: true }))

  it('writes a version that the BUCKET binding then serves', async () => {
    const info = await publishLocal(modelV1, 'local', { config: 'wrangler.toml', persistTo: dir })
    expect(info.version).toBe(1)
    const again = await publishLocal(modelV1, 'local', { config: 'wrangler.toml', persistTo: dir })
    expect(again.version).toBe(2)
    const proxy = await getPlatformProxy<{ BUCKET: R2Bucket }>({
      configPath: 'wrangler.toml',
      persist: { path: dir },
      remoteBindings: false,
    })
    try {
      const store = new ModelStore(new R2BlobStore(proxy.env.BUCKET), modelCodec)
      expect((await store.pointer('local'))?.version).toBe(2)
      expect((await store.load('local')).sha256).toBe(info.sha256)
    } finally {
      await proxy.dispose()
    }
  })
})
