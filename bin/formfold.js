#!/usr/bin/env node
// Launcher for the formfold command line: runs the TypeScript CLI through tsx's loader.
import { register } from 'tsx/esm/api'
register()
await import('../src/cli/main.ts')
