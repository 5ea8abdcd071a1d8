// A view of a BlobStore under a key prefix, so each test gets an empty store inside one shared R2 bucket.
import type { Blob, BlobInfo, BlobStore } from '../../src/http/store/blob-store.ts'

/**
 * Keys are stored as `prefix + key` and listed back without the prefix.
 * @example new PrefixedBlobStore(new R2BlobStore(env.BUCKET), 'test-1/')
 */
export class PrefixedBlobStore implements BlobStore {
  readonly #inner: BlobStore
  readonly #prefix: string

  constructor(inner: BlobStore, prefix: string) {
    this.#inner = inner
    this.#prefix = prefix
  }

  get(key: string): Promise<Blob | null> {
    return this.#inner.get(this.#prefix + key)
  }

  put(key: string, bytes: Uint8Array, meta?: Record<string, string>): Promise<void> {
    return this.#inner.put(this.#prefix + key, bytes, meta)
  }

  delete(key: string): Promise<void> {
    return this.#inner.delete(this.#prefix + key)
  }

  async list(prefix: string): Promise<BlobInfo[]> {
    const listed = await this.#inner.list(this.#prefix + prefix)
    return listed.map((b) => ({ ...b, key: b.key.slice(this.#prefix.length) }))
  }
}
