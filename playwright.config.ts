import { createHash } from 'node:crypto';
import { realpathSync } from 'node:fs';
import { cpus } from 'node:os';
import { defineConfig } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './e2e/support/chromium.ts';

/**
 * End-to-end tests drive Debian's Chromium (never a downloaded browser) against the production build
 * (`vite preview`): one server and one browser for the whole run (e2e/support/sharedBrowser.ts starts it;
 * PW_BROWSER_PER_WORKER=1 gives each worker its own). Tests run in parallel workers, each test in a fresh
 * browser context (its own storage); tests that read the clipboard back take a lock (e2e/support/clipboard.ts),
 * and downloads are read as streams (a remote browser has no local download path).
 * PW_DEV=1 serves the sources with `vite` instead. The port is PW_PORT, or one derived from this checkout's
 * path, so two checkouts run side by side without a setting and never share a server by accident (PW_REUSE=1
 * reuses one already running on the port). PW_WORKERS sets the number of workers (default: CPUs, at least 2).
 */
function portForCheckout(): number {
  const digest = createHash('sha256')
    .update(realpathSync(import.meta.dirname))
    .digest();
  return 42000 + (digest.readUInt16BE(0) % 1000);
}

const port = Number(process.env.PW_PORT ?? portForCheckout());
const server = process.env.PW_DEV ? 'npx vite' : 'npx vite preview';

export default defineConfig({
  testDir: 'e2e',
  outputDir: 'test-results',
  timeout: 60_000,
  retries: process.env.CI ? 1 : 0,
  fullyParallel: true,
  workers: Number(process.env.PW_WORKERS ?? Math.max(2, cpus().length)),
  reporter: [['list']],
  globalSetup: './e2e/support/sharedBrowser.ts',
  use: {
    ...(process.env.PW_BROWSER_WS ? { connectOptions: { wsEndpoint: process.env.PW_BROWSER_WS } } : {}),
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1440, height: 900 },
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? CHROMIUM_PATH,
      args: [...CHROMIUM_ARGS],
    },
  },
  webServer: {
    command: `${server} --port ${port} --strictPort --host 127.0.0.1`,
    url: `http://127.0.0.1:${port}`,
    reuseExistingServer: process.env.PW_REUSE === '1',
    timeout: 60_000,
  },
});
