/** Designer descriptions: what produced a design, kept with it so that it can be re-run with new values. */
import type { BandShape, IirFamily } from './iir.ts';
import type { OrderEstimate } from './orderEstimate.ts';
import type { RequirementMargin } from './margin.ts';
import type { Zpk } from '../types.ts';

/** Width of a notch or peak: a −3 dB bandwidth in Hz, or a quality factor Q = f0/bandwidth (give one). */
export interface NotchWidth {
  bandwidthHz?: number;
  q?: number;
}

/** Every designer and its parameters; frequencies in Hz at sample rate fs (Hz). */
export type DesignerSpec =
  | ({ kind: 'notch' | 'peak'; fs: number; f0: number } & NotchWidth)
  | { kind: 'dcBlocker'; fs: number; cutoffHz: number }
  /** Notches at h·f0 for each harmonic number h (1 = the fundamental); with q the width grows as h·f0/q. */
  | ({ kind: 'harmonicNotch'; fs: number; f0: number; harmonics: number[] } & NotchWidth)
  /** Teeth at every multiple of f0 (fs/f0 must be a whole number), including DC. */
  | ({ kind: 'comb'; fs: number; f0: number; type: 'notch' | 'peak' } & NotchWidth)
  | { kind: 'peakingEq'; fs: number; f0: number; gainDb: number; q?: number; bandwidthOctaves?: number }
  | { kind: 'lowShelf' | 'highShelf'; fs: number; f0: number; gainDb: number; q?: number; slope?: number }
  | IirSpec;

/** A classical design, of a given order at given edges or of the least order meeting a requirement. */
export interface IirSpec {
  kind: 'iir';
  fs: number;
  family: IirFamily;
  response: BandShape;
  order: number | 'auto';
  /** Design edges (Hz) for a given order; see designIir for what an edge means per family. */
  edgesHz?: number[];
  rippleDb?: number;
  attenuationDb?: number;
  /** Requirement pass-band edge(s), Hz: needed for order 'auto', and gives a margin for a fixed order. */
  passbandHz?: number[];
  /** Requirement stop-band edge(s), Hz, likewise. */
  stopbandHz?: number[];
}

/** What a designer returns: the roots, a one-line description, and for a requirement the order and margins. */
export interface DesignResult {
  zpk: Zpk;
  note: string;
  estimate?: OrderEstimate;
  margin?: RequirementMargin;
}
