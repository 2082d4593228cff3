/**
 * The design lives in the address bar: the fragment follows every committed change (one history entry
 * each), Back and Forward step through them, a copied or bookmarked address opens the same design, and a
 * reload of it changes nothing.
 */
import { expect, test, type Page } from '@playwright/test';
import { decodeLink } from '../src/share/link/index.ts';
import { bitwiseDifference } from '../test/share/arbitraries.ts';
import { applySystem, openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { dragRoot } from './support/plane.ts';
import { chooseKind, designerForm, fillField, openDesignPage } from './support/design.ts';
import type { Design } from '../src/core/model/design.ts';
import * as fullReader from '../src/share/schema/full.ts';
import { installFullReader } from '../src/share/schema/reader.ts';

// The test reads links as the command line does, with the full design reader (a composed design's parts
// are left to it by the quick reader).
installFullReader(fullReader);

/** The design the address bar holds. */
function addressDesign(page: Page): Design {
  const r = decodeLink(new URL(page.url()).hash);
  if (!r.ok) throw new Error(`the address holds no design: ${r.message}`);
  return r.value.design;
}
const entries = (page: Page) => page.evaluate(() => history.length);
/** Longer than the address bar's merging of a burst of changes (COALESCE_MS). */
const PAUSE_MS = 800;

test('Back and Forward step through committed changes; a copied address opens the same design', async ({
  page,
  browser,
}, info) => {
  await openWorkbench(page);
  const demo = await readDesign(page);
  await expect.poll(() => new URL(page.url()).hash).toMatch(/^#pw2\./);
  expect(bitwiseDifference(addressDesign(page), demo)).toBeNull();
  const start = await entries(page);

  await page.waitForTimeout(PAUSE_MS);
  await applySystem(page, 'y[n] = 0.5 y[n-1] + x[n]');
  await expect.poll(() => entries(page)).toBe(start + 1);
  const typed = await readDesign(page);
  expect(bitwiseDifference(addressDesign(page), typed)).toBeNull();

  // A drag is one entry, however many frames it took.
  await page.waitForTimeout(PAUSE_MS);
  await dragRoot(page, { kind: 'pole', index: 0 }, { re: 0.2, im: 0 }, { steps: 20 });
  await expect.poll(() => entries(page)).toBe(start + 2);
  const dragged = await readDesign(page);
  expect(dragged.poles[0]!.re).not.toBe(typed.poles[0]!.re);
  expect(bitwiseDifference(addressDesign(page), dragged)).toBeNull();
  await saveScreenshot(page, info, 'address-after-drag');

  await page.goBack();
  await expect.poll(async () => (await readDesign(page)).poles[0]!.re).toBe(typed.poles[0]!.re);
  await expect(page.getByRole('status').filter({ hasText: 'Back/Forward' })).toBeVisible();
  await page.goBack();
  await expect.poll(async () => bitwiseDifference(await readDesign(page), demo)).toBeNull();
  await saveScreenshot(page, info, 'address-back-twice');
  // Stepping back adds no entries of its own.
  expect(await entries(page)).toBe(start + 2);
  await page.goForward();
  await expect.poll(async () => (await readDesign(page)).poles[0]!.re).toBe(typed.poles[0]!.re);
  // Undo brings back what Forward replaced.
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect.poll(async () => bitwiseDifference(await readDesign(page), demo)).toBeNull();

  // The address, copied or bookmarked, opens the same design in a fresh browser.
  await page.waitForTimeout(PAUSE_MS);
  await page.getByRole('button', { name: 'Redo' }).click();
  const address = page.url();
  const elsewhere = await browser.newContext();
  const other = await elsewhere.newPage();
  await other.goto(address);
  await other.waitForFunction(() => window.__polewright !== undefined);
  expect(bitwiseDifference(await readDesign(other), await readDesign(page))).toBeNull();
  expect(other.url()).toBe(address);
  await elsewhere.close();

  // A reload of the address is the design already open: nothing changes and nothing is announced.
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect(bitwiseDifference(await readDesign(page), typed)).toBeNull();
  expect(page.url()).toBe(address);
  await expect(page.getByRole('status').filter({ hasText: 'from the link' })).toHaveCount(0);
  await saveScreenshot(page, info, 'address-after-reload');
});

test('a composed design travels in the address: its parts open elsewhere, and Back takes the added part away', async ({
  page,
  browser,
}, info) => {
  await openWorkbench(page);
  await openDesignPage(page);
  await chooseKind(page, 'Low-pass');
  await designerForm(page).getByRole('button', { name: 'Design', exact: true }).click();
  await page.waitForTimeout(PAUSE_MS);
  const lowpass = await readDesign(page);
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '50');
  await fillField(page, '−3 dB width', '4');
  await designerForm(page).getByRole('button', { name: 'Add to the design' }).click();
  await expect(page.getByTestId('design-parts').getByTestId('design-part')).toHaveCount(2);
  const composed = await readDesign(page);
  expect(composed.parts!.map((p) => p.designer?.kind)).toEqual(['iir', 'notch']);
  // The address holds the cascade, parts and all.
  await expect.poll(() => bitwiseDifference(addressDesign(page), composed)).toBeNull();
  await saveScreenshot(page, info, 'address-composed');

  // Opened in a fresh browser, the address gives the same parts (each still re-runnable there).
  const address = page.url();
  const elsewhere = await browser.newContext();
  const other = await elsewhere.newPage();
  await other.goto(address);
  await other.waitForFunction(() => window.__polewright !== undefined);
  await expect.poll(async () => bitwiseDifference(await readDesign(other), composed)).toBeNull();
  await openDesignPage(other);
  await expect(other.getByTestId('design-parts').getByTestId('design-part')).toHaveCount(2);
  await elsewhere.close();

  // Back is the low-pass alone again.
  await page.goBack();
  await expect.poll(async () => bitwiseDifference(await readDesign(page), lowpass)).toBeNull();
  expect((await readDesign(page)).parts).toBeUndefined();
});
