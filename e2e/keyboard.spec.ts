/**
 * Precise keyboard editing of the plane: Tab reaches the roots as one stop and selects the root it lands on,
 * N and P walk the roots, Page Up/Down step the radius without ever crossing the unit circle, comma and
 * period step the frequency on a grid that suits the sample rate, Alt+arrows stay the browser's, and the
 * number strip takes a pole pair's Q or width and a notch's depth and width.
 */
import { expect, test, type Page } from '@playwright/test';
import { saveScreenshot } from './support/app.ts';
import { planeSvg, rootAt, rootMark, type RootRef } from './support/plane.ts';

const fs = 2000;
const radius = (z: { re: number; im: number }) => Math.hypot(z.re, z.im);
const hz = (z: { re: number; im: number }) => (Math.abs(Math.atan2(z.im, z.re)) * fs) / (2 * Math.PI);
const strip = (page: Page) => page.getByRole('form', { name: 'Selected root by number' });
const focusedRoot = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement;
    return el instanceof SVGGElement ? `${el.dataset.kind} ${el.dataset.index}` : (el?.tagName ?? null);
  });

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(rootMark(page, { kind: 'pole', index: 0 })).toBeVisible({ timeout: 30_000 });
});

test('Tab reaches the roots as one stop and selects; N and P walk them', async ({ page }, testInfo) => {
  await planeSvg(page).focus();
  await page.keyboard.press('Tab');
  expect(await focusedRoot(page)).toBe('pole 0');
  await expect(rootMark(page, { kind: 'pole', index: 0 })).toHaveAttribute('aria-pressed', 'true');
  await expect(strip(page)).toContainText('Pole pair 1');
  // Only one root is a tab stop: the next Tab leaves the roots.
  await page.keyboard.press('Tab');
  expect(await focusedRoot(page)).not.toMatch(/^(pole|zero) /);
  await page.keyboard.press('Shift+Tab');
  expect(await focusedRoot(page)).toBe('pole 0');
  // N walks the table's order (poles, then zeros) and wraps; P and Shift+N walk back.
  for (const want of ['pole 1', 'pole 2', 'zero 0', 'zero 1', 'zero 2', 'pole 0']) {
    await page.keyboard.press('n');
    await expect.poll(() => focusedRoot(page)).toBe(want);
  }
  await page.keyboard.press('p');
  await expect.poll(() => focusedRoot(page)).toBe('zero 2');
  await page.keyboard.press('Shift+N');
  await expect.poll(() => focusedRoot(page)).toBe('zero 1');
  await expect(strip(page)).toContainText('Zero pair 2');
  // The one tab stop is now the selected root: leaving and coming back lands on it.
  await page.keyboard.press('Tab');
  await page.keyboard.press('Shift+Tab');
  expect(await focusedRoot(page)).toBe('zero 1');
  await saveScreenshot(page, testInfo, 'keyboard-walk-roots');
});

test('Page Up/Down step the radius by a part of the distance to the circle and never cross it', async ({
  page,
}, testInfo) => {
  const ref: RootRef = { kind: 'pole', index: 0 };
  const start = await rootAt(page, ref);
  const r0 = radius(start);
  await rootMark(page, ref).focus();
  await page.keyboard.press('PageUp');
  const once = await rootAt(page, ref);
  // A tenth of the distance to the circle, at the same frequency.
  expect(1 - radius(once)).toBeCloseTo((1 - r0) / 1.1, 5);
  expect(hz(once)).toBeCloseTo(hz(start), 9);
  await expect(page.locator('.pw-plane-hint')).toContainText('radius 0.99');
  // Sixty more presses: ever closer, never on or across the circle; the design stays stable.
  for (let i = 0; i < 60; i++) await page.keyboard.press('PageUp');
  const near = await rootAt(page, ref);
  expect(radius(near)).toBeLessThan(1);
  expect(1 - radius(near)).toBeLessThan((1 - r0) / 100);
  await expect(page.getByTestId('stability')).toContainText('Stable');
  await saveScreenshot(page, testInfo, 'keyboard-radius-near-circle');
  // Shift+Page Down: a hundredth of the distance back; each press is one undo step.
  await page.keyboard.press('Shift+PageDown');
  const back = await rootAt(page, ref);
  expect((1 - radius(back)) / (1 - radius(near))).toBeCloseTo(1.01, 4);
  await page.keyboard.press('Control+z');
  expect(await rootAt(page, ref)).toEqual(near);
});

test('comma and period step the frequency by 0.1 Hz (Shift 0.01 Hz) at 2 kHz, on the grid', async ({
  page,
}, testInfo) => {
  const ref: RootRef = { kind: 'pole', index: 0 };
  const start = await rootAt(page, ref);
  await rootMark(page, ref).focus();
  await page.keyboard.press('.');
  const up = await rootAt(page, ref);
  const f0 = hz(start);
  // The first press lands on the 0.1 Hz grid above the pole's frequency; the radius stays.
  expect(hz(up)).toBeCloseTo(Math.floor(f0 * 10 + 1e-6) / 10 + 0.1, 9);
  expect(radius(up)).toBeCloseTo(radius(start), 12);
  await page.keyboard.press('.');
  await page.keyboard.press('Shift+.');
  const fine = await rootAt(page, ref);
  expect(hz(fine)).toBeCloseTo(hz(up) + 0.1 + 0.01, 9);
  await expect(page.locator('.pw-plane-hint')).toContainText('step 0.01 Hz');
  await page.keyboard.press(',');
  expect(hz(await rootAt(page, ref))).toBeCloseTo(hz(up) + 0.1, 9);
  await saveScreenshot(page, testInfo, 'keyboard-frequency-steps');
});

test('Alt+arrows are left to the browser: the root does not move and the key is not taken', async ({
  page,
}) => {
  const ref: RootRef = { kind: 'pole', index: 0 };
  const start = await rootAt(page, ref);
  await rootMark(page, ref).focus();
  await page.evaluate(() => {
    (window as unknown as { taken: boolean[] }).taken = [];
    window.addEventListener('keydown', (e) => {
      if (e.key.startsWith('Arrow'))
        (window as unknown as { taken: boolean[] }).taken.push(e.defaultPrevented);
    });
  });
  await page.keyboard.press('Alt+ArrowLeft');
  await page.keyboard.press('Alt+ArrowRight');
  await page.keyboard.press('ArrowRight');
  expect(await page.evaluate(() => (window as unknown as { taken: boolean[] }).taken)).toEqual([
    false,
    false,
    true,
  ]);
  expect((await rootAt(page, ref)).re).toBeCloseTo(start.re + 0.01, 12);
});

test('the strip takes a pole pair by Q and a notch by depth and width', async ({ page }, testInfo) => {
  const pole: RootRef = { kind: 'pole', index: 2 };
  await rootMark(page, pole).focus();
  await strip(page).getByLabel('Coordinates').selectOption({ label: 'frequency, Q' });
  await strip(page).getByLabel('f', { exact: false }).first().fill('240');
  await strip(page).getByLabel('Q', { exact: false }).fill('30');
  await strip(page).getByLabel('Q', { exact: false }).press('Enter');
  const p = await rootAt(page, pole);
  expect(hz(p)).toBeCloseTo(240, 9);
  // Q 30 at 240 Hz is 8 Hz wide, as the root table then reads it.
  const row = page.getByTestId('root-table').locator('tbody tr').nth(2);
  await expect(row).toContainText('240 Hz');
  await expect(row).toContainText('30');
  await expect(row).toContainText('8 Hz');
  await saveScreenshot(page, testInfo, 'keyboard-strip-q');

  // The 150 Hz zeros over the 150 Hz poles are a notch: set it 40 dB deep and 3 Hz wide at 151 Hz.
  const zero: RootRef = { kind: 'zero', index: 1 };
  await rootMark(page, zero).focus();
  await strip(page).getByLabel('Coordinates').selectOption({ label: 'notch: frequency, depth, width' });
  const fields = strip(page).locator('input.pw-num');
  await fields.nth(0).fill('151');
  await fields.nth(1).fill('-40');
  await fields.nth(2).fill('3');
  await fields.nth(2).press('Enter');
  const z = await rootAt(page, zero);
  const q = await rootAt(page, { kind: 'pole', index: 1 });
  expect(hz(z)).toBeCloseTo(151, 9);
  expect(hz(q)).toBeCloseTo(151, 9);
  // (1 − ρ)/(1 − r) ≈ depth near the circle; the strip shows the figures back as typed.
  expect((1 - radius(z)) / (1 - radius(q))).toBeCloseTo(0.01, 3);
  await expect(fields.nth(1)).toHaveValue('−40');
  await expect(fields.nth(2)).toHaveValue('3');
  // One undo step brings both pairs back (Ctrl+Z in a field undoes its typing, so the button).
  await page.getByRole('button', { name: 'Undo' }).click();
  expect(hz(await rootAt(page, zero))).toBeCloseTo(150, 6);
  expect(hz(await rootAt(page, { kind: 'pole', index: 1 }))).toBeCloseTo(150, 2);
  // A width past fs/4 is refused in place, naming the field.
  await rootMark(page, zero).focus();
  await strip(page).getByLabel('Coordinates').selectOption({ label: 'notch: frequency, depth, width' });
  await fields.nth(2).fill('900');
  await fields.nth(2).press('Enter');
  await expect(strip(page).getByRole('alert')).toContainText(
    'Width: a −3 dB width is above 0 and at most fs/4',
  );
  await saveScreenshot(page, testInfo, 'keyboard-strip-notch');
});
