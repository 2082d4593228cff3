import { defineConfig } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './e2e/support/chromium.ts';

/**
 * End-to-end tests drive Debian's Chromium (never a downloaded browser) against the production build
 * (`vite preview`). While developing, PW_DEV=1 serves the sources with `vite` instead and PW_PORT picks the
 * port, so several people can run their tests side by side.
 */
const port = Number(process.env.PW_PORT ?? 4173);
const server = process.env.PW_DEV ? 'npx vite' : 'npx vite preview';

export default defineConfig({
  testDir: 'e2e',
  outputDir: 'test-results',
  timeout: 60_000,
  retries: process.env.CI ? 1 : 0,
  workers: 1,
  reporter: [['list']],
  use: {
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
    reuseExistingServer: !process.env.CI,
    timeout: 60_000,
  },
});
