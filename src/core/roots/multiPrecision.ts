/**
 * Horner's rule in multi-precision floating point, for roots where double-double evaluation fails: each partial
 * value is a complex pair of BigInt mantissas with one shared binary exponent, cut back to a chosen number of
 * bits after every step (the products with the point are exact; only the cut and the alignment of the
 * coefficient round). Unlike the compensated scheme (roots/compensated.ts) it has no exponent range to leave:
 * a Butterworth denominator of degree 1024 at 0.5 of Nyquist has a subnormal constant coefficient (2.4e-322),
 * where the error-free products of the compensated scheme are no longer exact. Exact BigInt evaluation
 * (roots/exactEval.ts) lets its integers grow by the point's bits at every step, tens of thousands of bits at
 * that degree; these stay at the chosen precision. A running bound of the cuts (each below one unit of the
 * new exponent, carried through the later steps by |z|: the running error analysis of Horner's rule) says
 * whether the precision resolved p(z) and p'(z); {@link MultiPrecisionEvaluator.at} raises it until it does.
 */
import { splitDouble } from '../stability/dyadic.ts';

/** Units of the last place lost per step: two cut components and one cut coefficient, rounded up. */
const CUT_UNITS = 3;

/** |z| as a double rounded up by more than its one rounding. */
const UP = 1 + 2 ** -50;

/** Largest error bound, relative to the value, at which p or p' counts as resolved. */
const RESOLVED = 2 ** -24;

/** Precisions tried, in bits (mantissas stay below 1024 bits, so they convert to finite doubles). */
const PRECISIONS = [192, 384, 896];

/** A coefficient as mantissa·2^f, with top the bit length of |mantissa| plus f (−Infinity for 0). */
interface Dyadic {
  m: bigint;
  f: number;
  top: number;
}

/** Shift counts as BigInts, made once (converting a count at every step costs as much as the shift). */
const COUNTS = Array.from({ length: 2048 }, (_, k) => BigInt(k));

function shift(v: bigint, s: number): bigint {
  if (s > 0) return v >> (s < 2048 ? COUNTS[s]! : BigInt(s));
  if (s < 0) return v << (-s < 2048 ? COUNTS[-s]! : BigInt(-s));
  return v;
}

/** log2 of the larger of |a| and |b| (to rounding; −Infinity when both are 0). */
function log2Max(a: bigint, b: bigint): number {
  return Math.log2(Math.max(Math.abs(Number(a)), Math.abs(Number(b))));
}

function bitsOf(m: bigint): number {
  const v = Number(m < 0n ? -m : m); // exact: |m| < 2^53
  return v >= 2 ** 32 ? 64 - Math.clz32(Math.floor(v / 2 ** 32)) : 32 - Math.clz32(v);
}

/** x / 2^e as an integer, rounded toward −Infinity when x has bits below 2^e. */
function toScaled(x: number, e: number): bigint {
  if (x === 0) return 0n;
  const { mantissa, exponent } = splitDouble(x);
  return shift(mantissa, e - exponent);
}

/** Evaluates p and p' of fixed double coefficients at double points in multi-precision floating point. */
export class MultiPrecisionEvaluator {
  private readonly coeffs: Dyadic[];
  private readonly out = new Float64Array(3);
  constructor(c: ArrayLike<number>) {
    this.coeffs = Array.from(c, (x) => {
      const { mantissa, exponent } = splitDouble(x);
      return { m: mantissa, f: exponent, top: x === 0 ? -Infinity : exponent + bitsOf(mantissa) };
    });
  }

  /**
   * Writes [Re, Im] of p'(z)/p(z) into out, raising the precision until both are resolved; returns false when
   * even the highest precision does not resolve them (or z = 0), leaving out as it was.
   */
  at(x: number, y: number, out: Float64Array): boolean {
    for (const bits of PRECISIONS) {
      if (this.evaluate(x, y, bits, this.out)) {
        out[0] = this.out[0]!;
        out[1] = this.out[1]!;
        return true;
      }
    }
    return false;
  }

  /** log2|p(z)| (resolved to 2^-24 relative; NaN when no precision tried resolves it). */
  modulus(x: number, y: number): number {
    for (const bits of PRECISIONS) if (this.evaluate(x, y, bits, this.out)) return this.out[2]!;
    return NaN;
  }

  /** p'/p and log2|p| at z with partial values cut to `bits` bits into out; false if not resolved. */
  private evaluate(x: number, y: number, bits: number, out: Float64Array): boolean {
    const cs = this.coeffs;
    const n = cs.length - 1;
    // z = (X + iY)·2^e with the larger part exact in 63 bits; a much smaller part is cut below 2^e, a relative
    // move of the point by at most 2^-62.
    const big = Math.max(Math.abs(x), Math.abs(y));
    if (big === 0) return false;
    const e = Math.floor(Math.log2(big)) - 62;
    const X = toScaled(x, e);
    const Y = toScaled(y, e);
    const mod = Math.hypot(x, y) * UP;
    let R = cs[0]!.m;
    let I = 0n;
    let ea = cs[0]!.f;
    let errA = 0;
    let DR = 0n;
    let DI = 0n;
    let ed = 0;
    let errD = 0;
    for (let k = 1; k <= n; k++) {
      // p' first, from the previous partial value of p: D ← D·z + A (errors in units of 2^ed and 2^ea).
      if (k === 1) {
        DR = R;
        DI = I;
        ed = ea;
        errD = errA;
      } else {
        const pr = DR * X - DI * Y;
        const pi = DR * Y + DI * X;
        const e1 = ed + e;
        const t = Math.max(e1 + log2Max(pr, pi), ea + log2Max(R, I));
        const ne = Number.isFinite(t) ? Math.floor(t) - bits : e1;
        DR = shift(pr, ne - e1) + shift(R, ne - ea);
        DI = shift(pi, ne - e1) + shift(I, ne - ea);
        errD = errD * mod * 2 ** (ed - ne) + errA * 2 ** (ea - ne) + CUT_UNITS;
        ed = ne;
      }
      const ck = cs[k]!;
      const pr = R * X - I * Y;
      const pi = R * Y + I * X;
      const e1 = ea + e;
      const t = Math.max(e1 + log2Max(pr, pi), ck.top);
      const ne = Number.isFinite(t) ? Math.floor(t) - bits : e1;
      R = shift(pr, ne - e1) + shift(ck.m, ne - ck.f);
      I = shift(pi, ne - e1);
      errA = errA * mod * 2 ** (ea - ne) + CUT_UNITS;
      ea = ne;
    }
    const pr = Number(R);
    const pi = Number(I);
    const dr = Number(DR);
    const di = Number(DI);
    const pm = Math.hypot(pr, pi);
    const dm = Math.hypot(dr, di);
    if (!(errA <= RESOLVED * pm) || !(errD <= RESOLVED * dm)) return false;
    // p'/p = (dr + i·di)/(pr + i·pi)·2^(ed − ea), from parts scaled near 1 so nothing overflows on the way.
    const sp = Math.floor(Math.log2(pm));
    const sd = Math.floor(Math.log2(dm));
    const ar = pr * 2 ** -sp;
    const ai = pi * 2 ** -sp;
    const br = dr * 2 ** -sd;
    const bi = di * 2 ** -sd;
    const den = ar * ar + ai * ai;
    const s = ed + sd - ea - sp;
    const half = Math.trunc(s / 2);
    out[0] = ((br * ar + bi * ai) / den) * 2 ** half * 2 ** (s - half);
    out[1] = ((bi * ar - br * ai) / den) * 2 ** half * 2 ** (s - half);
    out[2] = ea + Math.log2(pm);
    return true;
  }
}
