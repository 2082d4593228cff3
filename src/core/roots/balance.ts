/**
 * Exact power-of-two scaling of a polynomial's coefficients and of its variable, for coefficients that would
 * otherwise lie outside the normal range of doubles or near its ends. A high-degree polynomial whose trailing coefficients are
 * subnormal (a Butterworth denominator of degree 768 or 1024 with its cutoff at half of Nyquist: its constant
 * term is below 1e-320) loses every bound the iteration and the polish rely on: Horner's rounding is no longer
 * relative where the values are subnormal, and double-double's error-free products underflow, so the Aberth
 * iteration ran into its sweep limit and a multi-precision search was needed after the polish. Substituting
 * z = 2^-m·w multiplies coefficient k (descending) by 2^(m·k), which is exact in binary floating point, so the
 * scaled polynomial has exactly the roots w = 2^m·z, and for such a polynomial there is often an m that moves
 * every coefficient into the normal range.
 */

/** Exponents of the scaled coefficients are kept at most this (room for Horner's sums and derivatives). */
const HIGHEST = 900;

/**
 * ... and at least this: room below for double-double's error terms (about 2^-106 of a product), which
 * underflow for coefficients near 2^-1000 even though those are normal (z^300 − 2^-1000 ran into the sweep
 * limit before this scaling).
 */
const LOWEST = -900;

const TOP = 2 ** HIGHEST;
const BOTTOM = 2 ** LOWEST;

/** The scaling chosen for a polynomial: coefficient k is multiplied by 2^(shift + zoom·k). */
export interface Balance {
  /** Power of two applied to every coefficient. */
  shift: number;
  /** Variable scaling: roots of the scaled polynomial are 2^zoom times the roots of the given one. */
  zoom: number;
}

/**
 * The scaling for the n + 1 descending coefficients p[first..first + n] (p[first] and p[first + n] nonzero):
 * zoom 0 and the shift that brings the leading coefficient to about 1 when every nonzero coefficient so
 * scaled lies in [2^LOWEST, 2^HIGHEST] (the usual case, then nothing else changes), otherwise the integer
 * zoom that narrows the range of exponents most and a shift that places it inside [LOWEST, HIGHEST], if one
 * does; else zoom 0.
 */
export function chooseBalance(p: ArrayLike<number>, first: number, n: number): Balance {
  const shift = -Math.round(Math.log2(Math.abs(p[first]!)));
  const plain = 2 ** shift;
  let inRange = true;
  for (let k = 0; k <= n && inRange; k++) {
    const v = Math.abs(p[first + k]! * plain);
    if (v !== 0 && !(v >= BOTTOM && v <= TOP)) inRange = false;
  }
  if (inRange) return { shift, zoom: 0 };

  const exps: number[] = [];
  const at: number[] = [];
  for (let k = 0; k <= n; k++) {
    const v = p[first + k]!;
    if (v === 0) continue;
    exps.push(Math.log2(Math.abs(v)));
    at.push(k);
  }
  // The spread max − min of e_k + zoom·k is convex in zoom; search integers outward from 0 until it rises.
  const spread = (zoom: number) => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let j = 0; j < exps.length; j++) {
      const e = exps[j]! + zoom * at[j]!;
      if (e < lo) lo = e;
      if (e > hi) hi = e;
    }
    return { lo, hi };
  };
  const width = (zoom: number) => {
    const { lo, hi } = spread(zoom);
    return hi - lo;
  };
  let zoom = 0;
  const direction = width(1) < width(0) ? 1 : width(-1) < width(0) ? -1 : 0;
  if (direction === 0) return { shift, zoom: 0 };
  while (width(zoom + direction) < width(zoom)) zoom += direction;
  const { lo, hi } = spread(zoom);
  // Keep the leading coefficient near 1 where that fits; otherwise lower or raise everything.
  let s = shift;
  if (hi + s > HIGHEST) s = Math.floor(HIGHEST - hi);
  if (lo + s < LOWEST) s = Math.ceil(LOWEST - lo);
  if (hi + s > HIGHEST) return { shift, zoom: 0 };
  return { shift: s, zoom };
}

/**
 * p[first + k]·2^(shift + zoom·k) for k = 0..n, exact whenever the result is a normal double: the factor is
 * applied in steps of at most 2^±600, in the order that cannot pass through underflow or overflow on the way.
 */
export function applyBalance(p: ArrayLike<number>, first: number, n: number, b: Balance): Float64Array {
  const c = new Float64Array(n + 1);
  for (let k = 0; k <= n; k++) c[k] = timesPowerOfTwo(p[first + k]!, b.shift + b.zoom * k);
  return c;
}

/** x·2^e, exact where the result is normal, without an intermediate factor that overflows. */
export function timesPowerOfTwo(x: number, e: number): number {
  let v = x;
  let left = e;
  while (left > 600) {
    v *= 2 ** 600;
    left -= 600;
  }
  while (left < -600) {
    v *= 2 ** -600;
    left += 600;
  }
  return v * 2 ** left;
}
