/**
 * Derived data of the implementation (sections, fixed point), computed by the engine and memoised on the
 * identity of its inputs, like derived.ts. The word-length search and the simulation are the costly ones:
 * the page asks for them only while it is open, and not at all during a drag.
 */
import {
  buildImplementation,
  detectLimitCycle,
  inputSignal,
  quantizedResponse,
  simulateFixed,
  smallestWordLength,
  type FixedSimulation,
  type Implementation,
  type ImplementationSettings,
  type LimitCycleReport,
  type SignalSpec,
  type WordLengthSearch,
} from '../core/fixed/index.ts';
import { buildCascade, type Cascade } from '../core/sections/index.ts';
import { refineAtRoots, type FrequencyResponse } from '../core/response/index.ts';
import type { Stability } from '../core/stability/index.ts';
import type { Result, Zpk } from '../core/types.ts';
import { evaluateMask, type MaskResult, type RequirementMask } from '../core/mask/index.ts';
import { memoLast } from './memo.ts';
import { implementationOf } from './implementation.ts';
import { selectResponse, selectZpk } from './derived.ts';
import type { WorkbenchState } from './store.ts';

const cascadeOf = memoLast(
  (
    zpk: Zpk,
    pairing: ImplementationSettings['pairing'],
    ordering: ImplementationSettings['ordering'],
    gain: ImplementationSettings['gainDistribution'],
    scaling: ImplementationSettings['scaling'],
  ): Cascade => buildCascade(zpk, { pairing, ordering, gain, scaling }),
);
const implementationOfZpk = memoLast(
  (zpk: Zpk, fs: number, settings: ImplementationSettings): Result<Implementation> => {
    const c = cascadeOf(
      zpk,
      settings.pairing,
      settings.ordering,
      settings.gainDistribution,
      settings.scaling,
    );
    return buildImplementation(zpk, fs, settings, c);
  },
);
const responseOf = memoLast((impl: Implementation | null, omega: Float64Array) =>
  impl ? quantizedResponse(impl, omega) : null,
);
const maskOf = memoLast((mask: RequirementMask | undefined, impl: Implementation | null, fs: number) =>
  mask && impl ? evaluateMask(mask, impl.quantizedZpk, fs) : null,
);
const searchOf = memoLast(
  (zpk: Zpk, fs: number, settings: ImplementationSettings, mask: RequirementMask | undefined) =>
    smallestWordLength(zpk, fs, settings, mask ? ({ zpk: q }) => evaluateMask(mask, q, fs).pass : undefined),
);

/** A fixed-point run and what the cascade did afterwards with the input at zero. */
export interface SimulationReport {
  simulation: FixedSimulation;
  /** Zero-input behaviour after this input: rest, a limit cycle (period, amplitude) or undecided. */
  afterInput: LimitCycleReport;
  /** Largest |fixed-point output − float cascade output| over the run, in data LSBs. */
  maxErrorLsb: number;
}
const simulationOf = memoLast((impl: Implementation, spec: SignalSpec, fs: number): SimulationReport => {
  const simulation = simulateFixed(impl, inputSignal(spec, fs));
  const { outputValues: y, reference: ref } = simulation;
  let worst = 0;
  for (let i = 0; i < y.length; i++) worst = Math.max(worst, Math.abs(y[i]! - ref[i]!));
  const lsb = 2 ** -(impl.settings.dataWordLength - 1);
  return { simulation, afterInput: detectLimitCycle(impl, simulation.input), maxErrorLsb: worst / lsb };
});

// selectZpk hands out a new object on any design change (a rename, a setting); this one changes only with the
// roots or the gain, so changing a fixed-point setting does not rebuild the cascade.
const zpkFromParts = memoLast((zeros: Zpk['zeros'], poles: Zpk['poles'], gain: number): Zpk => ({
  zeros,
  poles,
  gain,
}));
/** The design's zpk, the same object while its roots and gain are unchanged. */
export const rootsZpk = (s: WorkbenchState): Zpk =>
  zpkFromParts(s.design.zeros, s.design.poles, selectZpk(s).gain);

/** The implementation settings in force (the design's, or the defaults when it has none). */
export const selectImplementationSettings = (s: WorkbenchState): ImplementationSettings =>
  implementationOf(s.design);
/** Whether the design carries implementation settings (then the quantized filter is drawn). */
export const selectHasImplementation = (s: WorkbenchState): boolean => s.design.implementation !== undefined;
/**
 * Whether the design runs as FIR taps on the target (every pole at the origin; the Target page's FIR part):
 * the quantized sections are then not what the target runs, so the plane and the magnitude plot draw the
 * quantized taps instead (store/firQuantizedDerived.ts).
 */
export const selectRunsAsTaps = (s: WorkbenchState): boolean =>
  s.design.poles.length > 0 && s.design.poles.every((p) => p.re === 0 && p.im === 0);
/**
 * Whether the quantized filter is drawn on the plane and the magnitude plot: settings present and "show
 * quantized" on (the sections' roots and response, or for an FIR the quantized taps' zeros and response).
 */
export const selectShowQuantized = (s: WorkbenchState): boolean =>
  s.design.implementation !== undefined && s.view.showQuantized !== false;

/** The design taken to fixed point with the settings in force, or why the settings do not apply. */
export const selectImplementation = (s: WorkbenchState): Result<Implementation> =>
  implementationOfZpk(rootsZpk(s), s.design.sampleRate, selectImplementationSettings(s));
const implOrNull = (s: WorkbenchState): Implementation | null => {
  const r = selectImplementation(s);
  return r.ok ? r.value : null;
};
/** The float cascade of second-order sections (ordered, gain-distributed, scaled) for the settings in force. */
export const selectCascade = (s: WorkbenchState): Cascade | null => implOrNull(s)?.cascade ?? null;
/** The quantized filter's frequency response on the frequency view's grid, or null. */
export const selectQuantizedResponse = (s: WorkbenchState): FrequencyResponse | null =>
  responseOf(implOrNull(s), selectResponse(s).omega);
const quantizedDisplayOf = memoLast((impl: Implementation | null, grid: FrequencyResponse | null) =>
  impl && grid ? refineAtRoots(impl.quantizedZpk, grid) : null,
);
/** The quantized response refined at the quantized roots' angles (a notch that moved shows where it went). */
export const selectQuantizedDisplayResponse = (s: WorkbenchState): FrequencyResponse | null =>
  quantizedDisplayOf(implOrNull(s), selectQuantizedResponse(s));
/** Stability of the quantized filter, or null. */
export const selectQuantizedStability = (s: WorkbenchState): Stability | null =>
  implOrNull(s)?.stability ?? null;
/** The design's mask judged on the quantized filter, or null (no mask, or settings that do not apply). */
export const selectQuantizedMaskResult = (s: WorkbenchState): MaskResult | null =>
  maskOf(s.design.mask, implOrNull(s), s.design.sampleRate);
/** Smallest coefficient word length (8..32) giving a stable quantized filter inside the mask (if any). */
export const selectWordLengthSearch = (s: WorkbenchState): WordLengthSearch =>
  searchOf(rootsZpk(s), s.design.sampleRate, selectImplementationSettings(s), s.design.mask);

/**
 * The bit-exact run of the implementation on a test input, with the zero-input check after it; null when the
 * settings do not apply. `spec` must keep its identity between calls for the memo to hold.
 */
export function simulationReport(s: WorkbenchState, spec: SignalSpec): SimulationReport | null {
  const impl = implOrNull(s);
  return impl ? simulationOf(impl, spec, s.design.sampleRate) : null;
}
