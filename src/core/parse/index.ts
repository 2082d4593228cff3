/**
 * What engineers type, read into a system. Four forms, recognised automatically by parseSystem:
 * difference equations (equation.ts), H(z) as a rational expression (rational.ts), coefficient lists
 * (coefficients.ts) and zeros/poles/gain (roots.ts, which documents that syntax). Every entry point returns
 * a Result; errors carry a 0-based position and what would have been accepted.
 */
import type { Result, TransferFunction, Zpk } from '../types.ts';
import { coefficientsFromText } from './coefficients.ts';
import { equationFromText } from './equation.ts';
import { guard } from './errors.ts';
import { ratioExcess, ratioFromText, ratioToTransferFunction, ratioVariable } from './rational.ts';
import { zpkFromText } from './roots.ts';
import { withOriginPoles, zpkExcess, zpkToTransferFunction } from './zpk.ts';

export { parseCoefficients } from './coefficients.ts';
export { parseDifferenceEquation } from './equation.ts';
export { parseRational } from './rational.ts';
export { parseRoots, ROOTS_SYNTAX } from './roots.ts';
export { parseNumber } from './scalar.ts';
export { zpkToTransferFunction, zpkExcess, withOriginPoles } from './zpk.ts';

export type EntryForm = 'equation' | 'rational' | 'coefficients' | 'roots';

export interface ParsedSystem {
  /** What the input was recognised as. */
  form: EntryForm;
  /** A readable description, e.g. 'difference equation, delay form' or 'H(z) in z^-1'. */
  detail: string;
  /** b, a in powers of z^-1 exactly as typed (a[0] not normalised to 1). */
  tf: TransferFunction;
  /** Present when the input was given as roots. */
  zpk?: Zpk;
  /** Things the user should know about how the input was read (e.g. a delay added to make it causal). */
  notes: string[];
}

/** The note for an improper H(z) that was delayed by `excess` samples. */
function delayNote(excess: number): string[] {
  if (excess === 0) return [];
  const s = excess > 1 ? 's' : '';
  return [
    `H(z) as typed has ${excess} more zero${s} than poles, which no causal filter realises; ` +
      `${excess} pole${s} at the origin ${excess > 1 ? 'were' : 'was'} added (a delay of ${excess} sample${s}). The magnitude is unchanged.`,
  ];
}

const ROOT_LABEL = /(?:^|[\s;,])(?:zeros?|poles?|gain|[zpk])\s*[:=]/i;
const SIGNAL = /(?<![A-Za-z])[xy]\s*[[(]/;
const Z_VARIABLE = /(?<![A-Za-z])z(?![A-Za-z])/;

/** Which form the text looks like, from the names it uses. */
export function detectForm(text: string): EntryForm {
  if (ROOT_LABEL.test(text)) return 'roots';
  if (SIGNAL.test(text)) return 'equation';
  if (Z_VARIABLE.test(text)) return 'rational';
  return 'coefficients';
}

/** Reads a system from any of the four entry forms, recognising which one it is. */
export function parseSystem(text: string): Result<ParsedSystem> {
  return guard(text, (): ParsedSystem => {
    switch (detectForm(text)) {
      case 'roots': {
        const typed = zpkFromText(text);
        const excess = zpkExcess(typed);
        const zpk = withOriginPoles(typed, excess);
        const tf = zpkToTransferFunction(zpk);
        return { form: 'roots', detail: 'zeros, poles and gain', tf, zpk, notes: delayNote(excess) };
      }
      case 'equation': {
        const eq = equationFromText(text);
        return { form: 'equation', detail: `difference equation, ${eq.form}`, tf: eq.tf, notes: [] };
      }
      case 'rational': {
        const ratio = ratioFromText(text);
        return {
          form: 'rational',
          detail: ratioVariable(ratio),
          tf: ratioToTransferFunction(ratio),
          notes: delayNote(ratioExcess(ratio)),
        };
      }
      case 'coefficients': {
        const tf = coefficientsFromText(text);
        const detail = tf.a.length === 1 ? 'coefficient list b (FIR)' : 'coefficient lists b and a';
        return { form: 'coefficients', detail, tf, notes: [] };
      }
    }
  });
}
