/**
 * The recording run through the fixed-point implementation in force (in the recording worker): the page's
 * codes equal the engine's bit-exact simulation of the same recording, it reports the difference from the
 * ideal filter, re-runs when a setting changes, and downloads as integer WAV and as CSV of input and output
 * codes; the floating-point CSV carries the input beside the output. Round-off noise on the Target page.
 */
import { readFileSync } from 'node:fs';
import { test, expect, type Page } from '@playwright/test';
import { openWorkbench, readDesign, saveScreenshot } from './support/app.ts';
import { humRecording, loadRecording, openSignalPage, showRegion } from './support/signal.ts';
import { openTarget } from './support/target.ts';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  roundoffNoise,
  simulateFixed,
  type ImplementationSettings,
} from '../src/core/fixed/index.ts';
import { readWav } from '../src/core/signal/index.ts';
import { resolveGain } from '../src/core/gainRule.ts';
import type { Design } from '../src/core/model/design.ts';

/** The engine's implementation of the page's design under the settings in force. */
function implementationOf(d: Design, settings: ImplementationSettings) {
  const gain = resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate).gain;
  const r = buildImplementation({ zeros: d.zeros, poles: d.poles, gain }, d.sampleRate, settings);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

async function download(page: Page, name: string): Promise<{ file: string; suggested: string }> {
  const [d] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name }).click()]);
  const file = test.info().outputPath(d.suggestedFilename());
  await d.saveAs(file);
  return { file, suggested: d.suggestedFilename() };
}

test.describe('a recording in fixed point', () => {
  test.beforeEach(async ({ page }) => {
    await openWorkbench(page);
  });

  test('runs in the worker, bit-exact with the engine, and downloads its codes', async ({
    page,
  }, testInfo) => {
    const rec = humRecording({
      sampleRate: 2000,
      seconds: 10,
      humHz: 50,
      humAmplitudes: [0.1, 0, 0.03],
      format: 'i16',
    });
    await openSignalPage(page);
    await loadRecording(page, rec.path);
    await showRegion(page, 'Recording');
    await page.getByLabel('fixed point').check();
    const summary = page.getByTestId('fixed-run-summary');
    await expect(summary).toHaveAttribute('data-state', 'done', { timeout: 30_000 });
    await expect(summary).toContainText('differs from the ideal filter by at most');
    await expect(summary).toContainText('LSB rms');
    await expect(page.getByTestId('signal-fixed-trace')).toHaveCount(1);
    await expect(page.getByTestId('fixed-difference')).toBeVisible();
    await saveScreenshot(page, testInfo, 'recording-fixed');

    const design = await readDesign(page);
    const input = readWav(readFileSync(rec.path));
    if (!input.ok) throw new Error(input.error.message);
    const x = input.value.channels[0]!;
    const impl = implementationOf(design, DEFAULT_IMPLEMENTATION);
    const engine = simulateFixed(impl, x);

    const wav = await download(page, 'Download fixed-point WAV');
    expect(wav.suggested).toBe('hopper-hum-fixed.wav');
    const out = readWav(readFileSync(wav.file));
    if (!out.ok) throw new Error(out.error.message);
    expect(out.value.info.format).toBe('i16');
    expect(out.value.sampleRate).toBe(2000);
    const codes = Array.from(out.value.channels[0]!, (v) => Math.round(v * 32768));
    expect(codes).toEqual(Array.from(engine.output));

    const csv = await download(page, 'Download fixed-point CSV');
    const lines = readFileSync(csv.file, 'utf8').trim().split('\n');
    expect(lines[0]).toBe('time_s,input_code,output_code');
    expect(lines).toHaveLength(20001);
    for (const k of [0, 1, 777, 19999]) {
      const [t, a, b] = lines[k + 1]!.split(',').map(Number);
      expect(t).toBeCloseTo(k / 2000, 12);
      expect(a).toBe(engine.input[k]);
      expect(b).toBe(engine.output[k]);
    }

    const floatCsv = await download(page, 'Download filtered CSV');
    const floatLines = readFileSync(floatCsv.file, 'utf8').trim().split('\n');
    expect(floatLines[0]).toBe('time_s,input,filtered');
    expect(Number(floatLines[101]!.split(',')[1])).toBe(x[100]);

    // A new setting runs the recording again, with the new arithmetic.
    await openTarget(page);
    await page
      .getByRole('radiogroup', { name: 'Structure' })
      .getByRole('radio', { name: 'Direct form I' })
      .click();
    await openSignalPage(page);
    await expect(summary).toHaveAttribute('data-state', 'done', { timeout: 30_000 });
    await expect(summary).toContainText('direct form I');
    const df1 = await download(page, 'Download fixed-point WAV');
    const back = readWav(readFileSync(df1.file));
    if (!back.ok) throw new Error(back.error.message);
    const engineDf1 = simulateFixed(
      implementationOf(design, { ...DEFAULT_IMPLEMENTATION, structure: 'df1' }),
      x,
    );
    expect(Array.from(back.value.channels[0]!, (v) => Math.round(v * 32768))).toEqual(
      Array.from(engineDf1.output),
    );
  });

  test('the Target page predicts the round-off noise and compares arrangements', async ({
    page,
  }, testInfo) => {
    await openTarget(page);
    const summary = page.getByTestId('noise-summary');
    await expect(summary).toContainText('effective bits');
    const design = await readDesign(page);
    const predicted = roundoffNoise(implementationOf(design, DEFAULT_IMPLEMENTATION));
    expect(Number(await summary.getAttribute('data-power-dbfs'))).toBeCloseTo(predicted.powerDbfs, 9);
    await page.getByText('Compare orderings, scalings and structures').click();
    const table = page.getByTestId('arrangements');
    await expect(table.locator('tbody tr')).toHaveCount(16);
    await expect(table.locator('tr.pw-current')).toHaveCount(1);
    await saveScreenshot(page, testInfo, 'target-noise');
    // Put the L1-scaled direct form I arrangement in force: one undo step brings the settings back.
    await table.locator('tr[data-key="ascending-l1-df1"]').getByRole('button', { name: 'Use' }).click();
    await expect(table.locator('tr.pw-current')).toHaveAttribute('data-key', 'ascending-l1-df1');
    await expect(page.locator('#pw-target-scaling')).toHaveValue('l1');
    await page.keyboard.press('Control+z');
    await expect(page.locator('#pw-target-scaling')).toHaveValue('linf');
  });
});
