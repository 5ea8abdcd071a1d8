// Launching the system's Debian `chromium` headless through playwright-core; a missing browser is a clear failure.
import { execFileSync } from 'node:child_process'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { type BrowserContext, chromium } from 'playwright-core'

/** Flags that keep headless Chromium quiet and offline (no updates, sync or QUIC). */
const FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
]

/** Where `chromium` is, or an error saying how to install it (the browser test must not skip silently). */
export function chromiumPath(): string {
  let path = ''
  try {
    path = execFileSync('sh', ['-c', 'command -v chromium || command -v chromium-browser'], {
      encoding: 'utf8',
    }).trim()
  } catch {
    path = ''
  }
  if (!path) {
    throw new Error(
      'the browser test needs Debian chromium, and `chromium` is not on PATH: install it with ' +
        '`apt-get update && apt-get install -y chromium` (CI does this in .ci/run)',
    )
  }
  return path.split('\n')[0]!
}

/** A headless browser in a fresh profile, and how to close it and remove the profile. */
export interface Browser {
  context: BrowserContext
  close(): Promise<void>
}

/**
 * Start headless Chromium in a fresh temporary profile.
 * @example const { context, close } = await launchChromium(); const page = await context.newPage()
 */
export async function launchChromium(): Promise<Browser> {
  const executablePath = chromiumPath()
  const profile = await mkdtemp(join(tmpdir(), 'formfold-chromium-'))
  const context = await chromium.launchPersistentContext(profile, {
    executablePath,
    headless: true,
    args: FLAGS,
    viewport: { width: 1280, height: 900 },
    acceptDownloads: true,
  })
  return {
    context,
    close: async () => {
      await context.close()
      await rm(profile, { recursive: true, force: true })
    },
  }
}
