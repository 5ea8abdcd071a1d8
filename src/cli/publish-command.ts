// `formfold publish -m MODEL --name NAME`: a new model version, to local R2 (wrangler's local state) or to a service.
import { readFile } from 'node:fs/promises'
import type { Command } from 'commander'
import { ApiError } from '../http/api-error.ts'
import { MODEL_NAME } from '../http/model-registry.ts'
import { publishToService } from '../http/publish-client.ts'
import { modelCodec } from '../http/served-model.ts'
import { ModelStore, type VersionInfo } from '../http/store/model-store.ts'
import { R2BlobStore } from '../http/store/r2-blob-store.ts'
import { EXIT, runCommand } from './io.ts'

interface PublishOptions {
  model: string
  name: string
  url?: string
  token?: string
  persistTo?: string
  config: string
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
    const { model: _model, ...info } = await new ModelStore(
      new R2BlobStore(proxy.env.BUCKET),
      modelCodec,
    ).publish(name, bytes)
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
    bytes = new Uint8Array(await readFile(o.model))
  } catch {
    process.stderr.write(`formfold publish: ${o.model}: cannot read the model file\n`)
    process.exit(EXIT.badInput)
  }
  if (o.url) {
    const result = await publishToService(o.url, o.name, bytes, o.token ?? process.env.FORMFOLD_WRITE_TOKEN)
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
    const info = await publishLocal(bytes, o.name, o)
    process.stdout.write(`${JSON.stringify({ name: o.name, ...info })}\n`)
  } catch (err) {
    if (!(err instanceof ApiError)) throw err
    process.stderr.write(`formfold publish: ${err.code}: ${err.message}\n`)
    process.exit(err.status < 500 ? EXIT.badInput : EXIT.failed)
  }
}
