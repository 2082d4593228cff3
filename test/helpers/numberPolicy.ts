/**
 * The policy for numbers people type (src/core/parse/typedNumber.ts) as tables, and a check that runs a
 * field's reading through them. Every number field of the page, the CLI and the CSV reader runs these
 * tables, so one text means one number everywhere.
 */
import { expect } from 'vitest';

/** A text typed into one field and the number it means, or null when it must be refused as not a number. */
export type PolicyCase = readonly [text: string, value: number | null];

/** One number in a field: marks, signs, exponents, fractions, and what is refused. */
export const SINGLE_FIELD_CASES: readonly PolicyCase[] = [
  ['0.5', 0.5],
  ['0,5', 0.5],
  [' 2 ', 2],
  ['+3', 3],
  ['-0.25', -0.25],
  ['−0.25', -0.25],
  ['.5', 0.5],
  ['5.', 5],
  ['1e-3', 1e-3],
  ['2.5E6', 2.5e6],
  ['1e−3', 1e-3],
  ['1/3', 1 / 3],
  ['−2,5/4', -0.625],
  ['3 / 4', 0.75],
  ['1e3/7', 1000 / 7],
  ['0,500', 0.5],
  ['1.000', 1],
  // A comma before exactly three digits may group thousands: refused as ambiguous.
  ['1,000', null],
  ['48,000', null],
  ['1/0', null],
  ['', null],
  ['   ', null],
  ['abc', null],
  ['1,2,3', null],
  ['1.2.3', null],
  ['1,5.2', null],
  ['1 000', null],
  ['0x10', null],
  ['inf', null],
  ['Infinity', null],
  ['NaN', null],
  ['pi', null],
  ['1e999', null],
  ['--1', null],
  ['1/-3', null],
  ['1/2/3', null],
];

/** Units in a field that has them (a frequency field), and a field that has none. */
export const HZ_FIELD_CASES: readonly PolicyCase[] = [
  ['50 Hz', 50],
  ['50Hz', 50],
  ['50 hz', 50],
  ['1.2 kHz', 1200],
  ['1,2kHz', 1200],
  ['0.001 MHz', 1000],
  ['1/4 kHz', 250],
  ['50 dB', null],
  ['50 kg', null],
  ['kHz', null],
];
export const DB_FIELD_CASES: readonly PolicyCase[] = [
  ['-40 dB', -40],
  ['−0,5dB', -0.5],
  ['3 Hz', null],
];
export const NO_UNIT_CASES: readonly PolicyCase[] = [
  ['50 Hz', null],
  ['2 dB', null],
];

/** A list of numbers: commas, semicolons and white space separate; the decimal mark is a point. */
export const LIST_CASES: readonly (readonly [text: string, values: number[] | null])[] = [
  ['0.5, -0.25', [0.5, -0.25]],
  ['0,5', [0, 5]],
  ['1e-3  −0.5;.75', [1e-3, -0.5, 0.75]],
  ['1/3 2/3', [1 / 3, 2 / 3]],
  ['1\n2\t3', [1, 2, 3]],
  [' 50, 150, 250 ', [50, 150, 250]],
  ['1,,2', [1, 2]],
  ['', null],
  ['x3', null],
  ['1, two', null],
  ['1/0', null],
  ['1 / 3', null],
  ['0.5 Hz', null],
];

/** A field's reading of its text. */
export type Reading = { ok: true; value: number | undefined } | { ok: false; message: string };

/** Messages of the one reader when text is not a number (as opposed to a field's own range or rule). */
const NOT_A_NUMBER =
  /not a number|nothing is typed|ambiguous|divides by zero|too large|not accepted here|takes no unit/i;

export interface FieldUnderTest {
  /** Reads the field's text the way the page does. */
  read: (text: string) => Reading;
  /** Whether the field's own rule (range, whole numbers) accepts a number; its refusal must not call it "not a number". */
  admissible: (x: number) => boolean;
  /** What one of the typed number is in the field's value (1000 where a bare number is kHz). */
  scale?: number;
}

/**
 * Runs the tables through one field: every number the policy reads is read to the same value (or refused by
 * the field's own rule, in its own words), and every text the policy refuses is refused as not a number.
 */
export function expectNumberPolicy(field: FieldUnderTest, ...tables: (readonly PolicyCase[])[]): void {
  const scale = field.scale ?? 1;
  for (const table of [SINGLE_FIELD_CASES, ...tables]) {
    for (const [text, value] of table) {
      const r = field.read(text);
      if (value === null) {
        expect(r.ok, `"${text}" must be refused`).toBe(false);
        if (!r.ok) expect(r.message, `"${text}"`).toMatch(NOT_A_NUMBER);
        continue;
      }
      // Units scale the number themselves; a bare number is in the field's own unit.
      const unitless = /^[\s\d.,+\-−/eE]*$/.test(text);
      const expected = unitless ? value * scale : value;
      if (field.admissible(expected)) {
        expect(r, `"${text}"`).toEqual({ ok: true, value: expected });
      } else {
        expect(r.ok, `"${text}" is outside the field's range`).toBe(false);
        if (!r.ok) expect(r.message, `"${text}"`).not.toMatch(/not a number/i);
      }
    }
  }
}

/** A list field's reading of its text. */
export type ListReading = { ok: true; value: number[] } | { ok: false; message: string };

/** Runs the list table through one list field (the field's own rule may refuse a number, in its own words). */
export function expectListPolicy(
  read: (text: string) => ListReading,
  admissible: (x: number) => boolean = () => true,
): void {
  for (const [text, values] of LIST_CASES) {
    const r = read(text);
    if (values === null) {
      expect(r.ok, `"${text}" must be refused`).toBe(false);
      if (!r.ok)
        expect(r.message, `"${text}"`).toMatch(/not a number|nothing is typed|at least one|divides by zero/i);
    } else if (values.every(admissible)) {
      expect(r, `"${text}"`).toEqual({ ok: true, value: values });
    } else {
      expect(r.ok, `"${text}" is outside the field's range`).toBe(false);
    }
  }
}
