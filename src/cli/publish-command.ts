// `formfold publish -m MODEL --name NAME`: a new model version, to local R2 (wrangler's local state) or to a service.
import type { Command } from 'commander'
import { decodeModel } from '../core/model/decode-model.ts'
import { type ShardedModelFiles, shardModel } from '../core/model/shard-model.ts'
import { ApiError } from '../http/api-error.ts'
import { MODEL_NAME } from '../http/model-registry.ts'
import { publishShardedToService, publishToService } from '../http/publish-client.ts'
import { modelCodec } from '../http/served-model.ts'
import { ModelStore, type VersionInfo } from '../http/store/model-store.ts'
import { R2BlobStore } from '../http/store/r2-blob-store.ts'
import { EXIT, runCommand } from './io.ts'
import { readModelText } from './model-file.ts'

interface PublishOptions {
  model: string
  name: string
  url?: string
  token?: string
  persistTo?: string
  config: string
  shardBudget?: string
}

/**
 * Publish into the R2 bucket of `wrangler dev --local`: the BUCKET binding of wrangler.toml over the
 * persisted local state (the same objects `wrangler dev` serves), through the same store code as the service.
 * @example await publishLocal(bytes, 'demo2', { config: 'wrangler.toml' })
 */
export async function publishLocal(
  bytes: Uint8Array,
  name: string,
  o: { config: string; persistTo?: string },
  sharded?: ShardedModelFiles,
): Promise<VersionInfo> {
  process.env.WRANGLER_SEND_METRICS ??= 'false'
  process.env.CLOUDFLARE_CF_FETCH_ENABLED ??= 'false'
  const { getPlatformProxy } = await import('wrangler')
  const proxy = await getPlatformProxy<{ BUCKET?: R2Bucket }>({
    configPath: o.config,
    persist: o.persistTo ? { path: o.persistTo } : true,
    remoteBindings: false,
  })
  try {
    if (!proxy.env.BUCKET) throw new Error(`${o.config} has no R2 binding named BUCKET`)
    const store = new ModelStore(new R2BlobStore(proxy.env.BUCKET), modelCodec)
    const encoder = new TextEncoder()
    // Shards first, the manifest last: the pointer moves only once every shard is stored.
    if (sharded)
      for (let i = 0; i < sharded.shards.length; i++)
        await store.shards.put(name, sharded.refs[i]!.sha256, encoder.encode(sharded.shards[i]!))
    const { model: _model, ...info } = await store.publish(
      name,
      sharded ? encoder.encode(sharded.manifest) : bytes,
    )
    return info
  } finally {
    await proxy.dispose()
  }
}

/**
 * Register `publish` on the program.
 * @example registerPublish(program) // formfold publish -m de.model.json --name de --url http://127.0.0.1:8787
 */
export function registerPublish(program: Command): void {
  program
    .command('publish')
    .description(
      'publish a model file as a new version: to local R2 (wrangler --local state), or to a service with --url',
    )
    .requiredOption('-m, --model <file>', 'model file (from formfold learn)')
    .requiredOption('--name <name>', 'model name (lowercase letters, digits, ".", "_", "-")')
    .option(
      '--url <url>',
      'a running service: PUT <url>/v1/models/<name> (token from --token or FORMFOLD_WRITE_TOKEN)',
    )
    .option('--token <token>', 'bearer token for --url (default: FORMFOLD_WRITE_TOKEN)')
    .option('--local', 'publish to local R2 through wrangler (the default without --url)')
    .option('--persist-to <dir>', 'wrangler state directory (default: .wrangler/state/v3)')
    .option('--config <file>', 'wrangler configuration', 'wrangler.toml')
    .option(
      '--shard-budget <bytes>',
      'publish as a sharded model: the form index split by form hash into shards of at most this many bytes, plus a manifest',
    )
    .action((opts: PublishOptions) => runCommand(() => publish(opts)))
}

async function publish(o: PublishOptions): Promise<void> {
  if (!MODEL_NAME.test(o.name)) {
    process.stderr.write(
      `formfold publish: "${o.name}" is not a model name (lowercase letters, digits, ".", "_", "-")\n`,
    )
    process.exit(EXIT.badInput)
  }
  let bytes: Uint8Array
  try {
    bytes = new TextEncoder().encode(await readModelText(o.model)) // the service stores the JSON
  } catch (err) {
    process.stderr.write(`formfold publish: ${(err as Error).message}\n`)
    process.exit(EXIT.badInput)
  }
  const sharded = o.shardBudget === undefined ? undefined : await shardFiles(bytes, o)
  if (o.url) {
    const token = o.token ?? process.env.FORMFOLD_WRITE_TOKEN
    const result = sharded
      ? await publishShardedToService(o.url, o.name, sharded, token)
      : await publishToService(o.url, o.name, bytes, token)
    if (!result.ok) {
      process.stderr.write(
        `formfold publish: ${result.status} ${result.error.code}: ${result.error.message}\n`,
      )
      process.exit(result.status >= 400 && result.status < 500 ? EXIT.badInput : EXIT.failed)
    }
    process.stdout.write(`${JSON.stringify(result.version)}\n`)
    return
  }
  try {
    const info = await publishLocal(bytes, o.name, o, sharded)
    process.stdout.write(`${JSON.stringify({ name: o.name, ...info })}\n`)
  } catch (err) {
    if (!(err instanceof ApiError)) throw err
    process.stderr.write(`formfold publish: ${err.code}: ${err.message}\n`)
    process.exit(err.status < 500 ? EXIT.badInput : EXIT.failed)
  }
}

/** The shards and manifest of a model file under `--shard-budget` (summary on stderr). */
async function shardFiles(bytes: Uint8Array, o: PublishOptions): Promise<ShardedModelFiles> {
  const budget = Number(o.shardBudget)
  if (!Number.isInteger(budget) || budget < 1024) {
    process.stderr.write(`formfold publish: --shard-budget must be a whole number of bytes, at least 1024\n`)
    process.exit(EXIT.badInput)
  }
  let model: ReturnType<typeof decodeModel>
  try {
    model = decodeModel(new TextDecoder().decode(bytes))
  } catch (err) {
    process.stderr.write(`formfold publish: ${o.model}: ${(err as Error).message}\n`)
    process.exit(EXIT.badInput)
  }
  const files = await shardModel(model, budget)
  const total = files.refs.reduce((n, r) => n + r.bytes, 0)
  process.stderr.write(
    `formfold publish: ${files.refs.length} shards (${total} bytes, largest ${Math.max(...files.refs.map((r) => r.bytes))}), ` +
      `manifest ${new TextEncoder().encode(files.manifest).byteLength} bytes\n`,
  )
  return files
}
