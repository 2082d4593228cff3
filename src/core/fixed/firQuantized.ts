/**
 * What the quantized taps of an FIR implementation (core/fixed/fir.ts) are as a filter, for the plane and the
 * magnitude plot: their values, their zeros (the root finder on the taps' polynomial) and their magnitude
 * response (the direct sum over the taps, with points added at the angles of zeros near the unit circle so a
 * notch shows its true depth). It imports the root finder, so the page loads it after its first view.
 */
import { findRoots } from '../roots/index.ts';
import type { Root } from '../types.ts';
import type { FirImplementation } from './fir.ts';
import { tapsMagnitudeSquaredAt } from '../response/coefficients.ts';

/** The values the target multiplies by: code · 2^−F, in tap order c[0] … c[L−1]. */
export function quantizedTapValues(impl: FirImplementation): number[] {
  const scale = 2 ** -impl.format.fractionBits;
  return impl.codes.map((c) => c * scale);
}

/** The zeros of H(z) = Σ c[k] z^−k, from the root finder. */
export interface TapZeros {
  /** Stored form: im ≥ 0 (a conjugate is implied), repeated zeros merged with their multiplicity. */
  zeros: Root[];
  /**
   * Leading taps that quantized to 0: H(z) is then z^−m times a shorter polynomial, which has m zeros
   * fewer (they went to infinity); trailing zero taps give zeros at the origin, listed in `zeros`.
   */
  leadingZeroTaps: number;
  /** Trailing taps that quantized to 0: each puts one of `zeros` at the origin. */
  trailingZeroTaps: number;
  /** Every tap quantized to 0: H is 0 everywhere and has no zeros to draw. */
  allZero: boolean;
  /** Whether the root finder met its stopping test for every zero. */
  converged: boolean;
}

/** Zeros of the taps c[0] … c[L−1] read as c[0] z^(L−1) + … + c[L−1] (H(z) times z^(L−1)). */
export function tapZeros(taps: readonly number[]): TapZeros {
  const r = findRoots(taps);
  return {
    zeros: r.grouped.filter((z) => z.im >= 0),
    leadingZeroTaps: r.atInfinity,
    trailingZeroTaps: r.zeroPolynomial ? 0 : taps.length - 1 - taps.findLastIndex((t) => t !== 0),
    allZero: r.zeroPolynomial,
    converged: r.converged,
  };
}

/** |H(e^jω)| of taps on a grid: the magnitude plot's unit pair. */
export interface TapsMagnitude {
  /** Frequencies, radians per sample, increasing. */
  omega: Float64Array;
  /** |H|, linear. */
  magnitude: Float64Array;
  /** 20·log10 |H| (−Infinity where the sum is exactly 0). */
  magnitudeDb: Float64Array;
}

/** |Σ c[k] e^(−jωk)| at each ω of `omega` (rad/sample), by Horner's rule (core/response/coefficients.ts). */
export function tapsMagnitude(taps: readonly number[], omega: Float64Array): TapsMagnitude {
  const n = omega.length;
  const magnitude = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const m = Math.sqrt(tapsMagnitudeSquaredAt(taps, omega[i]!));
    magnitude[i] = m;
    magnitudeDb[i] = 20 * Math.log10(m);
  }
  return { omega, magnitude, magnitudeDb };
}

/** Zeros farther than this from the unit circle (in radius) add no point: their dips are broad. */
export const TAP_ZERO_REFINE_BAND = 0.2;

/**
 * The grid with the angles of the zeros near the unit circle merged in (within the grid's own band, each
 * once, in increasing order), so the magnitude drawn reaches the bottom of every notch the taps make.
 */
export function gridWithZeroAngles(grid: Float64Array, zeros: readonly Root[]): Float64Array {
  if (grid.length === 0) return grid;
  const lo = grid[0]!;
  const hi = grid[grid.length - 1]!;
  const extra = zeros
    .filter((z) => Math.abs(Math.hypot(z.re, z.im) - 1) <= TAP_ZERO_REFINE_BAND)
    .map((z) => Math.atan2(z.im, z.re))
    .filter((w) => w >= lo && w <= hi);
  if (extra.length === 0) return grid;
  const all = Float64Array.from([...grid, ...extra]).sort();
  let m = 0;
  for (let i = 0; i < all.length; i++) if (i === 0 || all[i] !== all[m - 1]) all[m++] = all[i]!;
  return all.slice(0, m);
}

/**
 * `plain` (tapsMagnitude of the taps on `grid`) with the points at the angles of the zeros near the unit
 * circle added: the same values tapsMagnitude gives on gridWithZeroAngles(grid, zeros), computing only the
 * added points (the page draws the plain line while a long tap set's zeros are found, then this).
 */
export function withZeroAngles(
  plain: TapsMagnitude,
  taps: readonly number[],
  zeros: readonly Root[],
): TapsMagnitude {
  const grid = plain.omega;
  const all = gridWithZeroAngles(grid, zeros);
  if (all === grid) return plain;
  const n = all.length;
  const magnitude = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  for (let i = 0, j = 0; i < n; i++) {
    if (j < grid.length && all[i] === grid[j]) {
      magnitude[i] = plain.magnitude[j]!;
      magnitudeDb[i] = plain.magnitudeDb[j]!;
      j++;
    } else {
      const m = Math.sqrt(tapsMagnitudeSquaredAt(taps, all[i]!));
      magnitude[i] = m;
      magnitudeDb[i] = 20 * Math.log10(m);
    }
  }
  return { omega: all, magnitude, magnitudeDb };
}
