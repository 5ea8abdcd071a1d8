// The Node entry point: the same app on 127.0.0.1 through @hono/node-server, models embedded or from a file.
import { basename } from 'node:path'
import { type ServerType, serve } from '@hono/node-server'
import { readModelText } from './cli/model-file.ts'
import { ProblemError } from './core/lexicon/problem.ts'
import { readModel } from './core/model/decode-model.ts'
import { createApp } from './http/app.ts'
import { registryOver } from './http/app-registry.ts'
import { demoModel } from './http/demo-model.ts'
import type { EmbeddedModel } from './http/model-registry.ts'
import { modelCodec, type ServedModel, summarizeModel } from './http/served-model.ts'
import { MemoryBlobStore } from './http/store/memory-blob-store.ts'
import { ModelStore } from './http/store/model-store.ts'

export interface NodeServerOptions {
  /** Port on 127.0.0.1 (0: any free port). */
  port: number
  /** A model file to serve as the default model, besides the demo model. */
  modelFile?: string
  /** Its name (default: the file name without `.json` / `.model`). */
  modelName?: string
  /** The token writes must present (unset: writes are refused). */
  writeToken?: string
}

/** A running server: where it listens, and how to stop it. */
export interface NodeServer {
  url: string
  close(): Promise<void>
}

/**
 * The name a model file is served under.
 * @example modelNameOf('models/de-verbs.model.json') // 'de-verbs'
 */
export function modelNameOf(path: string): string {
  const name = basename(path)
    .toLowerCase()
    .replace(/\.gz$/, '')
    .replace(/\.json$/, '')
    .replace(/\.model$/, '')
    .replace(/[^a-z0-9._-]+/g, '-')
  return /^[a-z0-9]/.test(name) ? name : `m-${name}`
}

/**
 * Serve the app on 127.0.0.1. Published models live in this process's memory.
 * @example const server = await startNodeServer({ port: 8788 }); await fetch(`${server.url}/health`)
 */
export async function startNodeServer(options: NodeServerOptions): Promise<NodeServer> {
  const embedded: EmbeddedModel<ServedModel>[] = [demoModel]
  let defaultName = demoModel.name
  if (options.modelFile) {
    const text = await readModelText(options.modelFile)
    const read = readModel(text)
    if (!read.ok) throw new ProblemError({ ...read.problem, file: options.modelFile })
    const model = read.model
    defaultName = options.modelName ?? modelNameOf(options.modelFile)
    embedded.unshift({ name: defaultName, load: () => model, summarize: summarizeModel })
  }
  const registry = registryOver(new ModelStore(new MemoryBlobStore(), modelCodec), embedded, defaultName)
  const app = createApp({ registry: () => registry })
  const env = { WRITE_TOKEN: options.writeToken }
  return new Promise((resolve) => {
    const server: ServerType = serve(
      { fetch: (req) => app.fetch(req, env), port: options.port, hostname: '127.0.0.1' },
      (info) => {
        resolve({
          url: `http://127.0.0.1:${info.port}`,
          close: () => new Promise<void>((done) => server.close(() => done())),
        })
      },
    )
  })
}
