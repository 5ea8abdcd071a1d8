// An R2 bucket that counts the objects read through it, so a test can bound what a request fetched.

/** Reads of shard objects and of version (manifest) objects, by key. */
export interface Reads {
  shards: string[]
  manifests: string[]
}

/**
 * Wrap a bucket: every `get` is recorded in `reads`, everything else passes through.
 * @example const { bucket, reads } = countingBucket(env.BUCKET)
 */
export function countingBucket(inner: R2Bucket): { bucket: R2Bucket; reads: Reads } {
  const reads: Reads = { shards: [], manifests: [] }
  const bucket = {
    get: (key: string, options?: R2GetOptions) => {
      if (key.includes('/shards/')) reads.shards.push(key)
      else if (key.includes('/versions/')) reads.manifests.push(key)
      return inner.get(key, options)
    },
    put: (...args: Parameters<R2Bucket['put']>) => inner.put(...args),
    delete: (keys: string | string[]) => inner.delete(keys),
    list: (options?: R2ListOptions) => inner.list(options),
    head: (key: string) => inner.head(key),
  }
  return { bucket: bucket as unknown as R2Bucket, reads }
}
