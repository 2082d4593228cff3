/** `--fs` on a design file keeps the design in hertz, as the page's sample-rate field does, and says so. */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../helpers/cli.ts';
import { expectClose } from '../helpers/expectClose.ts';

const angleHz = (z: { re: number; im: number }, fs: number) => (Math.atan2(z.im, z.re) / (2 * Math.PI)) * fs;

async function notchFile(): Promise<string> {
  const file = join(mkdtempSync(join(tmpdir(), 'pw-rate-')), 'notch.json');
  const r = await runCli([
    'design',
    'notch',
    '--fs',
    '2000',
    '--f0',
    '50',
    '--bandwidth',
    '2',
    '--out',
    file,
  ]);
  expect(r.code).toBe(0);
  return file;
}

describe('--fs on a design file', () => {
  it('designs a designed notch again at the new rate: it stays at 50 Hz', async () => {
    const r = await runCli(['analyze', await notchFile(), '--fs', '4000', '--json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(
      /--fs 4000 Hz: .* was designed again at 4000 Hz from its designer's specification/,
    );
    const d = JSON.parse(r.stdout);
    expect(d.sampleRate).toBe(4000);
    expectClose(angleHz(d.zeros[0], 4000), 50, { rel: 1e-12 }, 'notch at 50 Hz');
  });

  it('moves hand-placed roots so their Hz stay, and refuses a rate below them', async () => {
    const file = await notchFile();
    const doc = JSON.parse(readFileSync(file, 'utf8'));
    delete doc.designer;
    delete doc.mask;
    writeFileSync(file, JSON.stringify(doc));
    const r = await runCli(['analyze', file, '--fs', '4000', '--json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/were moved so their frequencies in Hz stay/);
    expectClose(angleHz(JSON.parse(r.stdout).zeros[0], 4000), 50, { rel: 1e-12 }, 'zero at 50 Hz');
    const low = await runCli(['analyze', file, '--fs', '80']);
    expect(low.code).toBe(2);
    expect(low.stderr).toMatch(/the zero at 50 Hz lies above fs\/2 = 40 Hz/);
  });

  it('designs each part of a composed design again at the new rate: the notch part stays at 50 Hz', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-rate-'));
    const file = join(dir, 'lowpass.json');
    const lp = [
      'design',
      'lowpass',
      '--fs',
      '1000',
      '--family',
      'butterworth',
      '--order',
      '6',
      '--edge',
      '125',
    ];
    const req = ['--passband', '100', '--stopband', '300', '--ripple', '1', '--attenuation', '40'];
    expect((await runCli([...lp, ...req, '--out', file])).code).toBe(0);
    expect((await runCli(['design', 'notch', '--f0', '50', '--bandwidth', '4', '--add-to', file])).code).toBe(
      0,
    );
    const r = await runCli(['analyze', file, '--fs', '4000', '--json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(
      /--fs 4000 Hz: .*Every part was designed again at 4 kHz from the same specification in Hz/,
    );
    expect(r.stderr).toMatch(/mask the parts imply was rebuilt/);
    const d = JSON.parse(r.stdout);
    expect(d.sampleRate).toBe(4000);
    expectClose(Math.abs(angleHz(d.zeros.at(-1), 4000)), 50, { rel: 1e-12 }, 'notch part at 50 Hz');
    // A rate the low-pass cannot be designed at is refused, naming the part.
    const low = await runCli(['analyze', file, '--fs', '200']);
    expect(low.code).toBe(2);
    expect(low.stderr).toMatch(/part 1 cannot make it at 200 Hz/);
  });
});
