/**
 * Derived data: everything the views draw, computed from the design by the engine and memoised on the
 * identity of its inputs (the design is immutable, so a new object means a change).
 */
import type { Zpk, TransferFunction, Section } from '../core/types.ts';
import { zpkToTf, zpkToSections } from '../core/system/index.ts';
import { responseZpk, frequencyGrid, refineAtRoots, type FrequencyResponse } from '../core/response/index.ts';
import { resolveGain, type ResolvedGain } from '../core/gainRule.ts';
import { stabilityOfZpk, type Stability } from '../core/stability/index.ts';
import { exactChecks, type ExactChecks } from '../core/stability/exactChecksSlot.ts';
import type { SystemDiagnostics } from '../core/system/diagnostics.ts';
import type { ExpandedCheck } from '../core/system/expandedCheck.ts';
import { rootReadouts, type RootReadout } from '../core/readouts.ts';
import { filterSections, filterTf } from '../core/time/filter.ts';
import { makeImpulse, makeStep, makeSine, makeWhiteNoise } from '../core/time/inputs.ts';
import { closedFormResponseZpk, type ClosedForm } from '../core/time/closedForm.ts';
import type { Design } from '../core/model/design.ts';
import type { ViewSettings } from './view.ts';
import type { WorkbenchState } from './store.ts';
import { memoLast } from './memo.ts';
import { LOG_AXIS_MIN_FRACTION, shownBandHz } from './zoom.ts';
import { evaluateMask, type MaskResult } from '../core/mask/index.ts';
import {
  DesignEnginePending,
  runDesigner,
  type DesignerSpec,
  type DesignResult,
} from '../core/design/light.ts';
import type { Result } from '../core/types.ts';
import { differsFromDesigner } from './designer.ts';
import { hzToOmega } from '../core/units.ts';

/** Highest order for which the closed-form time response is listed (partial fractions grow ill-conditioned). */
export const CLOSED_FORM_MAX_ORDER = 24;
export { LOG_AXIS_MIN_FRACTION } from './zoom.ts';

const gainOf = memoLast((d: Design) => resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate));
const zpkOf = memoLast((design: Design): Zpk => ({
  zeros: design.zeros,
  poles: design.poles,
  gain: gainOf(design).gain,
}));
const tfOf = memoLast((design: Design, zpk: Zpk): TransferFunction =>
  design.typed ? { b: design.typed.b, a: design.typed.a } : zpkToTf(zpk),
);
const sectionsOf = memoLast((zpk: Zpk): Section[] => zpkToSections(zpk));
const gridOf = memoLast(
  (points: number, axis: ViewSettings['frequencyAxis'], loHz: number, hiHz: number, fs: number) => {
    // A zoomed band gets the same number of points as the whole axis: evaluated there, not interpolated,
    // at the same cost per redraw.
    if (hiHz > loHz)
      return frequencyGrid(points, {
        log: axis === 'log',
        fMin: hzToOmega(loHz, fs),
        fMax: Math.min(Math.PI, hzToOmega(hiHz, fs)),
      });
    return frequencyGrid(
      points,
      axis === 'log' ? { log: true, fMin: 2 * Math.PI * LOG_AXIS_MIN_FRACTION } : {},
    );
  },
);
/** The display grid (rad/sample) for the view's point count, axis and zoomed band. */
function displayGrid(s: WorkbenchState): Float64Array {
  const { frequencyAxis, frequencySpan } = s.view;
  const responsePoints = responsePointsOf(s);
  const fs = s.design.sampleRate;
  const band = shownBandHz(frequencySpan, fs, frequencyAxis);
  // Without a band the grid does not depend on the sample rate: 0s keep the memo across rate changes.
  return band
    ? gridOf(responsePoints, frequencyAxis, band[0], band[1], fs)
    : gridOf(responsePoints, frequencyAxis, 0, 0, 0);
}
const responseOf = memoLast((zpk: Zpk, omega: Float64Array) => responseZpk(zpk, omega));
const displayResponseOf = memoLast(refineAtRoots);
const stabilityOf = memoLast((zpk: Zpk, typed: Design['typed'], checks: ExactChecks) =>
  typed ? checks.stabilityOfTyped(zpk, typed.a) : stabilityOfZpk(zpk),
);
const typedDiagnosticsOf = memoLast((typed: Design['typed'], checks: ExactChecks) =>
  typed ? checks.typedDiagnostics(typed) : null,
);
const readoutsOf = memoLast((zpk: Zpk, fs: number) => rootReadouts(zpk, fs));

/** Fewest response points while a root is dragged. */
export const DRAG_RESPONSE_MIN_POINTS = 256;

/**
 * Points of the frequency grid: the setting, or while a root is dragged about one per pixel column of the
 * plots (at least DRAG_RESPONSE_MIN_POINTS), since the traces keep at most that much detail anyway and the
 * display response adds the exact angle of every root (so peaks and notch depths stay true). On release the
 * full grid comes back.
 */
export function responsePointsOf(s: WorkbenchState): number {
  const columns = s.view.responseColumns;
  if (!s.dragging || columns === undefined) return s.view.responsePoints;
  return Math.min(s.view.responsePoints, Math.max(DRAG_RESPONSE_MIN_POINTS, columns));
}

/** The time-view input signal for the current settings. */
function timeInput(view: ViewSettings, fs: number): Float64Array {
  const n = view.timeSamples;
  switch (view.timeInput) {
    case 'impulse':
      return makeImpulse(n);
    case 'step':
      return makeStep(n);
    case 'sine':
      return makeSine(hzToOmega(view.sineHz, fs), n);
    case 'noise':
      return makeWhiteNoise(n, view.noiseSeed);
  }
}
const inputOf = memoLast(
  (kind: ViewSettings['timeInput'], n: number, sineHz: number, seed: number, fs: number) =>
    timeInput({ timeInput: kind, timeSamples: n, sineHz, noiseSeed: seed } as ViewSettings, fs),
);
const outputOf = memoLast((sections: Section[], input: Float64Array) => filterSections(sections, input));
const typedOutputOf = memoLast((typed: NonNullable<Design['typed']>, input: Float64Array) =>
  filterTf(typed, input),
);
const closedFormOf = memoLast(
  (
    zpk: Zpk,
    order: number,
    kind: ViewSettings['timeInput'],
    sineHz: number,
    fs: number,
  ): ClosedForm | null => {
    if (order > CLOSED_FORM_MAX_ORDER || kind === 'noise') return null;
    if (kind === 'sine') return closedFormResponseZpk(zpk, { kind: 'sine', omega: hzToOmega(sineHz, fs) });
    return closedFormResponseZpk(zpk, { kind });
  },
);

/** Selectors: call with the store state; each returns the same object until its inputs change. */
export const selectGain = (s: WorkbenchState): ResolvedGain => gainOf(s.design);
export const selectZpk = (s: WorkbenchState): Zpk => zpkOf(s.design);
export const selectTf = (s: WorkbenchState): TransferFunction => tfOf(s.design, zpkOf(s.design));
export const selectSections = (s: WorkbenchState): Section[] => sectionsOf(zpkOf(s.design));
export const selectResponse = (s: WorkbenchState): FrequencyResponse =>
  responseOf(zpkOf(s.design), displayGrid(s));
/** The response on the display grid plus the exact angles of the roots near the circle (true notch depth). */
export const selectDisplayResponse = (s: WorkbenchState): FrequencyResponse =>
  displayResponseOf(zpkOf(s.design), selectResponse(s));
/**
 * The exact checks once they have arrived (store/exactChecks.ts), else null. Read through the store's
 * status, so every selector below gives a new value (and the views draw again) when they arrive.
 */
const checksOf = (s: WorkbenchState): ExactChecks | null =>
  s.exactChecks.state === 'ready' ? exactChecks() : null;
/**
 * The verdict: exact from the typed denominator when the design came as coefficients, else from the poles;
 * null until the exact checks have arrived (a verdict is given only once the exact test can run).
 */
export const selectStability = (s: WorkbenchState): Stability | null => {
  const checks = checksOf(s);
  return checks && stabilityOf(zpkOf(s.design), s.design.typed, checks);
};
const expandedCheckOf = memoLast((zpk: Zpk, typed: boolean, checks: ExactChecks) =>
  typed || zpk.poles.length === 0 ? null : checks.checkExpandedCoefficients(zpk),
);
/**
 * For roots placed or designed: whether their multiplied-out b, a still describe them (null for typed
 * coefficients, which are the design, for designs without poles, and until the exact checks arrive).
 */
export const selectExpandedCheck = (s: WorkbenchState): ExpandedCheck | null => {
  const checks = checksOf(s);
  return checks && expandedCheckOf(zpkOf(s.design), s.design.typed !== undefined, checks);
};
/**
 * Error bounds of the roots computed from typed coefficients, or null for roots placed or designed (and
 * until the exact checks arrive).
 */
export const selectTypedDiagnostics = (s: WorkbenchState): SystemDiagnostics | null => {
  const checks = checksOf(s);
  return checks && typedDiagnosticsOf(s.design.typed, checks);
};
export const selectReadouts = (s: WorkbenchState): RootReadout[] =>
  readoutsOf(zpkOf(s.design), s.design.sampleRate);
export const selectTimeInput = (s: WorkbenchState): Float64Array =>
  inputOf(s.view.timeInput, s.view.timeSamples, s.view.sineHz, s.view.noiseSeed, s.design.sampleRate);
/**
 * The time response: typed coefficients run exactly as typed (direct form II transposed), so an unstable
 * typed filter visibly grows; a design kept as roots runs as second-order sections.
 */
export const selectTimeOutput = (s: WorkbenchState): Float64Array =>
  s.design.typed
    ? typedOutputOf(s.design.typed, selectTimeInput(s))
    : outputOf(selectSections(s), selectTimeInput(s));
/** What the time response runs through: 'typed' b, a as given, or 'sections' from the roots. */
export const selectTimeStructure = (s: WorkbenchState): 'typed' | 'sections' =>
  s.design.typed ? 'typed' : 'sections';
/** Number of poles (with conjugates and multiplicity) or zeros, whichever is larger. */
export const selectOrder = (s: WorkbenchState): number => {
  const count = (rs: Design['zeros']) => rs.reduce((n, r) => n + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
  return Math.max(count(s.design.zeros), count(s.design.poles));
};
export const selectClosedForm = (s: WorkbenchState): ClosedForm | null =>
  closedFormOf(selectZpk(s), selectOrder(s), s.view.timeInput, s.view.sineHz, s.design.sampleRate);

/**
 * Evenly spread points per mask region while a root is dragged (the engine's default, 512, otherwise). The
 * edges and every root angle stay on the grid and the lowest minima are still refined, so the live verdict
 * follows the drag at a quarter of the cost; on release the full grid judges the design again.
 */
export const MASK_DRAG_POINTS_PER_REGION = 128;

const maskResultOf = memoLast(
  (mask: Design['mask'], zpk: Zpk, fs: number, dragging: boolean): MaskResult | null =>
    mask
      ? evaluateMask(mask, zpk, fs, dragging ? { pointsPerRegion: MASK_DRAG_POINTS_PER_REGION } : {})
      : null,
);
/**
 * The mask's verdict on the current roots (per region and overall, margins in dB), or null without a mask;
 * during a drag, judged on the coarser grid of MASK_DRAG_POINTS_PER_REGION.
 */
export const selectMaskResult = (s: WorkbenchState): MaskResult | null =>
  maskResultOf(s.design.mask, zpkOf(s.design), s.design.sampleRate, s.dragging);

/**
 * f's value, or null while the design algorithms it needs have not loaded (store/designEngine.ts): no
 * verdict rather than a wrong one. Nothing is memoised then (the memo keeps only returned values), and the
 * views that show it come with the Design page, which brings the algorithms with it.
 */
function whileEngineLoads<T>(f: () => T): T | null {
  try {
    return f();
  } catch (e) {
    if (e instanceof DesignEnginePending) return null;
    throw e;
  }
}
const designerOutputOf = memoLast((spec: DesignerSpec | undefined) => (spec ? runDesigner(spec) : null));
/** One status object per (spec, edited) pair, so a root drag does not make a new one per move. */
const statusObjectOf = memoLast((spec: DesignerSpec, editedByHand: boolean) => ({ spec, editedByHand }));
const designerStatusOf = memoLast((design: Design) =>
  design.designer
    ? statusObjectOf(design.designer, differsFromDesigner(design, designerOutputOf(design.designer)))
    : null,
);
/**
 * The designer behind the design and whether the roots were edited by hand since it ran, or null. The
 * same object while neither changes (a drag changes it once, at its first move).
 */
export const selectDesignerStatus = (
  s: WorkbenchState,
): { spec: DesignerSpec; editedByHand: boolean } | null => whileEngineLoads(() => designerStatusOf(s.design));
/**
 * What the design's designer gives (its roots, note, estimated order and margins), keyed on the designer's
 * description: run once per description, never per root move.
 */
export const selectDesignerResult = (s: WorkbenchState): Result<DesignResult> | null =>
  whileEngineLoads(() => designerOutputOf(s.design.designer));
