/**
 * `polewright spectrum`: the streamed two-pass command gives the engine's in-memory Welch estimate
 * (checked against scipy.signal.welch in test/core/signal/welch.test.ts) and tone levels (measureLevels),
 * before and after a design; and it says what was wrong with bad input.
 */
import { describe, it, expect } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { makeTones, measureLevels, readWav, welch, writeWav } from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { filterSections } from '../../../src/core/time/filter.ts';
import { zpkToSections, compressRoots } from '../../../src/core/system/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';

const dir = mkdtempSync(join(tmpdir(), 'pw-spectrum-'));
const path = (name: string) => join(dir, name);

const fs = 2000;
const n = 300_001; // several 256 KiB reads, odd
const x = makeTones(n, fs, [
  { frequencyHz: 50.04, amplitude: 0.2, phase: 0.3 },
  { frequencyHz: 150.12, amplitude: 0.03 },
]).map((v) => v + 0.2);
const noise = makeWhiteNoise(n, 3, 0.01);
for (let i = 0; i < n; i++) x[i] = x[i]! + noise[i]!;
writeFileSync(path('rec.wav'), writeWav({ format: 'f32', sampleRate: fs, channels: [x] }).bytes);
const decoded = (() => {
  const r = readWav(writeWav({ format: 'f32', sampleRate: fs, channels: [x] }).bytes);
  if (!r.ok) throw new Error(r.error.message);
  return r.value.channels[0]!;
})();
const NOTCH = ['--b', '0.95,-1.8,0.95', '--a', '1,-1.7,0.9', '--fs', '2000'];
const notchSections = (() => {
  const z = tfToZpk({ b: [0.95, -1.8, 0.95], a: [1, -1.7, 0.9] });
  return zpkToSections({ zeros: compressRoots(z.zeros), poles: compressRoots(z.poles), gain: z.gain });
})();

describe('polewright spectrum', () => {
  it('prints the Welch estimate of the recording, before and after the design, as the engine computes it', async () => {
    const r = await runCli([
      'spectrum',
      path('rec.wav'),
      ...NOTCH,
      '--window',
      'blackman',
      '--segment',
      '4096',
      '--overlap',
      '1024',
      '--scaling',
      'spectrum',
      '--json',
    ]);
    expect(r.code, r.stderr).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.settings).toMatchObject({
      window: 'blackman',
      segment: 4096,
      overlap: 1024,
      scaling: 'spectrum',
    });
    const o = { window: 'blackman' as const, nperseg: 4096, noverlap: 1024, scaling: 'spectrum' as const };
    const before = welch(decoded, fs, o);
    const after = welch(filterSections(notchSections, decoded), fs, o);
    expectClose(doc.before, before.power, { rel: 1e-12, abs: 1e-30 }, 'before');
    expectClose(doc.after, after.power, { rel: 1e-9, abs: 1e-30 }, 'after');
    expect(doc.settings.segments).toBe(before.segments);
  });

  it('CSV in dB with the automatic segment (1 Hz bins here)', async () => {
    const r = await runCli(['spectrum', path('rec.wav')]);
    expect(r.code, r.stderr).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[0]).toBe('frequency_hz,before_psd_db');
    expect(lines).toHaveLength(2048 / 2 + 2);
    const w = welch(decoded, fs, { nperseg: 2048 });
    const [f, p] = lines[51]!.split(',').map(Number);
    expect(f).toBe((50 * 2000) / 2048);
    expectClose(p!, 10 * Math.log10(w.power[50]!), { abs: 1e-9 });
  });

  it('--levels prints the fitted tone levels before and after, the same as measureLevels in memory', async () => {
    const r = await runCli(['spectrum', path('rec.wav'), ...NOTCH, '--levels', '50,150', '--json']);
    expect(r.code, r.stderr).toBe(0);
    const doc = JSON.parse(r.stdout);
    const y = filterSections(notchSections, decoded);
    const mem = measureLevels(decoded, y, fs, [50, 150]);
    expectClose(
      doc.levels.readings.map((row: { fittedHz: number }) => row.fittedHz),
      mem.readings.map((row) => row.fittedHz),
      { abs: 1e-9 },
      'found',
    );
    expectClose(
      doc.levels.readings.map((row: { afterDb: number }) => row.afterDb),
      mem.readings.map((row) => row.afterDb!),
      { abs: 1e-9 },
      'after',
    );
    // the tones' true amplitudes, within 0.1 dB
    expect(Math.abs(doc.levels.readings[0].beforeDb - 20 * Math.log10(0.2))).toBeLessThan(0.1);
    expect(Math.abs(doc.levels.readings[1].beforeDb - 20 * Math.log10(0.03))).toBeLessThan(0.1);
    expect(doc.levels.method).toMatch(/least-squares fit .* over 0 s–150 s \(300001 samples\)/);
    const text = await runCli(['spectrum', path('rec.wav'), ...NOTCH, '--levels', '50,150']);
    expect(text.stdout.split('\n')[0]).toBe(
      'frequency_hz,found_hz,before_db,after_db,change_db,before_floor_db,after_floor_db',
    );
    expect(text.stderr).toMatch(/levels by Hann-weighted least-squares fit/);
  });

  it('reads a CSV recording given its rate, and says what was wrong otherwise', async () => {
    writeFileSync(path('rec.csv'), Array.from(x.subarray(0, 8000)).join('\n') + '\n');
    const ok = await runCli([
      'spectrum',
      path('rec.csv'),
      '--input-rate',
      '2000',
      '--levels',
      '50',
      '--level-search',
      '0',
    ]);
    expect(ok.code, ok.stderr).toBe(0);
    expect(Number(ok.stdout.split('\n')[1]!.split(',')[1])).toBe(50);
    const rate = await runCli(['spectrum', path('rec.csv')]);
    expect(rate.stderr).toMatch(/no time column; give its sample rate with --input-rate/);
    const none = await runCli(['spectrum']);
    expect(none.stderr).toMatch(/Give the recording to analyse/);
    const win = await runCli(['spectrum', path('rec.wav'), '--window', 'triangle']);
    expect(win.stderr).toMatch(/--window must be one of rectangular, hann, hamming, blackman, flattop/);
    const ov = await runCli(['spectrum', path('rec.wav'), '--segment', '512', '--overlap', '512']);
    expect(ov.stderr).toMatch(/--overlap must be below the segment length \(512 samples\)/);
    const ny = await runCli(['spectrum', path('rec.wav'), '--levels', '50,1200']);
    expect(ny.stderr).toMatch(/1200 Hz is above half the sample rate \(1000 Hz\)/);
  });
});
