/**
 * Partial fractions and the closed-form response of H(z) given as b/a, whose poles the root finder has to
 * find first (poleSearch.ts). The page works from the stored roots (partialFractionsZpk,
 * closedFormResponseZpk), so its first view does without the root finder; these are for coefficients.
 */
import type { Root, TransferFunction } from '../types.ts';
import { polyMul } from '../poly.ts';
import { findPoleGroups } from './poleSearch.ts';
import { mergeRepeatedPoles } from './repeatedPoles.ts';
import { expandOverPoles, normalizeTf, type PartialFractions } from './partialFractions.ts';
import { inputTransform, toClosedForm, type ClosedForm, type TimeInput } from './closedForm.ts';

/** Partial-fraction expansion of H(z) in powers of z^-1 (scipy.signal.residuez convention). */
export function partialFractions(tf: TransferFunction): PartialFractions {
  const { b, a } = normalizeTf(tf);
  const poles = findPoleGroups(a);
  return expandOverPoles(b, a, mergeRepeatedPoles(a, poles.groups), poles.converged);
}

/** Closed form of the zero-state response of H(z) to an impulse, step or cosine input. */
export function closedFormResponse(tf: TransferFunction, input: TimeInput): ClosedForm {
  const { b, a } = normalizeTf(tf);
  const x = inputTransform(input);
  const poles = findPoleGroups(a);
  const groups: Root[] = [...poles.groups, ...x.poles];
  const aTotal = polyMul(a, x.a);
  const bTotal = polyMul(b, x.b);
  const pf = expandOverPoles(bTotal, aTotal, mergeRepeatedPoles(aTotal, groups), poles.converged);
  return toClosedForm(pf);
}
