/** Stability of a system from its poles: inside, on or outside the unit circle. */
import type { Root, Zpk } from './types.ts';
import { compressRoots, expandRoots } from './system/rootList.ts';
import { shortNumber } from './shortNumber.ts';

/** stable: every pole strictly inside; marginal: only simple poles on the circle, none outside; unstable: otherwise. */
export type Verdict = 'stable' | 'marginal' | 'unstable';

/** A stability verdict with the poles that decide it and a sentence saying why. */
export interface Stability {
  verdict: Verdict;
  /** Largest pole radius (0 when there are no poles). */
  maxPoleRadius: number;
  /** The poles that decide the verdict: those outside or repeated on the circle, on it, or the largest inside. */
  responsible: Root[];
  /** One sentence for the user, e.g. "pole pair at 0.9 ± 0.5j has radius 1.03 > 1". */
  reason: string;
}

/**
 * Poles with | |p| − 1 | <= 1e-9 count as on the unit circle. A pole placed on the circle from an angle, or
 * re-rooted from coefficients, lands within ~1e-15 of radius 1; a pole 1e-9 inside still decays with a time
 * constant of 1e9 samples (hours at audio rates), which no design means as "stable".
 */
export const UNIT_CIRCLE_TOLERANCE = 1e-9;

const radius = (r: Root) => Math.hypot(r.re, r.im);

/** Short decimal for the reason text: up to 4 significant digits, no trailing zeros. */
const formatNumber = (x: number): string => shortNumber(x, 4);

/** "pole at -0.5" / "pole pair at 0.9 ± 0.5j", with "double"/"triple"/"4-fold" for repeated poles. */
export function describePole(p: Root): string {
  const rep =
    p.multiplicity === 1 ? '' : (['', '', 'double ', 'triple '][p.multiplicity] ?? `${p.multiplicity}-fold `);
  return p.im === 0
    ? `${rep}pole at ${formatNumber(p.re)}`
    : `${rep}pole pair at ${formatNumber(p.re)} ± ${formatNumber(p.im)}j`;
}

function listed(poles: readonly Root[], what: (p: Root) => string): string {
  const head = poles.slice(0, 2).map(what).join('; ');
  return poles.length > 2 ? `${head}; and ${poles.length - 2} more` : head;
}

/** Verdict from the poles of the zpk, with the largest radius, the deciding poles and a reason. */
export function stabilityOfZpk(zpk: Zpk): Stability {
  const poles = compressRoots(expandRoots(zpk.poles));
  if (poles.length === 0) {
    return {
      verdict: 'stable',
      maxPoleRadius: 0,
      responsible: [],
      reason: 'no poles: the impulse response is finite',
    };
  }
  const maxPoleRadius = Math.max(...poles.map(radius));
  const outside = poles.filter((p) => radius(p) > 1 + UNIT_CIRCLE_TOLERANCE);
  if (outside.length > 0) {
    const reason = listed(outside, (p) => `${describePole(p)} has radius ${formatNumber(radius(p))} > 1`);
    return { verdict: 'unstable', maxPoleRadius, responsible: outside, reason };
  }
  const on = poles.filter((p) => Math.abs(radius(p) - 1) <= UNIT_CIRCLE_TOLERANCE);
  const repeated = on.filter((p) => p.multiplicity > 1);
  if (repeated.length > 0) {
    const reason = listed(
      repeated,
      (p) => `${describePole(p)} is repeated on the unit circle, so the response grows`,
    );
    return { verdict: 'unstable', maxPoleRadius, responsible: repeated, reason };
  }
  if (on.length > 0) {
    const reason = listed(
      on,
      (p) => `${describePole(p)} lies on the unit circle, so the response neither decays nor grows`,
    );
    return { verdict: 'marginal', maxPoleRadius, responsible: on, reason };
  }
  const largest = poles.filter((p) => radius(p) === maxPoleRadius);
  const reason = `every pole is inside the unit circle; the largest radius is ${formatNumber(maxPoleRadius)} (${describePole(largest[0]!)})`;
  return { verdict: 'stable', maxPoleRadius, responsible: largest, reason };
}
