/** The system entry: every form reads to the same roots; errors show in place and change nothing. */
import { expect, test } from '@playwright/test';
import { withClipboard } from './support/clipboard.ts';
import {
  applySystem,
  entryBox,
  openWorkbench,
  readDesign,
  saveScreenshot,
  sortedRoots,
  stabilityBanner,
} from './support/app.ts';

/**
 * One system, a resonator with poles at radius 0.9 and ±60° and zeros at ±1, written in each entry form.
 * The numbers are worked by hand: (z − 0.9e^{jπ/3})(z − 0.9e^{−jπ/3}) = z² − 0.9z + 0.81.
 */
const SAME_SYSTEM = [
  {
    form: 'difference equation, delay form',
    text: 'y[n] = 0.9 y[n-1] - 0.81 y[n-2] + 0.5 x[n] - 0.5 x[n-2]',
  },
  { form: 'difference equation, advance form', text: 'y[n+2] - 0.9y[n+1] + 0.81y[n] = 0.5x[n+2] - 0.5x[n]' },
  { form: 'H(z) in z', text: 'H(z) = (0.5z^2 - 0.5) / (z^2 - 0.9z + 0.81)' },
  { form: 'H(z) in z^-1', text: '(0.5 - 0.5z^-2) / (1 - 0.9 z^-1 + 0.81 z^-2)' },
  { form: 'coefficient lists', text: 'b = [0.5, 0, -0.5]\na = [1, -0.9, 0.81]' },
];
/** Allowed difference between two readings of the same system (root finding on degree 2). */
const SAME_ROOT_TOL = 1e-12;

test('every entry form gives the same roots, in the design and in the table', async ({ page }, testInfo) => {
  await openWorkbench(page);
  let firstTable: string[] | null = null;
  for (const { form, text } of SAME_SYSTEM) {
    await applySystem(page, text);
    await expect(page.getByTestId('read-as')).toContainText(form.split(',')[0]!);
    const d = await readDesign(page);
    // Worked by hand: zeros ±1 (two real roots), poles 0.45 ± 0.779423j (0.9·(cos 60°, sin 60°)).
    const zeros = sortedRoots(d.zeros);
    expect(zeros.map((r) => r.re)).toEqual([expect.closeTo(-1, 12), expect.closeTo(1, 12)]);
    expect(zeros.every((r) => r.im === 0 && r.multiplicity === 1)).toBe(true);
    expect(d.poles).toHaveLength(1);
    expect(Math.abs(d.poles[0]!.re - 0.45)).toBeLessThan(SAME_ROOT_TOL);
    expect(Math.abs(d.poles[0]!.im - 0.9 * Math.sin(Math.PI / 3))).toBeLessThan(SAME_ROOT_TOL);
    const rows = await page.getByTestId('root-table').locator('tbody tr').allInnerTexts();
    expect(rows).toHaveLength(3);
    if (firstTable) expect(rows, `table after ${form}`).toEqual(firstTable);
    firstTable = rows;
  }
  await saveScreenshot(page, testInfo, 'entry-forms');
});

test('a bad equation shows an inline error at its place and leaves the design as it was', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  const before = await readDesign(page);
  const bad = 'y[n] = 0.5 y[n-1] + * x[n]';
  await applySystem(page, bad);
  const alert = page.getByRole('alert');
  await expect(alert).toBeVisible();
  // The '*' at offset 20 is where the parser cannot go on.
  await expect(page.getByTestId('parse-error-mark')).toHaveText('*');
  await expect(alert).toContainText('Column 21');
  await expect(entryBox(page)).toHaveValue(bad);
  expect(await readDesign(page)).toEqual(before);
  await saveScreenshot(page, testInfo, 'entry-error');

  // Fixing the text and applying clears the error.
  await applySystem(page, 'y[n] = 0.5 y[n-1] + x[n]');
  await expect(page.getByTestId('parse-error-mark')).toHaveCount(0);
  expect((await readDesign(page)).poles).toEqual([{ re: 0.5, im: 0, multiplicity: 1 }]);
});

test('Ctrl+Enter applies; the banner turns red for an unstable system and names the poles', async ({
  page,
}) => {
  await openWorkbench(page);
  await expect(stabilityBanner(page)).toContainText('Stable');
  // z² − 2.1z + 1.2: a complex pair of radius √1.2 ≈ 1.095, outside the unit circle.
  await entryBox(page).fill('y[n] = 2.1 y[n-1] - 1.2 y[n-2] + x[n]');
  await entryBox(page).press('Control+Enter');
  await expect(stabilityBanner(page)).toContainText('Unstable');
  await expect(stabilityBanner(page)).toContainText('1.095');
  await expect(stabilityBanner(page)).toHaveClass(/unstable/);
  await expect(stabilityBanner(page).getByRole('status')).toHaveText('Unstable');
  // Poles at ±j, simple and on the circle: marginal (amber).
  await entryBox(page).fill('y[n] = -y[n-2] + x[n]');
  await entryBox(page).press('Control+Enter');
  await expect(stabilityBanner(page)).toHaveClass(/marginal/);
  await expect(stabilityBanner(page)).toContainText('unit circle');
});

test('the example chips put text in the box and it applies', async ({ page }) => {
  await openWorkbench(page);
  await page.getByRole('button', { name: '50 Hz notch, H(z)' }).click();
  await expect(entryBox(page)).toHaveValue(/^H\(z\) = /);
  await page.getByRole('button', { name: 'Apply' }).click();
  await expect(page.getByTestId('read-as')).toContainText('H(z) in z');
  expect((await readDesign(page)).zeros).toHaveLength(1);
});

test('the current system is shown in every form, each copyable', async ({ page, context }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await openWorkbench(page);
  await applySystem(page, 'b = [0.5, 0, -0.5]\na = [1, -0.9, 0.81]');
  const forms = page.getByTestId('system-forms');
  await expect(forms).toContainText('y[n]');
  await expect(forms).toContainText('z^-1');
  const copy = forms.getByRole('button', { name: /^Copy/ }).first();
  const clip = await withClipboard(async () => {
    await copy.click();
    await expect(copy).toHaveText('Copied');
    return page.evaluate(() => navigator.clipboard.readText());
  });
  expect(clip).toContain('y[n]');

  // "Edit" puts a form in the entry box, focused; applying it gives back the same system.
  const before = await readDesign(page);
  await page.getByRole('combobox', { name: 'digits' }).selectOption('all');
  await forms.getByRole('button', { name: 'Edit H(z) in z', exact: true }).click();
  await expect(entryBox(page)).toBeFocused();
  await expect(entryBox(page)).toHaveValue(/^H\(z\) = /);
  await page.getByRole('button', { name: 'Apply' }).click();
  const after = await readDesign(page);
  expect(after.typed?.b).toEqual(before.typed?.b);
  expect(after.typed?.a).toEqual(before.typed?.a);
});
