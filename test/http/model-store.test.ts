// The model store suite over the in-memory BlobStore (the storage of `formfold serve`).
import { MemoryBlobStore } from '../../src/http/store/memory-blob-store.ts'
import { describeModelStore } from './model-store-suite.ts'

describeModelStore('memory', () => new MemoryBlobStore())
