/**
 * The heavy design algorithms behind the registry's light entries (engineSlot.ts): the door that checks a
 * description's parameters (runDesigner.ts), the classical designer
 * (IIR prototypes and elliptic functions, FIR window / least squares / equiripple, order estimation) and the
 * equiripple FIR operators. Not in the page's first view: store/designEngine.ts loads it after the first
 * paint; index.ts installs it for the command line and the tests.
 */
import type { DesignEngine } from './engineSlot.ts';
import type { DesignResult } from './result.ts';
import type { IirSpec } from './entries/classicalParameters.ts';
import { DesignInputError } from './validate.ts';
import { runIir } from './runIir.ts';
import { runDesigner } from './runDesigner.ts';
import { runFir } from './fir/runFir.ts';
import { isFirFamily } from './fir/families.ts';
import { remezTaps } from './fir/remez.ts';
import { tfToZpk } from '../system/fromCoefficients.ts';
import type { FirBand } from './fir/bands.ts';
import { snapLinearPhaseZeros } from './fir/linearPhaseZeros.ts';
import { fmt } from './entries/common.ts';
import { designComb, designHarmonicNotches } from './comb.ts';
import { designDcBlocker, designNotch, designPeak } from './notch.ts';
import { designPeakingEq, designShelf } from './equaliser.ts';
import { linearPhaseShape, moveKeepingLinearPhase, restoreLinearPhase } from './fir/linearPhaseEdit.ts';
import { moveDesignKeepingLinearPhase, restoreLinearPhaseDesign } from './fir/linearPhaseDesign.ts';

/** Equiripple taps of an operator, refusing what the exchange cannot settle. */
function operatorTaps(order: number, band: FirBand, kind: 'differentiator' | 'hilbert') {
  if (order < 2)
    throw new DesignInputError(`order ${order} is too low for a ${kind}`, 'an order from 2', 'order');
  const r = remezTaps(order + 1, [band], kind);
  if (!r.converged)
    throw new DesignInputError(
      `the equiripple exchange did not settle at order ${order}`,
      'a lower order or a narrower band',
      'order',
    );
  return r;
}

const linear = (order: number) => `linear phase, delay ${fmt(order / 2)} samples`;

function differentiator(spec: Parameters<DesignEngine['differentiator']>[0]): DesignResult {
  // H ≈ jω with ω in rad/sample: the amplitude 2π·f for f in cycles per sample, relative error weighted
  const r = operatorTaps(
    spec.order,
    { lo: 0, hi: spec.upToHz / spec.fs, from: 2 * Math.PI, to: 2 * Math.PI, weight: 1 },
    'differentiator',
  );
  return {
    zpk: snapLinearPhaseZeros(tfToZpk({ b: Array.from(r.taps), a: [1] })),
    note: `order ${spec.order} equiripple differentiator, gain ω (rad/sample; × fs for per second) within ${fmt((100 * r.deviation) / (2 * Math.PI))} % up to ${fmt(spec.upToHz)} Hz, ${linear(spec.order)}, fs ${fmt(spec.fs)} Hz`,
  };
}

function hilbert(spec: Parameters<DesignEngine['hilbert']>[0]): DesignResult {
  const [lo, hi] = spec.bandHz as [number, number];
  // −1 with H = j·A·e^{−jωM}: H ≈ −j on positive frequencies, the Hilbert transformer's sign
  const r = operatorTaps(
    spec.order,
    { lo: lo / spec.fs, hi: hi / spec.fs, from: -1, to: -1, weight: 1 },
    'hilbert',
  );
  return {
    zpk: snapLinearPhaseZeros(tfToZpk({ b: Array.from(r.taps), a: [1] })),
    note: `order ${spec.order} equiripple Hilbert transformer, gain 1 within ±${fmt(r.deviation)} from ${fmt(lo)} to ${fmt(hi)} Hz, ${linear(spec.order)} plus a quarter turn, fs ${fmt(spec.fs)} Hz`,
  };
}

function classical(spec: IirSpec): DesignResult {
  return isFirFamily(spec.family) ? runFir({ ...spec, family: spec.family }) : runIir(spec);
}

/** The engine the registry's entries call through designEngine(). */
export const DESIGN_ENGINE: DesignEngine = {
  run: runDesigner,
  classical,
  differentiator,
  hilbert,
  designNotch,
  designPeak,
  designDcBlocker,
  designHarmonicNotches,
  designComb,
  designPeakingEq,
  designShelf,
  linearPhaseShape,
  moveKeepingLinearPhase,
  restoreLinearPhase,
  moveDesignKeepingLinearPhase,
  restoreLinearPhaseDesign,
};
