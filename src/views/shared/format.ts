/** Number formatting for the page: values in the units engineers read. */

/** A number with `digits` significant digits, no trailing zeros, exponent form when very large/small. */
export function formatNumber(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return Number.isNaN(x) ? 'NaN' : x > 0 ? '∞' : '−∞';
  if (x === 0) return '0';
  const ax = Math.abs(x);
  const s = ax >= 1e6 || ax < 1e-4 ? x.toExponential(digits - 1) : x.toPrecision(digits);
  const trimmed = s.includes('e')
    ? s.replace(/\.?0+e/, 'e').replace('e+', 'e')
    : s.includes('.')
      ? s.replace(/\.?0+$/, '')
      : s;
  return trimmed.replace(/^-/, '−');
}

/** A frequency in Hz or kHz, e.g. "50 Hz", "3.15 kHz". */
export function formatHz(hz: number, digits = 4): string {
  if (Math.abs(hz) >= 1000) return `${formatNumber(hz / 1000, digits)} kHz`;
  return `${formatNumber(hz, digits)} Hz`;
}

/** A level in dB, e.g. "−40.2 dB". */
export function formatDb(db: number, digits = 4): string {
  return `${formatNumber(db, digits)} dB`;
}

/** A duration in s, ms or µs. */
export function formatSeconds(s: number, digits = 3): string {
  const a = Math.abs(s);
  if (!Number.isFinite(s)) return formatNumber(s);
  if (a >= 1) return `${formatNumber(s, digits)} s`;
  if (a >= 1e-3) return `${formatNumber(s * 1e3, digits)} ms`;
  return `${formatNumber(s * 1e6, digits)} µs`;
}

/** A complex number as "a + bj" / "a − bj". */
export function formatComplex(re: number, im: number, digits = 4): string {
  if (im === 0) return formatNumber(re, digits);
  const sign = im < 0 ? '−' : '+';
  return `${formatNumber(re, digits)} ${sign} ${formatNumber(Math.abs(im), digits)}j`;
}
