import { readFileSync, writeFileSync } from 'node:fs';
import { test, expect } from '@playwright/test';
import { openWorkbench, readDesign, applySystem, saveScreenshot } from './support/app.ts';
import { zToScreen } from './support/plane.ts';
import {
  humRecording,
  levelChange,
  loadRecording,
  openSignalPage,
  recordingPanel,
  showRegion,
} from './support/signal.ts';
import { evalZpkAt } from '../src/core/response/index.ts';
import { resolveGain } from '../src/core/gainRule.ts';
import { zpkToSections } from '../src/core/system/index.ts';
import { createSectionFilter, readWav, runSectionFilter } from '../src/core/signal/index.ts';
import type { Design } from '../src/core/model/design.ts';
import type { Zpk } from '../src/core/types.ts';

function zpkOf(d: Design): Zpk {
  return {
    zeros: d.zeros,
    poles: d.poles,
    gain: resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate).gain,
  };
}

/** 20·log10|H(e^{iω})| at f Hz, from the design's roots by the engine's point evaluation. */
function gainDb(d: Design, hz: number): number {
  const w = (2 * Math.PI * hz) / d.sampleRate;
  const h = evalZpkAt(zpkOf(d), Math.cos(w), Math.sin(w));
  return 20 * Math.log10(Math.hypot(h.re, h.im));
}

test.describe('recordings', () => {
  test.beforeEach(async ({ page }) => {
    await openWorkbench(page);
  });

  test('a notch takes the hum down by |H| at its frequencies; the filtered WAV downloads', async ({
    page,
  }, testInfo) => {
    // A notch at 50 Hz (9° at 2 kHz) whose zeros sit just inside the circle, so its depth is finite.
    await applySystem(page, 'zeros: 0.999∠9°; poles: 0.95∠9°; gain: 1');
    const design = await readDesign(page);
    expect(design.sampleRate).toBe(2000);
    const rec = humRecording({
      sampleRate: 2000,
      seconds: 10,
      humHz: 50,
      humAmplitudes: [0.1, 0, 0.03],
      format: 'i16',
    });

    await openSignalPage(page);
    await loadRecording(page, rec.path);
    await expect(recordingPanel(page).getByTestId('signal-info')).toContainText(
      '2 kHz · 10 s · 20,000 samples',
    );
    await expect(recordingPanel(page).getByTestId('signal-output-trace')).toHaveCount(1);

    await showRegion(page, 'Spectrum');
    const typed = page.getByTestId('level-readout').getByRole('textbox');
    await typed.fill('50, 150');
    await typed.press('Enter');
    // A steady tone leaves the filter scaled by |H| at its frequency; the levels are fitted at the tone itself.
    const at50 = await levelChange(page, 50);
    const at150 = await levelChange(page, 150);
    expect(Math.abs(at50 - gainDb(design, 50))).toBeLessThan(0.1);
    expect(Math.abs(at150 - gainDb(design, 150))).toBeLessThan(0.1);
    await expect(page.getByTestId('level-method')).toContainText(
      'least-squares fit of sinusoids (jointly, with a constant) over 0 s–10 s (20000 samples)',
    );
    expect(at50).toBeLessThan(-30);
    await saveScreenshot(page, testInfo, 'signal-spectrum');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download filtered WAV' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('hopper-hum-filtered.wav');
    const file = testInfo.outputPath('filtered.wav');
    await download.saveAs(file);
    const bytes = new Uint8Array(readFileSync(file));
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const tag = (p: number) => String.fromCharCode(...bytes.subarray(p, p + 4));
    expect([tag(0), tag(8), tag(12), tag(36)]).toEqual(['RIFF', 'WAVE', 'fmt ', 'data']);
    expect(view.getUint16(20, true)).toBe(1); // integer PCM, as the input
    expect(view.getUint16(22, true)).toBe(1);
    expect(view.getUint32(24, true)).toBe(2000);
    expect(view.getUint16(34, true)).toBe(16);
    expect(view.getUint32(40, true)).toBe(20000 * 2);
    expect(bytes.length).toBe(44 + 40000);
    // The samples are the engine's cascade on the input as stored, to within one 16-bit step.
    const input = readWav(readFileSync(rec.path));
    const out = readWav(bytes);
    if (!input.ok || !out.ok) throw new Error('WAV not readable');
    const y = runSectionFilter(createSectionFilter(zpkToSections(zpkOf(design))), input.value.channels[0]!);
    const got = out.value.channels[0]!;
    let worst = 0;
    for (let k = 0; k < y.length; k++) worst = Math.max(worst, Math.abs(got[k]! - y[k]!));
    expect(worst).toBeLessThanOrEqual(1 / 32768);
  });

  test('broken and unsupported files get a message that says what is accepted', async ({ page }) => {
    await openSignalPage(page);
    const dir = test.info().outputPath('');
    writeFileSync(`${dir}/notes.wav`, 'hello, not audio at all');
    await page.getByTestId('recording-file-input').first().setInputFiles(`${dir}/notes.wav`);
    const alert = page.getByRole('alert').filter({ hasText: 'could not be read' });
    await expect(alert).toContainText('Not a WAV file');
    await expect(alert).toContainText('Accepted:');
    writeFileSync(`${dir}/song.mp3`, new Uint8Array([0xff, 0xfb, 0x90, 0x00, 0, 0, 0, 0]));
    await page.getByTestId('recording-file-input').first().setInputFiles(`${dir}/song.mp3`);
    await expect(alert).toContainText('convert it to WAV');
  });

  test('10 s at 48 kHz: take the file rate (one undo step); a root drag shows a live preview, release filters it all', async ({
    page,
  }, testInfo) => {
    const rec = humRecording({
      sampleRate: 48000,
      seconds: 10,
      humHz: 60,
      humAmplitudes: [0.1, 0.02, 0.03],
      format: 'f32',
    });
    await openSignalPage(page);
    await loadRecording(page, rec.path);
    const note = page.getByTestId('rate-mismatch').first();
    await expect(note).toContainText('Recorded at 48 kHz');
    const before = await readDesign(page);
    await note.getByRole('button').click();
    const adopted = await readDesign(page);
    expect(adopted.sampleRate).toBe(48000);
    // The hand-placed hum notches keep their hertz at the recording's rate.
    const hz = (d: typeof before) =>
      d.zeros.map((z) => (Math.atan2(z.im, z.re) / (2 * Math.PI)) * d.sampleRate).sort((a, b) => a - b);
    hz(adopted).forEach((f, i) => expect(f).toBeCloseTo(hz(before)[i]!, 9));
    await page.keyboard.press('Control+z');
    await expect.poll(async () => (await readDesign(page)).sampleRate).toBe(before.sampleRate);
    await page.getByTestId('rate-mismatch').first().getByRole('button').click();
    await expect(page.getByTestId('rate-mismatch')).toHaveCount(0);

    await showRegion(page, 'Recording');
    const panel = recordingPanel(page);
    await expect(panel.getByTestId('signal-output-trace')).toHaveAttribute('data-state', 'current');
    const pole = (await readDesign(page)).poles[0]!;
    const from = await zToScreen(page, pole);
    const to = await zToScreen(page, { re: pole.re * 0.97, im: pole.im * 0.97 });
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(to.x, to.y, { steps: 10 });
    // Held: the visible stretch (all 10 s) is filtered live, and the page says so.
    await expect(panel.getByTestId('signal-preview-trace')).toHaveCount(1);
    await expect(panel.getByTestId('recording-preview-note')).toContainText('filtered live');
    await saveScreenshot(page, testInfo, 'signal-48k-dragging');
    await page.mouse.up();
    await expect(panel.getByTestId('signal-preview-trace')).toHaveCount(0);
    await expect(panel.getByTestId('signal-output-trace')).toHaveAttribute('data-state', 'current');
    await saveScreenshot(page, testInfo, 'signal-48k');
  });

  /**
   * The longest main-thread task allowed while a 10-minute recording is dragged or its spectra computed. Measured
   * alone the longest is well under 250 ms; 319 ms was seen with the whole suite and a benchmark running on the
   * 2-core machine. The main-thread work these tests guard against took 1.6 s per move and 12.6 s per switch.
   */
  const LONG_TASK_BOUND_MS = 1000;

  test('10 minutes at 48 kHz: a root drag stays responsive and the whole recording follows on release', async ({
    page,
  }, testInfo) => {
    test.setTimeout(240_000);
    const rec = humRecording({
      sampleRate: 48000,
      seconds: 600,
      humHz: 50,
      humAmplitudes: [0.1, 0.02, 0.03],
      format: 'i16',
    });
    await applySystem(page, 'zeros: 1∠0.375°, 1∠1.125°; poles: 0.999∠0.375°, 0.999∠1.125°; gain: 1');
    await openSignalPage(page);
    await page.getByTestId('recording-file-input').first().setInputFiles(rec.path);
    const panel = recordingPanel(page);
    await expect(panel.getByTestId('signal-info')).toContainText('28,800,000 samples', { timeout: 120_000 });
    await expect(panel.getByTestId('signal-output-trace')).toHaveAttribute('data-state', 'current', {
      timeout: 60_000,
    });
    // Main-thread tasks of 50 ms or more while the root is dragged (the browser's long-task timing).
    await page.evaluate(() => {
      const w = window as unknown as { __longTasks: number[] };
      w.__longTasks = [];
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) w.__longTasks.push(e.duration);
      }).observe({ type: 'longtask' });
    });
    const pole = (await readDesign(page)).poles[0]!;
    const from = await zToScreen(page, pole);
    const target = { re: 0.99 * Math.cos(0.02), im: 0.99 * Math.sin(0.02) };
    const to = await zToScreen(page, target);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(to.x, to.y, { steps: 40 });
    await expect(panel.getByTestId('signal-preview-trace')).toHaveCount(1);
    await expect(panel.getByTestId('recording-preview-note')).toContainText('While you drag');
    const longTasks = await page.evaluate(() => (window as unknown as { __longTasks: number[] }).__longTasks);
    await page.mouse.up();
    // Every move reached the design: the pole sits where the pointer let go.
    const moved = (await readDesign(page)).poles[0]!;
    expect(Math.hypot(moved.re - target.re, moved.im - target.im)).toBeLessThan(0.01);
    // Refiltering 28.8 M samples per move took 1.6 s on the main thread; now no task comes near that.
    testInfo.annotations.push({
      type: 'long tasks during the drag (ms)',
      description: longTasks.join(', ') || 'none',
    });
    // Not a frame budget (that is measured in npm run bench -- drag): a bound that holds on a loaded shared
    // machine and still tells the two apart, since the old refilter alone took 1.6 s per move.
    expect(Math.max(0, ...longTasks)).toBeLessThan(LONG_TASK_BOUND_MS);
    await expect(panel.getByTestId('signal-output-trace')).toHaveAttribute('data-state', 'current', {
      timeout: 60_000,
    });
    await saveScreenshot(page, testInfo, 'signal-10min');

    // Switching to the spectra of all 28.8 M samples (Welch in the worker) keeps the page live: before, the
    // switch froze it for 12.6 s on the main thread.
    await page.evaluate(() => ((window as unknown as { __longTasks: number[] }).__longTasks.length = 0));
    await showRegion(page, 'Spectrum');
    // The view is there at once and says how far the recording's spectrum has got, then draws it.
    const progress = page.getByTestId('spectrum-input-progress');
    await expect(progress).toBeVisible();
    await expect(
      progress.getByRole('progressbar', { name: "Computing the recording's spectrum" }),
    ).toBeVisible();
    await expect(page.getByTestId('spectrum-before')).toHaveCount(1, { timeout: 120_000 });
    await expect(progress).toHaveCount(0);
    await expect(page.locator('[data-testid="spectrum-after"][data-measured="true"]')).toHaveCount(1, {
      timeout: 120_000,
    });
    const spectrumTasks = await page.evaluate(
      () => (window as unknown as { __longTasks: number[] }).__longTasks,
    );
    testInfo.annotations.push({
      type: 'long tasks while the spectra are computed (ms)',
      description: spectrumTasks.join(', ') || 'none',
    });
    expect(Math.max(0, ...spectrumTasks)).toBeLessThan(LONG_TASK_BOUND_MS);
    await saveScreenshot(page, testInfo, 'signal-10min-spectrum');
  });
});
