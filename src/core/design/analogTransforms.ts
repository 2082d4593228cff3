/**
 * Frequency transformations of an analog low-pass prototype (edge 1 rad/s) applied to its zeros and poles
 * directly: s → s/ω₀ (low-pass), ω₀/s (high-pass), (s² + ω₀²)/(B·s) (band-pass) and its reciprocal
 * (band-stop). Zeros at infinity of the prototype land at 0 or at ±iω₀; gains are carried as logarithms.
 */
import type { Root } from '../types.ts';
import type { Complex } from '../types.ts';
import { cAdd, cDiv, cMul, cScale, cSqrt, cSub, cx, upperHalf } from './complex.ts';
import type { LogGainZpk } from './prototype.ts';
import { countRoots, logProductAt, root } from './prototype.ts';

const excess = (p: LogGainZpk) => countRoots(p.poles) - countRoots(p.zeros);

function mapRoots(roots: readonly Root[], f: (r: Complex) => Complex): Root[] {
  return roots.map((r) => {
    const v = upperHalf(f(cx(r.re, r.im)));
    return root(v.re, r.im === 0 ? 0 : v.im, r.multiplicity);
  });
}

/** Low-pass prototype → low-pass with edge ω₀ rad/s. */
export function toLowpass(p: LogGainZpk, w0: number): LogGainZpk {
  const scale = (r: Complex) => cScale(r, w0);
  return {
    zeros: mapRoots(p.zeros, scale),
    poles: mapRoots(p.poles, scale),
    logGain: p.logGain + excess(p) * Math.log(w0),
    sign: p.sign,
  };
}

/** Gain factor Π(−z)/Π(−p) picked up when every root is inverted. */
function inversionGain(p: LogGainZpk): { log: number; sign: number } {
  const z = logProductAt(p.zeros, 0);
  const q = logProductAt(p.poles, 0);
  return { log: z.log - q.log, sign: z.sign * q.sign };
}

/** Low-pass prototype → high-pass with edge ω₀ rad/s; zeros at infinity move to s = 0. */
export function toHighpass(p: LogGainZpk, w0: number): LogGainZpk {
  const invert = (r: Complex) => cDiv(cx(w0), r);
  const n = excess(p);
  const g = inversionGain(p);
  const zeros = mapRoots(p.zeros, invert);
  if (n > 0) zeros.push(root(0, 0, n));
  return { zeros, poles: mapRoots(p.poles, invert), logGain: p.logGain + g.log, sign: p.sign * g.sign };
}

/**
 * Both solutions of s² − 2a·s + ω₀² = 0, i.e. a ± √(a² − ω₀²), the larger one from the formula and the other
 * from the product ω₀², which avoids cancellation when |a| ≫ ω₀.
 */
function splitRoot(r: Root, a: Complex, w0: number): Root[] {
  const d = cSqrt(cSub(cMul(a, a), cx(w0 * w0)));
  const big = a.re * d.re + a.im * d.im >= 0 ? cAdd(a, d) : cSub(a, d);
  const small = cDiv(cx(w0 * w0), big);
  if (r.im === 0 && d.im !== 0) return [root(a.re, Math.abs(d.im), r.multiplicity)];
  return [big, small].map((v) => {
    const u = upperHalf(v);
    return root(u.re, r.im === 0 ? 0 : u.im, r.multiplicity);
  });
}

/** Low-pass prototype → band-pass centred on ω₀ (geometric mean of the edges) with width B rad/s. */
export function toBandpass(p: LogGainZpk, w0: number, bw: number): LogGainZpk {
  const split = (roots: readonly Root[]) =>
    roots.flatMap((r) => splitRoot(r, cScale(cx(r.re, r.im), bw / 2), w0));
  const n = excess(p);
  const zeros = split(p.zeros);
  if (n > 0) zeros.push(root(0, 0, n));
  return { zeros, poles: split(p.poles), logGain: p.logGain + n * Math.log(bw), sign: p.sign };
}

/** Low-pass prototype → band-stop centred on ω₀ with width B rad/s; zeros at infinity move to ±iω₀. */
export function toBandstop(p: LogGainZpk, w0: number, bw: number): LogGainZpk {
  const split = (roots: readonly Root[]) =>
    roots.flatMap((r) => splitRoot(r, cDiv(cx(bw / 2), cx(r.re, r.im)), w0));
  const n = excess(p);
  const g = inversionGain(p);
  const zeros = split(p.zeros);
  if (n > 0) zeros.push(root(0, w0, n));
  return { zeros, poles: split(p.poles), logGain: p.logGain + g.log, sign: p.sign * g.sign };
}
