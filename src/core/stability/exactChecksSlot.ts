/**
 * Where the page finds the exact checks (exactChecks.ts): the stability verdict on typed coefficients
 * decided exactly, the check that a design's multiplied-out b, a still are the design, and the error
 * bounds of roots computed from typed coefficients. Their big-integer and compensated arithmetic is not in
 * the page's first view: the page installs them when their chunk arrives (store/exactChecks.ts), and until
 * then says the verdict is being checked rather than give one. The command line and the tests call them
 * directly.
 */
import type { stabilityOfTyped } from './typed.ts';
import type { checkExpandedCoefficients } from '../system/expandedCheck.ts';
import type { typedDiagnostics } from '../system/diagnostics.ts';

export interface ExactChecks {
  stabilityOfTyped: typeof stabilityOfTyped;
  checkExpandedCoefficients: typeof checkExpandedCoefficients;
  typedDiagnostics: typeof typedDiagnostics;
}

let installed: ExactChecks | null = null;

/** Installs the checks (null removes them, for tests of the page's loading path). */
export function installExactChecks(checks: ExactChecks | null): void {
  installed = checks;
}

/** The installed checks, or null before they have arrived. */
export function exactChecks(): ExactChecks | null {
  return installed;
}
