/**
 * Typed coefficients on the page (issue 10): the verdict is decided exactly from the coefficients as typed,
 * the time view runs them as typed, ill-conditioned coefficients get a plain warning, and a design whose
 * multiplied-out b, a are not the design says so beside them. Truth for the elliptic filters: mpmath at 60
 * digits (test/reference/gen_roots_truth.py).
 */
import { expect, test } from '@playwright/test';
import { applySystem, openWorkbench, saveScreenshot, stabilityBanner } from './support/app.ts';
import { encodeLink } from '../src/share/link/index.ts';
import { runDesigner } from '../src/core/design/index.ts';
import { emptyDesign } from '../src/core/model/design.ts';
import { loadFixture } from '../test/helpers/fixtures.ts';

/** scipy.signal.ellip(6, 0.5, 60, 20, fs=48000) as typed: its denominator has a pole pair at radius 1.00225 (mpmath). */
const ELLIP6 = loadFixture<{ name: string; b: { coefficients: number[] }; a: { coefficients: number[] } }[]>(
  'roots_truth_designs',
).find((d) => d.name === 'ellip(6, 0.5, 60, 20, fs=48000)')!;

test('typed elliptic coefficients are unstable as typed, and the time view grows', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  await applySystem(
    page,
    `b = [${ELLIP6.b.coefficients.join(', ')}]\na = [${ELLIP6.a.coefficients.join(', ')}]`,
  );
  await expect(stabilityBanner(page)).toContainText('Unstable');
  await expect(stabilityBanner(page)).toContainText('1.0022');
  await expect(page.getByTestId('time-structure')).toHaveText('runs b, a as typed');
  await saveScreenshot(page, testInfo, 'typed-unstable');
});

test('coefficients that leave roots uncertain get a plain warning naming them', async ({
  page,
}, testInfo) => {
  await openWorkbench(page);
  // 0.37·(z + 1)^12 multiplied out: twelve zeros the doubles fix only to about ε^(1/12)
  const binomial = [1, 12, 66, 220, 495, 792, 924, 792, 495, 220, 66, 12, 1];
  await applySystem(page, `b = [${binomial.map((c) => 0.37 * c).join(', ')}]\na = [1, -0.5]`);
  const warning = page.getByTestId('typed-warning');
  await expect(warning).toBeVisible();
  await expect(warning).toContainText('12 roots');
  await expect(warning).toContainText('uncertain by');
  await expect(warning).toContainText('second-order sections');
  await saveScreenshot(page, testInfo, 'typed-warning');
});

test('a design whose multiplied-out b, a are not the design says so beside them', async ({
  page,
}, testInfo) => {
  const r = runDesigner({
    kind: 'iir',
    fs: 1000,
    family: 'elliptic',
    response: 'lowpass',
    order: 12,
    edgesHz: [10],
    rippleDb: 0.5,
    attenuationDb: 60,
  });
  if (!r.ok) throw new Error(r.error.message);
  const design = {
    ...emptyDesign(1000),
    name: 'Elliptic 12 at 10 Hz',
    zeros: r.value.zpk.zeros,
    poles: r.value.zpk.poles,
    gainRule: { kind: 'fixed' as const, value: r.value.zpk.gain },
  };
  await page.goto(`/#${encodeLink({ design, view: {} })}`);
  await page.waitForFunction(() => window.__polewright !== undefined);
  await expect(stabilityBanner(page)).toContainText('Stable');
  const note = page.getByTestId('expanded-warning');
  await expect(note).toBeVisible();
  await expect(note).toContainText('unstable');
  await expect(note).toContainText('sections');
  await note.scrollIntoViewIfNeeded();
  await expect(page.getByTestId('time-structure')).toHaveText('runs sections from the roots');
  await saveScreenshot(page, testInfo, 'expanded-warning');
});
