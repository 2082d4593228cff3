/**
 * Time responses by direct filtering in float64: the transposed direct form II recursion (the structure
 * scipy.signal.lfilter uses) for a whole transfer function, and a cascade of such biquads for sections.
 * Loops run on Float64Arrays and allocate nothing per sample, since the page refilters on every drag frame.
 */
import type { Section, TransferFunction } from '../types.ts';
import { createSectionFilter, runSectionFilter } from '../signal/sectionFilter.ts';
import { makeImpulse, makeSine, makeStep } from './inputs.ts';

/**
 * Filters x through H(z) = B(z^-1)/A(z^-1) in transposed direct form II, normalising by a[0] (a[0] must be
 * nonzero). With `state` (length max(len b, len a) - 1) the filter starts from that state, as lfilter's zi,
 * and the final state is written back into it, so a long signal can be filtered in pieces.
 */
export function filterTf(tf: TransferFunction, x: ArrayLike<number>, state?: Float64Array): Float64Array {
  const a0 = tf.a[0];
  if (a0 === undefined || a0 === 0 || !Number.isFinite(a0)) {
    throw new Error(
      `filterTf: the leading denominator coefficient a[0] is ${String(a0)}; it must be a nonzero number`,
    );
  }
  const order = Math.max(tf.b.length, tf.a.length) - 1;
  const b = new Float64Array(order + 1);
  const a = new Float64Array(order + 1);
  for (let k = 0; k < tf.b.length; k++) b[k] = tf.b[k]! / a0;
  for (let k = 1; k < tf.a.length; k++) a[k] = tf.a[k]! / a0;
  const n = x.length;
  const y = new Float64Array(n);
  if (order === 0) {
    const g = b[0]!;
    for (let i = 0; i < n; i++) y[i] = g * x[i]!;
    return y;
  }
  if (state !== undefined && state.length !== order) {
    throw new Error(`filterTf: the state has ${state.length} values; this filter needs ${order}`);
  }
  const z = state ?? new Float64Array(order);
  const last = order - 1;
  const b0 = b[0]!;
  for (let i = 0; i < n; i++) {
    const xi = x[i]!;
    const yi = b0 * xi + z[0]!;
    for (let k = 0; k < last; k++) z[k] = b[k + 1]! * xi + z[k + 1]! - a[k + 1]! * yi;
    z[last] = b[order]! * xi - a[order]! * yi;
    y[i] = yi;
  }
  return y;
}

/**
 * Filters x through a cascade of second-order sections, each in transposed direct form II and normalised by
 * its own a0, starting from zero state (as scipy.signal.sosfilt). An empty cascade passes x through. The
 * arithmetic is the cascade kernel's (signal/sectionFilter.ts), so a signal filtered in pieces there gives
 * this output bit for bit.
 */
export function filterSections(sections: readonly Section[], x: ArrayLike<number>): Float64Array {
  return runSectionFilter(createSectionFilter(sections), x);
}

/** First n samples of the impulse response h[k], k = 0..n-1. */
export function impulseResponse(tf: TransferFunction, n: number): Float64Array {
  return filterTf(tf, makeImpulse(n));
}

/** First n samples of the zero-state response to the unit step u[k]. */
export function stepResponse(tf: TransferFunction, n: number): Float64Array {
  return filterTf(tf, makeStep(n));
}

/**
 * First n samples of the zero-state response to the cosine cos(omega·k + phase)·u[k] (omega in radians per
 * sample, phase in radians, default 0), transient included.
 */
export function sineResponse(tf: TransferFunction, omega: number, n: number, phase = 0): Float64Array {
  return filterTf(tf, makeSine(omega, n, phase));
}
