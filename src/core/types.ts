/**
 * Shared engine types. Conventions that hold everywhere in src/core:
 * - Polynomials are coefficient arrays in DESCENDING powers (highest first), as numpy does. A b/a array in
 *   powers of z^-1 (b[k] multiplies z^-k) is the same array read as a polynomial in z of degree length-1.
 * - Frequencies inside the engine are radians per sample (omega in [0, pi]); hertz only at the edges,
 *   converted with the design's sample rate by units.ts, whose types keep the two apart.
 * - Roots of real-coefficient systems: a complex root is stored once with im > 0 and its conjugate is
 *   implied; a real root has im === 0.
 */

/** A complex number as a plain pair: the one complex type of the API surface and of code that is not hot. */
export interface Complex {
  re: number;
  im: number;
}

/** A root of a polynomial with its multiplicity. */
export interface Root extends Complex {
  multiplicity: number;
}

/** Zeros/poles/gain: H(z) = gain * prod(z - zero) / prod(z - pole), over every root and implied conjugate. */
export interface Zpk {
  /** Zeros with im >= 0; a zero with im > 0 implies its conjugate. */
  zeros: Root[];
  /** Poles with im >= 0; a pole with im > 0 implies its conjugate. */
  poles: Root[];
  /** The k of H(z) = k * prod(z - z_i) / prod(z - p_i). */
  gain: number;
}

/** Transfer function H(z) = B(z^-1) / A(z^-1); b[k] and a[k] multiply z^-k. a[0] need not be 1. */
export interface TransferFunction {
  b: number[];
  a: number[];
}

/** One second-order section row [b0, b1, b2, a0, a1, a2] in powers of z^-1, as scipy's sos rows. */
export type Section = [number, number, number, number, number, number];

/** Result of an operation that can fail on user input: either a value or an error a user can act on. */
export type Result<T, E = InputError> = { ok: true; value: T } | { ok: false; error: E };

/** An error in something the user typed or loaded: what was wrong, where (0-based character offset), what is accepted. */
export interface InputError {
  message: string;
  /** 0-based character offset into the input, when the error has a place. */
  position?: number;
  /** What would have been accepted at that place. */
  expected?: string;
  /** The parameter at fault (a designer description's key), so a form can mark that field. */
  parameter?: string;
  /** The item of a list parameter at fault, 0-based. */
  index?: number;
}
