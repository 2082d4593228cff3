/**
 * Turns entry text into what the store's loadTyped needs: roots in the stored form, the gain, and the
 * coefficients exactly as typed. Anything that goes wrong comes back as an InputError, never a throw.
 */
import { parseSystem } from '../../../core/parse/index.ts';
import { compressRoots, tfToZpk } from '../../../core/system/index.ts';
import type { InputError, Root, Zpk } from '../../../core/types.ts';
import { emptyDesign, type Design, type TypedCoefficients } from '../../../core/model/design.ts';

export interface EntryReading {
  zeros: Root[];
  poles: Root[];
  gain: number;
  typed: TypedCoefficients;
  /** How the text was read, e.g. "difference equation, delay form". */
  detail: string;
}

/** Reads entry text into roots, gain and typed coefficients, or the error to show at its place. */
export function readEntry(
  text: string,
): { ok: true; value: EntryReading } | { ok: false; error: InputError } {
  const parsed = parseSystem(text);
  if (!parsed.ok) return parsed;
  const { tf, detail } = parsed.value;
  let zpk: Zpk;
  try {
    zpk = parsed.value.zpk ?? tfToZpk(tf);
  } catch (e) {
    const why = e instanceof Error ? e.message : 'the roots could not be found';
    return { ok: false, error: { message: `Read as ${detail}, but ${why}`, position: 0 } };
  }
  if (!Number.isFinite(zpk.gain)) {
    return { ok: false, error: { message: `Read as ${detail}, but the gain is not finite`, position: 0 } };
  }
  return {
    ok: true,
    value: {
      zeros: compressRoots(zpk.zeros),
      poles: compressRoots(zpk.poles),
      gain: zpk.gain,
      typed: { b: [...tf.b], a: [...tf.a], text },
      detail,
    },
  };
}

/** The line holding a 0-based offset, with the column inside it (1-based line number). */
export function locate(text: string, position: number): { line: number; lineText: string; column: number } {
  const p = Math.min(Math.max(0, position), text.length);
  const start = text.lastIndexOf('\n', p - 1) + 1;
  const endAt = text.indexOf('\n', p);
  const end = endAt < 0 ? text.length : endAt;
  const line = text.slice(0, start).split('\n').length;
  return { line, lineText: text.slice(start, end), column: p - start };
}

/** The name a typed system takes over from a scenario's or the empty design's name. */
export const TYPED_NAME = 'Typed system';

/**
 * Name and note for a design replaced by typed text: a scenario's note described other roots, so it goes
 * and the name with it; a name the user chose (a design without a note) stays.
 */
export function typedAbout(design: Pick<Design, 'name' | 'note'>): { name?: string; note?: string } {
  if (design.note) return { name: TYPED_NAME, note: '' };
  return design.name === emptyDesign().name ? { name: TYPED_NAME } : {};
}
