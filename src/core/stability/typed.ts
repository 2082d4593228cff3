/**
 * The verdict for a design that came as typed coefficients, decided exactly (coefficients.ts). Not in the
 * page's first view: it loads after the first paint with the other exact checks (exactChecks.ts).
 */
import type { Root, Zpk } from '../types.ts';
import { expandRoots } from '../system/rootList.ts';
import { stabilityOfCoefficients } from './coefficients.ts';
import { stabilityOfZpk, type Stability, type Verdict } from './index.ts';

const radius = (r: Root) => Math.hypot(r.re, r.im);

const TITLE: Record<Verdict, string> = {
  stable: 'stable',
  marginal: 'marginally stable',
  unstable: 'unstable',
};

/**
 * The verdict for a design that came as typed coefficients: the exact test on the denominator a (powers
 * of z^-1, as typed) decides; the computed poles give the radius and the poles to point at. Where the two
 * disagree, the coefficients win and the reason says what the computed poles suggested.
 */
export function stabilityOfTyped(zpk: Zpk, a: ArrayLike<number>): Stability {
  const byRoots = stabilityOfZpk(zpk);
  const exact = stabilityOfCoefficients(a);
  if (exact.verdict === byRoots.verdict)
    return {
      ...byRoots,
      reason: `${byRoots.reason} (confirmed exactly from the coefficients)`,
      decidedBy: 'coefficients',
    };
  const near = [...expandRoots(zpk.poles)]
    .filter((p) => p.im >= 0)
    .sort((p, q) => Math.abs(radius(q) - 1) - Math.abs(radius(p) - 1));
  return {
    verdict: exact.verdict,
    maxPoleRadius: byRoots.maxPoleRadius,
    responsible: near.length > 0 ? [near[near.length - 1]!] : [],
    reason: `${exact.reason}; the computed poles alone looked ${TITLE[byRoots.verdict]}, but they cannot be resolved that finely from these coefficients`,
    decidedBy: 'coefficients',
    rootsSuggested: byRoots.verdict,
  };
}
