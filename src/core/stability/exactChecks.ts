/**
 * The exact checks as one module (the page's chunk loaded after its first paint; see exactChecksSlot.ts).
 */
import type { ExactChecks } from './exactChecksSlot.ts';
import { stabilityOfTyped } from './typed.ts';
import { checkExpandedCoefficients } from '../system/expandedCheck.ts';
import { typedDiagnostics } from '../system/diagnostics.ts';

export const EXACT_CHECKS: ExactChecks = { stabilityOfTyped, checkExpandedCoefficients, typedDiagnostics };
