// The formfold command line: one subcommand per file, each a thin wrapper over a core function.
import { Command } from 'commander'
import { registerAnalyze } from './analyze-command.ts'
import { registerEvaluate } from './evaluate-command.ts'
import { registerExpand } from './expand-command.ts'
import { registerLearn } from './learn-command.ts'
import { registerConstrain } from './constrain-command.ts'
import { registerServe } from './serve-command.ts'
import { registerPublish } from './publish-command.ts'

// A closed pipe (`formfold expand … | head`) ends the command quietly, as other tools do.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EPIPE') process.exit(0)
  throw err
})

const program = new Command('formfold')
  .description('Learn inflection paradigms from dictionary tables; predict tables; write tagging constraints.')
  .showHelpAfterError()
  .exitOverride((err) => {
    process.exit(err.exitCode === 0 ? 0 : 2)
  })

registerLearn(program)
registerExpand(program)
registerAnalyze(program)
registerEvaluate(program)
registerConstrain(program)
registerServe(program)
registerPublish(program)

await program.parseAsync(process.argv)
