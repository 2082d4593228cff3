/**
 * Last refinement of roots whose condition defeats double (and double-double) evaluation: Aberth–Ehrlich
 * sweeps (as in roots/aberth.ts) with p and p' evaluated exactly (roots/exactEval.ts). Far from convergence
 * the points are rounded to fewer bits, which makes the exact integers shorter; the precision doubles as the
 * steps shrink, up to the full 53 bits. Used by the exact stability test, where certified inclusion disks
 * need approximations accurate to the last bit.
 */
import { aberthCorrection } from './aberth.ts';
import { exactValues, type ExactPoly } from './exactEval.ts';

/** Aberth's correction of the approximation being moved (aberthCorrection). */
const correction = new Float64Array(2);

/** Mantissa bits of the points in the first sweeps. */
const START_BITS = 24;

/** A root stops moving once its step is below this many units in the last place. */
const STOP_ULPS = 4;

function roundTo(x: number, bits: number): number {
  if (x === 0 || bits >= 53) return x;
  const q = 2 ** (Math.floor(Math.log2(Math.abs(x))) - bits);
  return Math.round(x / q) * q;
}

/**
 * Refines re/im in place towards the roots of the exact polynomial p; at most maxSweeps sweeps. Only the
 * roots listed in `which` move (all by default; the others stay as they are and only repel); `startBits`
 * is the precision of the first sweeps (53 for approximations already accurate to their last bits).
 */
export function refineExactly(
  p: ExactPoly,
  re: Float64Array,
  im: Float64Array,
  maxSweeps: number,
  which?: readonly number[],
  startBits = START_BITS,
): boolean {
  const n = re.length;
  const all = which ? [...which] : Array.from({ length: n }, (_, i) => i);
  let bits = startBits;
  let active = all;
  for (let sweep = 0; sweep < maxSweeps && active.length > 0; sweep++) {
    const next: number[] = [];
    let largest = 0;
    for (const i of active) {
      const x = roundTo(re[i]!, bits);
      const y = roundTo(im[i]!, bits);
      const v = exactValues(p, x, y);
      const den = v.pr * v.pr + v.pi * v.pi;
      if (den === 0) {
        re[i] = x;
        im[i] = y;
        continue; // an exact root
      }
      aberthCorrection(
        (v.dr * v.pr + v.di * v.pi) / den,
        (v.di * v.pr - v.dr * v.pi) / den,
        x,
        y,
        i,
        re,
        im,
        correction,
      );
      const sr = correction[0]!;
      const si = correction[1]!;
      if (!Number.isFinite(sr) || !Number.isFinite(si)) continue;
      re[i] = x - sr;
      im[i] = y - si;
      const step = Math.hypot(sr, si);
      const size = Math.hypot(re[i]!, im[i]!);
      largest = Math.max(largest, step / (size || 1));
      if (bits < 53 || step > STOP_ULPS * Number.EPSILON * size) next.push(i);
    }
    if (bits < 53 && largest < 4 * 2 ** -bits) {
      bits = Math.min(53, 2 * bits);
      active = all;
    } else active = next;
  }
  return active.length === 0;
}
