/**
 * `simulate --fixed` against the exported C: the header written by `export` with the same settings flags,
 * compiled with gcc, run on the same integer input — the command's output codes must equal the C program's
 * sample by sample, and its overflow count the C's event count. Plus the input forms (built-in, CSV codes,
 * WAV), the output files, the JSON report and the messages for bad input.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { compileFilter, requireToolchain } from '../../helpers/cProgram.ts';
import { readCsvSignal, readWav, writeWav } from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { writeSharedFile } from '../../../src/share/designFile.ts';
import { DEFAULT_IMPLEMENTATION } from '../../../src/core/fixed/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';

beforeAll(() => requireToolchain('host'));

const dir = mkdtempSync(join(tmpdir(), 'pw-fixed-'));
const path = (name: string) => join(dir, name);

/** A 50 Hz notch at 2 kHz and a resonator that overflows unscaled. */
const NOTCH = ['--b', '0.95,-1.8,0.95', '--a', '1,-1.7,0.9', '--fs', '2000'];
const HOT = ['--b', '1.5,3,1.5', '--a', '1,-1.4,0.85', '--fs', '1000'];

/** Integer codes: noise near full scale, steps at the limits (for overflows), some quiet samples. */
function codes(n: number, bits: number): Int32Array {
  const full = 2 ** (bits - 1);
  const noise = makeWhiteNoise(n, 5, 0.5);
  return Int32Array.from(noise, (v, i) =>
    i % 400 < 40
      ? i % 800 < 400
        ? full - 1
        : -full
      : Math.max(-full, Math.min(full - 1, Math.round(v * full))),
  );
}

async function exported(design: string[], flags: string[]): Promise<ReturnType<typeof compileFilter>> {
  const header = path(`f${Math.random().toString(36).slice(2)}.h`);
  const r = await runCli(['export', ...design, '--format', 'c', '--out', header, ...flags]);
  expect(r.code, r.stderr).toBe(0);
  return compileFilter(readFileSync(header, 'utf8'));
}

async function fixedJson(argv: string[]) {
  const r = await runCli(['simulate', ...argv, '--fixed', '--json']);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout);
}

describe('simulate --fixed equals the exported C, sample by sample', () => {
  const settings: [string[], string[]][] = [
    [NOTCH, ['--structure', 'df1', '--word', '12', '--rounding', 'nearest', '--overflow', 'saturate']],
    [NOTCH, ['--structure', 'df2t', '--word', '16', '--rounding', 'truncate', '--overflow', 'wrap']],
    [HOT, ['--scaling', 'none', '--structure', 'df2t', '--overflow', 'saturate']],
    [HOT, ['--scaling', 'none', '--structure', 'df1', '--overflow', 'wrap', '--feedback', 'negated']],
    [
      HOT,
      [
        '--scaling',
        'l2',
        '--data-word',
        '24',
        '--word',
        '20',
        '--accumulator',
        '48',
        '--ordering',
        'descending',
      ],
    ],
  ];
  for (const [design, flags] of settings) {
    it(`${design[1]}/${design[3]} ${flags.join(' ')}: CSV codes in`, async () => {
      const program = await exported(design, flags);
      const bits = flags.includes('24') ? 24 : 16;
      const x = codes(3000, bits);
      writeFileSync(path('codes.csv'), Array.from(x).join('\n') + '\n');
      const doc = await fixedJson([
        ...design,
        ...flags,
        '--input',
        path('codes.csv'),
        '--input-units',
        'codes',
      ]);
      expect(doc.inputCodes).toEqual(Array.from(x));
      const c = program.run('fixed', x);
      expect(c.pop()).toBe(`events ${doc.overflows.count}`);
      expect(doc.output).toEqual(c.map(Number));
      if (design === HOT && flags.includes('none')) expect(doc.overflows.count).toBeGreaterThan(0);
    });
  }

  it('a built-in input (noise) gives the codes the C program turns into the same output', async () => {
    const flags = ['--structure', 'df1', '--rounding', 'truncate'];
    const program = await exported(NOTCH, flags);
    const doc = await fixedJson([
      ...NOTCH,
      ...flags,
      '--input',
      'noise:9',
      '--samples',
      '2000',
      '--amplitude',
      '0.3',
    ]);
    expect(doc.inputCodes).toHaveLength(2000);
    const c = program.run('fixed', doc.inputCodes);
    c.pop();
    expect(doc.output).toEqual(c.map(Number));
  });

  it('a 16-bit WAV in, a 16-bit WAV of output codes out, equal to the C program on the WAV codes', async () => {
    const program = await exported(NOTCH, []);
    const x = codes(5000, 16);
    writeFileSync(
      path('in16.wav'),
      writeWav({ format: 'i16', sampleRate: 2000, channels: [], integers: [x] }).bytes,
    );
    const r = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--input',
      path('in16.wav'),
      '--output',
      path('out16.wav'),
    ]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/wrote .*out16\.wav: 5000 sample\(s\) of 16-bit codes \(Q0\.15\)/);
    const back = readWav(readFileSync(path('out16.wav')));
    if (!back.ok) throw new Error(back.error.message);
    expect(back.value.info.format).toBe('i16');
    expect(back.value.sampleRate).toBe(2000);
    const c = program.run('fixed', x);
    c.pop();
    expect(Array.from(back.value.channels[0]!, (v) => Math.round(v * 32768))).toEqual(c.map(Number));
  });

  it('a 20-bit data word goes to a 24-bit WAV with the codes in its top 20 bits', async () => {
    const r = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--data-word',
      '20',
      '--input',
      'sine:50',
      '--samples',
      '100',
      '--output',
      path('out20.wav'),
    ]);
    expect(r.code, r.stderr).toBe(0);
    const doc = await fixedJson([...NOTCH, '--data-word', '20', '--input', 'sine:50', '--samples', '100']);
    const back = readWav(readFileSync(path('out20.wav')));
    if (!back.ok) throw new Error(back.error.message);
    expect(back.value.info.format).toBe('i24');
    expect(Array.from(back.value.channels[0]!, (v) => v * 2 ** 19)).toEqual(doc.output);
  });

  it('CSV output carries time, input and output codes', async () => {
    const r = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--input',
      'step',
      '--samples',
      '50',
      '--output',
      path('out.csv'),
    ]);
    expect(r.code, r.stderr).toBe(0);
    const lines = readFileSync(path('out.csv'), 'utf8').trim().split('\n');
    expect(lines[0]).toBe('time_s,input,output');
    expect(lines).toHaveLength(51);
    const doc = await fixedJson([...NOTCH, '--input', 'step', '--samples', '50']);
    expect(lines.slice(1).map((l) => Number(l.split(',')[2]))).toEqual(doc.output);
    expect(lines[2]).toBe(`0.0005,16384,${doc.output[1]}`);
  });
});

describe('simulate --fixed reports', () => {
  it('a limit cycle after the input: y = round(−0.875·y[n−1]) settles into ±3 LSB, period 2', async () => {
    // By hand, rounding half up from 8 LSB: 8, −7, 6, −5, 4, −3, 3, −3, ... (see the core's hand-worked test)
    const doc = await fixedJson([
      '--b',
      '1',
      '--a',
      '1,0.875',
      '--scaling',
      'none',
      '--input',
      'impulse',
      '--samples',
      '4',
      '--amplitude',
      String(8 / 32768),
    ]);
    expect(doc.output).toEqual([8, -7, 6, -5]);
    expect(doc.limitCycle).toMatchObject({ verdict: 'cycle', period: 2, amplitudeCodes: 3 });
    const r = await runCli([
      'simulate',
      '--b',
      '1',
      '--a',
      '1,0.875',
      '--scaling',
      'none',
      '--fixed',
      '--amplitude',
      String(8 / 32768),
    ]);
    expect(r.stderr).toMatch(/limit cycle of period 2 sample\(s\), amplitude 3 LSB/);
  });

  it('overflow events, the difference from the ideal filter and the round-off noise', async () => {
    const doc = await fixedJson([
      ...HOT,
      '--scaling',
      'none',
      '--input',
      'sine:100',
      '--samples',
      '400',
      '--amplitude',
      '0.9',
    ]);
    expect(doc.overflows.count).toBeGreaterThan(0);
    expect(doc.overflows.listed[0]).toMatchObject({ section: 0 });
    // saturation makes the output far from the ideal filter, by many LSBs
    expect(doc.ideal.maxLsb).toBeGreaterThan(1000);
    const quiet = await fixedJson([
      ...NOTCH,
      '--input',
      'noise:2',
      '--samples',
      '20000',
      '--amplitude',
      '0.2',
    ]);
    expect(quiet.overflows.count).toBe(0);
    expect(Math.abs(quiet.roundoff.measured.powerDbfs - quiet.roundoff.predicted.powerDbfs)).toBeLessThan(1);
    expect(quiet.ideal.samples).toBe(20000);
    expect(quiet.settings.structure).toBe('df2t');
  });

  it("uses a design file's own implementation settings, flags overriding them", async () => {
    const zpk = tfToZpk({ b: [0.95, -1.8, 0.95], a: [1, -1.7, 0.9] });
    const file = path('with-settings.json');
    writeFileSync(
      file,
      writeSharedFile({
        design: {
          sampleRate: 2000,
          zeros: zpk.zeros,
          poles: zpk.poles,
          gainRule: { kind: 'fixed', value: zpk.gain },
          name: 'notch',
          note: '',
          implementation: {
            ...DEFAULT_IMPLEMENTATION,
            structure: 'df1',
            wordLength: 12,
            rounding: 'truncate',
          },
        },
        view: {},
      }),
    );
    const own = await fixedJson([file]);
    expect(own.settings).toMatchObject({ structure: 'df1', wordLength: 12, rounding: 'truncate' });
    const over = await fixedJson([file, '--structure', 'df2t']);
    expect(over.settings).toMatchObject({ structure: 'df2t', wordLength: 12 });
    const c = await runCli(['export', file, '--format', 'json']);
    expect(JSON.parse(c.stdout).structure).toBe('df1');
  });
});

describe('simulate --fixed input errors', () => {
  it('names the sample and the range for bad codes', async () => {
    writeFileSync(path('bad.csv'), '1\n2\n40000\n');
    const r = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--input',
      path('bad.csv'),
      '--input-units',
      'codes',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/sample 3 is 40000, outside the 16-bit data word\. .* from -32768 to 32767/);
    writeFileSync(path('frac.csv'), '1\n0.5\n');
    const f = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--input',
      path('frac.csv'),
      '--input-units',
      'codes',
    ]);
    expect(f.stderr).toMatch(/sample 2 is 0\.5, not a whole number/);
  });

  it('refuses codes from a WAV, fixed-only flags without --fixed, and --output-format with --fixed', async () => {
    writeFileSync(
      path('w.wav'),
      writeWav({ format: 'i16', sampleRate: 2000, channels: [new Float64Array(4)] }).bytes,
    );
    const w = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--input',
      path('w.wav'),
      '--input-units',
      'codes',
    ]);
    expect(w.stderr).toMatch(/--input-units codes applies to CSV input/);
    const nf = await runCli(['simulate', ...NOTCH, '--word', '12']);
    expect(nf.stderr).toMatch(/--word applies to a fixed-point run; add --fixed/);
    const of = await runCli([
      'simulate',
      ...NOTCH,
      '--fixed',
      '--output',
      path('x.wav'),
      '--output-format',
      'f32',
    ]);
    expect(of.stderr).toMatch(/--output-format does not apply with --fixed/);
  });

  it('reads a CSV of values with full scale ±1 by default, the same codes as the built-in sine', async () => {
    const doc = await fixedJson([...NOTCH, '--input', 'sine:50', '--samples', '40']);
    const values = doc.inputCodes.map((c: number) => c / 32768);
    writeFileSync(path('vals.csv'), values.join('\n') + '\n');
    const again = await fixedJson([...NOTCH, '--input', path('vals.csv')]);
    expect(again.inputCodes).toEqual(doc.inputCodes);
    expect(again.output).toEqual(doc.output);
    const parsed = readCsvSignal(readFileSync(path('vals.csv'), 'utf8'), { sampleRate: 2000 });
    expect(parsed.status).not.toBe('error');
  });
});
