import { test, expect } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { downloadBytes } from './support/files.ts';
import { clickRoot, rootAt, zToScreen } from './support/plane.ts';
import {
  downloadExport,
  exportPreview,
  openTarget,
  quantizedMarks,
  setCoefficientBits,
  type QuantizedMark,
} from './support/target.ts';

/** The JSON export's parts these tests read. */
interface SectionsJson {
  designHash: string;
  sampleRate: number;
  coefficientFormat: { q: string; fractionBits: number };
  feedbackSign: 'denominator' | 'negated';
  outputGain: number;
  sections: { fixed: number[] }[];
}

/**
 * |H(e^{jω})| of the cascade the JSON's integer codes describe: Π (b0 + b1 z⁻¹ + b2 z⁻²)/(1 + a1 z⁻¹ + a2 z⁻²)
 * times the output gain, values = code / 2^F (common practice for Qm.n codes). Independent of the page.
 */
function codesMagnitude(doc: SectionsJson, hz: number): number {
  const w = (2 * Math.PI * hz) / doc.sampleRate;
  const scale = 2 ** -doc.coefficientFormat.fractionBits;
  const sign = doc.feedbackSign === 'negated' ? -1 : 1;
  let mag = Math.abs(doc.outputGain);
  for (const { fixed } of doc.sections) {
    const [b0, b1, b2, c1, c2] = fixed.map((c) => c * scale) as [number, number, number, number, number];
    const poly = (k0: number, k1: number, k2: number) =>
      Math.hypot(k0 + k1 * Math.cos(w) + k2 * Math.cos(2 * w), -k1 * Math.sin(w) - k2 * Math.sin(2 * w));
    mag *= poly(b0, b1, b2) / poly(1, sign * c1, sign * c2);
  }
  return mag;
}

/** Roots of z² + p z + q (one per conjugate pair, im ≥ 0), by the quadratic formula. */
function quadraticRoots(p: number, q: number): { re: number; im: number }[] {
  const disc = p * p - 4 * q;
  if (disc < 0) return [{ re: -p / 2, im: Math.sqrt(-disc) / 2 }];
  return [(-p + Math.sqrt(disc)) / 2, (-p - Math.sqrt(disc)) / 2].map((re) => ({ re, im: 0 }));
}

const radius = (z: { re: number; im: number }) => Math.hypot(z.re, z.im);
const hzOf = (z: { re: number; im: number }, fs: number) => (Math.atan2(z.im, z.re) * fs) / (2 * Math.PI);
const upper = (marks: QuantizedMark[], kind: QuantizedMark['kind']) =>
  marks.filter((m) => m.kind === kind && m.im > 0);

test.describe('taking the hum notches to fixed point', () => {
  test.beforeEach(async ({ page }) => {
    await openWorkbench(page);
    await openTarget(page);
  });

  test('12-bit coefficients: the roots move and the notch gets shallower', async ({ page }, testInfo) => {
    const design = await readDesign(page);
    const fs = design.sampleRate;
    // Nothing is drawn until the design carries target settings.
    await expect(page.getByTestId('quantized-roots')).toHaveCount(0);
    await setCoefficientBits(page, 12);
    expect((await readDesign(page)).implementation?.wordLength).toBe(12);
    await expect(page.getByTestId('q-format')).toHaveText('Q1.10');
    await expect(page.getByTestId('quantized-trace')).toBeVisible();

    // A selected root's frequency label stands above the quantized line's key, never over it: the 50 Hz
    // notch sits at the left of the plot, where the key is written.
    await clickRoot(page, { kind: 'zero', index: 0 });
    const label = await page.getByTestId('root-marker').locator('rect').boundingBox();
    const key = await page.getByTestId('quantized-trace').locator('text').boundingBox();
    expect(label && key).toBeTruthy();
    const apart =
      label!.x + label!.width <= key!.x ||
      key!.x + key!.width <= label!.x ||
      label!.y + label!.height <= key!.y ||
      key!.y + key!.height <= label!.y;
    expect(apart, `label ${JSON.stringify(label)} and key ${JSON.stringify(key)}`).toBe(true);

    const marks = await quantizedMarks(page);
    const poles = upper(marks, 'pole');
    const zeros = upper(marks, 'zero');
    expect(poles).toHaveLength(design.poles.length);
    expect(zeros).toHaveLength(design.zeros.length);

    // Poles: the ideal radius is lost to 10 fraction bits (a2 = r² rounded), still inside the circle.
    const idealPoleRadius = radius(design.poles[0]!);
    for (const p of poles) {
      expect(Math.abs(radius(p) - idealPoleRadius)).toBeGreaterThan(1e-5);
      expect(radius(p)).toBeLessThan(1);
    }
    // Zeros: b0 and b2 of a notch section round to the same code, so its zero pair stays on the circle
    // (radius² = b2/b0 = 1) but slides along it: b1 sets the angle, and the notch is no longer at f0.
    const idealHz = design.zeros.map((z) => hzOf(z, fs)).sort((a, b) => a - b);
    const movedHz = zeros.map((z) => hzOf(z, fs)).sort((a, b) => a - b);
    for (const z of zeros) expect(Math.abs(radius(z) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(movedHz[0]! - idealHz[0]!)).toBeGreaterThan(0.2);

    // The marks drawn are the roots of the exported integer codes.
    const doc = JSON.parse(await exportPreview(page, 'JSON')) as SectionsJson;
    expect(doc.coefficientFormat.q).toBe('Q1.10');
    const scale = 2 ** -doc.coefficientFormat.fractionBits;
    const fromCodes = doc.sections.flatMap(({ fixed }, section) => {
      const [b0, b1, b2, a1, a2] = fixed.map((c) => c * scale) as [number, number, number, number, number];
      return [
        ...quadraticRoots(b1 / b0, b2 / b0).map((z) => ({ kind: 'zero', section, ...z })),
        ...quadraticRoots(a1, a2).map((z) => ({ kind: 'pole', section, ...z })),
      ];
    });
    for (const r of fromCodes) {
      const drawn = marks.find((m) => m.kind === r.kind && m.section === r.section && m.im >= 0);
      expect(drawn, `${r.kind} of section ${r.section}`).toBeDefined();
      expect(Math.hypot(drawn!.re - r.re, drawn!.im - r.im)).toBeLessThan(1e-9);
    }

    // At 50 Hz the ideal zero sits on the circle (−∞ dB); the quantized filter is far shallower there.
    const f0 = idealHz[0]!;
    expect(Math.abs(f0 - 50)).toBeLessThan(1e-9);
    const quantizedDb = 20 * Math.log10(codesMagnitude(doc, f0));
    expect(quantizedDb).toBeGreaterThan(-20);
    // Same check at 16 bits: still shallower than ideal, but much deeper than at 12.
    await setCoefficientBits(page, 16);
    const doc16 = JSON.parse(await exportPreview(page, 'JSON')) as SectionsJson;
    expect(20 * Math.log10(codesMagnitude(doc16, f0))).toBeLessThan(quantizedDb - 10);
    await setCoefficientBits(page, 12);

    await expect(page.getByTestId('verdict-stability')).toContainText('stable');
    await expect(page.getByTestId('limit-cycle')).toContainText(/After the input stops/);
    await saveScreenshot(page, testInfo, 'target-12-bit');

    // The overlay switch hides both layers and brings them back.
    const toggle = page.getByRole('checkbox', { name: /Draw the quantized filter/ });
    await toggle.uncheck();
    await expect(page.getByTestId('quantized-roots')).toHaveCount(0);
    await expect(page.getByTestId('quantized-trace')).toHaveCount(0);
    await toggle.check();
    await expect(page.getByTestId('quantized-roots')).toHaveCount(1);
  });

  test('the shortest word is found and put in force with one click (one undo step)', async ({ page }) => {
    // The demo's mask asks for 40 dB within ±0.02 Hz of each hum line: 12-bit codes slide the notches by
    // about 1 Hz (see above), so the shortest word that still meets the mask is longer than 12 bits.
    await setCoefficientBits(page, 12);
    await page.getByRole('button', { name: 'Find the shortest word' }).click();
    const result = page.getByTestId('word-search');
    await expect(result).toContainText(/(\d+) bits is the shortest word/);
    const bits = Number((await result.textContent())!.match(/(\d+) bits is the shortest/)![1]);
    expect(bits).toBeGreaterThan(12);
    expect(bits).toBeLessThanOrEqual(32);
    await page.getByRole('button', { name: `Use ${bits} bits` }).click();
    expect((await readDesign(page)).implementation?.wordLength).toBe(bits);
    await expect(page.getByRole('button', { name: `Using ${bits} bits` })).toBeDisabled();
    await page.getByRole('button', { name: 'Undo' }).click();
    expect((await readDesign(page)).implementation?.wordLength).toBe(12);
  });

  test('during a root drag the quantized layers step aside, and follow the new root on release', async ({
    page,
  }) => {
    await setCoefficientBits(page, 12);
    await expect(page.getByTestId('quantized-roots')).toHaveCount(1);
    const root = await rootAt(page, { kind: 'pole', index: 0 });
    const from = await zToScreen(page, root);
    const to = { re: 0.9 * Math.cos(0.3), im: 0.9 * Math.sin(0.3) };
    const target = await zToScreen(page, to);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(target.x, target.y, { steps: 8 });
    await expect(page.getByTestId('quantized-roots')).toHaveCount(0);
    await expect(page.getByText('Paused while a root is dragged')).toBeVisible();
    // the plane and the magnitude plot say so too, rather than drawing the quantized filter of before
    await expect(page.getByTestId('quantized-paused')).toContainText('drawn again when you let go');
    await expect(page.getByTestId('quantized-trace-paused')).toContainText('drawn again when you let go');
    await page.mouse.up();
    await expect(page.getByTestId('quantized-roots')).toHaveCount(1);
    await expect(page.getByTestId('quantized-paused')).toHaveCount(0);
    const moved = await rootAt(page, { kind: 'pole', index: 0 });
    expect(Math.hypot(moved.re - to.re, moved.im - to.im)).toBeLessThan(0.02);
    // Some quantized pole sits within a few coefficient steps (2^-10) of where the pole was dropped.
    const poles = upper(await quantizedMarks(page), 'pole');
    const nearest = Math.min(...poles.map((p) => Math.hypot(p.re - moved.re, p.im - moved.im)));
    expect(nearest).toBeLessThan(0.01);
  });

  test('a bad word length is refused with a message and changes nothing', async ({ page }) => {
    const field = page.getByRole('textbox', { name: 'Coefficients' });
    await field.fill('40');
    await field.press('Enter');
    await expect(page.getByRole('alert').filter({ hasText: 'word length 40' })).toContainText('8 to 32');
    expect((await readDesign(page)).implementation).toBeUndefined();
  });

  test('the downloaded C header carries the codes, Q format, sample rate and hash, and compiles', async ({
    page,
  }, testInfo) => {
    await setCoefficientBits(page, 12);
    const doc = JSON.parse(await exportPreview(page, 'JSON')) as SectionsJson;
    const preview = await exportPreview(page, 'C header');
    const download = await downloadExport(page);
    expect(download.suggestedFilename()).toBe('hopper_scale_50_hz_hum_notches.h');
    const text = (await downloadBytes(download)).toString('utf8');
    expect(text).toContain('hopper_scale_50_hz_hum_notches.h - ');
    expect(text).toBe(preview);
    for (const { fixed } of doc.sections) expect(text).toContain(`{ ${fixed.join(', ')} }`);
    expect(text).toContain('Q1.10');
    expect(text).toContain('sample rate: 2000 Hz');
    expect(text).toMatch(/SAMPLE_RATE 2000\.0+\b/);
    expect(doc.designHash).toMatch(/^[0-9a-f]{16}$/);
    expect(text).toContain(`design hash: ${doc.designHash}`);
    expect(text).toContain('transposed direct form II');
    // C99, every warning an error (gcc on this machine).
    const header = testInfo.outputPath(download.suggestedFilename());
    writeFileSync(header, text);
    execFileSync('gcc', ['-std=c99', '-Wall', '-Wextra', '-Werror', '-fsyntax-only', '-x', 'c', header]);
  });
});
