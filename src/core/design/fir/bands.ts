/** Bands of a least-squares or equiripple FIR design, in cycles per sample (0 to 0.5). */

/**
 * One band: from lo to hi (cycles per sample), the desired amplitude going linearly from `from` to `to`
 * (a constant band has from = to), and its weight (> 0).
 */
export interface FirBand {
  lo: number;
  hi: number;
  from: number;
  to: number;
  weight: number;
}

/** Checks that bands are increasing, inside [0, 0.5], apart, and weighted above 0 (throws RangeError). */
export function checkBands(bands: readonly FirBand[]): void {
  let last = -Infinity;
  for (const [i, b] of bands.entries()) {
    if (!(b.lo >= 0 && b.hi <= 0.5 && b.lo < b.hi && b.lo >= last))
      throw new RangeError(`band ${i + 1} [${b.lo}, ${b.hi}] is not inside [0, 0.5] after the one before it`);
    if (!(b.weight > 0) || !Number.isFinite(b.weight))
      throw new RangeError(`band ${i + 1} has weight ${b.weight}; a weight must be above 0`);
    last = b.hi;
  }
}
