/**
 * Runs an FIR family of the classical designer (window method, least squares, equiripple): at a given
 * order, or at the least order meeting a requirement, found by designing from a first guess (estimate.ts)
 * and stepping through the orders the band shape allows.
 */
import type { BandShape } from '../iir.ts';
import type { DesignResult } from '../result.ts';
import type { Requirement } from '../requirement.ts';
import { requirementMargin } from '../margin.ts';
import { BAND_SHAPE_OPTIONS, type IirSpec } from '../entries/classicalParameters.ts';
import { requirementOf } from '../runIir.ts';
import { DesignInputError, MAX_FIR_ORDER } from '../validate.ts';
import { tfToZpk } from '../../system/fromCoefficients.ts';
import { shortNumber } from '../../shortNumber.ts';
import type { FirBand } from './bands.ts';
import { firOrderGuess, passDeviation, stopDeviation, windowAttenuationDb } from './estimate.ts';
import { leastSquaresTaps } from './leastSquares.ts';
import { remezTaps } from './remez.ts';
import { windowMethodTaps } from './windowMethod.ts';
import { kaiserBeta, WINDOW_FIGURES, type FirWindow } from './windows.ts';
import { meetsOnGrid } from './check.ts';
import { snapLinearPhaseZeros } from './linearPhaseZeros.ts';
import { designsFromBands, type FirFamily } from './families.ts';

export { FIR_FAMILIES, designsFromBands, isFirFamily, type FirFamily } from './families.ts';

const WORDS: Record<FirFamily, string> = {
  kaiser: 'Kaiser-window',
  hann: 'Hann-window',
  hamming: 'Hamming-window',
  blackman: 'Blackman-window',
  leastsquares: 'least-squares',
  equiripple: 'equiripple (Parks–McClellan)',
};

/**
 * Whether an order suits the band shape and method: a high-pass or band-stop needs gain at fs/2, which a
 * symmetric FIR of odd order cannot have; the least-squares designer makes odd-length (even-order) filters.
 */
export function firOrderAllowed(family: FirFamily, shape: BandShape, order: number): boolean {
  const evenOnly = shape === 'highpass' || shape === 'bandstop' || family === 'leastsquares';
  return !evenOnly || order % 2 === 0;
}

/** Bands in cycles per sample from a requirement; weights 1/δ so that each band's ripple is what is asked. */
function bandsOf(req: Requirement): FirBand[] {
  const p = req.passbandHz.map((f) => f / req.fs);
  const s = req.stopbandHz.map((f) => f / req.fs);
  const dp = passDeviation(req.rippleDb);
  const ds = stopDeviation(req.attenuationDb);
  const pass = (lo: number, hi: number): FirBand => ({ lo, hi, from: 1, to: 1, weight: 1 });
  const stop = (lo: number, hi: number): FirBand => ({ lo, hi, from: 0, to: 0, weight: dp / ds });
  switch (req.response) {
    case 'lowpass':
      return [pass(0, p[0]!), stop(s[0]!, 0.5)];
    case 'highpass':
      return [stop(0, s[0]!), pass(p[0]!, 0.5)];
    case 'bandpass':
      return [stop(0, s[0]!), pass(p[0]!, p[1]!), stop(s[1]!, 0.5)];
    case 'bandstop':
      return [pass(0, p[0]!), stop(s[0]!, s[1]!), pass(p[1]!, 0.5)];
  }
}

/** Cut-offs (Hz) in the middle of each transition band. */
function midCutoffsHz(req: Requirement): number[] {
  const p = req.passbandHz;
  const s = req.stopbandHz;
  return p.map((f, i) => (f + s[i]!) / 2);
}

/** The narrowest transition band, cycles per sample. */
function narrowestTransition(req: Requirement): number {
  return Math.min(...req.passbandHz.map((f, i) => Math.abs(f - req.stopbandHz[i]!))) / req.fs;
}

interface Plan {
  family: FirFamily;
  shape: BandShape;
  fs: number;
  cutoffsHz: number[];
  beta: number;
  bands: FirBand[];
}

/** The taps of the plan at an order (throws DesignInputError when a method cannot design it). */
function tapsAt(plan: Plan, order: number): Float64Array {
  const taps = order + 1;
  const { family } = plan;
  if (family === 'leastsquares') {
    try {
      return leastSquaresTaps(taps, plan.bands);
    } catch (e) {
      if (e instanceof RangeError)
        throw new DesignInputError(e.message, 'a lower order or wider bands', 'order');
      throw e;
    }
  }
  if (family === 'equiripple') {
    const r = remezTaps(taps, plan.bands);
    if (!r.converged)
      throw new DesignInputError(
        `the equiripple exchange did not settle at order ${order} in ${r.iterations} rounds`,
        'a lower order, wider transition bands or the least-squares method',
        'order',
      );
    return r.taps;
  }
  return windowMethodTaps(
    taps,
    plan.shape,
    plan.cutoffsHz.map((f) => f / plan.fs),
    family as FirWindow,
    plan.beta,
  );
}

/** The least allowed order meeting the requirement, searched from the first guess. */
function leastOrder(plan: Plan, req: Requirement, guess: number): number {
  const next = (n: number, dir: 1 | -1) => {
    let m = n + dir;
    while (m >= 1 && m <= MAX_FIR_ORDER && !firOrderAllowed(plan.family, plan.shape, m)) m += dir;
    return m >= 1 && m <= MAX_FIR_ORDER ? m : undefined;
  };
  const meets = (n: number) => meetsOnGrid(tapsAt(plan, n), req);
  let n: number | undefined = Math.min(MAX_FIR_ORDER, Math.max(1, guess));
  if (!firOrderAllowed(plan.family, plan.shape, n)) n = next(n, 1) ?? next(n, -1)!;
  if (meets(n)) {
    for (let lower = next(n, -1); lower !== undefined && meets(lower); lower = next(lower, -1)) n = lower;
    return n;
  }
  for (let higher = next(n, 1); higher !== undefined; higher = next(higher, 1))
    if (meets(higher)) return higher;
  const words = WORDS[plan.family];
  throw new DesignInputError(
    `no ${words} FIR up to order ${MAX_FIR_ORDER} meets the requirement`,
    plan.family in WINDOW_FIGURES
      ? `less attenuation (this window reaches about ${WINDOW_FIGURES[plan.family as 'hann'].attenuationDb} dB), the Kaiser window or equiripple`
      : 'a wider transition band, more pass-band ripple or less attenuation',
    'order',
  );
}

/** Designs an FIR family of the classical designer from its checked description. */
export function runFir(spec: IirSpec & { family: FirFamily }): DesignResult {
  const { fs, family } = spec;
  const shape = spec.response;
  const req = requirementOf(spec);
  const auto = spec.order === 'auto';
  const fromBands = designsFromBands(family);
  if (!req && (auto || fromBands))
    throw new DesignInputError(
      `the ${WORDS[family]} method needs the pass and stop bands`,
      'pass-band and stop-band edges',
      'passbandHz',
    );
  const cutoffsHz = auto || (fromBands && req) ? midCutoffsHz(req!) : spec.edgesHz!;
  const atten =
    spec.attenuationDb === undefined
      ? 0
      : spec.rippleDb === undefined
        ? spec.attenuationDb
        : windowAttenuationDb(spec.rippleDb, spec.attenuationDb);
  const plan: Plan = {
    family,
    shape,
    fs,
    cutoffsHz,
    beta: family === 'kaiser' ? kaiserBeta(atten) : 0,
    bands: req ? bandsOf(req) : [],
  };
  let guess: number | undefined;
  let order: number;
  if (auto) {
    guess = firOrderGuess(family, narrowestTransition(req!), req!.rippleDb, req!.attenuationDb);
    order = leastOrder(plan, req!, guess);
  } else {
    order = spec.order as number;
    if (!firOrderAllowed(family, shape, order))
      throw new DesignInputError(
        `a ${WORDS[family]} ${shape === 'highpass' || shape === 'bandstop' ? BAND_SHAPE_OPTIONS.find((o) => o.value === shape)!.label.toLowerCase() : 'FIR'} of order ${order} is not possible`,
        `an even order (${order - 1} or ${order + 1}): ${family === 'leastsquares' ? 'the least-squares designer makes odd-length filters' : 'an odd order puts a zero at fs/2'}`,
        'order',
      );
  }
  let h = tapsAt(plan, order);
  let zpk = snapLinearPhaseZeros(tfToZpk({ b: Array.from(h), a: [1] }));
  let margin = req ? requirementMargin(zpk, req) : undefined;
  // the grid check of the search and the refined margin can disagree by a hair at the edge of meeting
  for (
    let extra = 0;
    auto && margin && extra < 4 && (margin.passMarginDb < 0 || margin.stopMarginDb < 0);
    extra++
  ) {
    let m = order + 1;
    while (!firOrderAllowed(family, shape, m)) m++;
    if (m > MAX_FIR_ORDER) break;
    order = m;
    h = tapsAt(plan, order);
    zpk = snapLinearPhaseZeros(tfToZpk({ b: Array.from(h), a: [1] }));
    margin = requirementMargin(zpk, req!);
  }
  const fmt = (v: number) => shortNumber(v, 6);
  const shapeWords = BAND_SHAPE_OPTIONS.find((o) => o.value === shape)!.label.toLowerCase();
  let note = `order ${order} ${WORDS[family]} ${shapeWords} FIR (${order + 1} taps, linear phase, delay ${fmt(order / 2)} samples)`;
  if (fromBands) {
    note += `, pass band ${req!.passbandHz.map(fmt).join('–')} Hz, stop band ${req!.stopbandHz.map(fmt).join('–')} Hz`;
  } else note += `, cut-off${cutoffsHz.length > 1 ? 's' : ''} ${cutoffsHz.map(fmt).join(', ')} Hz`;
  if (family === 'kaiser') note += `, β ${fmt(plan.beta)}`;
  note += `, fs ${fmt(fs)} Hz`;
  if (auto) note += ` (least order meeting the requirement; first guess ${guess})`;
  return {
    zpk,
    note,
    ...(auto && {
      estimate: { order, naturalEdgesHz: fromBands ? [...req!.passbandHz] : cutoffsHz, converged: true },
    }),
    ...(margin && { margin }),
  };
}
