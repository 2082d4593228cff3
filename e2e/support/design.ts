/**
 * Drivers for the Design page and the requirement mask in end-to-end tests: open the page, fill the form,
 * press Design, read the mask's verdict from the page, and compute the response of the current design
 * with the engine (read through the page's read-only probe) to check what the page shows.
 */
import { expect, type Locator, type Page } from '@playwright/test';
import { magnitudeDbAt } from '../../src/core/mask/index.ts';
import type { Zpk } from '../../src/core/types.ts';
import { readDesign } from './app.ts';
import { frequencyPanel } from './charts.ts';
import { hzToOmega } from '../../src/core/units.ts';

/** Shows the side column's Design page. */
export async function openDesignPage(page: Page): Promise<void> {
  await page.getByRole('tab', { name: 'Design' }).click();
  await expect(designerForm(page)).toBeVisible();
}

/** The design form's section. */
export function designerForm(page: Page): Locator {
  return page.getByTestId('designer-form');
}

/** The "designed by" section (present while the design remembers its designer). */
export function designerStatus(page: Page): Locator {
  return page.getByTestId('designer-status');
}

/** The requirement mask section of the Design page. */
export function maskSection(page: Page): Locator {
  return page.getByTestId('mask-section');
}

/** Picks the kind of filter in the form (by its label, e.g. "Notch", "Low-pass"). */
export async function chooseKind(page: Page, label: string): Promise<void> {
  await designerForm(page).getByLabel('Kind').selectOption({ label });
}

/** Types a value into a form field named by its label (e.g. "Centre", "−3 dB width"). */
export async function fillField(page: Page, label: string, value: string): Promise<void> {
  await designerForm(page).getByLabel(label, { exact: true }).fill(value);
}

/** Presses the form's Design (or Re-run) button. */
export async function pressDesign(page: Page): Promise<void> {
  await designerForm(page)
    .getByRole('button', { name: /^(Design|Re-run)$/ })
    .click();
}

/** The verdict chip in the magnitude plot's title row. */
export function maskChip(page: Page): Locator {
  return frequencyPanel(page).getByTestId('mask-chip');
}

/** Waits until the chip says pass (true) or fail (false). */
export async function expectMaskPass(page: Page, pass: boolean): Promise<void> {
  await expect(maskChip(page)).toHaveAttribute('data-pass', String(pass));
  await expect(maskSection(page).getByTestId('mask-overall')).toHaveAttribute('data-pass', String(pass));
}

/** The current design's zeros/poles/gain (the gain as a designer leaves it: a fixed k). */
export async function designZpk(page: Page): Promise<{ zpk: Zpk; fs: number }> {
  const d = await readDesign(page);
  if (d.gainRule.kind !== 'fixed') throw new Error('expected a fixed gain after a design');
  return { zpk: { zeros: d.zeros, poles: d.poles, gain: d.gainRule.value }, fs: d.sampleRate };
}

/** |H| in dB at hz (Hz) for a design at sample rate fs, by the engine. */
export function magnitudeDbHz(zpk: Zpk, fs: number, hz: number): number {
  return magnitudeDbAt(zpk, hzToOmega(hz, fs));
}

/**
 * The −3 dB width (Hz) of a notch at f0: the distance between the frequencies either side of f0 where the
 * response comes back up to −3.0103 dB (half power), each found by bisection.
 */
export function notchWidthHz(zpk: Zpk, fs: number, f0: number): number {
  const halfPowerDb = -10 * Math.log10(2);
  const cross = (lo: number, hi: number, rising: boolean) => {
    for (let i = 0; i < 80; i++) {
      const mid = (lo + hi) / 2;
      const above = magnitudeDbHz(zpk, fs, mid) > halfPowerDb;
      if (above === rising) hi = mid;
      else lo = mid;
    }
    return (lo + hi) / 2;
  };
  const upper = cross(f0, fs / 2, true);
  const lower = cross(0, f0, false);
  return upper - lower;
}
