/**
 * One Chromium for the whole run: global set-up starts it as a Playwright browser server and every worker
 * connects to it (use.connectOptions in playwright.config.ts), each test in a fresh context of its own.
 * PW_BROWSER_PER_WORKER=1 gives each worker its own Chromium instead (to tell a browser fault from a test's).
 */
import { rmSync } from 'node:fs';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './chromium.ts';
import { CLIPBOARD_LOCK } from './clipboard.ts';

export default async function sharedBrowser(): Promise<(() => Promise<void>) | undefined> {
  rmSync(CLIPBOARD_LOCK, { recursive: true, force: true }); // left by a run that was killed
  if (process.env.PW_BROWSER_PER_WORKER === '1') return undefined;
  const server = await chromium.launchServer({
    executablePath: process.env.CHROMIUM_PATH ?? CHROMIUM_PATH,
    args: [...CHROMIUM_ARGS],
  });
  // Workers start after global set-up and inherit its environment, where the config reads the endpoint.
  process.env.PW_BROWSER_WS = server.wsEndpoint();
  return () => server.close();
}
