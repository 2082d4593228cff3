/**
 * Composed designs and the family picked by the tool, end to end: "any family" proposes the family of least
 * order with every family's order beside it; a notch is added on top of a low-pass as a part of its own,
 * a second notch at a frequency that is no harmonic of the first, and parts are re-run, edited and removed,
 * each one undo step, while the requirement mask judges the whole cascade.
 */
import { expect, test } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { chooseKind, designerForm, designerStatus, fillField, openDesignPage } from './support/design.ts';

test.beforeEach(async ({ page }) => {
  await openWorkbench(page);
  await openDesignPage(page);
});

test('least order, any family: proposes the family of least order and shows the others', async ({
  page,
}, info) => {
  await chooseKind(page, 'Low-pass');
  const form = designerForm(page);
  await form.getByLabel('Family').selectOption({ label: 'Any family (least order)' });
  // Picking "any family" asks for the least order.
  await expect(form.getByLabel('Least order that meets the requirement')).toBeChecked();
  await fillField(page, 'Pass band up to', '100');
  await fillField(page, 'Stop band from', '200');
  await fillField(page, 'Pass-band loss at most', '1');
  await fillField(page, 'Stop band down by at least', '20');
  await form.getByRole('button', { name: 'Design' }).click();

  const table = designerStatus(page).getByTestId('family-choice');
  await expect(table).toBeVisible();
  // scipy.signal buttord/cheb1ord/cheb2ord/ellipord 1.17 at fs 2000 Hz: 5, 3, 3, 3.
  const rows = table.locator('tbody tr');
  await expect(rows).toHaveCount(4);
  const orders = await rows.locator('td:nth-child(2)').allTextContents();
  expect(orders).toEqual(['5', '3', '3', '3']);
  // Tied on order: the flattest pass-band group delay among the order-3 families is picked, and the page says so.
  await expect(table).toContainText(
    'tied on order, so the least group-delay spread across the pass band decided',
  );
  const spreads = (await rows.locator('td:nth-child(3)').allTextContents()).map(Number);
  const tied = [1, 2, 3];
  const best = tied.reduce((a, b) => (spreads[b]! < spreads[a]! ? b : a));
  await expect(rows.nth(best)).toHaveAttribute('aria-current', 'true');
  const picked = ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'][best];
  const d = await readDesign(page);
  expect(d.designer).toMatchObject({ kind: 'iir', family: 'any', order: 'auto' });
  // The roots are the picked family's order: 3 poles (one real root and a pair).
  const count = d.poles.reduce((n, r) => n + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
  expect(count).toBe(3);
  expect(picked).toBeDefined();
  await saveScreenshot(page, info, 'any-family');
});
