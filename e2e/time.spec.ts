import { test, expect } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { choose, hoverSample, readTime, timeCursor, timePanel } from './support/charts.ts';
import type { Design } from '../src/core/model/design.ts';

/**
 * h[0] of the design: with as many zeros as poles, H(z) = k·Π(1 − zᵢz⁻¹)/Π(1 − pᵢz⁻¹), so h[0] = k, and the
 * DC gain rule sets k = Π|1 − pᵢ| / Π|1 − zᵢ| (common practice). Computed here from the roots alone.
 */
function firstSample(d: Design): number {
  const at1 = (roots: Design['zeros']) =>
    roots.reduce((m, r) => m * Math.hypot(1 - r.re, r.im) ** (r.multiplicity * (r.im === 0 ? 1 : 2)), 1);
  return at1(d.poles) / at1(d.zeros);
}

test.describe('time view', () => {
  test.beforeEach(async ({ page }) => {
    await openWorkbench(page);
  });

  test('the impulse response reads sample by sample, and y[0] is the gain', async ({ page }, testInfo) => {
    const design = await readDesign(page);
    await timeCursor(page).focus();
    await page.keyboard.press('Home');
    const first = await readTime(page);
    expect(first.n).toBe(0);
    expect(first.x).toBe(1);
    expect(Math.abs(first.y - firstSample(design))).toBeLessThan(1e-5);
    await page.keyboard.press('ArrowRight');
    await expect(timeCursor(page)).toHaveAttribute('aria-valuenow', '1');
    const second = await readTime(page);
    expect(second.x).toBe(0);
    expect(second.t).toBe('500 µs'); // 1 / 2 kHz

    await hoverSample(page, 40);
    const hovered = await readTime(page);
    expect(hovered.n).toBe(40);
    expect(hovered.t).toBe('20 ms');
    await saveScreenshot(page, testInfo, 'time-impulse');
  });

  test('the closed form of the demo lists its three hum modes; noise explains why there is none', async ({
    page,
  }) => {
    const panel = timePanel(page);
    const list = panel.getByRole('list', { name: 'Closed-form terms' });
    await expect(list).toBeVisible();
    const text = await list.innerText();
    for (const hz of ['50 Hz', '150 Hz', '250 Hz']) expect(text).toContain(hz);
    expect(text).toContain('δ[n]');
    // The slowest pole's envelope is drawn and labelled with its time constant (1 − r ≈ 4π/2000 → ~159 samples).
    await expect(panel.getByTestId('time-envelope')).toHaveCount(1);
    await expect(panel.getByTestId('time-envelope-note')).toContainText('159 samples');

    await choose(panel, 'Input signal', 'step');
    await expect(list).toContainText('steady value');

    await choose(panel, 'Input signal', 'noise');
    await expect(list).toHaveCount(0);
    await expect(panel).toContainText('White noise has no closed form');
    await expect(panel.getByTestId('time-envelope')).toHaveCount(0);
  });

  test('a sinusoid input at a typed frequency, and the sample count with its bounds', async ({ page }) => {
    const panel = timePanel(page);
    await choose(panel, 'Input signal', 'sine');
    const hz = panel.getByLabel('at', { exact: true });
    await hz.fill('100');
    await hz.press('Enter');
    await expect(panel.getByRole('list', { name: 'Closed-form terms' })).toContainText('sustained');

    const n = panel.getByLabel('N', { exact: true });
    await n.fill('100000');
    await n.press('Enter');
    await expect(panel.getByRole('alert')).toHaveText('Samples must be 8 … 65536');
    await expect(timeCursor(page)).toHaveAttribute('aria-valuemax', '255');
    await n.fill('1024');
    await n.press('Enter');
    await expect(panel.getByRole('alert')).toHaveCount(0);
    await expect(timeCursor(page)).toHaveAttribute('aria-valuemax', '1023');
    // The sample axis now runs to 1000.
    await expect(panel.locator('.pw-chart-axis-bottom text').filter({ hasText: /^1000$/ })).toHaveCount(1);
  });

  test('stems or a line: stems are one path of vertical strokes', async ({ page }) => {
    const panel = timePanel(page);
    const output = panel.getByTestId('time-output-trace');
    await expect(output).toHaveAttribute('data-style', 'stems');
    const stems = await output.locator('path').first().getAttribute('d');
    expect(stems).toMatch(/^M[\d.]+ [\d.]+V/);
    expect(stems).not.toContain('L');
    await choose(panel, 'Drawing style', 'line');
    await expect(output).toHaveAttribute('data-style', 'line');
    const line = await output.locator('path').first().getAttribute('d');
    expect(line).toContain('L');
    expect(line).not.toContain('V');
  });

  test('the amplitude axis fits the ringing after the first sample, or everything', async ({ page }) => {
    const panel = timePanel(page);
    // By default the large first sample of the notch's impulse response is left off-scale and labelled.
    await expect(panel.getByTestId('time-offscale')).toContainText('y[0] = 0.9831');
    await choose(panel, 'Amplitude axis fits', 'all');
    await expect(panel.getByTestId('time-offscale')).toHaveCount(0);
    const labels = await panel.locator('.pw-chart-axis-left text').allTextContents();
    const values = labels.map((t) => Number(t.replace('−', '-'))).filter((v) => Number.isFinite(v));
    expect(Math.max(...values)).toBeGreaterThanOrEqual(0.98); // y[0] ≈ 0.983 is on the axis now
  });
});
