// The storage a model store needs: keyed byte objects with small string metadata (R2, or memory under Node).

/** An object's listing entry. */
export interface BlobInfo {
  key: string
  size: number
  meta: Record<string, string>
}

/** An object read back: its bytes and metadata. */
export interface Blob {
  bytes: Uint8Array
  meta: Record<string, string>
}

/**
 * Keyed objects. Each `put` replaces an object whole (a reader sees the old or the new, never a mix);
 * `list` returns every key under a prefix, sorted.
 * @example await blobs.put('models/demo/pointer.json', bytes, { version: '3' })
 */
export interface BlobStore {
  get(key: string): Promise<Blob | null>
  put(key: string, bytes: Uint8Array, meta?: Record<string, string>): Promise<void>
  delete(key: string): Promise<void>
  list(prefix: string): Promise<BlobInfo[]>
}
