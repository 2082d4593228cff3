/**
 * The quantized taps of an FIR design drawn on the plane and the magnitude plot: their zeros (the root finder)
 * and their magnitude response on the frequency view's grid. Present only while the design carries target
 * settings and the taps build (firDerived.ts). Loaded after the first view with the layers that draw them
 * (views/firQuantized/), since it brings the root finder and the FIR arithmetic.
 */
import {
  gridWithZeroAngles,
  quantizedTapValues,
  tapsMagnitude,
  tapZeros,
  type TapsMagnitude,
  type TapZeros,
} from '../core/fixed/firQuantized.ts';
import type { FirImplementation } from '../core/fixed/fir.ts';
import { selectResponse } from './derived.ts';
import { selectFirImplementation } from './firDerived.ts';
import { memoLast } from './memo.ts';
import type { WorkbenchState } from './store.ts';

/** The quantized taps as a filter: what the target multiplies by, and its zeros. */
export interface FirQuantized {
  impl: FirImplementation;
  /** code · 2^−F, in tap order. */
  taps: number[];
  zeros: TapZeros;
}

/**
 * The last taps' zeros, kept while the quantized values are the same: a change that leaves the codes and
 * the format alone (a rename, an accumulator or rounding of the data) does not find the roots again.
 */
let lastTaps: number[] | null = null;
let lastZeros: TapZeros | null = null;
function zerosOf(taps: number[]): TapZeros {
  if (lastTaps && lastZeros && lastTaps.length === taps.length && lastTaps.every((t, k) => t === taps[k]))
    return lastZeros;
  lastZeros = tapZeros(taps);
  lastTaps = taps;
  return lastZeros;
}

const quantizedOf = memoLast((impl: FirImplementation): FirQuantized => {
  const taps = quantizedTapValues(impl);
  return { impl, taps, zeros: zerosOf(taps) };
});

/** The FIR's quantized taps and their zeros, or null (not an FIR, no target settings, or settings refused). */
export function selectFirQuantized(s: WorkbenchState): FirQuantized | null {
  if (!s.design.implementation) return null;
  const r = selectFirImplementation(s);
  return r?.ok ? quantizedOf(r.value) : null;
}

const magnitudeOf = memoLast((q: FirQuantized, grid: Float64Array) =>
  tapsMagnitude(q.taps, gridWithZeroAngles(grid, q.zeros.zeros)),
);

/**
 * |H| of the quantized taps on the frequency view's grid, plus the angles of their zeros near the unit
 * circle; null whenever selectFirQuantized is.
 */
export function selectFirQuantizedMagnitude(s: WorkbenchState): TapsMagnitude | null {
  const q = selectFirQuantized(s);
  return q ? magnitudeOf(q, selectResponse(s).omega) : null;
}
