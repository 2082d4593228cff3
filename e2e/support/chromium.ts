/**
 * How Polewright starts Debian's Chromium, shared by the end-to-end tests (playwright.config.ts) and the drag
 * benchmark (bench/drag.ts) so both measure and test the same browser setup.
 */

/** Debian's Chromium; the project never downloads a browser. */
export const CHROMIUM_PATH = '/usr/bin/chromium';

/** Headless, no sandbox or GPU, and nothing that reaches the network or updates itself in the background. */
export const CHROMIUM_ARGS: readonly string[] = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
