/**
 * Minimum order of each classical family for a requirement, and the natural edges to design with, by the
 * classical order formulas on prewarped edges (Butterworth: log ratio; Chebyshev: acosh ratio; elliptic:
 * ratio of complete elliptic integrals from the degree equation). Conventions as scipy.signal buttord,
 * cheb1ord, cheb2ord and ellipord, including their band-stop refinement that slides each pass-band edge
 * towards the stop band to the position needing the lowest order.
 */
import type { IirFamily } from './iir.ts';
import type { Requirement } from './requirement.ts';
import { ellipticK } from './ellipticFunctions.ts';
import { powerRatioMinusOne } from './chebyshev.ts';
import { minimiseOnInterval } from './minimise.ts';
import { prewarp } from './bilinear.ts';
import { omegaToHz } from '../units.ts';

/** An estimated order with the natural (design) edges in Hz. */
export interface OrderEstimate {
  order: number;
  /** Edges to pass to the design, Hz: one for low-/high-pass, two for band shapes. */
  naturalEdgesHz: number[];
  /** False when the band-stop edge search did not reach its tolerance. */
  converged: boolean;
}

/** Steepness ratio of the equivalent low-pass prototype (stop-band edge over pass-band edge, >= 1). */
function selectivity(req: Requirement, passb: readonly number[], stopb: readonly number[]): number {
  const [p0, p1 = 0] = passb;
  switch (req.response) {
    case 'lowpass':
      return stopb[0]! / p0!;
    case 'highpass':
      return p0! / stopb[0]!;
    case 'bandpass':
      return Math.min(...stopb.map((s) => Math.abs((s * s - p0! * p1) / (s * (p0! - p1)))));
    case 'bandstop':
      return Math.min(...stopb.map((s) => Math.abs((s * (p0! - p1)) / (s * s - p0! * p1))));
  }
}

/** The order (not rounded) that a family needs for a prototype selectivity ratio. */
function fractionalOrder(family: IirFamily, ratio: number, req: Requirement): number {
  const d2 = powerRatioMinusOne(req.attenuationDb) / powerRatioMinusOne(req.rippleDb);
  if (family === 'butterworth') return Math.log10(d2) / (2 * Math.log10(ratio));
  if (family !== 'elliptic') return Math.acosh(Math.sqrt(d2)) / Math.acosh(ratio);
  const m = 1 / (ratio * ratio);
  const m1 = 1 / d2;
  return (ellipticK(m, 1 - m) * ellipticK(1 - m1, m1)) / (ellipticK(1 - m, m) * ellipticK(m1, 1 - m1));
}

/** Natural (design) edges, prewarped, for the estimated order. */
function naturalEdges(family: IirFamily, order: number, req: Requirement, passb: number[]): number[] {
  const [p0, p1 = 0] = passb as [number, number?];
  const gPass = powerRatioMinusOne(req.rippleDb);
  if (family === 'chebyshev1' || family === 'elliptic') return passb;
  if (family === 'butterworth') {
    // Butterworth −3 dB frequency that puts exactly the allowed loss at the pass-band edge.
    const w = gPass ** (-1 / (2 * order));
    if (req.response === 'lowpass') return [w * p0];
    if (req.response === 'highpass') return [p0 / w];
    const span = p1 - p0;
    if (req.response === 'bandstop') {
      const disc = Math.sqrt(span * span + 4 * w * w * p0 * p1);
      return [Math.abs((span - disc) / (2 * w)), Math.abs((span + disc) / (2 * w))].sort((a, b) => a - b);
    }
    const half = (w * span) / 2;
    const root = Math.sqrt(half * half + p0 * p1);
    return [Math.abs(root - half), Math.abs(root + half)].sort((a, b) => a - b);
  }
  // Chebyshev II: the stop-band edge that puts exactly the allowed loss at the pass-band edge.
  const f = 1 / Math.cosh(Math.acosh(Math.sqrt(powerRatioMinusOne(req.attenuationDb) / gPass)) / order);
  if (req.response === 'lowpass') return [p0 / f];
  if (req.response === 'highpass') return [p0 * f];
  const half = req.response === 'bandstop' ? (f * (p1 - p0)) / 2 : (p1 - p0) / (2 * f);
  const n0 = -half + Math.sqrt(half * half + p0 * p1);
  return [n0, (p0 * p1) / n0];
}

/** Minimum order of a family for a requirement, with its natural edges in Hz (scipy *ord conventions). */
export function estimateOrder(family: IirFamily, req: Requirement): OrderEstimate {
  const warp = (f: number) => prewarp(f, req.fs);
  const passb = req.passbandHz.map(warp);
  const stopb = req.stopbandHz.map(warp);
  let converged = true;
  if (req.response === 'bandstop') {
    // Slide each pass-band edge towards the stop band to where the order needed is least.
    const cost = (i: number) => (x: number) => {
      const trial = passb.slice();
      trial[i] = x;
      return fractionalOrder(family, selectivity(req, trial, stopb), req);
    };
    // Both searches start from the requested edges (as scipy does), then both moved edges are used.
    const r0 = minimiseOnInterval(cost(0), passb[0]!, stopb[0]! * (1 - 1e-12));
    const r1 = minimiseOnInterval(cost(1), stopb[1]! * (1 + 1e-12), passb[1]!);
    passb[0] = r0.x;
    passb[1] = r1.x;
    converged = r0.converged && r1.converged;
  }
  const order = Math.ceil(fractionalOrder(family, selectivity(req, passb, stopb), req));
  const edges = naturalEdges(family, order, req, passb);
  // Back from prewarped tan(ω/2) to hertz.
  return { order, naturalEdgesHz: edges.map((w) => omegaToHz(2 * Math.atan(w), req.fs)), converged };
}
