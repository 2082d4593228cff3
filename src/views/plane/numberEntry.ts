/**
 * Reading a root position typed by number: radius and angle (degrees, radians or Hz) or real and imaginary
 * parts. Returns the position or a message that says what was wrong and what is accepted.
 */
import type { Complex } from '../../core/types.ts';

export type AngleUnit = 'deg' | 'rad' | 'hz';

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/** A number typed by a person: accepts a Unicode minus and surrounding spaces; rejects empty text. */
export function parseUserNumber(text: string): number | null {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '' || !/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}

/** The angle in radians/sample for a value in the given unit at sample rate fs. */
export function angleToRadians(value: number, unit: AngleUnit, fs: number): number {
  if (unit === 'deg') return (value * Math.PI) / 180;
  if (unit === 'hz') return (2 * Math.PI * value) / fs;
  return value;
}

/** The angle of z in the given unit (upper half: 0…π, 0…180°, 0…fs/2). */
export function radiansToAngle(rad: number, unit: AngleUnit, fs: number): number {
  if (unit === 'deg') return (rad * 180) / Math.PI;
  if (unit === 'hz') return (rad * fs) / (2 * Math.PI);
  return rad;
}

const UNIT_WORDS: Record<AngleUnit, string> = { deg: 'degrees', rad: 'radians', hz: 'Hz' };

/** Reads radius and angle text into z. */
export function parsePolar(
  radiusText: string,
  angleText: string,
  unit: AngleUnit,
  fs: number,
): Parsed<Complex> {
  const r = parseUserNumber(radiusText);
  if (r === null || r < 0) {
    return { ok: false, message: `Radius “${radiusText.trim()}” is not a number ≥ 0 (e.g. 0.95).` };
  }
  const a = parseUserNumber(angleText);
  if (a === null) {
    return {
      ok: false,
      message: `Angle “${angleText.trim()}” is not a number in ${UNIT_WORDS[unit]} (e.g. ${unit === 'hz' ? fs / 8 : unit === 'deg' ? 45 : 0.785}).`,
    };
  }
  const w = angleToRadians(a, unit, fs);
  return { ok: true, value: { re: r * Math.cos(w), im: r * Math.sin(w) } };
}

/** Reads real and imaginary part text into z. */
export function parseCartesian(reText: string, imText: string): Parsed<Complex> {
  const re = parseUserNumber(reText);
  if (re === null)
    return { ok: false, message: `Real part “${reText.trim()}” is not a number (e.g. −0.5 or 1e-3).` };
  const im = parseUserNumber(imText);
  if (im === null)
    return { ok: false, message: `Imaginary part “${imText.trim()}” is not a number (e.g. 0.3).` };
  return { ok: true, value: { re, im } };
}
