/**
 * Verdicts that never pass what fails, and a sample rate that keeps designs in hertz, driven as a user would:
 * a pass band with a ceiling, the ideal and the quantized verdicts side by side, exports that carry their
 * warnings, a rate change that re-designs or asks, and a typed system that does not inherit a mask.
 */
import { expect, test, type Page } from '@playwright/test';
import { applySystem, openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { frequencyPanel } from './support/charts.ts';
import {
  chooseKind,
  designerStatus,
  designZpk,
  expectMaskPass,
  fillField,
  magnitudeDbHz,
  maskChip,
  maskSection,
  openDesignPage,
  pressDesign,
} from './support/design.ts';
import { dragRoot, rootAt } from './support/plane.ts';
import { exportPreview, openTarget, setCoefficientBits } from './support/target.ts';
import { rootFrequencyHz } from '../src/core/readouts.ts';

const undo = (page: Page) =>
  page.getByRole('banner').getByRole('button', { name: 'Undo', exact: true }).click();
const quantizedChip = (page: Page) => frequencyPanel(page).getByTestId('mask-chip-quantized');
async function typeRate(page: Page, text: string): Promise<void> {
  const field = page.getByRole('textbox', { name: 'Sample rate' });
  await field.fill(text);
  await field.press('Enter');
}

test.beforeEach(async ({ page }) => {
  await openWorkbench(page);
});

test('a bump above the pass band fails against its ceiling, named on the chip', async ({ page }, info) => {
  await openDesignPage(page);
  await chooseKind(page, 'Low-pass');
  await pressDesign(page);
  await expectMaskPass(page, true);
  // The requirement's pass band has both limits, shown and editable: +ripple above, −ripple below.
  const d = await readDesign(page);
  const pass = d.mask!.regions.find((r) => r.kind === 'pass')!;
  const ripple = d.designer!.kind === 'iir' ? d.designer!.rippleDb! : NaN;
  expect([pass.lowerDb, pass.upperDb]).toEqual([-ripple, ripple]);
  await expect(maskSection(page).getByLabel('Region 1 upper limit (dB)')).toHaveValue(String(ripple));
  await expect(frequencyPanel(page).locator('[data-region="pass"] .pw-mask-limit')).toHaveCount(2);

  // The pole nearest the circle, dragged closer: a resonant bump above the ceiling.
  const radius = (p: { re: number; im: number }) => Math.hypot(p.re, p.im);
  const index = d.poles.reduce((best, p, i) => (radius(p) > radius(d.poles[best]!) ? i : best), 0);
  const before = await rootAt(page, { kind: 'pole', index });
  await dragRoot(
    page,
    { kind: 'pole', index },
    { re: (before.re * 0.97) / radius(before), im: (before.im * 0.97) / radius(before) },
  );
  await expectMaskPass(page, false);
  // The chip names the worst point (its margin and place; its limit in the tooltip), the region row in words.
  await expect(maskChip(page)).toHaveAttribute('title', /upper limit of pass/);
  await expect(
    maskSection(page).getByTestId('mask-row-pass').locator('xpath=following-sibling::tr[1]'),
  ).toContainText('above its upper limit');
  // The worst point named on the chip is where the response really peaks above the ceiling.
  const { zpk, fs } = await designZpk(page);
  const text = (await maskChip(page).textContent())!;
  const at = Number(/at ([\d.]+) Hz/.exec(text)![1]);
  expect(magnitudeDbHz(zpk, fs, at)).toBeGreaterThan(ripple);
  await saveScreenshot(page, info, 'pass-band-ceiling');
});

test('with 16-bit coefficients the quantized verdict shows beside the ideal one, as prominent', async ({
  page,
}, info) => {
  // The demo hum design passes its mask as an ideal filter.
  await expect(maskChip(page)).toHaveAttribute('data-pass', 'true');
  await expect(quantizedChip(page)).toHaveCount(0);
  await openTarget(page);
  // A fixed-point target set on the Target page (16 bits, the default word, chosen explicitly).
  await setCoefficientBits(page, 15);
  await setCoefficientBits(page, 16);
  await expect(maskChip(page)).toContainText('ideal');
  await expect(maskChip(page)).toHaveAttribute('data-pass', 'true');
  await expect(quantizedChip(page)).toContainText('16-bit Q1.14');
  await expect(quantizedChip(page)).toHaveAttribute(
    'title',
    /judged on the quantized \(16-bit Q1\.14\) filter/,
  );
  await expect(quantizedChip(page)).toHaveAttribute('data-pass', 'false');
  await expect(quantizedChip(page)).toContainText('✗ fails');
  // The chips are the same size of type: neither is the footnote of the other.
  const size = (l: ReturnType<typeof maskChip>) => l.evaluate((e) => getComputedStyle(e).fontSize);
  expect(await size(quantizedChip(page))).toBe(await size(maskChip(page)));
  // Both stability verdicts, each saying which filter it judges.
  // The dB/linear choice stays reachable beside the two chips.
  await frequencyPanel(page).getByRole('radio', { name: 'linear' }).first().click({ trial: true });
  await expect(page.getByTestId('stability')).toContainText('Ideal filter');
  await expect(page.getByTestId('stability-quantized')).toContainText('Quantized 16-bit');
  await saveScreenshot(page, info, 'ideal-and-quantized');
});

test('an export of a failing implementation carries its warnings in the file', async ({ page }, info) => {
  await openTarget(page);
  await setCoefficientBits(page, 16);
  await expect(page.getByTestId('export-warnings')).toContainText('mask-fails-quantized');
  const c = await exportPreview(page, 'C header');
  expect(c).toMatch(/WARNINGS \(\d+\)/);
  expect(c).toMatch(/\[mask-fails-quantized\]/);
  expect(c).toMatch(/#define \w+_WARNINGS [1-9]/);
  const json = JSON.parse(await exportPreview(page, 'JSON'));
  expect(json.warnings.map((w: { key: string }) => w.key)).toContain('mask-fails-quantized');
  const csv = await exportPreview(page, 'CSV');
  expect(csv).toMatch(/^# warnings: [1-9]/);
  await saveScreenshot(page, info, 'export-warnings');
  // Q0.15 clamps the three hum sections to identical codes: that is said too.
  await page.getByRole('radiogroup', { name: 'Q format' }).getByRole('radio', { name: 'by hand' }).click();
  await page.getByRole('textbox', { name: 'Fraction bits' }).fill('15');
  await page.getByRole('textbox', { name: 'Fraction bits' }).press('Enter');
  await expect(page.getByTestId('export-warnings')).toContainText('identical-clamped-sections');
});

test('a designed notch stays at 50 Hz when the sample rate doubles; undo restores both', async ({
  page,
}, info) => {
  await openDesignPage(page);
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '50');
  await fillField(page, '−3 dB width', '2');
  await pressDesign(page);
  const before = await readDesign(page);
  expect(before.sampleRate).toBe(2000);
  await typeRate(page, '4');
  await expect(page.getByTestId('rate-question')).toHaveCount(0);
  await expect(page.getByRole('status').filter({ hasText: 'Designed again at 4 kHz' }).first()).toBeVisible();
  const after = await readDesign(page);
  expect(after.sampleRate).toBe(4000);
  expect(rootFrequencyHz(after.zeros[0]!, 4000)).toBeCloseTo(50, 9);
  await expect(designerStatus(page).getByTestId('designer-edited')).toHaveCount(0);
  await expect(designerStatus(page)).toContainText('50 Hz');
  // The form's "Designed: … fs 2000 Hz" from the earlier run no longer describes the design: it goes.
  await expect(page.getByTestId('designer-done')).toHaveCount(0);
  await expectMaskPass(page, true);
  await saveScreenshot(page, info, 'rate-redesigned');
  await undo(page);
  const back = await readDesign(page);
  expect(back.sampleRate).toBe(2000);
  expect(back.zeros).toEqual(before.zeros);
});

test('hand-placed roots: the field asks, keeps Hz by default, or keeps places when chosen', async ({
  page,
}, info) => {
  // The demo's hum notches were placed by hand (no designer).
  const before = await readDesign(page);
  const hz = (d: typeof before) => d.zeros.map((z) => rootFrequencyHz(z, d.sampleRate)).sort((a, b) => a - b);
  await typeRate(page, '4');
  const question = page.getByTestId('rate-question');
  await expect(question).toContainText('placed by hand');
  await saveScreenshot(page, info, 'rate-question');
  await expect(question.getByRole('button', { name: /frequencies in Hz/ })).toBeFocused();
  await page.keyboard.press('Enter');
  const kept = await readDesign(page);
  expect(kept.sampleRate).toBe(4000);
  hz(kept).forEach((f, i) => expect(f).toBeCloseTo(hz(before)[i]!, 9));
  await expect(maskChip(page)).toHaveAttribute('data-pass', 'true');
  await undo(page);
  expect((await readDesign(page)).sampleRate).toBe(2000);

  await typeRate(page, '4');
  await page
    .getByTestId('rate-question')
    .getByRole('button', { name: /places in the plane/ })
    .click();
  const placed = await readDesign(page);
  expect(placed.zeros).toEqual(before.zeros);
  hz(placed).forEach((f, i) => expect(f).toBeCloseTo(2 * hz(before)[i]!, 9));
  await expect(maskChip(page)).toHaveAttribute('data-pass', 'false');
});

test('a composed design with a part moved by hand: both verdicts, the question, and Hz kept part by part', async ({
  page,
}, info) => {
  await openDesignPage(page);
  // A low-pass from the form's starting values, with a 50 Hz notch added as a part of its own.
  await chooseKind(page, 'Low-pass');
  await pressDesign(page);
  await chooseKind(page, 'Notch');
  await fillField(page, 'Centre', '50');
  await fillField(page, '−3 dB width', '4');
  await page.getByRole('button', { name: 'Add to the design' }).click();
  await expect(page.getByTestId('design-parts').getByTestId('design-part')).toHaveCount(2);
  const composed = await readDesign(page);
  expect(composed.sampleRate).toBe(2000);
  // The notch's pole (the last one stored) moved by hand to 52 Hz: its part now reads "edited by hand".
  const index = composed.poles.length - 1;
  const pole = composed.poles[index]!;
  const r = Math.hypot(pole.re, pole.im);
  const theta = (2 * Math.PI * 52) / 2000;
  await dragRoot(page, { kind: 'pole', index }, { re: r * Math.cos(theta), im: r * Math.sin(theta) });
  const moved = await readDesign(page);
  const movedHz = rootFrequencyHz(moved.poles[index]!, 2000);
  expect(movedHz).toBeGreaterThan(50.5);
  // A fixed-point target (16 bits, chosen explicitly): the quantized verdicts beside the ideal ones.
  await openTarget(page);
  await setCoefficientBits(page, 15);
  await setCoefficientBits(page, 16);
  await expect(maskChip(page)).toContainText('ideal');
  await expect(quantizedChip(page)).toContainText('16-bit');
  await expect(page.getByTestId('stability-quantized')).toContainText('Quantized 16-bit');

  await typeRate(page, '4');
  const question = page.getByTestId('rate-question');
  await expect(question).toContainText('moved since their part was designed');
  await expect(question.getByRole('button', { name: /frequencies in Hz/ })).toBeFocused();
  await saveScreenshot(page, info, 'composed-rate-question');
  await page.keyboard.press('Enter');
  await expect(question).toHaveCount(0);
  const after = await readDesign(page);
  expect(after.sampleRate).toBe(4000);
  // The low-pass part is designed again at 4 kHz; the hand-moved pole keeps its Hz; the notch zero its 50 Hz.
  expect(after.parts!.map((p) => p.designer?.fs)).toEqual([4000, 4000]);
  expect(rootFrequencyHz(after.poles[index]!, 4000)).toBeCloseTo(movedHz, 9);
  expect(rootFrequencyHz(after.zeros[after.zeros.length - 1]!, 4000)).toBeCloseTo(50, 9);
  await expect(
    page.getByRole('status').filter({ hasText: 'part 2 (edited by hand) moved in the plane' }).first(),
  ).toBeVisible();
  await expect(maskChip(page)).toBeVisible();
  await expect(quantizedChip(page)).toBeVisible();
  await saveScreenshot(page, info, 'composed-rate-kept');
  await undo(page);
  expect((await readDesign(page)).sampleRate).toBe(2000);
});

test('a typed system does not keep the previous design’s mask; undo brings it back', async ({
  page,
}, info) => {
  await expect(maskChip(page)).toBeVisible();
  await applySystem(page, 'b = [1, -1.6, 0.64]; a = [1]');
  await expect(maskChip(page)).toHaveCount(0);
  await expect(frequencyPanel(page).getByTestId('mask-layer')).toHaveCount(0);
  await expect(page.getByText("The previous design's requirement mask was removed")).toBeVisible();
  expect((await readDesign(page)).mask).toBeUndefined();
  await saveScreenshot(page, info, 'typed-no-mask');
  await undo(page);
  await expect(maskChip(page)).toBeVisible();
  // Chosen explicitly, the mask stays and judges the typed system.
  await page.getByLabel('Keep the mask').check();
  await applySystem(page, 'b = [1, -1.6, 0.64]; a = [1]');
  await expect(maskChip(page)).toHaveAttribute('data-pass', 'false');
  // Failing everywhere, the plot writes only the worst margin: labels cannot overlap.
  await expect(frequencyPanel(page).locator('.pw-mask-worst text')).toHaveCount(1);
});
