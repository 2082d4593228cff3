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
