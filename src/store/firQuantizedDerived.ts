/**
 * The quantized taps of an FIR design drawn on the plane and the magnitude plot: their zeros (the root finder)
 * and their magnitude response on the frequency view's grid. Present only while the design carries target
 * settings and the taps build (firDerived.ts). Loaded after the first view with the layers that draw them
 * (views/firQuantized/), since it brings the root finder and the FIR arithmetic.
 *
 * The zeros of a long tap set take long enough to find (an order-512 polynomial costs a few tens of ms) that
 * the page finds them in a worker (views/firQuantized/tapZerosFinder.ts); `zerosOnPage` decides which, and
 * both run the same tapZeros. The selectors here find them on the calling thread: the command line, the tests
 * and the page's short tap sets use them.
 */
import {
  quantizedTapValues,
  tapsMagnitude,
  tapZeros,
  withZeroAngles,
  type TapsMagnitude,
  type TapZeros,
} from '../core/fixed/firQuantized.ts';
import type { FirImplementation } from '../core/fixed/fir.ts';
import { selectResponse } from './derived.ts';
import { selectFirImplementation } from './firDerived.ts';
import { memoLast } from './memo.ts';
import type { WorkbenchState } from './store.ts';

/** The quantized taps of an FIR implementation: what the target multiplies by. */
export interface FirQuantizedTaps {
  impl: FirImplementation;
  /** code · 2^−F, in tap order. */
  taps: number[];
}

/** The quantized taps as a filter: what the target multiplies by, and its zeros. */
export interface FirQuantized extends FirQuantizedTaps {
  zeros: TapZeros;
}

/**
 * The highest polynomial degree (taps − 1) whose zeros the page finds on its own thread: up to here findRoots
 * costs a few ms (order 128: about 2 ms warm on the development machine, see bench/README.md), well under a
 * frame, so a short design never shows a waiting key; longer tap sets go to the worker.
 */
export const ZEROS_ON_PAGE_MAX_DEGREE = 128;

/** Whether the zeros of these taps are found on the page's thread (short) rather than in a worker (long). */
export function zerosOnPage(taps: readonly number[]): boolean {
  return taps.length - 1 <= ZEROS_ON_PAGE_MAX_DEGREE;
}

/** Whether two tap sets hold the same values. */
export function sameTaps(a: readonly number[], b: readonly number[]): boolean {
  return a === b || (a.length === b.length && a.every((t, k) => t === b[k]));
}

/**
 * The last taps' zeros, kept while the quantized values are the same: a change that leaves the codes and
 * the format alone (a rename, an accumulator or rounding of the data) does not find the roots again.
 */
let lastTaps: readonly number[] | null = null;
let lastZeros: TapZeros | null = null;
/** The zeros of the taps, found on the calling thread (the last answer reused for the same values). */
export function zerosOfTaps(taps: readonly number[]): TapZeros {
  if (lastTaps && lastZeros && sameTaps(lastTaps, taps)) return lastZeros;
  lastZeros = tapZeros(taps);
  lastTaps = taps;
  return lastZeros;
}

const tapsOf = memoLast((impl: FirImplementation): FirQuantizedTaps => ({
  impl,
  taps: quantizedTapValues(impl),
}));

/** The FIR's quantized taps, or null (not an FIR, no target settings, or settings refused). */
export function selectFirQuantizedTaps(s: WorkbenchState): FirQuantizedTaps | null {
  if (!s.design.implementation) return null;
  const r = selectFirImplementation(s);
  return r?.ok ? tapsOf(r.value) : null;
}

const quantizedOf = memoLast((q: FirQuantizedTaps): FirQuantized => ({ ...q, zeros: zerosOfTaps(q.taps) }));

/**
 * The FIR's quantized taps and their zeros found on this thread, or null (not an FIR, no target settings,
 * or settings refused).
 */
export function selectFirQuantized(s: WorkbenchState): FirQuantized | null {
  const q = selectFirQuantizedTaps(s);
  return q ? quantizedOf(q) : null;
}

/**
 * |H| of the taps on the grid, with points added at the angles of their zeros near the unit circle when the
 * zeros are known (null: the grid alone, so a notch may read shallower than it is).
 */
export function tapsMagnitudeOn(
  taps: readonly number[],
  zeros: TapZeros | null,
  grid: Float64Array,
): TapsMagnitude {
  const plain = plainMagnitude(taps, grid);
  return zeros ? refinedMagnitude(plain, taps, zeros) : plain;
}
const plainMagnitude = memoLast(tapsMagnitude);
// the zeros' points added to the plain line already drawn while they were found, not the whole grid again
const refinedMagnitude = memoLast((plain: TapsMagnitude, taps: readonly number[], zeros: TapZeros) =>
  withZeroAngles(plain, taps, zeros.zeros),
);

/**
 * |H| of the quantized taps on the frequency view's grid, plus the angles of their zeros near the unit
 * circle; null whenever selectFirQuantized is.
 */
export function selectFirQuantizedMagnitude(s: WorkbenchState): TapsMagnitude | null {
  const q = selectFirQuantized(s);
  return q ? tapsMagnitudeOn(q.taps, q.zeros, selectResponse(s).omega) : null;
}
