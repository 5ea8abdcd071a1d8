// The model store suite inside workerd: over the R2 binding, and over memory, as under Node.
import { env } from 'cloudflare:workers'
import { MemoryBlobStore } from '../../src/http/store/memory-blob-store.ts'
import { R2BlobStore } from '../../src/http/store/r2-blob-store.ts'
import { describeModelStore } from '../http/model-store-suite.ts'
import { freshName } from '../http/route-target.ts'
import { PrefixedBlobStore } from './prefixed-blob-store.ts'

describeModelStore(
  'the R2 binding',
  () => new PrefixedBlobStore(new R2BlobStore(env.BUCKET), `${freshName('store')}/`),
)
describeModelStore('memory (in workerd)', () => new MemoryBlobStore())
