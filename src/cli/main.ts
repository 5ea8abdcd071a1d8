// The formfold command line: one subcommand per file, each a thin wrapper over a core function.
import { Command } from 'commander'
import { registerEvaluate } from './evaluate-command.ts'
import { registerConstrain } from './constrain-command.ts'

const program = new Command('formfold')
  .description('Learn inflection paradigms from dictionary tables; predict tables; write tagging constraints.')
  .showHelpAfterError()
  .exitOverride((err) => {
    process.exit(err.exitCode === 0 ? 0 : 2)
  })

registerEvaluate(program)
registerConstrain(program)

await program.parseAsync(process.argv)
