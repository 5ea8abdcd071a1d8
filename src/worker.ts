// The Workers entry point: the app, with models from the BUCKET binding and writes guarded by WRITE_TOKEN.
import { createApp } from './http/app.ts'

/**
 * The app as a module worker (`wrangler dev`, `wrangler deploy`, the vitest Workers pool).
 * @example await SELF.fetch('http://x/v1/analyze?form=lokan')
 */
const app = createApp()

export default app
