/**
 * What a number field does with its text, apart from drawing: read it with the one reader of typed numbers
 * (core/parse/typedNumber.ts), then apply the field's own rule. Pure, so every field's reading is tested
 * against the same policy table.
 */
import { readNumber, readNumberList, type TypedUnitName } from '../../core/parse/typedNumber.ts';

/** A field's reading of its text: the value, or the message shown beside the field. */
export type FieldReading<T> = { ok: true; value: T } | { ok: false; message: string };

/** How a number field reads: the typed unit it accepts, its own rule, and whether it may be left empty. */
export interface NumberFieldRule {
  /** The unit that may be typed after the number (its spellings: TYPED_UNITS). */
  typedUnit?: TypedUnitName;
  /** What a bare number is worth in that unit (1000 when a Hz field shows kHz); default 1. */
  bareFactor?: number;
  /** Why a number is not acceptable for this field, or null when it is. */
  check?: (x: number) => string | null;
  /** Empty text means "none" (a limit that can be removed) instead of a mistake. */
  optional?: boolean;
}

/** The reader's refusal as one sentence: what was wrong, then what is accepted. */
export function refusal(r: { message: string; expected: string }): string {
  return `${r.message[0]!.toUpperCase()}${r.message.slice(1)}; expected ${r.expected}.`;
}

/** Reads one number field's text (undefined only for an optional field left empty). */
export function readNumberField(text: string, rule: NumberFieldRule = {}): FieldReading<number | undefined> {
  if (rule.optional && text.trim() === '') return { ok: true, value: undefined };
  const r = readNumber(text, {
    ...(rule.typedUnit && { unit: rule.typedUnit }),
    ...(rule.bareFactor !== undefined && { bareFactor: rule.bareFactor }),
  });
  if (!r.ok) return { ok: false, message: refusal(r) };
  const why = rule.check?.(r.value) ?? null;
  return why === null ? { ok: true, value: r.value } : { ok: false, message: why };
}

/** Reads a list field's text (numbers separated by commas, spaces or semicolons), then the field's rule per item. */
export function readListField(text: string, check?: (x: number) => string | null): FieldReading<number[]> {
  const r = readNumberList(text);
  if (!r.ok) return { ok: false, message: refusal(r) };
  for (const [i, x] of r.values.entries()) {
    const why = check?.(x) ?? null;
    if (why !== null) return { ok: false, message: `Item ${i + 1}: ${why}` };
  }
  return { ok: true, value: r.values };
}
