/**
 * Doubles as exact integers: every finite double is m·2^e with an integer m, so an array of doubles is an
 * integer array times one common power of two. Tests that must not round (the exact stability test) work on
 * these integers with BigInt.
 */

/** x = mantissa · 2^exponent exactly, with the mantissa odd (or 0 for x = 0). */
export function splitDouble(x: number): { mantissa: bigint; exponent: number } {
  if (!Number.isFinite(x)) throw new RangeError(`splitDouble: ${x} is not a finite number`);
  if (x === 0) return { mantissa: 0n, exponent: 0 };
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const biased = Number((bits >> 52n) & 0x7ffn);
  let m = bits & 0xfffffffffffffn;
  let e = biased === 0 ? -1074 : biased - 1075;
  if (biased !== 0) m |= 1n << 52n;
  while ((m & 1n) === 0n) {
    m >>= 1n;
    e++;
  }
  return { mantissa: x < 0 ? -m : m, exponent: e };
}

/**
 * The doubles c as integers c_k · 2^-shift (every c_k exact); zeros stay 0. The common scale 2^shift is a
 * positive factor, so the integer polynomial has the same roots as the doubles' polynomial.
 */
export function toIntegers(c: ArrayLike<number>): bigint[] {
  const parts = Array.from(c, (x) => splitDouble(x));
  let low = Infinity;
  for (const p of parts) if (p.mantissa !== 0n) low = Math.min(low, p.exponent);
  return parts.map((p) => (p.mantissa === 0n ? 0n : p.mantissa << BigInt(p.exponent - low)));
}
