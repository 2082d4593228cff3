/**
 * Nothing the page accepts is lost on reload: designs beyond the old file limits (a long FIR typed with long
 * text, a comb with many teeth from the page's own designer) are kept, reopen after a reload and go into a
 * file; what no file could hold is refused where it is typed, with the reason, and the design stays.
 */
import { expect, test } from '@playwright/test';
import { applySystem, entryBox, openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { chooseKind, designerForm, fillField, openDesignPage, pressDesign } from './support/design.ts';

/** An FIR of `n` taps written out in full with generous white space, as pasted from elsewhere. */
function firText(n: number): string {
  const taps = Array.from({ length: n }, (_, i) => String(Math.sin(i * 0.37) / (i + 3)));
  return `b = [\n${taps
    .map((t) => `    ${t},     % tap`)
    .join('\n')
    .replace(/% tap/g, '')}\n]`;
}

test('a 300-tap FIR typed as 25 000 characters is kept, and comes back after a reload', async ({
  page,
}, info) => {
  await openWorkbench(page);
  const text = firText(300) + ' '.repeat(25_000 - firText(300).length);
  expect(text.length).toBe(25_000);
  await applySystem(page, text);
  const before = await readDesign(page);
  expect(before.typed?.b).toHaveLength(300);
  // The FIR's 299 poles sit at the origin: one root of multiplicity 299 (the old limit was 64).
  expect(before.poles).toEqual([{ re: 0, im: 0, multiplicity: 299 }]);
  await page.waitForTimeout(600);
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  const after = await readDesign(page);
  expect(after).toEqual(before);
  expect(after.typed!.text.length).toBe(25_000);
  await expect(page.getByRole('button', { name: 'Undo' })).toBeEnabled();
  await saveScreenshot(page, info, 'long-fir');
});

test('an FIR of 1026 taps is refused in the entry with the limit, and the design stays', async ({
  page,
}, info) => {
  await openWorkbench(page);
  const before = await readDesign(page);
  await applySystem(page, firText(1026));
  await expect(page.getByRole('alert').or(page.getByTestId('parse-error')).first()).toContainText(
    'at most 1025',
  );
  expect(await readDesign(page)).toEqual(before);
  await expect(entryBox(page)).toHaveValue(firText(1026));
  await saveScreenshot(page, info, 'fir-1026-refused');
});

test("the page's comb designer: order 1000 with a mask region per tooth is kept, order 2000 is refused with the spacing", async ({
  page,
}, info) => {
  test.setTimeout(120_000);
  await openWorkbench(page);
  await openDesignPage(page);
  await chooseKind(page, 'Comb (every multiple)');
  await fillField(page, 'Tooth spacing', '1');
  await fillField(page, '−3 dB width', '0.2');
  await pressDesign(page);
  await expect(designerForm(page)).toContainText('order 2000');
  await expect(designerForm(page)).toContainText('1.953125 Hz or more');
  await fillField(page, 'Tooth spacing', '2');
  await pressDesign(page);
  await expect.poll(async () => (await readDesign(page)).designer?.kind, { timeout: 30_000 }).toBe('comb');
  const designed = await readDesign(page);
  // A stop region at each of the 501 teeth (the teeth are too close for pass bands between them).
  expect(designed.mask!.regions.length).toBe(501);
  await page.waitForTimeout(1000);
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect(await readDesign(page)).toEqual(designed);
  await saveScreenshot(page, info, 'comb-1000');
});

test('the Design page says when an order is beyond double precision, and which order works', async ({
  page,
}, info) => {
  await openWorkbench(page);
  await openDesignPage(page);
  await chooseKind(page, 'Band-pass');
  const form = designerForm(page);
  await form.getByLabel('Family').selectOption({ label: 'Elliptic' });
  const before = await readDesign(page);
  await fillField(page, 'Order', '64');
  await pressDesign(page);
  const refusal = form.getByRole('alert').filter({ hasText: 'order 64' });
  await expect(refusal).toContainText('order 64 puts two poles');
  await expect(refusal).toContainText('closer than double precision separates');
  await expect(form.getByLabel('Order', { exact: true })).toHaveAttribute('aria-invalid', 'true');
  expect(await readDesign(page)).toEqual(before);
  await saveScreenshot(page, info, 'order-beyond-precision');
  const largest = /order (\d+) is the largest that works/.exec((await refusal.textContent()) ?? '')![1]!;
  await fillField(page, 'Order', largest);
  await pressDesign(page);
  await expect
    .poll(async () => (await readDesign(page)).designer)
    .toMatchObject({ kind: 'iir', family: 'elliptic', order: Number(largest) });
});
