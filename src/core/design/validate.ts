/** Errors of designer parameters that a user can act on, and the designers' limits. */
import type { InputError, Result } from '../types.ts';

/** Highest order the classical designers accept. */
export const MAX_DESIGN_ORDER = 64;
/** Highest order (taps − 1) the FIR designers accept: well inside the root finder's accurate range. */
export const MAX_FIR_ORDER = 512;

/**
 * Thrown inside a designer run and turned into an InputError result at its door. `parameter` names the
 * parameter at fault (its key in the description) and `index` the item of a list, so the page can mark
 * the field; both are absent when the error is about the design as a whole.
 */
export class DesignInputError extends Error {
  constructor(
    message: string,
    readonly expected: string,
    readonly parameter?: string,
    readonly index?: number,
  ) {
    super(message);
  }
}

/** Runs f, turning a DesignInputError into a failed Result. */
export function guard<T>(f: () => T): Result<T> {
  try {
    return { ok: true, value: f() };
  } catch (e) {
    if (!(e instanceof DesignInputError)) throw e;
    const error: InputError = {
      message: e.message,
      expected: e.expected,
      ...(e.parameter !== undefined && { parameter: e.parameter }),
      ...(e.index !== undefined && { index: e.index }),
    };
    return { ok: false, error };
  }
}
