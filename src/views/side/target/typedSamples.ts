/** Reads samples a user typed or pasted for the bit-exact run: numbers separated by commas, spaces or lines. */

/** Most samples accepted from the box. */
export const MAX_TYPED_SAMPLES = 65536;

export type TypedSamples = { ok: true; values: number[] } | { ok: false; message: string };

/** The numbers in the text, or what was wrong (which item, what is accepted). */
export function readTypedSamples(text: string): TypedSamples {
  const items = text
    .split(/[\s,;]+/)
    .map((t) => t.trim())
    .filter(Boolean);
  if (items.length === 0)
    return { ok: false, message: 'Type or paste at least one sample, e.g. 0.5, 0, -0.25.' };
  if (items.length > MAX_TYPED_SAMPLES)
    return {
      ok: false,
      message: `${items.length} samples is too many; at most ${MAX_TYPED_SAMPLES} are run.`,
    };
  const values: number[] = [];
  for (let i = 0; i < items.length; i++) {
    const t = items[i]!.replace(/^−/, '-');
    const v = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t) ? Number(t) : NaN;
    if (!Number.isFinite(v))
      return {
        ok: false,
        message: `Item ${i + 1}, "${items[i]}", is not a number; use plain decimals (full scale is ±1).`,
      };
    values.push(v);
  }
  return { ok: true, values };
}
