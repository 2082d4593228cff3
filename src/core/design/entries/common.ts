/**
 * Parameters several designers share (a centre frequency, a width as a bandwidth or Q, a gain in dB), the
 * checks that tie them to the others, and starting values from the invented scenarios (50 Hz hum at 2 kHz,
 * a 120 Hz anti-alias low-pass at 1 kHz, a 1.2 kHz tone detector at 8 kHz).
 */
import { shortNumber } from '../../shortNumber.ts';
import { DesignInputError } from '../validate.ts';

/** A number for messages and notes. */
export const fmt = (v: number) => shortNumber(v, 6);

/** The centre (or fundamental, spacing, midpoint) of a designer: a frequency inside the band. */
export function centre(label: string, what: string, short = 'f0', hint?: string) {
  return {
    key: 'f0',
    flag: 'f0',
    label,
    short,
    what,
    unit: 'Hz',
    type: 'number',
    range: 'band',
    presence: 'required',
    ...(hint !== undefined && { hint }),
  } as const;
}

/** A −3 dB width in Hz, one of the two ways to give a notch's or peak's width. */
export const bandwidth = {
  key: 'bandwidthHz',
  flag: 'bandwidth',
  label: '−3 dB width',
  what: 'the −3 dB width in Hz',
  unit: 'Hz',
  type: 'number',
  range: 'positive',
  presence: 'optional',
} as const;

/** A quality factor, the other way to give a width (Q = f0 / bandwidth). */
export function quality(what: string) {
  return {
    key: 'q',
    flag: 'q',
    label: 'Q',
    what,
    type: 'number',
    range: 'positive',
    presence: 'optional',
  } as const;
}

/** A gain in dB (any finite number). */
export function gainDb(what: string) {
  return {
    key: 'gainDb',
    flag: 'gain-db',
    label: 'Gain',
    short: 'gain',
    what,
    unit: 'dB',
    type: 'number',
    range: 'finite',
    presence: 'required',
  } as const;
}

/** The width as a bandwidth or Q: the form's choice between them. */
export const NOTCH_WIDTH = { keys: ['bandwidthHz', 'q'], label: 'Width as' } as const;

/**
 * The −3 dB width in Hz of a notch or peak at centre f (Hz), from its bandwidth or Q, which must stay
 * below `below` Hz (names the width parameter given when it does not).
 */
export function widthHz(
  w: { bandwidthHz?: number; q?: number },
  f: number,
  below: number,
  what: string,
): number {
  const bw = w.bandwidthHz ?? f / w.q!;
  if (!(bw < below))
    throw new DesignInputError(
      `a ${fmt(bw)} Hz width is too wide for ${what}`,
      `a width below ${fmt(below)} Hz (Q above ${fmt(f / below)})`,
      w.bandwidthHz !== undefined ? 'bandwidthHz' : 'q',
    );
  return bw;
}

/** A value rounded to 3 significant digits. */
export const r3 = (v: number) => Number(v.toPrecision(3));

/** The hum a notch starts on at fs: 50 Hz mains where it fits comfortably below Nyquist, else fs/20. */
export const humHz = (fs: number) => r3(fs / 2 > 400 ? 50 : fs / 20);

/** Starting widths at fs: about 2 Hz for mains hum, and Q 25. */
export const startWidth = (fs: number) => ({
  bandwidthHz: r3(fs / 2 > 400 ? 2 : humHz(fs) / 25),
  q: 25,
});
