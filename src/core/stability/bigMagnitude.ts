/** Magnitudes of BigInts as doubles, rounded up, for error bounds kept in double precision. */

/** Number of bits of |x| (0 for x = 0). */
export function bitLength(x: bigint): number {
  const a = x < 0n ? -x : x;
  if (a === 0n) return 0;
  const n = a.toString(16).length;
  const top = Number(a >> BigInt(4 * (n - 1)));
  return 4 * (n - 1) + (32 - Math.clz32(top));
}

/** Relative slack covering the rounding of one BigInt-to-double conversion and a few double operations. */
const UP = 1 + 2 ** -48;

/** An upper bound on |x| · 2^-shift as a double (Infinity past the double range). */
export function magnitudeUp(x: bigint, shift: number): number {
  const a = x < 0n ? -x : x;
  if (a === 0n) return 0;
  const bits = bitLength(a);
  const drop = Math.max(0, bits - 64);
  const top = Number(a >> BigInt(drop)) + 1; // + 1 covers the bits shifted out
  return top * 2 ** (drop - shift) * UP;
}

/** A lower bound on |x| · 2^-shift as a double (0 when it underflows). */
export function magnitudeDown(x: bigint, shift: number): number {
  const a = x < 0n ? -x : x;
  if (a === 0n) return 0;
  const bits = bitLength(a);
  const drop = Math.max(0, bits - 64);
  const top = Number(a >> BigInt(drop));
  return (top * 2 ** (drop - shift)) / UP;
}
