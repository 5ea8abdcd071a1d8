// Types of the bindings the workers suite sees (wrangler.toml: KV, BUCKET) and of the worker's default export.
declare namespace Cloudflare {
  interface Env {
    BUCKET: R2Bucket
    KV: KVNamespace
    WRITE_TOKEN?: string
  }
  interface Exports {
    default: Fetcher
  }
}
