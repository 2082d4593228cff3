/**
 * Parse errors. Inside the parser a mistake is thrown as a ParseError so that deep recursion can stop at
 * once; every public entry point catches it (and anything unexpected) through `guard`, so callers only ever
 * see a Result.
 */
import type { InputError, Result } from '../types.ts';
import { MAX_TYPED_TEXT_CHARS } from '../model/limits.ts';

/** A mistake in the input at a 0-based character offset, with what would have been accepted there. */
export class ParseError extends Error {
  readonly position: number;
  readonly expected: string | undefined;
  constructor(message: string, position: number, expected?: string) {
    super(message);
    this.position = position;
    this.expected = expected;
  }
}

/** Throws a ParseError whose message ends with the 1-based column (position stays a 0-based offset), so the position is readable in the text too. */
export function fail(message: string, position: number, expected?: string): never {
  throw new ParseError(`${message} at column ${position + 1}`, position, expected);
}

/**
 * Runs a parse step and turns any thrown error into an InputError with a position inside the text. Text
 * longer than a design may keep (MAX_TYPED_TEXT_CHARS) is refused before any parsing.
 */
export function guard<T>(text: string, run: () => T): Result<T> {
  if (text.length > MAX_TYPED_TEXT_CHARS)
    return {
      ok: false,
      error: {
        message: `the text is ${text.length} characters long`,
        position: MAX_TYPED_TEXT_CHARS,
        expected: `at most ${MAX_TYPED_TEXT_CHARS} characters`,
      },
    };
  try {
    return { ok: true, value: run() };
  } catch (e) {
    if (e instanceof ParseError) {
      const error: InputError = { message: e.message, position: clamp(e.position, text.length) };
      if (e.expected !== undefined) error.expected = e.expected;
      return { ok: false, error };
    }
    // Very deep nesting can exhaust the stack; anything else is a bug, but the user still gets a message.
    const why = e instanceof RangeError ? 'the input is nested too deeply' : 'the input could not be read';
    return { ok: false, error: { message: why, position: 0 } };
  }
}

function clamp(p: number, n: number): number {
  return Number.isFinite(p) ? Math.min(Math.max(0, Math.trunc(p)), n) : 0;
}
