/**
 * Laurent polynomials in z (finitely many terms, negative powers allowed) and ratios of them. Mixing z and
 * z^-1 in one H(z) then needs no special case: everything is a map exponent -> coefficient, shifted into
 * powers of z^-1 only at the very end.
 */
import { fail } from './errors.ts';
import { MAX_ORDER } from '../model/limits.ts';

/**
 * Largest span of powers of z accepted in any intermediate result (total degree of a factor): the largest
 * order a design may have, so work stops at once on input no design could hold.
 */
export const MAX_DEGREE = MAX_ORDER;

/** Sum of c[i]·z^(low+i); no zero coefficient at either end; the zero polynomial has c = []. */
export interface Laurent {
  low: number;
  c: number[];
}

/** Ratio num/den of Laurent polynomials; den is never the zero polynomial. */
export interface Ratio {
  num: Laurent;
  den: Laurent;
}

export const ONE: Laurent = { low: 0, c: [1] };

/** Drops zero coefficients at both ends so that `low` and the length give the true extent. */
export function trimLaurent(low: number, c: number[]): Laurent {
  let s = 0;
  let e = c.length;
  while (s < e && c[s] === 0) s++;
  while (e > s && c[e - 1] === 0) e--;
  return s === e ? { low: 0, c: [] } : { low: low + s, c: c.slice(s, e) };
}

/** Highest power present (undefined for the zero polynomial). */
export function highPower(p: Laurent): number {
  return p.low + p.c.length - 1;
}

export function isZero(p: Laurent): boolean {
  return p.c.length === 0;
}

/** The value if p is a constant (a z^0 term or zero), else undefined. */
export function constantOf(p: Laurent): number | undefined {
  if (p.c.length === 0) return 0;
  return p.c.length === 1 && p.low === 0 ? p.c[0] : undefined;
}

function checkExtent(low: number, high: number, pos: number): void {
  if (high - low > MAX_DEGREE || Math.abs(low) > MAX_DEGREE || Math.abs(high) > MAX_DEGREE) {
    fail(`the expression reaches powers of z beyond ${MAX_DEGREE}`, pos, `total degree up to ${MAX_DEGREE}`);
  }
}

export function addLaurent(a: Laurent, b: Laurent, sign: 1 | -1, pos: number): Laurent {
  if (isZero(b)) return a;
  if (isZero(a)) return sign === 1 ? b : scaleLaurent(b, -1);
  const low = Math.min(a.low, b.low);
  const high = Math.max(highPower(a), highPower(b));
  checkExtent(low, high, pos);
  const c = new Array<number>(high - low + 1).fill(0);
  a.c.forEach((v, i) => (c[a.low - low + i] = v));
  b.c.forEach((v, i) => (c[b.low - low + i]! += sign * v));
  return trimLaurent(low, c);
}

export function mulLaurent(a: Laurent, b: Laurent, pos: number): Laurent {
  if (isZero(a) || isZero(b)) return { low: 0, c: [] };
  checkExtent(a.low + b.low, highPower(a) + highPower(b), pos);
  const c = new Array<number>(a.c.length + b.c.length - 1).fill(0);
  for (let i = 0; i < a.c.length; i++) {
    const ai = a.c[i]!;
    if (ai === 0) continue;
    for (let j = 0; j < b.c.length; j++) c[i + j]! += ai * b.c[j]!;
  }
  return trimLaurent(a.low + b.low, c);
}

export function scaleLaurent(a: Laurent, s: number): Laurent {
  return trimLaurent(
    a.low,
    a.c.map((v) => v * s),
  );
}

/** Coefficients divided (not multiplied by a reciprocal) by d, so 1/3 reads exactly as typed. */
export function divideLaurent(a: Laurent, d: number): Laurent {
  return trimLaurent(
    a.low,
    a.c.map((v) => v / d),
  );
}

function sameLaurent(a: Laurent, b: Laurent): boolean {
  return a.low === b.low && a.c.length === b.c.length && a.c.every((v, i) => v === b.c[i]);
}

/** Sum or difference of ratios; a shared denominator is kept as it is, so typed coefficients stay exact. */
export function addRatio(a: Ratio, b: Ratio, sign: 1 | -1, pos: number): Ratio {
  if (sameLaurent(a.den, b.den)) return { num: addLaurent(a.num, b.num, sign, pos), den: a.den };
  const num = addLaurent(mulLaurent(a.num, b.den, pos), mulLaurent(b.num, a.den, pos), sign, pos);
  return { num, den: mulLaurent(a.den, b.den, pos) };
}

export function mulRatio(a: Ratio, b: Ratio, pos: number): Ratio {
  return { num: mulLaurent(a.num, b.num, pos), den: mulLaurent(a.den, b.den, pos) };
}

/** Quotient a/b; fails when b is the zero polynomial. A constant divisor divides the numerator directly. */
export function divRatio(a: Ratio, b: Ratio, pos: number): Ratio {
  if (isZero(b.num)) fail('division by a zero polynomial', pos, 'a nonzero divisor');
  // A single-term divisor c·z^k (a number, z, z^2...) shifts and divides the numerator: 0.72/z^2 stays exact.
  if (b.num.c.length === 1 && sameLaurent(b.den, ONE)) {
    const shifted = { low: a.num.low - b.num.low, c: a.num.c };
    checkExtent(shifted.low, highPower(shifted), pos);
    return { num: divideLaurent(shifted, b.num.c[0]!), den: a.den };
  }
  return { num: mulLaurent(a.num, b.den, pos), den: mulLaurent(a.den, b.num, pos) };
}

/** Largest of |lowest power|, |highest power| and the span: how far one factor reaches. */
function extent(p: Laurent): number {
  if (isZero(p)) return 0;
  return Math.max(Math.abs(p.low), Math.abs(highPower(p)), p.c.length - 1);
}

/** Whole-number power of a ratio (negative powers invert it), by repeated squaring. */
export function powRatio(a: Ratio, e: number, pos: number): Ratio {
  if (e < 0 && isZero(a.num)) fail('a zero polynomial raised to a negative power', pos, 'a nonzero base');
  if (e < 0 && !(a.num.c.length === 1 && sameLaurent(a.den, ONE))) {
    return powRatio({ num: a.den, den: a.num }, -e, pos);
  }
  const reach = Math.max(1, extent(a.num), extent(a.den));
  if (Math.abs(e) * reach > MAX_DEGREE) {
    fail(`the power ${e} reaches powers of z beyond ${MAX_DEGREE}`, pos, `total degree up to ${MAX_DEGREE}`);
  }
  if (a.num.c.length === 1 && sameLaurent(a.den, ONE)) {
    // A single term c·z^k to the power e is c^e·z^(k·e): z^-1 stays a negative power of z.
    const c = Math.pow(a.num.c[0]!, e);
    if (!Number.isFinite(c)) fail('the power is not a finite number', pos, 'values that stay finite');
    return { num: trimLaurent(a.num.low * e, [c]), den: ONE };
  }
  let result: Ratio = { num: ONE, den: ONE };
  let base = a;
  let n = e;
  while (n > 0) {
    if (n & 1) result = mulRatio(result, base, pos);
    n >>= 1;
    if (n > 0) base = mulRatio(base, base, pos);
  }
  return result;
}
