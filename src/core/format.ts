/**
 * The one rule for numbers people read — every read-out of the page and the command line's printed text:
 * figures, not float noise. A level within DB_RESOLUTION of 0 dB reads 0 dB; a level no double can tell
 * from zero reads "< −300 dB", an exact zero "−∞ dB (exact zero)"; a margin says what it is ("passes by
 * 0.0143 dB", "fails by 2.01 dB") and an infinite or undefined one says why.
 */
import { MASK_PASS_TOLERANCE_DB } from './mask/evaluate.ts';

/** How a figure is written: the page's typography, or plain ASCII for the command line. */
export interface FormatStyle {
  /** '-' for '−', 'inf' for '∞', '<=' for '≤'. */
  ascii?: boolean;
}

/**
 * Smallest level difference a read-out shows, dB: finer is rounding (a unit gain through a cascade comes
 * out 1e-14 dB off). The same as the mask's pass tolerance, so a margin that reads 0 dB also passes.
 */
export const DB_RESOLUTION = MASK_PASS_TOLERANCE_DB;
/**
 * Lowest level a read-out states, dB: |H| below 1e-15 is below what double precision resolves next to the
 * 0 dB parts of a response, so the figure itself is noise.
 */
export const DB_FLOOR = -300;

const asciiOf = (s: string) => s.replace(/−/g, '-').replace(/∞/g, 'inf').replace(/≤/g, '<=');
const styled = (s: string, style: FormatStyle) => (style.ascii ? asciiOf(s) : s);

/** A number with `digits` significant digits, no trailing zeros, exponent form when very large/small. */
export function formatNumber(x: number, digits = 4, style: FormatStyle = {}): string {
  if (!Number.isFinite(x)) return styled(Number.isNaN(x) ? 'NaN' : x > 0 ? '∞' : '−∞', style);
  if (x === 0) return '0';
  const ax = Math.abs(x);
  // toPrecision writes 4160 to 3 digits as "4.16e+3": below a million, whole numbers read better.
  const s =
    ax >= 1e6 || ax < 1e-4
      ? x.toExponential(digits - 1)
      : ax >= 1
        ? String(Number(x.toPrecision(digits)))
        : x.toPrecision(digits);
  const trimmed = s.includes('e')
    ? s.replace(/\.?0+e/, 'e').replace('e+', 'e')
    : s.includes('.')
      ? s.replace(/\.?0+$/, '')
      : s;
  return styled(trimmed.replace(/^-/, '−'), style);
}

/** A frequency in Hz or kHz, e.g. "50 Hz", "3.15 kHz". */
export function formatHz(hz: number, digits = 4, style: FormatStyle = {}): string {
  if (Math.abs(hz) >= 1000) return `${formatNumber(hz / 1000, digits, style)} kHz`;
  return `${formatNumber(hz, digits, style)} Hz`;
}

/**
 * A level in dB as people read it: "−40.2 dB"; "0 dB" within DB_RESOLUTION of 0; "< −300 dB" below
 * DB_FLOOR; "−∞ dB (exact zero)" for an exact zero; "+∞ dB (infinite)"; "undefined" for NaN.
 */
export function formatDb(db: number, digits = 4, style: FormatStyle = {}): string {
  if (Number.isNaN(db)) return 'undefined';
  if (db === -Infinity) return styled('−∞ dB (exact zero)', style);
  if (db === Infinity) return styled('+∞ dB (infinite)', style);
  if (db < DB_FLOOR) return styled(`< ${formatNumber(DB_FLOOR, 4)} dB`, style);
  if (Math.abs(db) < DB_RESOLUTION) return '0 dB';
  return `${formatNumber(db, digits, style)} dB`;
}

/**
 * The figure of a level with a fixed number of decimals, for tables whose columns line up ("−86.9"; the
 * caller writes the unit, dB or dBFS): rounding never leaves "−0.0", and the floor and infinities follow
 * formatDb ("< −300", "−∞", "∞").
 */
export function formatDbFigure(db: number, decimals = 1, style: FormatStyle = {}): string {
  if (Number.isNaN(db)) return 'undefined';
  if (!Number.isFinite(db)) return styled(db < 0 ? '−∞' : '∞', style);
  if (db < DB_FLOOR) return styled(`< ${formatNumber(DB_FLOOR, 4)}`, style);
  const text = db.toFixed(decimals);
  return styled(Number(text) === 0 ? text.replace('-', '') : text.replace('-', '−'), style);
}

/** A level difference with its sign, "+0.19 dB" / "−2.01 dB" / "0 dB" (same rule as formatDb). */
export function formatSignedDb(db: number, digits = 4, style: FormatStyle = {}): string {
  const s = formatDb(db, digits, style);
  return db > 0 && Number.isFinite(db) && s !== '0 dB' ? `+${s}` : s;
}

/**
 * A margin to a limit in words (positive: inside the limits): "passes by 0.0143 dB", "fails by 2.01 dB",
 * "passes at the limit (within 0.000001 dB)", and for a margin that is not a figure what it means.
 */
export function formatMargin(marginDb: number, digits = 3, style: FormatStyle = {}): string {
  if (Number.isNaN(marginDb)) return 'not judged';
  if (marginDb === Infinity) return 'passes: no limit applies here';
  if (marginDb === -Infinity) return 'fails: a root on the unit circle takes the response to ±∞ dB';
  if (Math.abs(marginDb) < DB_RESOLUTION)
    return styled(`passes at the limit (within ${formatNumber(DB_RESOLUTION, 1)} dB)`, style);
  return `${marginDb > 0 ? 'passes' : 'fails'} by ${formatDb(Math.abs(marginDb), digits, style)}`;
}

/** A duration in s, ms or µs. */
export function formatSeconds(s: number, digits = 3, style: FormatStyle = {}): string {
  const a = Math.abs(s);
  if (!Number.isFinite(s)) return formatNumber(s, digits, style);
  if (a >= 1) return `${formatNumber(s, digits, style)} s`;
  if (a >= 1e-3) return `${formatNumber(s * 1e3, digits, style)} ms`;
  return `${formatNumber(s * 1e6, digits, style)} ${style.ascii ? 'us' : 'µs'}`;
}

/** A complex number as "a + bj" / "a − bj". */
export function formatComplex(re: number, im: number, digits = 4, style: FormatStyle = {}): string {
  if (im === 0) return formatNumber(re, digits, style);
  const sign = im < 0 ? '−' : '+';
  return styled(`${formatNumber(re, digits)} ${sign} ${formatNumber(Math.abs(im), digits)}j`, style);
}
