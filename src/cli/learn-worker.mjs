// A learning thread's entry point: its TypeScript runs through tsx's loader, as the command line's does.
import { register } from 'tsx/esm/api'

register()
await import('./learn-worker.ts')
