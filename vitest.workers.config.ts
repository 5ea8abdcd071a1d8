// The route suite inside workerd, through the Workers vitest pool.
import { cloudflareTest } from '@cloudflare/vitest-pool-workers'
import { defineProject } from 'vitest/config'

export default defineProject({
  plugins: [cloudflareTest({ main: './src/worker.ts', wrangler: { configPath: './wrangler.toml' } })],
  test: {
    name: 'workers',
    include: ['test/workers/**/*.test.ts'],
    // Builds the German verb slice and the model `formfold learn` makes of it (test/workers/learn-german.test.ts).
    globalSetup: ['./test/workers/german-slice.setup.ts'],
  },
})
