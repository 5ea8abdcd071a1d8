// Objects in an R2 bucket binding: the model storage of the Workers runtime (and of `wrangler dev --local`).
import type { Blob, BlobInfo, BlobStore } from './blob-store.ts'

/**
 * A `BlobStore` over an R2 bucket. Listing follows R2's cursor until the listing is complete.
 * @example const blobs = new R2BlobStore(env.BUCKET)
 */
export class R2BlobStore implements BlobStore {
  readonly #bucket: R2Bucket

  constructor(bucket: R2Bucket) {
    this.#bucket = bucket
  }

  async get(key: string): Promise<Blob | null> {
    const object = await this.#bucket.get(key)
    if (!object) return null
    return { bytes: new Uint8Array(await object.arrayBuffer()), meta: object.customMetadata ?? {} }
  }

  async put(key: string, bytes: Uint8Array, meta: Record<string, string> = {}): Promise<void> {
    await this.#bucket.put(key, bytes, { customMetadata: meta })
  }

  async delete(key: string): Promise<void> {
    await this.#bucket.delete(key)
  }

  async list(prefix: string): Promise<BlobInfo[]> {
    const out: BlobInfo[] = []
    let cursor: string | undefined
    for (;;) {
      // `include` is a runtime option the type declarations lack; without it listings carry no metadata.
      const options = { prefix, cursor, include: ['customMetadata'] } as R2ListOptions
      const page = await this.#bucket.list(options)
      for (const o of page.objects) out.push({ key: o.key, size: o.size, meta: o.customMetadata ?? {} })
      if (!page.truncated) break
      cursor = page.cursor
    }
    return out.sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0))
  }
}
