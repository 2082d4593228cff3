/**
 * Drivers for the recording views in end-to-end tests: write an invented recording to a temporary WAV
 * file with the engine, open it through the file input, switch the time region, read the level read-out.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, type Locator, type Page } from '@playwright/test';
import { makeHum, makeTones, writeWav, type SampleFormat } from '../../src/core/signal/index.ts';

/** A recording of hum (no drift, so its level is one line) over a slow tone, as the engine writes it. */
export function humRecording(opts: {
  sampleRate: number;
  seconds: number;
  humHz: number;
  humAmplitudes: number[];
  format: SampleFormat;
}): { path: string; samples: Float64Array } {
  const n = Math.round(opts.sampleRate * opts.seconds);
  const hum = makeHum(n, opts.sampleRate, {
    fundamentalHz: opts.humHz,
    harmonicAmplitudes: opts.humAmplitudes,
    driftHz: 0,
  });
  const weight = makeTones(n, opts.sampleRate, [{ frequencyHz: 7, amplitude: 0.2 }]);
  const samples = new Float64Array(n);
  for (let k = 0; k < n; k++) samples[k] = hum[k]! + weight[k]!;
  const { bytes } = writeWav({ format: opts.format, sampleRate: opts.sampleRate, channels: [samples] });
  const dir = mkdtempSync(join(tmpdir(), 'pw-signal-'));
  const path = join(dir, 'hopper-hum.wav');
  writeFileSync(path, bytes);
  return { path, samples };
}

/** The time region while it shows a recording. */
export function recordingPanel(page: Page): Locator {
  return page.locator('section[aria-label="recording"]');
}

/** Opens the side column's Signal page. */
export async function openSignalPage(page: Page): Promise<void> {
  await page.getByRole('tab', { name: 'Signal' }).click();
}

/** Sets the file on the recording file input and waits until the signal is shown. */
export async function loadRecording(page: Page, path: string): Promise<void> {
  await page.getByTestId('recording-file-input').first().setInputFiles(path);
  await expect(recordingPanel(page).getByTestId('signal-info')).toBeVisible();
}

/** Switches the time region ('Test input', 'Recording' or 'Spectrum'). */
export async function showRegion(page: Page, name: 'Test input' | 'Recording' | 'Spectrum'): Promise<void> {
  await page.getByRole('radiogroup', { name: 'Time region shows' }).getByRole('radio', { name }).click();
}

/** The read-out row at `hz`: the change in dB as drawn (full precision from its data attribute). */
export async function levelChange(page: Page, hz: number): Promise<number> {
  const cell = page.getByTestId('level-readout').locator(`tr[data-hz="${hz}"] td[data-change-db]`);
  return Number(await cell.getAttribute('data-change-db'));
}
