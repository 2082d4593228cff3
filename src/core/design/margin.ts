/**
 * How well a designed filter meets a requirement: the worst pass-band loss and the worst stop-band
 * attenuation, found on a dense grid and then refined around the worst grid point, with their margins.
 */
import type { Zpk } from '../types.ts';
import { responseAt, responseZpk } from '../response/index.ts';
import { minimiseOnInterval } from './minimise.ts';
import type { Requirement } from './requirement.ts';
import { requirementRegions } from './requirement.ts';
import { hzToOmega } from '../units.ts';

/** Grid points per band region before refinement; fine enough to separate the ripples of order-64 designs. */
export const MARGIN_GRID_POINTS = 4096;
/** Relative bracket width at which the refinement of a worst point stops. */
export const MARGIN_REFINE_TOLERANCE = 1e-10;

/** Achieved figures and margins in dB (a margin >= 0 meets the requirement), with where the worst occurs. */
export interface RequirementMargin {
  /** Largest loss in the pass band(s), dB (the achieved ripple). */
  passbandLossDb: number;
  /** Smallest attenuation in the stop band(s), dB. */
  stopbandAttenuationDb: number;
  /** rippleDb − passbandLossDb. */
  passMarginDb: number;
  /** stopbandAttenuationDb − attenuationDb. */
  stopMarginDb: number;
  worstPassHz: number;
  worstStopHz: number;
}

/** The smallest value of g(f) over [lo, hi] Hz: the grid minimum, refined between its grid neighbours. */
function worstOver(
  g: (fHz: number) => number,
  grid: (lo: number, hi: number) => Float64Array,
  lo: number,
  hi: number,
) {
  const values = grid(lo, hi);
  const n = values.length;
  let best = 0;
  for (let i = 1; i < n; i++) if (values[i]! < values[best]!) best = i;
  const step = (hi - lo) / (n - 1);
  const a = Math.max(lo, lo + (best - 1) * step);
  const b = Math.min(hi, lo + (best + 1) * step);
  const r = minimiseOnInterval(g, a, b, MARGIN_REFINE_TOLERANCE);
  return r.value <= values[best]! ? { f: r.x, v: r.value } : { f: lo + best * step, v: values[best]! };
}

/** Worst pass-band loss and stop-band attenuation of zpk against the requirement, in dB and Hz. */
export function requirementMargin(zpk: Zpk, req: Requirement): RequirementMargin {
  const toOmega = (f: number) => hzToOmega(f, req.fs);
  const db = (f: number) => {
    const h = responseAt(zpk, toOmega(f));
    return 20 * Math.log10(Math.hypot(h.re, h.im));
  };
  const gridDb = (sign: number) => (lo: number, hi: number) => {
    const omega = new Float64Array(MARGIN_GRID_POINTS);
    for (let i = 0; i < omega.length; i++) omega[i] = toOmega(lo + ((hi - lo) * i) / (omega.length - 1));
    const out = responseZpk(zpk, omega).magnitudeDb;
    for (let i = 0; i < out.length; i++) out[i] = sign * out[i]!;
    return out;
  };
  const regions = requirementRegions(req);
  // Pass band: minimise the gain (largest loss). Stop band: minimise the attenuation, i.e. minimise −gain.
  const pass = regions.pass.map(([lo, hi]) => worstOver(db, gridDb(1), lo, hi));
  const stop = regions.stop.map(([lo, hi]) => worstOver((f) => -db(f), gridDb(-1), lo, hi));
  const worstPass = pass.reduce((p, q) => (q.v < p.v ? q : p));
  const worstStop = stop.reduce((p, q) => (q.v < p.v ? q : p));
  return {
    passbandLossDb: -worstPass.v,
    stopbandAttenuationDb: worstStop.v,
    passMarginDb: req.rippleDb + worstPass.v,
    stopMarginDb: worstStop.v - req.attenuationDb,
    worstPassHz: worstPass.f,
    worstStopHz: worstStop.f,
  };
}
