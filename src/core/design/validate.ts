/** Checks of designer parameters that produce errors a user can act on. */
import type { InputError, Result } from '../types.ts';
import { shortNumber } from '../shortNumber.ts';

/** Highest order the classical designers accept. */
export const MAX_DESIGN_ORDER = 64;

/** Thrown inside a designer run and turned into an InputError result at its door. */
export class DesignInputError extends Error {
  constructor(
    message: string,
    readonly expected: string,
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
    const error: InputError = { message: e.message, expected: e.expected };
    return { ok: false, error };
  }
}

const fmt = (v: number) => shortNumber(v, 10);

/** A finite number > 0 (or >= lower, exclusive). */
export function positive(name: string, v: number | undefined, unit: string, lower = 0): number {
  const u = unit ? ` ${unit}` : '';
  const expected = `a number greater than ${fmt(lower)}${u}`;
  if (v === undefined) throw new DesignInputError(`${name} is missing`, expected);
  if (!Number.isFinite(v) || !(v > lower))
    throw new DesignInputError(`${name} = ${fmt(v)}${u} is not accepted`, expected);
  return v;
}

/** A sample rate in Hz. */
export const sampleRate = (fs: number) => positive('sample rate fs', fs, 'Hz');

/** A frequency strictly between 0 and Nyquist. */
export function inBand(name: string, f: number | undefined, fs: number): number {
  const expected = `a frequency between 0 and ${fmt(fs / 2)} Hz (fs/2), exclusive`;
  if (f === undefined) throw new DesignInputError(`${name} is missing`, expected);
  if (!Number.isFinite(f) || !(f > 0 && f < fs / 2))
    throw new DesignInputError(`${name} = ${fmt(f)} Hz lies outside (0, ${fmt(fs / 2)}) Hz`, expected);
  return f;
}

/** A list of `count` strictly increasing in-band frequencies. */
export function edges(
  name: string,
  list: readonly number[] | undefined,
  count: number,
  fs: number,
): number[] {
  const expected =
    count === 1
      ? `one frequency in (0, ${fmt(fs / 2)}) Hz`
      : `two increasing frequencies low,high in (0, ${fmt(fs / 2)}) Hz`;
  if (!list || list.length !== count)
    throw new DesignInputError(
      `${name} needs ${count === 1 ? 'one edge' : 'two edges'}, got ${list ? list.length : 'none'}`,
      expected,
    );
  list.forEach((f, i) => inBand(`${name}[${i}]`, f, fs));
  if (count === 2 && !(list[0]! < list[1]!))
    throw new DesignInputError(
      `${name} = ${fmt(list[0]!)},${fmt(list[1]!)} Hz is not in increasing order`,
      expected,
    );
  return list.slice();
}

/** A whole-number filter order 1..MAX_DESIGN_ORDER. */
export function designOrder(order: number): number {
  if (!Number.isInteger(order) || order < 1 || order > MAX_DESIGN_ORDER)
    throw new DesignInputError(
      `order ${fmt(order)} is not accepted`,
      `a whole number from 1 to ${MAX_DESIGN_ORDER}, or auto`,
    );
  return order;
}

/** Exactly one of two alternative parameters. */
export function oneOf(names: [string, string], a: number | undefined, b: number | undefined): 0 | 1 {
  if ((a === undefined) === (b === undefined))
    throw new DesignInputError(
      `give exactly one of ${names[0]} and ${names[1]}`,
      `${names[0]} or ${names[1]}, not both`,
    );
  return a !== undefined ? 0 : 1;
}
