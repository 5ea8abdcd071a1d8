// Objects in a Map: the model storage of `formfold serve` and of tests under Node.
import type { Blob, BlobInfo, BlobStore } from './blob-store.ts'

/**
 * A `BlobStore` in memory. Bytes are copied in and out, so a caller's buffer can't change a stored object.
 * @example const store = new ModelStore(new MemoryBlobStore(), modelCodec)
 */
export class MemoryBlobStore implements BlobStore {
  readonly #objects = new Map<string, Blob>()

  async get(key: string): Promise<Blob | null> {
    const found = this.#objects.get(key)
    return found ? { bytes: found.bytes.slice(), meta: { ...found.meta } } : null
  }

  async put(key: string, bytes: Uint8Array, meta: Record<string, string> = {}): Promise<void> {
    this.#objects.set(key, { bytes: bytes.slice(), meta: { ...meta } })
  }

  async delete(key: string): Promise<void> {
    this.#objects.delete(key)
  }

  async list(prefix: string): Promise<BlobInfo[]> {
    return [...this.#objects]
      .filter(([key]) => key.startsWith(prefix))
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([key, blob]) => ({ key, size: blob.bytes.byteLength, meta: { ...blob.meta } }))
  }
}
