/**
 * Composed designs and the family picked by the tool, end to end: "any family" proposes the family of least
 * order with every family's order beside it; a notch is added on top of a low-pass as a part of its own,
 * a second notch at a frequency that is no harmonic of the first, and parts are re-run, edited and removed,
 * each one undo step, while the requirement mask judges the whole cascade.
 */
import { expect, test, type Page } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import {
  chooseKind,
  designZpk,
  designerForm,
  designerStatus,
  expectMaskPass,
  fillField,
  magnitudeDbHz,
  openDesignPage,
} from './support/design.ts';
import { dragRoot, rootAt } from './support/plane.ts';

const parts = (page: Page) => page.getByTestId('design-parts').getByTestId('design-part');
const undoButton = (page: Page) =>
  page.getByRole('banner').getByRole('button', { name: 'Undo', exact: true });
const redoButton = (page: Page) =>
  page.getByRole('banner').getByRole('button', { name: 'Redo', exact: true });
/** |H| in dB of the page's current design at hz, by the engine. */
const dbAt = async (page: Page, hz: number) => {
  const { zpk, fs } = await designZpk(page);
  return magnitudeDbHz(zpk, fs, hz);
};
const notchAt = async (page: Page, centre: string, width: string) => {
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', centre);
  await fillField(page, '−3 dB width', width);
};

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
  await form.getByRole('button', { name: 'Design', exact: true }).click();

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

  // As a part of a cascade, it still says which family it picked and the others' orders.
  await notchAt(page, '50', '4');
  await designerForm(page).getByRole('button', { name: 'Add to the design' }).click();
  await expect(parts(page)).toHaveCount(2);
  await expect(parts(page).nth(0).getByTestId('part-family')).toContainText(
    'Butterworth 5, Chebyshev I 3, Chebyshev II 3, Elliptic 3',
  );
  await saveScreenshot(page, info, 'any-family-as-a-part');
});

test('a second notch on a low-pass: parts are added, edited, re-run and removed, each one undo step', async ({
  page,
}, info) => {
  // A low-pass from the form's starting values (order 4 at 2 kHz, with its requirement and mask).
  await chooseKind(page, 'Low-pass');
  await designerForm(page).getByRole('button', { name: 'Design', exact: true }).click();
  const lowpass = await readDesign(page);
  expect(lowpass.designer).toMatchObject({ kind: 'iir', response: 'lowpass' });
  const passDb = await dbAt(page, 20);

  // A notch at 50 Hz added on top: the low-pass stays, the notch is a part of its own.
  await notchAt(page, '50', '4');
  await designerForm(page).getByRole('button', { name: 'Add to the design' }).click();
  await expect(parts(page)).toHaveCount(2);
  // A second notch at 73.3 Hz (no harmonic of 50 Hz).
  await notchAt(page, '73.3', '2');
  await designerForm(page).getByRole('button', { name: 'Add to the design' }).click();
  await expect(parts(page)).toHaveCount(3);
  await expect(parts(page).nth(0)).toContainText('Butterworth low-pass');
  await expect(parts(page).nth(2)).toContainText('73.3 Hz');
  const three = await readDesign(page);
  expect(three.parts!.map((p) => p.designer?.kind)).toEqual(['iir', 'notch', 'notch']);
  expect(await dbAt(page, 50)).toBeLessThan(-100); // zeros on the circle at each notch (common practice)
  expect(await dbAt(page, 73.3)).toBeLessThan(-100);
  // Far from the notches the low-pass is as it was (the notches' skirts are < 0.01 dB at 20 Hz here).
  expect(Math.abs((await dbAt(page, 20)) - passDb)).toBeLessThan(0.05);
  // The whole mask has both notches' stop regions, and judges the cascade.
  expect(three.mask!.regions.filter((r) => r.kind === 'stop').length).toBe(3);
  await expectMaskPass(page, true);
  await saveScreenshot(page, info, 'three-parts');
  // The parts survive a reload (the autosaved session carries them, as files and links do).
  await page.reload();
  await page.waitForFunction(() => window.__polewright !== undefined);
  expect((await readDesign(page)).parts).toEqual(three.parts);
  await openDesignPage(page);
  await expect(parts(page)).toHaveCount(3);

  // Edit the second notch: its parameters go into the form; Update changes only that part.
  await parts(page)
    .nth(2)
    .getByRole('button', { name: /^Edit part 3/ })
    .click();
  await expect(designerForm(page).getByLabel('Centre', { exact: true })).toHaveValue('73.3');
  await fillField(page, 'Centre', '81');
  await designerForm(page).getByRole('button', { name: 'Update part 3' }).click();
  await expect(parts(page).nth(2)).toContainText('81 Hz');
  expect(await dbAt(page, 81)).toBeLessThan(-100);
  expect(await dbAt(page, 73.3)).toBeGreaterThan(-1);
  // The mask was the one the parts imply, so its stop region moved with the notch, and the whole passes.
  expect(
    (await readDesign(page)).mask!.regions.some((r) => r.kind === 'stop' && r.fromHz < 81 && r.toHz > 81),
  ).toBe(true);
  await expectMaskPass(page, true);
  const edited = await readDesign(page);
  expect(edited.zeros.slice(0, -1)).toEqual(three.zeros.slice(0, -1));

  // A hand edit of the 50 Hz notch's pole marks that part only; Re-run brings its roots back.
  const poleIndex = edited.parts![0]!.poles; // the first pole of part 2
  const pole = await rootAt(page, { kind: 'pole', index: poleIndex });
  await dragRoot(page, { kind: 'pole', index: poleIndex }, { re: pole.re * 0.9, im: pole.im * 0.9 });
  await expect(parts(page).nth(1)).toContainText('edited by hand');
  await expect(parts(page).nth(0)).not.toContainText('edited by hand');
  await saveScreenshot(page, info, 'part-edited-by-hand');
  await parts(page)
    .nth(1)
    .getByRole('button', { name: /^Re-run part 2/ })
    .click();
  await expect(parts(page).nth(1)).not.toContainText('edited by hand');
  expect((await readDesign(page)).poles).toEqual(edited.poles);

  // Remove the 50 Hz notch; Undo brings it back, Redo takes it away again.
  await parts(page)
    .nth(1)
    .getByRole('button', { name: /^Remove part 2/ })
    .click();
  await expect(parts(page)).toHaveCount(2);
  expect(await dbAt(page, 50)).toBeGreaterThan(-1);
  await expectMaskPass(page, true);
  await saveScreenshot(page, info, 'part-removed');
  await undoButton(page).click();
  await expect(parts(page)).toHaveCount(3);
  expect(await dbAt(page, 50)).toBeLessThan(-100);
  await redoButton(page).click();
  await expect(parts(page)).toHaveCount(2);
  // Removing the last notch leaves the low-pass alone, remembered by its designer as before.
  await parts(page)
    .nth(1)
    .getByRole('button', { name: /^Remove part 2/ })
    .click();
  await expect(page.getByTestId('design-parts')).toHaveCount(0);
  const alone = await readDesign(page);
  expect(alone.designer).toMatchObject({ kind: 'iir' });
  expect(alone.poles).toEqual(lowpass.poles);
});
