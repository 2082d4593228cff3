/**
 * Typed coefficients on the command line (issue 10): the verdict is the exact one, roots carry diagnostics,
 * and simulate runs the coefficients as typed. Truth for the named filters comes from mpmath at 60 digits
 * (test/reference/gen_roots_truth.py).
 */
import { describe, it, expect } from 'vitest';
import { runCli } from '../helpers/cli.ts';
import { loadFixture } from '../helpers/fixtures.ts';

interface PolyCase {
  coefficients: number[];
  roots: { re: number[]; im: number[] };
  verdict?: string;
}
const designs = loadFixture<{ name: string; b: PolyCase; a: PolyCase }[]>('roots_truth_designs');
const named = (name: string) => designs.find((d) => d.name === name)!;

describe('analyze on typed coefficients', () => {
  it('calls the pole pair 0.9999993 and 1.0000001 unstable and prints the radius past 1', async () => {
    const r = await runCli(['analyze', '--b', '1', '--a', '1,-1.9999994,0.99999939999993']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/stability: UNSTABLE/);
    expect(r.stdout).toMatch(/radius 1\.0000001 > 1/);
    expect(r.stdout).not.toMatch(/double pole/);
  });

  it('finds the pole pair of the typed 6th-order elliptic low-pass at radius 1.00225 (mpmath)', async () => {
    const d = named('ellip(6, 0.5, 60, 20, fs=48000)');
    expect(d.a.verdict).toBe('unstable'); // mpmath.polyroots at 60 digits of the doubles
    const r = await runCli([
      'analyze',
      '--b',
      d.b.coefficients.join(','),
      '--a',
      d.a.coefficients.join(','),
      '--json',
    ]);
    const out = JSON.parse(r.stdout);
    expect(out.stability.verdict).toBe('unstable');
    expect(out.stability.decidedBy).toBe('coefficients');
    const trueMax = Math.max(...d.a.roots.re.map((x, i) => Math.hypot(x, d.a.roots.im[i]!)));
    expect(trueMax).toBeGreaterThan(1.002); // mpmath: 1.00225
    expect(Math.abs(out.stability.maxPoleRadius - trueMax)).toBeLessThan(1e-9);
    expect(out.diagnostics.source).toBe('typed');
    expect(out.diagnostics.converged).toBe(true);
    expect(out.diagnostics.setBackwardError.poles).toBeLessThan(1e-14);
    for (const p of out.diagnostics.poles) {
      // every computed pole lies within its bound of a true pole (mpmath)
      const dist = Math.min(...d.a.roots.re.map((x, i) => Math.hypot(x - p.re, d.a.roots.im[i]! - p.im)));
      expect(dist).toBeLessThanOrEqual(p.errorBound);
    }
  });

  it('flags roots the coefficients leave uncertain and says which form is safe', async () => {
    // (z + 1)^12 multiplied out and scaled: twelve zeros that the doubles only fix to about ε^(1/12)
    const b = Array.from(
      { length: 13 },
      (_, k) => 0.37 * [1, 12, 66, 220, 495, 792, 924, 792, 495, 220, 66, 12, 1][k]!,
    );
    const r = await runCli(['analyze', '--b', b.join(','), '--a', '1', '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.diagnostics.zeros.some((z: { uncertain: boolean }) => z.uncertain)).toBe(true);
    const text = await runCli(['analyze', '--b', b.join(','), '--a', '1']);
    expect(text.stdout).toMatch(/ill-conditioned/);
    expect(text.stdout).toMatch(/sections or the roots themselves are the safe form/);
  });
});

describe('simulate on typed coefficients', () => {
  it('runs b and a as typed, so the unstable typed elliptic low-pass grows (mpmath: pole radius 1.00225)', async () => {
    const d = named('ellip(6, 0.5, 60, 20, fs=48000)');
    const args = ['--b', d.b.coefficients.join(','), '--a', d.a.coefficients.join(',')];
    const r = await runCli([
      'simulate',
      ...args,
      '--fs',
      '48000',
      '--input',
      'step',
      '--samples',
      '20000',
      '--json',
    ]);
    expect(r.stderr).toMatch(/exactly as typed/);
    const y = JSON.parse(r.stdout).output as number[];
    // a pole pair at radius 1.00225 grows by 1.00225^20000 ≈ 3e19 over the run (mpmath radius)
    expect(Math.abs(y[y.length - 1]!)).toBeGreaterThan(1e10);
  });
});

describe('design: multiplied-out coefficients that are not the design', () => {
  it('warns beside the 12th-order elliptic low-pass at 10 Hz of 1 kHz, whose b, a are unstable', async () => {
    // scipy.signal.ellip(12, 0.5, 60, 10, fs=1000) multiplied out: unstable by mpmath at 60 digits
    expect(named('ellip(12, 0.5, 60, 10, fs=1000)').a.verdict).toBe('unstable');
    const args = [
      'design',
      'lowpass',
      '--family',
      'elliptic',
      '--order',
      '12',
      '--edge',
      '10',
      '--fs',
      '1000',
    ];
    const spec = [...args, '--ripple', '0.5', '--attenuation', '60'];
    const out = JSON.parse((await runCli([...spec, '--json'])).stdout);
    expect(out.stability.verdict).toBe('stable');
    expect(out.coefficientWarning.coefficientVerdict).toBe('unstable');
    expect(out.coefficientWarning.maxResponseErrorDb).toBeGreaterThan(0.1);
    const text = (await runCli(spec)).stdout;
    expect(text).toMatch(/warning: the multiplied-out coefficients b, a are unstable/);
    expect(text).toMatch(/second-order sections/);
  });
  it('says nothing for a 4th-order Butterworth low-pass at 100 Hz of 1 kHz', async () => {
    const r = await runCli([
      'design',
      'lowpass',
      '--family',
      'butterworth',
      '--order',
      '4',
      '--edge',
      '100',
      '--fs',
      '1000',
      '--json',
    ]);
    expect(JSON.parse(r.stdout).coefficientWarning).toBeUndefined();
  });
});
