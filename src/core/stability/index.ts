/**
 * Stability of a system from its poles: inside, on or outside the unit circle. The exact verdict on typed
 * coefficients is typed.ts (with coefficients.ts), which the page loads after its first paint
 * (store/exactChecks.ts).
 */
import type { Root, Zpk } from '../types.ts';
import { compressRoots, expandRoots } from '../system/rootList.ts';
import { shortNumber } from '../shortNumber.ts';

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
  /**
   * 'roots': from the poles as stored (placed or designed, exact as they are);
   * 'coefficients': decided exactly from typed denominator coefficients (see stabilityOfTyped).
   */
  decidedBy: 'roots' | 'coefficients';
  /** When the coefficients overrule the computed poles: the verdict the computed poles alone gave. */
  rootsSuggested?: Verdict;
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

/**
 * A radius with enough digits to show on which side of 1 it lies: 4 significant digits, more when it is
 * within 1e-3 of 1 (1.0000001 must not print as 1).
 */
export function radiusText(r: number): string {
  const gap = Math.abs(r - 1);
  const digits = gap > 0 && gap < 1e-3 ? Math.min(17, Math.ceil(-Math.log10(gap)) + 2) : 4;
  return shortNumber(r, digits);
}

/** A pole coordinate: like radiusText, so a pole at 1.0000001 does not print as 1. */
const nearOne = (x: number): string =>
  Math.abs(Math.abs(x) - 1) < 1e-3 ? (x < 0 ? '-' : '') + radiusText(Math.abs(x)) : formatNumber(x);

/** "pole at -0.5" / "pole pair at 0.9 ± 0.5j", with "double"/"triple"/"4-fold" for repeated poles. */
export function describePole(p: Root): string {
  const rep =
    p.multiplicity === 1 ? '' : (['', '', 'double ', 'triple '][p.multiplicity] ?? `${p.multiplicity}-fold `);
  return p.im === 0
    ? `${rep}pole at ${nearOne(p.re)}`
    : `${rep}pole pair at ${nearOne(p.re)} ± ${formatNumber(p.im)}j`;
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
      decidedBy: 'roots',
    };
  }
  const maxPoleRadius = Math.max(...poles.map(radius));
  const outside = poles.filter((p) => radius(p) > 1 + UNIT_CIRCLE_TOLERANCE);
  if (outside.length > 0) {
    const reason = listed(outside, (p) => `${describePole(p)} has radius ${radiusText(radius(p))} > 1`);
    return { verdict: 'unstable', maxPoleRadius, responsible: outside, reason, decidedBy: 'roots' };
  }
  const on = poles.filter((p) => Math.abs(radius(p) - 1) <= UNIT_CIRCLE_TOLERANCE);
  const repeated = on.filter((p) => p.multiplicity > 1);
  if (repeated.length > 0) {
    const reason = listed(
      repeated,
      (p) => `${describePole(p)} is repeated on the unit circle, so the response grows`,
    );
    return { verdict: 'unstable', maxPoleRadius, responsible: repeated, reason, decidedBy: 'roots' };
  }
  if (on.length > 0) {
    const reason = listed(
      on,
      (p) => `${describePole(p)} lies on the unit circle, so the response neither decays nor grows`,
    );
    return { verdict: 'marginal', maxPoleRadius, responsible: on, reason, decidedBy: 'roots' };
  }
  const largest = poles.filter((p) => radius(p) === maxPoleRadius);
  const reason = `every pole is inside the unit circle; the largest radius is ${radiusText(maxPoleRadius)} (${describePole(largest[0]!)})`;
  return { verdict: 'stable', maxPoleRadius, responsible: largest, reason, decidedBy: 'roots' };
}
