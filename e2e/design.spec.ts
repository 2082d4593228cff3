/**
 * The Design page end to end: a notch designed in Hz lands on the plane with the asked depth and width,
 * a mask judges hand edits live (pass → fail when a pole is dragged to add ripple, and back on undo),
 * a mask edge is dragged on the plot in one undo step, a design is re-run with a changed parameter, and
 * released for free editing.
 */
import { expect, test } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { cursorHz, frequencyPanel, hoverFrequency, readFrequency } from './support/charts.ts';
import {
  chooseKind,
  designZpk,
  designerForm,
  designerStatus,
  expectMaskPass,
  fillField,
  magnitudeDbHz,
  maskSection,
  notchWidthHz,
  openDesignPage,
  pressDesign,
} from './support/design.ts';
import { dragRoot, rootAt } from './support/plane.ts';

const undoButton = (page: import('@playwright/test').Page) =>
  page.getByRole('banner').getByRole('button', { name: 'Undo', exact: true });

test.beforeEach(async ({ page }) => {
  await openWorkbench(page);
  await openDesignPage(page);
});

test('a notch designed at 120 Hz, 10 Hz wide, shows there with that width', async ({ page }, info) => {
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '120');
  await fillField(page, '−3 dB width', '10');
  await pressDesign(page);

  const d = await readDesign(page);
  expect(d.designer).toMatchObject({ kind: 'notch', f0: 120, bandwidthHz: 10 });
  expect(d.poles).toHaveLength(1);
  const { zpk, fs } = await designZpk(page);
  expect(magnitudeDbHz(zpk, fs, 120)).toBeLessThan(-100); // a zero on the unit circle at f0
  expect(Math.abs(notchWidthHz(zpk, fs, 120) - 10)).toBeLessThan(0.01); // −3 dB width as asked
  await expect(designerStatus(page).getByTestId('designer-title')).toHaveText('Notch');
  // The demo's name and note described the hum notches it replaced: the header now names the notch.
  await expect(page.getByRole('textbox', { name: 'Design name' })).toHaveValue('Notch');
  expect((await readDesign(page)).note).toBe('');

  // The frequency view's read-out at the notch and half a width away (the pointer lands within a pixel).
  await hoverFrequency(page, 120);
  const atNotch = await readFrequency(page);
  const hz = await cursorHz(page);
  expect(Math.abs(hz - 120)).toBeLessThan(2.5);
  expect(atNotch.db).toBeLessThan(-10);
  // The read-out prints 4 digits, on a slope of ~17 dB/Hz here: agreement to 0.05 dB.
  expect(Math.abs(atNotch.db - magnitudeDbHz(zpk, fs, hz))).toBeLessThan(0.05);
  await hoverFrequency(page, 125);
  const atEdge = await readFrequency(page);
  expect(Math.abs(atEdge.db - -3.01)).toBeLessThan(1.5);

  // The design came with its mask, and it passes.
  await expectMaskPass(page, true);
  await saveScreenshot(page, info, 'notch');
});

test('a mask that passes fails when a pole is dragged to add ripple, and passes again on undo', async ({
  page,
}, info) => {
  await chooseKind(page, 'Low-pass');
  await pressDesign(page);
  await expectMaskPass(page, true);
  const mask = maskSection(page);
  // A ceiling on the pass band: ripple above +0.5 dB now counts as a failure.
  await mask.getByLabel('Region 1 upper limit (dB)').fill('0.5');
  await mask.getByLabel('Region 1 upper limit (dB)').press('Enter');
  expect((await readDesign(page)).mask?.regions[0]).toMatchObject({ kind: 'pass', upperDb: 0.5 });
  await expectMaskPass(page, true);

  // The pole nearest the unit circle, dragged closer to it: a resonant bump in the pass band.
  const d = await readDesign(page);
  const radius = (p: { re: number; im: number }) => Math.hypot(p.re, p.im);
  const index = d.poles.reduce((best, p, i) => (radius(p) > radius(d.poles[best]!) ? i : best), 0);
  const before = await rootAt(page, { kind: 'pole', index });
  const scale = 0.95 / radius(before);
  await dragRoot(page, { kind: 'pole', index }, { re: before.re * scale, im: before.im * scale });
  await expectMaskPass(page, false);
  await expect(mask.getByTestId('mask-verdict-pass')).toHaveAttribute('data-pass', 'false');
  await expect(frequencyPanel(page).getByTestId('mask-worst-pass')).toBeVisible();
  await expect(designerStatus(page).getByTestId('designer-edited')).toBeVisible();
  await saveScreenshot(page, info, 'mask-failing');

  await undoButton(page).click();
  await expectMaskPass(page, true);
  await expect(designerStatus(page).getByTestId('designer-edited')).toHaveCount(0);
});

test('a mask edge dragged on the plot moves in one undo step', async ({ page }) => {
  await chooseKind(page, 'Low-pass');
  await pressDesign(page);
  const stop = () => readDesign(page).then((d) => d.mask!.regions.find((r) => r.kind === 'stop')!);
  const from = (await stop()).fromHz;
  const handle = frequencyPanel(page).locator('[data-testid="mask-handles"] rect[data-edge="fromHz"]').last();
  const box = (await handle.boundingBox())!;
  const x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x - 40, y, { steps: 8 });
  await page.mouse.up();
  const moved = (await stop()).fromHz;
  expect(moved).toBeLessThan(from - 40);
  await undoButton(page).click();
  expect((await stop()).fromHz).toBe(from);
});

test('a design re-runs with a changed parameter (one undo step) and is released for free editing', async ({
  page,
}) => {
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '120');
  await fillField(page, '−3 dB width', '10');
  await pressDesign(page);
  const first = await readDesign(page);

  // Bad input: a message at the field, and nothing changes.
  await fillField(page, 'Centre', '5000');
  await pressDesign(page);
  await expect(designerForm(page).getByRole('alert').first()).toContainText('f0 = 5000 Hz');
  expect((await readDesign(page)).poles).toEqual(first.poles);

  await designerStatus(page).getByRole('button', { name: 'Change parameters' }).click();
  await expect(designerForm(page).getByLabel('Centre', { exact: true })).toHaveValue('120');
  // The form scrolls into view and takes the focus on the next frame; a click aimed before that can miss.
  await expect(designerForm(page).getByLabel('Centre', { exact: true })).toBeFocused();
  await fillField(page, '−3 dB width', '20');
  await designerForm(page).getByRole('button', { name: 'Re-run' }).click();
  const second = await readDesign(page);
  expect(second.designer).toMatchObject({ kind: 'notch', f0: 120, bandwidthHz: 20 });
  const { zpk, fs } = await designZpk(page);
  expect(Math.abs(notchWidthHz(zpk, fs, 120) - 20)).toBeLessThan(0.02);
  await undoButton(page).click();
  expect((await readDesign(page)).poles).toEqual(first.poles);
  await page.getByRole('banner').getByRole('button', { name: 'Redo' }).click();

  // Hand edits after a design are announced; release keeps the roots and forgets the designer.
  const pole = await rootAt(page, { kind: 'pole', index: 0 });
  await dragRoot(page, { kind: 'pole', index: 0 }, { re: pole.re * 0.97, im: pole.im * 0.97 });
  await expect(designerStatus(page).getByTestId('designer-edited')).toBeVisible();
  const edited = await readDesign(page);
  await designerStatus(page).getByRole('button', { name: 'Release' }).click();
  const released = await readDesign(page);
  expect(released.designer).toBeUndefined();
  expect(released.poles).toEqual(edited.poles);
  await expect(designerStatus(page)).toHaveCount(0);
});
