import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { compileFilter } from '../../helpers/cProgram.ts';
import { buildImplementation, DEFAULT_IMPLEMENTATION, runFixedCodes } from '../../../src/core/fixed/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';

const NOTCH = ['--b', '0.95,-1.8,0.95', '--a', '1,-1.7,0.9', '--fs', '2000'];

describe('polewright export', () => {
  it('writes JSON with the settings the flags name', async () => {
    const r = await runCli([
      'export',
      ...NOTCH,
      '--format',
      'json',
      '--structure',
      'df1',
      '--word',
      '16',
      '--fraction',
      '14',
      '--rounding',
      'truncate',
      '--overflow',
      'wrap',
      '--scaling',
      'none',
      '--feedback',
      'negated',
    ]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.structure).toBe('df1');
    expect(doc.sampleRate).toBe(2000);
    expect(doc.coefficientFormat.q).toBe('Q1.14');
    expect(doc.rounding).toBe('truncate');
    expect(doc.overflow).toBe('wrap');
    expect(doc.feedbackSign).toBe('negated');
    // unscaled, truncated codes by hand: floor(0.95·2^14) = 15564, floor(−1.8·2^14) = −29492 (−29491.2),
    // negated feedback: floor(1.7·2^14) = 27852 (27852.8), floor(−0.9·2^14) = −14746 (−14745.6)
    expect(doc.sections[0].fixed).toEqual([15564, -29492, 15564, 27852, -14746]);
  });

  it('writes CSV and C, to stdout or a file', async () => {
    const csv = await runCli(['export', ...NOTCH, '--format', 'csv']);
    expect(csv.code).toBe(0);
    expect(csv.stdout).toMatch(/^# warnings: 0\n# design hash: [0-9a-f]{16}/);
    const dir = mkdtempSync(join(tmpdir(), 'polewright-export-'));
    const out = join(dir, 'notch.h');
    const c = await runCli(['export', ...NOTCH, '--format', 'c', '--name', 'hum_notch', '--out', out]);
    expect(c.code).toBe(0);
    expect(c.stdout).toBe('');
    expect(c.stderr).toMatch(
      /wrote .*notch\.h: c, 1 section\(s\), df2t, 16-bit Q1\.14 coefficients; stability: ideal filter stable, quantized filter stable/,
    );
    expect(readFileSync(out, 'utf8')).toMatch(/#define HUM_NOTCH_SECTIONS 1/);
  });

  it('exported C, compiled with gcc, reproduces the simulation bit for bit', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polewright-export-'));
    const header = join(dir, 'filter.h');
    const flags = ['--structure', 'df1', '--word', '12', '--rounding', 'nearest', '--overflow', 'saturate'];
    const r = await runCli(['export', ...NOTCH, '--format', 'c', '--out', header, ...flags]);
    expect(r.code).toBe(0);
    const program = compileFilter(
      readFileSync(header, 'utf8'),
      'host',
      `#include <stdio.h>
#include "filter.h"
int main(void) {
  pw_filter_sample x[64] = {0}, y[64];
  pw_filter_fixed_state st;
  int i;
  x[0] = 20000; x[1] = -32768; x[5] = 32767;
  pw_filter_fixed_reset(&st);
  pw_filter_fixed_process(&st, x, y, 64);
  for (i = 0; i < 64; i++) printf("%d\\n", (int)y[i]);
  return 0;
}
`,
    );
    const got = program.run('fixed', []).map(Number);
    const impl = buildImplementation(tfToZpk({ b: [0.95, -1.8, 0.95], a: [1, -1.7, 0.9] }), 2000, {
      ...DEFAULT_IMPLEMENTATION,
      structure: 'df1',
      wordLength: 12,
      accumulatorBits: 40,
    });
    if (!impl.ok) throw new Error(impl.error.message);
    const x = new Int32Array(64);
    x[0] = 20000;
    x[1] = -32768;
    x[5] = 32767;
    expect(got).toEqual(Array.from(runFixedCodes(impl.value, x).output));
  });

  it('rejects bad option values with what is accepted', async () => {
    const bad = await runCli(['export', ...NOTCH, '--structure', 'lattice']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--structure must be one of df1, df2t; got "lattice"/);
    const word = await runCli(['export', ...NOTCH, '--word', '40']);
    expect(word.stderr).toMatch(/--word must be a whole number from 8 to 32/);
    const acc = await runCli(['export', ...NOTCH, '--word', '24', '--accumulator', '32']);
    expect(acc.stderr).toMatch(/--accumulator must be a whole number from 39 to 64/);
    const name = await runCli(['export', ...NOTCH, '--name', 'no-dash']);
    expect(name.stderr).toMatch(/not a C identifier/);
  });

  it('says on stderr when quantization loses stability', async () => {
    const r = await runCli([
      'export',
      '--b',
      '1',
      '--a',
      '1,-1.9,0.9995',
      '--word',
      '8',
      '--scaling',
      'none',
      '--format',
      'csv',
    ]);
    // A marginal quantized filter is a warning: written into the file, and a distinct exit code.
    expect(r.code).toBe(3);
    expect(r.stderr).toMatch(/note: quantization made the filter marginal/);
    expect(r.stdout).toMatch(/^# warnings: [1-9]/);
  });

  // Scenario 4's neighbour: a 4th-order Butterworth low-pass at 20 Hz on a 48 kHz channel in 16 bits. Its
  // numerator codes all round to 0 and its poles land exactly on z = 1 (common practice: a cutoff far below fs
  // needs far more coefficient bits than 16).
  const LOW = ['lowpass', '--fs', '48000', '--family', 'butterworth', '--order', '4', '--edge', '20'];
  const designFile = async (dir: string, argv: string[]) => {
    const file = join(dir, 'design.json');
    expect((await runCli(['design', ...argv, '--out', file])).code).toBe(0);
    return file;
  };

  it('carries its warnings in every format and exits 3 unless --allow-warnings is given', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-export-warn-'));
    const file = await designFile(dir, LOW);
    const c = await runCli(['export', file, '--word', '16', '--out', join(dir, 'f.h')]);
    expect(c.code).toBe(3);
    expect(c.stderr).toMatch(
      /warning: \[numerator-all-zero\] section 0: b0, b1 and b2 all quantize to code 0/,
    );
    expect(c.stderr).toMatch(/warning: \[poles-on-unit-circle\] section \d: .*z = 1/);
    expect(c.stderr).toMatch(/warning: \[quantized-unstable\] whole filter/);
    expect(c.stderr).toMatch(/5 warning\(s\) are written into .*f\.h; exit code 3\..*--allow-warnings/);
    const header = readFileSync(join(dir, 'f.h'), 'utf8');
    expect(header).toMatch(/WARNINGS \(5\)/);
    expect(header).toMatch(/#define PW_FILTER_WARNINGS 5\n/);
    const json = await runCli(['export', file, '--word', '16', '--format', 'json']);
    expect(json.code).toBe(3);
    const doc = JSON.parse(json.stdout);
    expect(doc.warnings.map((w: { key: string }) => w.key).sort()).toEqual([
      'numerator-all-zero',
      'numerator-all-zero',
      'poles-on-unit-circle',
      'poles-on-unit-circle',
      'quantized-unstable',
    ]);
    const csv = await runCli(['export', file, '--word', '16', '--format', 'csv', '--allow-warnings']);
    expect(csv.code).toBe(0);
    expect(csv.stdout).toMatch(/^# warnings: 5\n# warning: \[poles-on-unit-circle\] section 0/);
    expect(csv.stderr).toMatch(/accepted with --allow-warnings/);
    // 32-bit coefficients hold the design: no warnings, exit 0, a zero count in the file.
    const ok = await runCli(['export', file, '--word', '32']);
    expect(ok.code).toBe(0);
    expect(ok.stdout).toMatch(/#define PW_FILTER_WARNINGS 0\n/);
  });

  it('judges the mask of a design file on the quantized filter, saying which filter each verdict is for', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-export-mask-'));
    // Scenario 1: hum notches at 50, 150, 250 Hz on a 2 kHz hopper scale.
    const file = await designFile(dir, [
      'harmonic-notch',
      '--fs',
      '2000',
      '--f0',
      '50',
      '--harmonics',
      '1,3,5',
      '--bandwidth',
      '2',
    ]);
    const r = await runCli(['export', file, '--word', '16', '--format', 'json']);
    expect(r.stderr).toMatch(/mask, ideal filter: PASS/);
    expect(r.stderr).toMatch(/mask, quantized filter \(16-bit Q1\.14\): FAIL by [\d.]+ dB at 49\.9\d* Hz/);
    expect(r.code).toBe(3);
    expect(JSON.parse(r.stdout).warnings[0].key).toBe('mask-fails-quantized');
    // Clamping to Q0.15 leaves the three sections with the same codes.
    const q15 = await runCli(['export', file, '--word', '16', '--fraction', '15', '--format', 'csv']);
    expect(q15.code).toBe(3);
    expect(q15.stdout).toMatch(/# warning: \[identical-clamped-sections\] sections 0, 1, 2: /);
    expect(q15.stdout).toMatch(/# warning: \[coefficients-clamped\] section 0: b1, a1 do not fit Q0\.15/);
  });

  it('is listed in the usage text', async () => {
    const r = await runCli(['--help']);
    expect(r.stdout).toMatch(/polewright export +<design> \[--format c\|json\|csv\]/);
  });
});
