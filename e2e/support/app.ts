/** Drivers for the workbench shell and side column in end-to-end tests. */
import { expect, type Page, type TestInfo } from '@playwright/test';
import type { Design } from '../../src/core/model/design.ts';
import type { Root } from '../../src/core/types.ts';

/** Opens the page and waits until the workbench and its read-only probe are there. */
export async function openWorkbench(page: Page): Promise<void> {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Polewright' })).toBeVisible();
  await page.waitForFunction(() => window.__polewright !== undefined);
}

/** A copy of the current design, read through the page's read-only probe. */
export function readDesign(page: Page): Promise<Design> {
  return page.evaluate(() => window.__polewright!.design());
}

/** The system entry box. */
export function entryBox(page: Page) {
  return page.getByRole('textbox', { name: 'System text' });
}

/** Types a system into the entry box and applies it with the button. */
export async function applySystem(page: Page, text: string): Promise<void> {
  // The parser of typed systems arrives with the chunks fetched after the first paint; once they are all
  // there, Apply takes effect before the click returns, so the caller can read the design at once.
  await page.waitForLoadState('networkidle');
  await entryBox(page).fill(text);
  await page.getByRole('button', { name: 'Apply' }).click();
}

/** The stability banner. */
export function stabilityBanner(page: Page) {
  return page.getByTestId('stability');
}

/** Roots sorted for comparison: by real part, then imaginary part. */
export function sortedRoots(roots: readonly Root[]): Root[] {
  return [...roots].sort((a, b) => a.re - b.re || a.im - b.im);
}

/** Saves a full-page screenshot as an artifact of the test run. */
export async function saveScreenshot(page: Page, testInfo: TestInfo, name: string): Promise<void> {
  const path = testInfo.outputPath(`${name}.png`);
  await page.screenshot({ path, fullPage: true });
  await testInfo.attach(name, { path, contentType: 'image/png' });
}

/**
 * Answers the question the sample-rate field asks for hand-placed roots (the demo's): keep their
 * frequencies in Hz, the default.
 */
export async function keepHzOnRateChange(page: Page): Promise<void> {
  await page
    .getByTestId('rate-question')
    .getByRole('button', { name: /frequencies in Hz/ })
    .click();
}
