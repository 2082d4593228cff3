/**
 * Typed coefficients against the exact truth of the rationals the doubles are (mpmath.polyroots at 60 digits,
 * test/reference/gen_roots_truth.py), with numpy.roots' figures on the same doubles beside ours.
 */
import { describe, it, expect } from 'vitest';
import { findRoots } from '../../../src/core/roots/index.ts';
import { setBackwardError } from '../../../src/core/roots/setBackwardError.ts';
import { reseatSharedRoots } from '../../../src/core/roots/reseat.ts';
import { inclusionDisks } from '../../../src/core/roots/inclusion.ts';
import { stabilityOfCoefficients } from '../../../src/core/stability/coefficients.ts';
import type { Verdict } from '../../../src/core/stability/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface PolyCase {
  role: 'a' | 'b';
  coefficients: number[];
  roots: { re: number[]; im: number[] };
  numpyBackwardError: number;
  numpyForwardError: number;
  verdict?: Verdict;
}
type Named = PolyCase & { name: string };
interface DesignCase {
  name: string;
  b: PolyCase;
  a: PolyCase;
}

const designs = loadFixture<DesignCase[]>('roots_truth_designs');
const special = loadFixture<Named[]>('roots_truth_special');
const cases: Named[] = [
  ...designs.flatMap((d) => [
    { ...d.b, name: `${d.name}, b` },
    { ...d.a, name: `${d.name}, a` },
  ]),
  ...special,
];

/** The reported root set listed in full: grouped roots repeated by multiplicity. */
function reportedSet(c: number[]): { re: number[]; im: number[] } {
  const r = findRoots(c);
  const re: number[] = [];
  const im: number[] = [];
  for (const g of r.grouped)
    for (let m = 0; m < g.multiplicity; m++) {
      re.push(g.re);
      im.push(g.im);
    }
  return { re, im };
}

/** A floor for the set backward error where numpy's is 0: one rounding of each root. */
const BACKWARD_FLOOR = 4 * Number.EPSILON;

describe('typed coefficients against mpmath truth', () => {
  it('has at least 100 typed designs and every special family', () => {
    expect(designs.length).toBeGreaterThanOrEqual(100);
    expect(special.length).toBeGreaterThan(50);
  });

  it.each(cases.filter((c) => c.role === 'a').map((c) => [c.name, c] as const))(
    'verdict for %s equals the exact truth',
    (_name, c) => {
      // mpmath.polyroots at 60 digits of the exact rationals (roots at ±1 decided with fractions)
      expect(stabilityOfCoefficients(c.coefficients).verdict).toBe(c.verdict);
    },
  );

  it.each(cases.map((c) => [c.name, c] as const))(
    'root set of %s reproduces the polynomial as well as numpy.roots',
    (_name, c) => {
      const set = reportedSet(c.coefficients);
      const ours = setBackwardError(c.coefficients, set.re, set.im);
      // numpy.roots' set backward error, multiplied out by mpmath at 60 digits
      expect(ours).toBeLessThanOrEqual(Math.max(10 * c.numpyBackwardError, BACKWARD_FLOOR));
      if (c.numpyBackwardError <= 1e-12) expect(ours).toBeLessThanOrEqual(1e-12);
    },
  );

  it.each(cases.map((c) => [c.name, c] as const))('error bounds of %s hold the true roots', (_name, c) => {
    const r = findRoots(c.coefficients);
    const lead = c.coefficients.findIndex((x) => x !== 0);
    const disks = inclusionDisks(Float64Array.from(c.coefficients.slice(lead)), r.re, r.im);
    // Every true root (mpmath) lies in the union of the disks, and each group of touching disks holds as many
    // true roots as it has disks.
    const held = new Map<number, number>();
    for (let t = 0; t < c.roots.re.length; t++) {
      const tr = c.roots.re[t]!;
      const ti = c.roots.im[t]!;
      let home = -1;
      for (let i = 0; i < r.re.length; i++)
        if (Math.hypot(tr - r.re[i]!, ti - r.im[i]!) <= disks.radius[i]! * (1 + 1e-9) + 1e-300) home = i;
      expect(home, `true root ${tr} + ${ti}j outside every disk`).toBeGreaterThanOrEqual(0);
      const id = disks.component[home]!;
      held.set(id, (held.get(id) ?? 0) + 1);
    }
    const size = new Map<number, number>();
    for (const id of disks.component) size.set(id, (size.get(id) ?? 0) + 1);
    expect(held).toEqual(size);
  });
});

describe('clustered denominators of high degree', () => {
  const high = loadFixture<(Named & { numpyBackwardError: number })[]>('roots_truth_high_degree');
  it.each(high.map((c) => [c.name, c] as const))(
    '%s: the reported set multiplies out to the coefficients, no root listed twice',
    (_name, c) => {
      const r = findRoots(c.coefficients);
      const seen = new Set<string>();
      for (let i = 0; i < r.re.length; i++) seen.add(`${r.re[i]}:${r.im[i]}`);
      expect(seen.size).toBe(r.re.length);
      const set = reportedSet(c.coefficients);
      const ours = setBackwardError(c.coefficients, set.re, set.im);
      // numpy.roots' set backward error on the same doubles, multiplied out by mpmath at 60 digits
      expect(ours).toBeLessThanOrEqual(Math.max(10 * c.numpyBackwardError, BACKWARD_FLOOR));
      expect(ours).toBeLessThanOrEqual(1e-12);
    },
  );
});

describe('degrees 768 and 1024', () => {
  const cases = loadFixture<(Named & { numpyBackwardError: number })[]>('roots_truth_degree_768_1024');
  it.each(cases.map((c) => [c.name, c] as const))(
    '%s: the reported set multiplies out to the coefficients as well as numpy.roots',
    (_name, c) => {
      const set = reportedSet(c.coefficients);
      const ours = setBackwardError(c.coefficients, set.re, set.im);
      // numpy.roots' set backward error on the same doubles, multiplied out by mpmath at 400 digits
      expect(ours).toBeLessThanOrEqual(Math.max(10 * c.numpyBackwardError, BACKWARD_FLOOR));
      if (c.numpyBackwardError <= 1e-12) expect(ours).toBeLessThanOrEqual(1e-12);
    },
  );
});

describe('approximations sharing one root', () => {
  it('moves one of two approximations on a simple root to the root left without one', () => {
    // (z − 0.5)(z − 0.625)(z − 0.75) multiplied out by hand: every coefficient exact in binary; two
    // approximations three units apart on 0.625 and none on 0.75
    const c = Float64Array.from([1, -1.875, 1.15625, -0.234375]);
    const zr = Float64Array.from([0.5, 0.625, 0.625 + 3 * 2 ** -53]);
    const zi = new Float64Array(3);
    const before = setBackwardError(c, zr, zi);
    reseatSharedRoots(c, zr, zi);
    const after = setBackwardError(c, zr, zi);
    expect(before).toBeGreaterThan(1e-3);
    expect(after).toBeLessThan(1e-15);
    // the moved member found the third root
    expect(Math.max(...zr)).toBe(0.75);
  });

  it('leaves the approximations of an exact triple root together', () => {
    // (z + 1)^3: the multiplicity step merges these; they are not a shared simple root
    const c = Float64Array.from([1, 3, 3, 1]);
    const zr = Float64Array.from([-1.0000000000065146, -0.9999999999823634, -0.9999999999994407]);
    const zi = new Float64Array(3);
    const copy = Float64Array.from(zr);
    expect(reseatSharedRoots(c, zr, zi)).toBe(0);
    expect(zr).toEqual(copy);
  });
});
