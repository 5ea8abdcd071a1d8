// Test projects: the Node suite and the suite that runs inside workerd.
import { defineConfig } from 'vitest/config'

export default defineConfig({
  test: {
    projects: [
      { test: { name: 'node', environment: 'node', include: ['test/**/*.test.ts'], exclude: ['test/workers/**'], testTimeout: 60_000 } },
      './vitest.workers.config.ts',
    ],
  },
})
