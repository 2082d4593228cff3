import { test, expect } from '@playwright/test';
import { applySystem, openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import {
  axisLabels,
  choose,
  cursorHz,
  frequencyCursor,
  frequencyPanel,
  hoverFrequency,
  readFrequency,
  showDelayPlot,
} from './support/charts.ts';
import { clickRoot } from './support/plane.ts';
import type { Design } from '../src/core/model/design.ts';

/**
 * |H(e^{jω})| of the design at f Hz, evaluated here from the roots (every conjugate and multiplicity) with
 * the DC gain rule applied: k = 1/|H₁(1)| (common practice: H(z) = k·Π(z − zᵢ)/Π(z − pᵢ)). Independent of
 * the page's engine.
 */
function magnitudeAt(d: Design, f: number): number {
  const w = (2 * Math.PI * f) / d.sampleRate;
  const prodAt = (re: number, im: number) => {
    let m = 1;
    for (const [roots, sign] of [
      [d.zeros, 1],
      [d.poles, -1],
    ] as const) {
      for (const r of roots) {
        const mirrors = r.im === 0 ? [r.im] : [r.im, -r.im];
        for (const i of mirrors) m *= Math.hypot(re - r.re, im - i) ** (sign * r.multiplicity);
      }
    }
    return m;
  };
  expect(d.gainRule.kind).toBe('dc');
  return prodAt(Math.cos(w), Math.sin(w)) / prodAt(1, 0);
}

test.describe('frequency view', () => {
  test.beforeEach(async ({ page }) => {
    await openWorkbench(page);
  });

  test('hovering reads exact values: a deep notch at 50 Hz, 0 dB at DC', async ({ page }, testInfo) => {
    const design = await readDesign(page);
    // On the notch's flank the level changes fast with frequency: a grid-point value would be far off.
    await hoverFrequency(page, 47);
    const hz = await cursorHz(page);
    expect(Math.abs(hz - 47)).toBeLessThan(1.5);
    const flank = await readFrequency(page);
    expect(flank.hz).toBeCloseTo(hz, 2);
    const expected = 20 * Math.log10(magnitudeAt(design, hz));
    expect(Math.abs(flank.db - expected)).toBeLessThan(Math.abs(expected) * 1e-3 + 1e-3);
    expect(flank.linear).toBeCloseTo(magnitudeAt(design, hz), 3);

    // At the hum frequency itself the zero sits on the circle: a notch 40 dB deep or more (−∞ exactly at 50 Hz).
    await hoverFrequency(page, 50);
    expect(Math.abs((await cursorHz(page)) - 50)).toBeLessThan(0.6);
    expect((await readFrequency(page)).db).toBeLessThan(-40);
    await saveScreenshot(page, testInfo, 'frequency-hover-50Hz');

    // Keyboard: Home puts the cross-hair at DC, where the DC gain rule gives exactly 0 dB.
    await frequencyCursor(page).focus();
    await page.keyboard.press('Home');
    await expect(frequencyCursor(page)).toHaveAttribute('aria-valuenow', '0');
    const dc = await readFrequency(page);
    expect(Math.abs(dc.db)).toBeLessThan(1e-6);
    expect(dc.linear).toBe(1);
    expect(dc.phaseDeg).toBe(0);
  });

  test('arrow keys move the cross-hair in even steps', async ({ page }) => {
    const cursor = frequencyCursor(page);
    await cursor.focus();
    await page.keyboard.press('Home');
    await page.keyboard.press('ArrowRight');
    const fs = (await readDesign(page)).sampleRate;
    // Poll: the cross-hair's value is rendered after the key event, not during it.
    await expect.poll(() => cursorHz(page)).toBeCloseTo(fs / 2 / 400, 9);
    await page.keyboard.press('Shift+ArrowRight');
    await expect.poll(() => cursorHz(page)).toBeCloseTo((11 * fs) / 2 / 400, 9);
    await page.keyboard.press('End');
    await expect.poll(() => cursorHz(page)).toBe(fs / 2);
  });

  test('settings change the axes: dB/linear, log frequency, wrapped phase, delay in ms', async ({
    page,
  }, testInfo) => {
    const panel = frequencyPanel(page);
    const num = (labels: string[]) => labels.map((t) => Number(t.replace('−', '-')));
    // dB: the notches reach the floor, so the axis runs ~120 dB below 0.
    const db = num(await axisLabels(page, 'magnitude'));
    expect(Math.min(...db)).toBeLessThanOrEqual(-100);
    await choose(panel, 'Magnitude scale', 'linear');
    const linear = num(await axisLabels(page, 'magnitude'));
    expect(Math.min(...linear)).toBe(0);
    expect(Math.max(...linear)).toBeGreaterThanOrEqual(1);
    expect(Math.max(...linear)).toBeLessThan(2);

    expect(await axisLabels(page, 'x')).toContain('500');
    await choose(panel, 'Frequency axis', 'log');
    const logLabels = await axisLabels(page, 'x');
    expect(logLabels).toEqual(expect.arrayContaining(['1', '10', '100']));
    await expect(panel.locator('.pw-chart-axis-title')).toHaveText('Frequency (Hz, log)');

    await choose(panel, 'Phase', 'wrapped');
    expect(await axisLabels(page, 'phase')).toEqual(expect.arrayContaining(['−180', '180']));

    await showDelayPlot(page);
    const samples = num(await axisLabels(page, 'delay'));
    await choose(panel, 'Group delay unit', 'ms');
    const ms = num(await axisLabels(page, 'delay'));
    // At 2 kHz a sample is 0.5 ms: the axis numbers halve (give or take the rounding of its ends).
    expect(ms).not.toEqual(samples);
    expect(Math.max(...ms)).toBeLessThanOrEqual(Math.max(...samples) / 2);
    expect(Math.max(...ms)).toBeGreaterThan(Math.max(...samples) / 5);
    await saveScreenshot(page, testInfo, 'frequency-settings');
  });

  test('hold scale keeps the magnitude axis while the design changes', async ({ page }) => {
    const panel = frequencyPanel(page);
    const hold = panel.getByRole('button', { name: 'Hold scale' });
    const before = await axisLabels(page, 'magnitude');
    await hold.click();
    await expect(hold).toHaveAttribute('aria-pressed', 'true');
    // A plain gain of 100 is a flat 40 dB: far above the held axis.
    await applySystem(page, 'y[n] = 100 x[n]');
    await expect.poll(() => readDesign(page).then((d) => d.zeros.length + d.poles.length)).toBe(0);
    expect(await axisLabels(page, 'magnitude')).toEqual(before);
    // Released, the axis follows the new response.
    await hold.click();
    await expect.poll(() => axisLabels(page, 'magnitude')).toContain('40');
  });

  test('a marker follows the selected root to its frequency', async ({ page }) => {
    const marker = frequencyPanel(page).getByTestId('root-marker');
    await expect(marker).toHaveCount(0);
    await clickRoot(page, { kind: 'pole', index: 1 });
    await expect(marker).toHaveText('Pole 150 Hz');
    await clickRoot(page, { kind: 'zero', index: 2 });
    await expect(marker).toHaveText('Zero 250 Hz');
  });
});
