// Fuzz target for the command line: `formfold learn` on messy files exits 0 with a model or 2 with none.
import fc from 'fast-check'
import { workdir } from '../reliability/cli.ts'
import { noisyText, rowsToTsv, table } from './arbitraries.ts'
import { check, type FuzzTarget } from './target.ts'

const messyFile = noisyText(fc.array(table, { minLength: 1, maxLength: 3 }).map((ts) => rowsToTsv(ts.flat())))

export const cliTarget: FuzzTarget = {
  name: 'cli: learn on messy files',
  checks:
    'formfold learn [--skip-bad] on noisy table rows: exit 0 and a model file, or exit 2, a file:line message and no file',
  // A run starts a Node process (about a second), so it gets one input for every 200 reader inputs.
  cost: 200,
  property: () =>
    fc.asyncProperty(messyFile, fc.boolean(), async (text, skipBad) => {
      const w = await workdir({ 'in.tsv': text })
      try {
        const r = await w.run(['learn', ...(skipBad ? ['--skip-bad'] : []), 'in.tsv', '-o', 'out.json'])
        const files = await w.list()
        check(r.code === 0 || r.code === 2, () => `exit ${r.code} (${r.signal}): ${r.stderr}`)
        check(!/\bat \S+ \(|node:internal/.test(r.stderr), () => `a stack trace: ${r.stderr}`)
        if (r.code === 0) {
          check(files.join() === 'in.tsv,out.json', () => `files ${files.join()}`)
          check(
            JSON.parse((await w.read('out.json')).toString('utf8')).format === 'formfold-model',
            'not a model',
          )
        } else {
          check(files.join() === 'in.tsv', () => `a failed run left ${files.join()}`)
          check(
            /^formfold: in\.tsv(:\d+)?: /.test(r.stderr),
            () => `message does not name the file: ${r.stderr}`,
          )
        }
      } finally {
        await w.dispose()
      }
    }),
}
