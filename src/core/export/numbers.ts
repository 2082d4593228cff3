/** Number text for exports. */

/** A double with 17 significant digits, enough to read back the same value in any language. */
export function float17(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`cannot export the non-finite value ${x}`);
  return x.toPrecision(17);
}

/** An integer code as a C constant of its type: INT32_MIN is spelled (−2147483647 − 1), as C requires. */
export function cInteger(code: number): string {
  return code === -2147483648 ? '(-2147483647 - 1)' : String(code);
}
