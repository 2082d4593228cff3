/** The workbench shell: demo on first open, undo/redo, design buttons, sample rate, layout, read-outs. */
import { expect, test, type Page } from '@playwright/test';
import {
  applySystem,
  entryBox,
  openWorkbench,
  readDesign,
  saveScreenshot,
  stabilityBanner,
  keepHzOnRateChange,
} from './support/app.ts';

test('the page opens on the demo design with its scenario stated', async ({ page }, testInfo) => {
  await openWorkbench(page);
  await expect(page.getByRole('textbox', { name: 'Design name' })).toHaveValue(/Hopper scale/);
  await expect(page.getByLabel('About this design')).toHaveValue(/grain-hopper weighing station/);
  // a note longer than its one line at rest ends in an ellipsis, not a letter cut in half
  await page.setViewportSize({ width: 900, height: 800 });
  const rest = await page.getByLabel('About this design').evaluate((el) => ({
    overflows: el.scrollWidth > el.clientWidth,
    ending: getComputedStyle(el).textOverflow,
  }));
  expect(rest).toEqual({ overflows: true, ending: 'ellipsis' });
  await page.setViewportSize({ width: 1440, height: 900 });
  await expect(page.getByText('Check before you ship')).toBeVisible();
  await expect(stabilityBanner(page)).toContainText('Stable');
  await expect(page.getByRole('textbox', { name: 'Sample rate' })).toHaveValue('2');
  await expect(page.getByTestId('root-table').locator('tbody tr')).toHaveCount(6);
  await saveScreenshot(page, testInfo, 'workbench-demo');
});

test('undo restores the previous design exactly and redo re-applies it', async ({ page }) => {
  await openWorkbench(page);
  const demo = await readDesign(page);
  await applySystem(page, 'y[n] = 0.5 y[n-1] + x[n]');
  const typed = await readDesign(page);
  expect(typed).not.toEqual(demo);
  // The scenario described the demo's roots, so it makes way for the typed system.
  await expect(page.getByRole('textbox', { name: 'Design name' })).toHaveValue('Typed system');
  await expect(page.getByLabel('About this design')).toHaveValue('');

  await page.getByRole('button', { name: 'Undo' }).click();
  expect(await readDesign(page)).toEqual(demo);
  await expect(page.getByLabel('About this design')).toHaveValue(/grain-hopper/);
  await page.getByRole('button', { name: 'Redo' }).click();
  expect(await readDesign(page)).toEqual(typed);

  // The shortcuts, with focus away from any text field.
  await page.getByRole('heading', { name: 'Polewright' }).click();
  await page.keyboard.press('Control+z');
  expect(await readDesign(page)).toEqual(demo);
  await page.keyboard.press('Control+Shift+z');
  expect(await readDesign(page)).toEqual(typed);
  await page.keyboard.press('Control+z');
  await page.keyboard.press('Control+y');
  expect(await readDesign(page)).toEqual(typed);
});

test('Ctrl+Z inside the entry box edits the text, not the design', async ({ page }) => {
  await openWorkbench(page);
  await applySystem(page, 'y[n] = 0.5 y[n-1] + x[n]');
  const typed = await readDesign(page);
  await entryBox(page).focus();
  await page.keyboard.press('Control+z');
  expect(await readDesign(page)).toEqual(typed);
});

test('start empty is one undo step, and the demo button brings the demo back', async ({ page }) => {
  await openWorkbench(page);
  const demo = await readDesign(page);
  await page.getByRole('button', { name: 'Start empty' }).click();
  const empty = await readDesign(page);
  expect(empty.zeros).toEqual([]);
  expect(empty.poles).toEqual([]);
  expect(empty.sampleRate).toBe(demo.sampleRate);
  await page.getByRole('button', { name: 'Undo' }).click();
  expect(await readDesign(page)).toEqual(demo);
  await page.getByRole('button', { name: 'Start empty' }).click();
  await page.getByRole('button', { name: 'Demo design' }).click();
  expect(await readDesign(page)).toEqual(demo);
});

test('the sample rate takes Hz or kHz and refuses bad input in place', async ({ page }) => {
  await openWorkbench(page);
  const rate = page.getByRole('textbox', { name: 'Sample rate' });
  await rate.fill('abc');
  await rate.press('Enter');
  await expect(page.getByRole('alert')).toContainText('not a number');
  expect((await readDesign(page)).sampleRate).toBe(2000);
  await rate.fill('0');
  await rate.press('Enter');
  await expect(page.getByRole('alert')).toContainText('above zero');
  expect((await readDesign(page)).sampleRate).toBe(2000);
  await rate.fill('48');
  await rate.press('Enter');
  await keepHzOnRateChange(page);
  expect((await readDesign(page)).sampleRate).toBe(48000);
  await expect(page.getByRole('alert')).toHaveCount(0);
  await page.getByRole('combobox', { name: 'Sample rate unit' }).selectOption('Hz');
  await expect(rate).toHaveValue('48000');
  await rate.fill('1000');
  await rate.press('Tab');
  await keepHzOnRateChange(page);
  expect((await readDesign(page)).sampleRate).toBe(1000);
});

test('the gain rule resolves k and says when a rule cannot be met', async ({ page }) => {
  await openWorkbench(page);
  // Zero at z = 1 (DC) and a pole at 0.5: |H(1)| = 0, so 0 dB at DC is impossible.
  await applySystem(page, 'y[n] = 0.5 y[n-1] + x[n] - x[n-1]');
  const rule = page.getByRole('combobox', { name: 'Gain rule' });
  await rule.selectOption('dc');
  await expect(page.getByRole('alert')).toContainText('DC');
  // At Nyquist z = −1: |H| = |−1 − 1| / |−1 − 0.5| = 4/3, so k = 0.75 (worked by hand).
  await rule.selectOption('nyquist');
  await expect(page.getByTestId('resolved-gain')).toHaveText('k = 0.75');
  await rule.selectOption('fixed');
  const k = page.getByRole('textbox', { name: 'k =' });
  await expect(k).toHaveValue('0.75');
  await k.fill('2');
  await k.press('Enter');
  expect((await readDesign(page)).gainRule).toEqual({ kind: 'fixed', value: 2 });
});

test('number fields read 0,5, the Unicode minus, fractions and units by one policy', async ({ page }) => {
  await openWorkbench(page);
  const rate = page.getByRole('textbox', { name: 'Sample rate' });
  await rate.fill('44,1');
  await rate.press('Enter');
  await keepHzOnRateChange(page);
  expect((await readDesign(page)).sampleRate).toBe(44100);
  await rate.fill('800 Hz');
  await rate.press('Enter');
  await keepHzOnRateChange(page);
  expect((await readDesign(page)).sampleRate).toBe(800);
  await rate.fill('1,000');
  await rate.press('Enter');
  await expect(page.getByRole('alert')).toContainText('ambiguous');
  expect((await readDesign(page)).sampleRate).toBe(800);
  await rate.press('Escape');
  await expect(page.getByRole('alert')).toHaveCount(0);

  await page.getByRole('combobox', { name: 'Gain rule' }).selectOption('fixed');
  const k = page.getByRole('textbox', { name: 'k =' });
  await k.fill('−1/4');
  await k.press('Enter');
  expect((await readDesign(page)).gainRule).toEqual({ kind: 'fixed', value: -0.25 });
  await k.fill('0,5');
  await k.press('Tab');
  expect((await readDesign(page)).gainRule).toEqual({ kind: 'fixed', value: 0.5 });
});

test('clicking a row of the root table selects that root', async ({ page }) => {
  await openWorkbench(page);
  const row = page.getByTestId('root-table').locator('tbody tr').nth(1);
  await row.click();
  await expect(row).toHaveAttribute('aria-selected', 'true');
  const sel = await page.evaluate(() => window.__polewright!.selection());
  expect(sel).not.toBeNull();
});

/** Asserts the page does not scroll and each region lies inside the viewport. */
async function expectAllRegionsVisible(page: Page): Promise<void> {
  const fits = await page.evaluate(() => document.documentElement.scrollHeight <= window.innerHeight + 1);
  expect(fits, 'the page fits without scrolling').toBe(true);
  const vp = page.viewportSize()!;
  for (const cls of ['plane', 'frequency', 'time', 'side']) {
    const box = await page.locator(`.pw-area-${cls}`).boundingBox();
    expect(box, cls).not.toBeNull();
    expect(box!.width, `${cls} width`).toBeGreaterThan(250);
    expect(box!.height, `${cls} height`).toBeGreaterThan(200);
    expect(box!.x + box!.width, `${cls} right edge`).toBeLessThanOrEqual(vp.width + 1);
    expect(box!.y + box!.height, `${cls} bottom edge`).toBeLessThanOrEqual(vp.height + 1);
  }
}

for (const size of [
  { width: 1280, height: 720 },
  { width: 1440, height: 900 },
]) {
  test(`every region is visible without scrolling at ${size.width}×${size.height}`, async ({
    page,
  }, testInfo) => {
    await page.setViewportSize(size);
    await openWorkbench(page);
    await expectAllRegionsVisible(page);
    await saveScreenshot(page, testInfo, `workbench-${size.width}x${size.height}`);
  });
}

test('a narrow screen stacks the regions in one column', async ({ page }, testInfo) => {
  await page.setViewportSize({ width: 420, height: 860 });
  await openWorkbench(page);
  const xs = await Promise.all(
    ['plane', 'frequency', 'time', 'side'].map(
      async (c) => (await page.locator(`.pw-area-${c}`).boundingBox())!,
    ),
  );
  for (const b of xs) expect(Math.abs(b.x - xs[0]!.x)).toBeLessThan(1);
  for (let i = 1; i < xs.length; i++) expect(xs[i]!.y).toBeGreaterThan(xs[i - 1]!.y);
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth);
  expect(overflow, 'no sideways scrolling').toBe(false);
  await saveScreenshot(page, testInfo, 'workbench-narrow');
});
