/**
 * Turns entry text into what the store's loadTyped needs: roots in the stored form, the gain, and the
 * coefficients exactly as typed. Anything that goes wrong comes back as an InputError, never a throw.
 */
import { parseSystem } from '../../../core/parse/index.ts';
import { compressRoots } from '../../../core/system/index.ts';
import { tfToZpk } from '../../../core/system/fromCoefficients.ts';
import type { InputError, Root, Zpk } from '../../../core/types.ts';
import type { TypedCoefficients } from '../../../core/model/design.ts';

export { locate, typedAbout, TYPED_NAME } from './entryText.ts';

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
