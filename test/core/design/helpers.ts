/** Shared checks for designer tests: roots compared as sets, responses at frequencies in Hz. */
import type { Root, Zpk } from '../../../src/core/types.ts';
import { responseZpk } from '../../../src/core/response/index.ts';

/** A complex number as the fixtures encode it. */
export interface C {
  re: number;
  im: number;
}

/** Every root listed, conjugates and multiplicities included. */
export function allRoots(roots: readonly Root[]): C[] {
  const out: C[] = [];
  for (const r of roots)
    for (let m = 0; m < r.multiplicity; m++) {
      out.push({ re: r.re, im: r.im });
      if (r.im !== 0) out.push({ re: r.re, im: -r.im });
    }
  return out;
}

/** Fixture roots, which numpy writes as plain numbers when they are all real. */
export const fixtureRoots = (list: readonly (C | number)[]): C[] =>
  list.map((v) => (typeof v === 'number' ? { re: v, im: 0 } : v));

/**
 * Largest distance |a − e| / max(1, |e|) when each expected root is paired with the nearest unused actual
 * root; Infinity when the counts differ.
 */
export function rootSetDistance(actual: readonly C[], expected: readonly C[]): number {
  if (actual.length !== expected.length) return Infinity;
  const used = new Uint8Array(actual.length);
  let worst = 0;
  for (const e of expected) {
    let best = -1;
    let bestD = Infinity;
    actual.forEach((a, i) => {
      const d = Math.hypot(a.re - e.re, a.im - e.im);
      if (!used[i] && d < bestD) [best, bestD] = [i, d];
    });
    used[best] = 1;
    worst = Math.max(worst, bestD / Math.max(1, Math.hypot(e.re, e.im)));
  }
  return worst;
}

/** Magnitude in dB and phase of zpk at frequencies in Hz. */
export function responseHz(zpk: Zpk, fHz: readonly number[], fs: number) {
  return responseZpk(
    zpk,
    Float64Array.from(fHz, (f) => (2 * Math.PI * f) / fs),
  );
}

/** Magnitude in dB at one frequency in Hz. */
export const dbAt = (zpk: Zpk, f: number, fs: number): number => responseHz(zpk, [f], fs).magnitudeDb[0]!;

/** Smallest |a − b| between two angles, radians. */
export const angleGap = (a: number, b: number): number =>
  Math.abs(Math.atan2(Math.sin(a - b), Math.cos(a - b)));
