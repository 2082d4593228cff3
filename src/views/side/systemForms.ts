/** The current system written in every text form the entry reads, for display and copying. */
import {
  printCoefficients,
  printDifferenceEquation,
  printFactored,
  printRationalZ,
  printRationalZinv,
  printRoots,
  type PrintOptions,
} from '../../core/print/index.ts';
import type { TransferFunction, Zpk } from '../../core/types.ts';

export interface SystemForm {
  label: string;
  text: string;
}

/** Every form of the system; `digits` rounds for display, undefined prints every digit (exact round trip). */
export function systemForms(tf: TransferFunction, zpk: Zpk, digits: number | undefined): SystemForm[] {
  const opts: PrintOptions = digits === undefined ? {} : { digits };
  return [
    { label: 'Difference equation, delay form', text: printDifferenceEquation(tf, 'delay', opts) },
    { label: 'Difference equation, advance form', text: printDifferenceEquation(tf, 'advance', opts) },
    { label: 'H(z) in z', text: printRationalZ(tf, opts) },
    { label: 'H(z) in z⁻¹', text: printRationalZinv(tf, opts) },
    { label: 'Factored', text: printFactored(zpk, opts) },
    { label: 'Coefficients b, a (powers of z⁻¹)', text: printCoefficients(tf, opts) },
    { label: 'Zeros, poles, gain', text: printRoots(zpk, opts) },
  ];
}
