import { test, expect } from '@playwright/test';
import { clickRoot, dragRoot, planeSvg, rootAt, rootMark, zToScreen } from './support/plane.ts';

/** One screen pixel in z units is about 1/250 at the test viewport; positions are checked to a few pixels. */
const PIXEL_TOLERANCE_Z = 0.02;

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(rootMark(page, { kind: 'pole', index: 0 })).toBeVisible({ timeout: 30_000 });
});

test('dragging a pole moves it, and the frequency view and stability read-out follow', async ({
  page,
}, info) => {
  const pole = { kind: 'pole' as const, index: 0 };
  // The magnitude trace is the clipped path of the magnitude plot (the frequency view's own drawing).
  const magnitude = page.getByTestId('plot-magnitude').locator('path[clip-path]');
  const before = await magnitude.getAttribute('d');
  // Demo pole pair 0 sits near 50 Hz at 2 kHz; move it to 0.9·e^{jπ/4}, i.e. 250 Hz.
  const to = { re: 0.9 * Math.SQRT1_2, im: 0.9 * Math.SQRT1_2 };
  await dragRoot(page, pole, to);
  const after = await rootAt(page, pole);
  expect(Math.abs(after.re - to.re)).toBeLessThan(PIXEL_TOLERANCE_Z);
  expect(Math.abs(after.im - to.im)).toBeLessThan(PIXEL_TOLERANCE_Z);
  await expect(page.getByTestId('root-marker')).toHaveAttribute('aria-label', /Selected Pole 2(4\d|5\d) Hz/);
  expect(await magnitude.getAttribute('d')).not.toBe(before);
  await expect(page.getByTestId('stability')).toContainText('Stable');
  await expect(rootMark(page, pole)).toHaveAttribute(
    'aria-label',
    /Pole pair at 2\d\d(\.\d+)? Hz, radius 0\.9/,
  );
  await page.screenshot({ path: info.outputPath('plane-after-drag.png') });
});

test('dragging a pole outside the unit circle shows the design as unstable', async ({ page }) => {
  await dragRoot(page, { kind: 'pole', index: 1 }, { re: 0.6, im: 1.0 });
  await expect(page.getByTestId('stability')).toContainText('Unstable');
  await expect(rootMark(page, { kind: 'pole', index: 1 }).locator('.pw-root-danger')).toHaveCount(1);
  await expect(planeSvg(page).locator('.pw-outside-unstable')).toHaveCount(1);
});

test('dragging the conjugate mirror moves the pair to the mirrored place', async ({ page }) => {
  await dragRoot(page, { kind: 'zero', index: 2 }, { re: -0.3, im: -0.8 }, { mirror: true });
  const z = await rootAt(page, { kind: 'zero', index: 2 });
  expect(Math.abs(z.re + 0.3)).toBeLessThan(PIXEL_TOLERANCE_Z);
  expect(Math.abs(z.im - 0.8)).toBeLessThan(PIXEL_TOLERANCE_Z);
});

test('arrow keys nudge the focused root by 0.01, with Shift by 0.001, one undo step each', async ({
  page,
}) => {
  const ref = { kind: 'pole' as const, index: 0 };
  const start = await rootAt(page, ref);
  await rootMark(page, ref).focus();
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('ArrowUp');
  await page.keyboard.press('Shift+ArrowLeft');
  const moved = await rootAt(page, ref);
  expect(moved.re).toBeCloseTo(start.re + 0.01 - 0.001, 12);
  expect(moved.im).toBeCloseTo(start.im + 0.01, 12);
  await page.keyboard.press('Control+z');
  const undone = await rootAt(page, ref);
  expect(undone.re).toBeCloseTo(start.re + 0.01, 12);
  expect(undone.im).toBeCloseTo(start.im + 0.01, 12);
  await expect(page.getByText(/arrows 0\.01 \(Shift 0\.001\)/)).toBeVisible();
});

test('a whole drag is one undo step and Ctrl+Z restores the exact previous position', async ({ page }) => {
  const ref = { kind: 'zero' as const, index: 1 };
  const start = await rootAt(page, ref);
  await dragRoot(page, ref, { re: 0.2, im: 0.5 }, { steps: 25 });
  expect((await rootAt(page, ref)).re).not.toBe(start.re);
  await page.keyboard.press('Control+z');
  expect(await rootAt(page, ref)).toEqual(start);
});

test('a pole pair placed by clicking lands where clicked; Delete removes it', async ({ page }) => {
  const count = async () => (await page.evaluate(() => window.__polewright!.design().poles.length)) as number;
  const n = await count();
  await page.getByRole('button', { name: 'Pole pair', exact: true }).click();
  const at = await zToScreen(page, { re: -0.4, im: 0.4 });
  await page.mouse.click(at.x, at.y);
  expect(await count()).toBe(n + 1);
  const added = await rootAt(page, { kind: 'pole', index: n });
  expect(Math.abs(added.re + 0.4)).toBeLessThan(PIXEL_TOLERANCE_Z);
  expect(Math.abs(added.im - 0.4)).toBeLessThan(PIXEL_TOLERANCE_Z);
  await page.keyboard.press('Delete');
  expect(await count()).toBe(n);
});

test('typing a radius and angle in Hz moves the selected root; bad text changes nothing', async ({
  page,
}) => {
  const ref = { kind: 'zero' as const, index: 0 };
  await clickRoot(page, ref);
  const strip = page.getByRole('form', { name: 'Selected root by number' });
  await strip.getByLabel('r', { exact: true }).fill('0.5');
  await strip.getByLabel('∠', { exact: true }).fill('500');
  await strip.getByLabel('∠', { exact: true }).press('Enter');
  const z = await rootAt(page, ref);
  expect(z.re).toBeCloseTo(0, 9); // 500 Hz at 2 kHz is a quarter turn
  expect(z.im).toBeCloseTo(0.5, 9);
  await strip.getByLabel('r', { exact: true }).fill('half');
  await strip.getByLabel('r', { exact: true }).press('Enter');
  await expect(strip.getByRole('alert')).toContainText('Radius: "half" is not a number');
  expect(await rootAt(page, ref)).toEqual(z);
});
