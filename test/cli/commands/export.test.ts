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
    expect(csv.stdout).toMatch(/^# design hash: [0-9a-f]{16}/);
    const dir = mkdtempSync(join(tmpdir(), 'polewright-export-'));
    const out = join(dir, 'notch.h');
    const c = await runCli(['export', ...NOTCH, '--format', 'c', '--name', 'hum_notch', '--out', out]);
    expect(c.code).toBe(0);
    expect(c.stdout).toBe('');
    expect(c.stderr).toMatch(
      /wrote .*notch\.h: c, 1 section\(s\), df2t, Q1\.14 coefficients, quantized filter stable/,
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
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/note: quantization made the filter marginal/);
  });

  it('is listed in the usage text', async () => {
    const r = await runCli(['--help']);
    expect(r.stdout).toMatch(/polewright export +<design> \[--format c\|json\|csv\]/);
  });
});
