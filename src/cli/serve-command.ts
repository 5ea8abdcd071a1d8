// `formfold serve [-m MODEL] [--port N]`: the HTTP app under Node on 127.0.0.1 (the demo model by default).
import { type Command, InvalidArgumentError } from 'commander'
import { runCommand } from './io.ts'

/** The default port of `formfold serve`. */
export const DEFAULT_SERVE_PORT = 8788

const port = (text: string): number => {
  const n = Number(text)
  if (!Number.isInteger(n) || n < 0 || n > 65535)
    throw new InvalidArgumentError('expected a port number 0–65535')
  return n
}

/**
 * Register `serve` on the program. Writes are accepted only with `FORMFOLD_WRITE_TOKEN` set (the bearer token).
 * @example registerServe(program) // formfold serve -m de.model.json --port 8788
 */
export function registerServe(program: Command): void {
  program
    .command('serve')
    .description('serve the HTTP API on 127.0.0.1 (the demo model, and a model file as the default if given)')
    .option('-m, --model <file>', 'model file to serve as the default model')
    .option('--name <name>', 'name of that model (default: its file name)')
    .option('--port <n>', `port on 127.0.0.1 (0: any free one)`, port, DEFAULT_SERVE_PORT)
    .action((opts: { model?: string; name?: string; port: number }) =>
      runCommand(async () => {
        // Loaded here, not at start-up: other commands need none of the HTTP stack.
        const { startNodeServer } = await import('../node.ts')
        const server = await startNodeServer({
          port: opts.port,
          modelFile: opts.model,
          modelName: opts.name,
          writeToken: process.env.FORMFOLD_WRITE_TOKEN || undefined,
        })
        process.stderr.write(`formfold: serving on ${server.url} (Ctrl-C stops)\n`)
        const stop = () => void server.close().then(() => process.exit(0))
        process.once('SIGINT', stop)
        process.once('SIGTERM', stop)
      }),
    )
}
