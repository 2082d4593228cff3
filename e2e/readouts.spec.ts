/**
 * Numbers people read: read-outs show figures, not float noise. A level off 0 dB by rounding reads 0 dB, an
 * exact zero reads "−∞ dB (exact zero)", margins say whether they pass and by how much, and no read-out
 * shows an exponent of float noise.
 */
import { expect, test } from '@playwright/test';
import { applySystem, openWorkbench, saveScreenshot } from './support/app.ts';
import { frequencyCursor, frequencyPanel } from './support/charts.ts';

const dbText = (page: import('@playwright/test').Page) =>
  frequencyPanel(page).getByTestId('freq-read-db').innerText();

test('the demo reads 0 dB at DC, its notches as exact zeros and its mask margin in words', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  const chip = page.getByTestId('mask-chip');
  // The chip says which filter it judges (the ideal one: no fixed-point target is set) and its verdict.
  await expect(chip).toContainText('ideal');
  await expect(chip).toContainText('✓ passes');
  await expect(chip).toContainText(/by 0\.0143 dB at 250 Hz/);
  await expect(chip).not.toContainText('+');
  // The root table's notch column: the zeros on the circle give an exact zero, not −322 dB.
  const table = page.getByTestId('root-table');
  await expect(table).toContainText(/notch (−∞ dB \(exact zero\)|< −300 dB)/);
  await expect(table).not.toContainText(/e-\d/);
  await frequencyCursor(page).focus();
  await page.keyboard.press('Home');
  expect(await dbText(page)).toBe('0 dB');
  await saveScreenshot(page, testInfo, 'readouts-demo');
});

test('a typed FIR whose DC gain is 1 to rounding reads 0 dB there, and a zero at DC reads −∞', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  // 0.3 + 0.3 + 0.3 + 0.1 is 0.9999999999999999 in doubles: 20·log10 of it is −9.6e-16 dB.
  await applySystem(page, 'b = [0.3, 0.3, 0.3, 0.1]\na = [1]');
  await frequencyCursor(page).focus();
  await page.keyboard.press('Home');
  await expect(frequencyCursor(page)).toHaveAttribute('aria-valuenow', '0');
  expect(await dbText(page)).toBe('0 dB');
  await saveScreenshot(page, testInfo, 'readouts-fir-dc');
  // A first difference: an exact zero at DC.
  await applySystem(page, 'y[n] = x[n] - x[n-1]');
  await frequencyCursor(page).focus();
  await page.keyboard.press('Home');
  await expect.poll(() => dbText(page)).toBe('−∞ dB (exact zero)');
  await expect(page.getByTestId('root-table')).not.toContainText(/e-1\d/);
  await saveScreenshot(page, testInfo, 'readouts-exact-zero');
});
