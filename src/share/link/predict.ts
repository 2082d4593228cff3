/**
 * The imaginary part of a root on (or very near) the unit circle, written as its distance in units in the
 * last place from sqrt((1 − re)(1 + re)), which a designer's zeros on the circle hit within a few ulps. The
 * factored form keeps 1 − re exact for re in [½, 1] (Sterbenz), so the prediction is good near z = 1.
 */

const bits = new DataView(new ArrayBuffer(8));

function toBits(x: number): bigint {
  bits.setFloat64(0, x);
  return bits.getBigInt64(0);
}

function fromBits(b: bigint): number {
  bits.setBigInt64(0, b);
  return bits.getFloat64(0);
}

/** Largest ulp distance worth writing this way (a three-byte varint after zigzag). */
export const MAX_ULP_DISTANCE = (1 << 20) - 1;

/** The predicted imaginary part of a root on the unit circle with real part re (NaN when |re| > 1). */
export function circleIm(re: number): number {
  return Math.sqrt((1 - re) * (1 + re));
}

/** Zigzag ulp distance of im from its prediction, or null when it is too far (or either is not positive). */
export function circleDelta(re: number, im: number): number | null {
  const p = circleIm(re);
  if (!(p > 0 && im > 0) || !Number.isFinite(im)) return null;
  const d = toBits(im) - toBits(p);
  const z = d >= 0n ? d * 2n : -d * 2n - 1n;
  return z <= BigInt(MAX_ULP_DISTANCE) ? Number(z) : null;
}

/** The imaginary part from re and a zigzag ulp distance; NaN when re is off the circle or the result is not finite. */
export function circleImFromDelta(re: number, zigzag: number): number {
  const p = circleIm(re);
  if (!(p > 0)) return NaN;
  const d = zigzag % 2 === 0 ? BigInt(zigzag / 2) : -BigInt((zigzag + 1) / 2);
  return fromBits(toBits(p) + d);
}
