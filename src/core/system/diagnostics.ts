/**
 * Diagnostics of the zeros and poles computed from typed coefficients (see roots/diagnostics.ts): the same
 * polynomials tfToZpk solves, so the bounds belong to the roots the design holds. Roots that were placed or
 * designed are exact as stored and get an error bound of 0.
 */
import type { Root, TransferFunction, Zpk } from '../types.ts';
import { diagnoseRoots, type PolynomialDiagnostics, type RootDiagnostic } from '../roots/diagnostics.ts';
import { expandRoots } from './rootList.ts';

export { uncertainRoots } from './uncertainRoots.ts';

/** Diagnostics for a whole system. */
export interface SystemDiagnostics {
  /** 'typed': roots computed from coefficients as typed; 'roots': roots as placed or designed (exact). */
  source: 'typed' | 'roots';
  /** Every root search converged. */
  converged: boolean;
  /** Set backward error of the zeros (from b) and the poles (from a); 0 for exact roots. */
  setBackwardError: { zeros: number; poles: number };
  /** Stored form (im ≥ 0) with an error bound each. */
  zeros: RootDiagnostic[];
  poles: RootDiagnostic[];
}

/** The padded, leading-zero-free numerator and denominator polynomials tfToZpk finds roots of. */
function polynomials(tf: TransferFunction): { b: number[] | null; a: number[] } {
  const n = Math.max(tf.b.length, tf.a.length);
  const b = [...tf.b, ...new Array<number>(n - tf.b.length).fill(0)];
  const a = [...tf.a, ...new Array<number>(n - tf.a.length).fill(0)];
  const lb = b.findIndex((v) => v !== 0);
  const la = a.findIndex((v) => v !== 0);
  return { b: lb < 0 ? null : b.slice(lb), a: a.slice(Math.max(0, la)) };
}

const empty: PolynomialDiagnostics = { converged: true, setBackwardError: 0, roots: [] };

/** Diagnostics for roots computed from the typed coefficients tf (b, a in powers of z^-1). */
export function typedDiagnostics(tf: TransferFunction): SystemDiagnostics {
  const { b, a } = polynomials(tf);
  const zeros = b ? diagnoseRoots(b) : empty;
  const poles = diagnoseRoots(a);
  return {
    source: 'typed',
    converged: zeros.converged && poles.converged,
    setBackwardError: { zeros: zeros.setBackwardError, poles: poles.setBackwardError },
    zeros: zeros.roots,
    poles: poles.roots,
  };
}

/** Diagnostics for exact roots (placed or designed): bound 0 everywhere. */
export function exactDiagnostics(zpk: Zpk): SystemDiagnostics {
  const exact = (rs: Root[]) =>
    expandRoots(rs)
      .filter((r) => r.im >= 0)
      .map((r) => ({ ...r, errorBound: 0, uncertain: false }));
  return {
    source: 'roots',
    converged: true,
    setBackwardError: { zeros: 0, poles: 0 },
    zeros: exact(zpk.zeros),
    poles: exact(zpk.poles),
  };
}
