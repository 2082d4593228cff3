/** What a designer returns. */
import type { Zpk } from '../types.ts';
import type { OrderEstimate } from './orderEstimate.ts';
import type { RequirementMargin } from './margin.ts';

/** The roots, a one-line description, and for a requirement the order estimated and the margins reached. */
export interface DesignResult {
  zpk: Zpk;
  note: string;
  estimate?: OrderEstimate;
  margin?: RequirementMargin;
}
