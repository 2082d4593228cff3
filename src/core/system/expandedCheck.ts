/**
 * Whether a design's multiplied-out coefficients b, a still are the design. Multiplying out many roots
 * near each other (a low cut-off, a high order) rounds the coefficients so far that their own roots are
 * elsewhere: they can be unstable beside a stable design, or miss its response by decibels. Sections hold
 * the roots two at a time and keep the design.
 */
import type { Zpk } from '../types.ts';
import { zpkToTf } from './transferFunction.ts';
import { stabilityOfZpk, type Verdict } from '../stability/index.ts';
import { boundedStabilityOfCoefficients } from '../stability/coefficients.ts';
import { magnitudeDbZpk } from '../response/magnitude.ts';
import { frequencyGrid } from '../response/grid.ts';
import { coefficientsAt } from '../response/coefficients.ts';

/** The expanded b, a miss the design's magnitude by more than this (dB) somewhere: warn. */
export const EXPANDED_RESPONSE_TOLERANCE_DB = 0.1;

/** Only frequencies where the design is within this many dB of its peak are compared (deep stop-band noise aside). */
export const EXPANDED_COMPARE_RANGE_DB = 100;

/** Points of the comparison grid (plus every root's angle). */
const GRID_POINTS = 2048;

/** What the check found. */
export interface ExpandedCheck {
  /**
   * The expanded coefficients' own verdict, decided exactly; 'undecided' when the certified stages and the
   * work-limited exact test leave it open (high orders whose multiplied-out coefficients are far off).
   */
  coefficientVerdict: Verdict | 'undecided';
  /** The design's verdict from its roots. */
  designVerdict: Verdict;
  /** Largest |dB(b, a) − dB(design)| over the compared frequencies. */
  maxResponseErrorDb: number;
  /** Whether to warn: the verdicts differ, or the response error exceeds the tolerance. */
  warn: boolean;
  /** One sentence for the user (empty when there is nothing to say). */
  message: string;
}

const value = new Float64Array(2);

/** |B(e^{iω})/A(e^{iω})| in dB from coefficient arrays (powers of z^-1), by Horner's rule in e^{-iω}. */
function coefficientDb(b: number[], a: number[], omega: number): number {
  const at = (p: number[]) => {
    coefficientsAt(p, omega, value);
    return Math.hypot(value[0]!, value[1]!);
  };
  return 20 * Math.log10(at(b) / at(a));
}

/** Compares the design zpk with its own multiplied-out b, a. */
export function checkExpandedCoefficients(zpk: Zpk): ExpandedCheck {
  const { b, a } = zpkToTf(zpk);
  const designVerdict = stabilityOfZpk(zpk).verdict;
  const coefficientVerdict = boundedStabilityOfCoefficients(a)?.verdict ?? 'undecided';
  const grid = frequencyGrid(GRID_POINTS);
  const angles = [...zpk.zeros, ...zpk.poles].map((r) => Math.abs(Math.atan2(r.im, r.re)));
  const omega = Float64Array.from([...grid, ...angles]);
  const design = magnitudeDbZpk(zpk, omega);
  let peak = -Infinity;
  for (const v of design) if (v > peak) peak = v;
  let worst = 0;
  for (let i = 0; i < omega.length; i++) {
    if (!(design[i]! >= peak - EXPANDED_COMPARE_RANGE_DB)) continue;
    const d = Math.abs(coefficientDb(b, a, omega[i]!) - design[i]!);
    if (!(d <= worst)) worst = d;
  }
  const unstable = coefficientVerdict !== designVerdict;
  const off = !(worst <= EXPANDED_RESPONSE_TOLERANCE_DB);
  const parts: string[] = [];
  if (coefficientVerdict === 'undecided')
    parts.push('have no exact stability verdict within the work a page allows');
  else if (unstable)
    parts.push(`are ${coefficientVerdict} while the design is ${designVerdict} (exact test)`);
  if (off)
    parts.push(
      Number.isFinite(worst)
        ? `miss the design's magnitude response by up to ${worst.toPrecision(3)} dB`
        : "miss the design's magnitude response without bound (one has a notch or peak the other lacks)",
    );
  return {
    coefficientVerdict,
    designVerdict,
    maxResponseErrorDb: worst,
    warn: unstable || off,
    message:
      parts.length === 0
        ? ''
        : `the multiplied-out coefficients b, a ${parts.join(' and ')}: they are not this design; implement it as second-order sections`,
  };
}
