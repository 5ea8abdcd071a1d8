// A BlobStore wrapper that damages what it is given, to show a failed publish never moves the pointer.
import type { Blob, BlobInfo, BlobStore } from '../../src/http/store/blob-store.ts'

/** What goes wrong: version objects stored truncated, or the pointer write failing. */
export type Fault = 'none' | 'truncate-versions' | 'fail-pointer'

/**
 * Wraps a store; `fault` can be changed between calls.
 * @example const faulty = new FaultyBlobStore(new MemoryBlobStore()); faulty.fault = 'truncate-versions'
 */
export class FaultyBlobStore implements BlobStore {
  fault: Fault = 'none'
  readonly #inner: BlobStore

  constructor(inner: BlobStore) {
    this.#inner = inner
  }

  get(key: string): Promise<Blob | null> {
    return this.#inner.get(key)
  }

  async put(key: string, bytes: Uint8Array, meta?: Record<string, string>): Promise<void> {
    if (this.fault === 'truncate-versions' && key.includes('/versions/')) {
      return this.#inner.put(key, bytes.subarray(0, Math.floor(bytes.length / 3)), meta)
    }
    if (this.fault === 'fail-pointer' && key.endsWith('/pointer.json')) throw new Error('storage unavailable')
    return this.#inner.put(key, bytes, meta)
  }

  delete(key: string): Promise<void> {
    return this.#inner.delete(key)
  }

  list(prefix: string): Promise<BlobInfo[]> {
    return this.#inner.list(prefix)
  }
}
