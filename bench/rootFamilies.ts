/**
 * The polynomial families of the root-finding benchmarks (bench/roots.ts, bench/rootsCompare.ts,
 * bench/rootStages.ts): random, FIR low-pass, clustered Butterworth denominators and repeated roots.
 */
import { polyFromRoots } from '../src/core/poly.ts';
import type { Root } from '../src/core/types.ts';
import { mulberry32 } from '../src/core/random.ts';

export function randomPoly(n: number): Float64Array {
  const u = mulberry32(1000 + n);
  return Float64Array.from(
    { length: n + 1 },
    () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u()),
  );
}

/** Windowed-sinc (Hamming) low-pass with n + 1 taps, cutoff 0.3 of Nyquist, unit gain at DC. */
export function firLowPass(n: number): Float64Array {
  const cutoff = 0.3;
  const h = Float64Array.from({ length: n + 1 }, (_, k) => {
    const t = k - n / 2;
    const sinc = t === 0 ? cutoff : Math.sin(Math.PI * cutoff * t) / (Math.PI * t);
    return sinc * (0.54 - 0.46 * Math.cos((2 * Math.PI * k) / n));
  });
  const sum = h.reduce((s, v) => s + v, 0);
  return h.map((v) => v / sum);
}

/**
 * Denominator of an order-n digital Butterworth low-pass by the bilinear transform, multiplied out (cutoff as a
 * fraction of Nyquist; the table's family uses 0.2).
 */
export function butterworth(n: number, cutoff = 0.2): Float64Array {
  const wc = Math.tan((Math.PI * cutoff) / 2);
  const poles: Root[] = [];
  for (let k = 0; k < n; k++) {
    const th = (Math.PI * (2 * k + n + 1)) / (2 * n);
    const sr = wc * Math.cos(th);
    const si = wc * Math.sin(th);
    if (si < -1e-12) continue;
    // z = (1 + s) / (1 - s)
    const dr = 1 - sr;
    const dd = dr * dr + si * si;
    const zr = ((1 + sr) * dr - si * si) / dd;
    const zi = (si * dr + (1 + sr) * si) / dd;
    poles.push({ re: zr, im: Math.abs(zi) < 1e-12 ? 0 : zi, multiplicity: 1 });
  }
  return polyFromRoots(poles);
}

/** n/4 seeded conjugate pairs, each a double root, moduli 0.3…1.2. */
export function repeatedRoots(n: number): Float64Array {
  const u = mulberry32(5000 + n);
  const roots: Root[] = [];
  for (let k = 0; k < n / 4; k++) {
    const r = 0.3 + 0.9 * u();
    const a = 0.1 + (Math.PI - 0.2) * u();
    roots.push({ re: r * Math.cos(a), im: r * Math.sin(a), multiplicity: 2 });
  }
  return polyFromRoots(roots);
}

export const FAMILIES: [string, (n: number) => Float64Array][] = [
  ['random', randomPoly],
  ['FIR low-pass', firLowPass],
  ['Butterworth', butterworth],
  ['repeated', repeatedRoots],
];

/** The family whose name starts with `prefix` (case-insensitive), all families for an empty prefix. */
export function familiesNamed(prefix: string): [string, (n: number) => Float64Array][] {
  return FAMILIES.filter(([name]) => name.toLowerCase().startsWith(prefix.toLowerCase()));
}
