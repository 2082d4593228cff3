/** What a designer returns. */
import type { Zpk } from '../types.ts';
import type { OrderEstimate } from './orderEstimate.ts';
import type { RequirementMargin } from './margin.ts';
import type { FamilyChoice } from './familyChoice.ts';

/** The roots, a one-line description, and for a requirement the order estimated and the margins reached. */
export interface DesignResult {
  zpk: Zpk;
  note: string;
  estimate?: OrderEstimate;
  margin?: RequirementMargin;
  /** For "any family": the family picked and every family's least order. */
  family?: FamilyChoice;
}
