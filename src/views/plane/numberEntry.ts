/**
 * Reading a root typed by number: radius and angle (degrees, radians or Hz) or real and imaginary parts, and
 * its multiplicity, each read by the one reader of typed numbers. Returns the position or a message that
 * says which field was wrong, what was wrong and what is accepted.
 */
import type { Complex } from '../../core/types.ts';
import { MAX_MULTIPLICITY } from '../../core/model/limits.ts';
import type { TypedUnitName } from '../../core/parse/typedNumber.ts';
import { readNumberField, type NumberFieldRule } from '../shared/fieldReading.ts';
import { hzToOmega, omegaToHz, type Hertz, type RadPerSample } from '../../core/units.ts';

export type AngleUnit = 'deg' | 'rad' | 'hz';

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/** The angle in radians/sample for a value in the given unit at sample rate fs. */
export function angleToRadians(value: number, unit: AngleUnit, fs: Hertz): RadPerSample {
  if (unit === 'deg') return (value * Math.PI) / 180;
  if (unit === 'hz') return hzToOmega(value, fs);
  return value;
}

/** The angle of z in the given unit (upper half: 0…π, 0…180°, 0…fs/2). */
export function radiansToAngle(rad: RadPerSample, unit: AngleUnit, fs: Hertz): number {
  if (unit === 'deg') return (rad * 180) / Math.PI;
  if (unit === 'hz') return omegaToHz(rad, fs);
  return rad;
}

/** The unit an angle may be typed in, by the angle unit chosen. */
const TYPED_ANGLE: Record<AngleUnit, TypedUnitName> = { deg: '°', rad: 'rad', hz: 'Hz' };

/** A root's radius: 0 or more. */
export const radiusRule: NumberFieldRule = { check: (x) => (x >= 0 ? null : 'a radius is 0 or more') };
/** A root's angle in the chosen unit (that unit may be typed after it). */
export const angleRule = (unit: AngleUnit): NumberFieldRule => ({ typedUnit: TYPED_ANGLE[unit] });
/** A real or imaginary part, or a real root's position: any number. */
export const partRule: NumberFieldRule = {};
/** A root's multiplicity: a whole number from 1 to MAX_MULTIPLICITY. */
export const multiplicityRule: NumberFieldRule = {
  check: (m) =>
    Number.isInteger(m) && m >= 1 && m <= MAX_MULTIPLICITY
      ? null
      : `a multiplicity is a whole number from 1 to ${MAX_MULTIPLICITY}`,
};

/** One field of the editor read by its rule; the message names the field. */
function field(what: string, text: string, rule: NumberFieldRule): Parsed<number> {
  const r = readNumberField(text, rule);
  return r.ok ? { ok: true, value: r.value! } : { ok: false, message: `${what}: ${r.message}` };
}

/** Reads a real root's position. */
export function parseReal(text: string): Parsed<number> {
  return field('Position', text, partRule);
}

/** Reads radius and angle text into z. */
export function parsePolar(
  radiusText: string,
  angleText: string,
  unit: AngleUnit,
  fs: number,
): Parsed<Complex> {
  const r = field('Radius', radiusText, radiusRule);
  if (!r.ok) return r;
  const a = field('Angle', angleText, angleRule(unit));
  if (!a.ok) return a;
  const w = angleToRadians(a.value, unit, fs);
  return { ok: true, value: { re: r.value * Math.cos(w), im: r.value * Math.sin(w) } };
}

/** Reads real and imaginary part text into z. */
export function parseCartesian(reText: string, imText: string): Parsed<Complex> {
  const re = field('Real part', reText, partRule);
  if (!re.ok) return re;
  const im = field('Imaginary part', imText, partRule);
  if (!im.ok) return im;
  return { ok: true, value: { re: re.value, im: im.value } };
}
