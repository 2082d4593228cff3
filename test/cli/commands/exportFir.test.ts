/**
 * FIR designs through `polewright export` and `simulate --fixed`: the taps as C, JSON and CSV in the direct
 * or symmetric form; the exported C compiled with gcc gives the codes `simulate --fixed` prints, bit for bit.
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { compileFilter } from '../../helpers/cProgram.ts';

const dir = mkdtempSync(join(tmpdir(), 'polewright-fir-'));
const design = join(dir, 'smooth.json');

async function designed(): Promise<string> {
  const r = await runCli([
    'design',
    'lowpass',
    '--family',
    'equiripple',
    '--order',
    '30',
    '--passband',
    '100',
    '--stopband',
    '160',
    '--ripple',
    '1',
    '--attenuation',
    '40',
    '--fs',
    '1000',
    '--out',
    design,
  ]);
  expect(r.code, r.stderr).toBe(0);
  return design;
}

describe('FIR designs on the command line', () => {
  it('exports taps as JSON: symmetric form by default, codes by hand for a typed FIR', async () => {
    const r = await runCli([
      'export',
      '--b',
      '0.25,0.5,0.25',
      '--a',
      '1',
      '--fs',
      '1000',
      '--format',
      'json',
    ]);
    expect(r.code, r.stderr).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.format).toBe('polewright-fir');
    expect(doc.form).toBe('symmetric');
    expect(doc.symmetry).toBe('even');
    expect(doc.multipliesPerSample).toBe(2);
    expect(doc.preAddBits).toBe(17);
    // Q0.15 holds 0.5 (the most fraction bits that do): 0.25·2^15 = 8192, 0.5·2^15 = 16384
    expect(doc.coefficientFormat.q).toBe('Q0.15');
    expect(doc.fixed).toEqual([8192, 16384, 8192]);
    const direct = await runCli([
      'export',
      '--b',
      '0.25,0.5,0.25',
      '--a',
      '1',
      '--format',
      'csv',
      '--structure',
      'fir-direct',
    ]);
    expect(direct.code, direct.stderr).toBe(0);
    expect(direct.stdout).toContain(
      '# direct form: acc += c[k] x[n-k] for k = 0 .. 2, in that order; 3 multiplies',
    );
    expect(direct.stdout).toContain('tap,value,code\n0,0.25000000000000000,8192\n');
  });

  it('refuses what does not apply, saying why', async () => {
    const lopsided = await runCli(['export', '--b', '1,0.5', '--a', '1', '--structure', 'fir-symmetric']);
    expect(lopsided.code).toBe(2);
    expect(lopsided.stderr).toContain('neither symmetric nor antisymmetric');
    const iir = await runCli(['export', '--b', '1,0.5', '--a', '1,-0.5', '--structure', 'fir-direct']);
    expect(iir.code).toBe(2);
    expect(iir.stderr).toContain('applies to an FIR design');
    const scaling = await runCli(['export', '--b', '0.5,0.5', '--a', '1', '--scaling', 'l2']);
    expect(scaling.code).toBe(2);
    expect(scaling.stderr).toContain('--scaling shapes second-order sections');
    const sections = await runCli([
      'export',
      '--b',
      '0.5,0.5',
      '--a',
      '1',
      '--structure',
      'df2t',
      '--format',
      'json',
    ]);
    expect(sections.code, sections.stderr).toBe(0);
    expect(JSON.parse(sections.stdout).format).toBe('polewright-sections');
  });

  for (const form of ['fir-symmetric', 'fir-direct'] as const) {
    it(`the exported C (${form}) gives the codes simulate --fixed prints, bit for bit`, async () => {
      const file = await designed();
      const settings = ['--structure', form, '--word', '14', '--rounding', 'truncate', '--overflow', 'wrap'];
      const c = await runCli(['export', file, '--format', 'c', ...settings]);
      expect(c.code, c.stderr).toBe(0);
      expect(c.stdout).toContain('#define PW_FILTER_TAPS 31');
      const sim = await runCli([
        'simulate',
        file,
        '--fixed',
        '--input',
        'noise',
        '--amplitude',
        '1.3',
        '--samples',
        '900',
        '--json',
        ...settings,
      ]);
      expect(sim.code, sim.stderr).toBe(0);
      const run = JSON.parse(sim.stdout);
      expect(run.structure).toBe(form);
      expect(run.multipliesPerSample).toBe(form === 'fir-symmetric' ? 16 : 31);
      expect(run.inputClipped).toBeGreaterThan(0);
      const out = compileFilter(c.stdout).run('fixed', run.inputCodes);
      expect(out.pop()).toBe(`events ${run.overflows.count}`);
      expect(out.map(Number)).toEqual(run.output);
    });
  }
});
