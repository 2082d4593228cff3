import { describe, it, expect } from 'vitest';
import {
  DB_RESOLUTION,
  formatComplex,
  formatDb,
  formatDbFigure,
  formatHz,
  formatMargin,
  formatNumber,
  formatSeconds,
  formatSignedDb,
} from '../../src/core/format.ts';
import { MASK_PASS_TOLERANCE_DB } from '../../src/core/mask/evaluate.ts';

describe('numbers people read', () => {
  it('keeps significant digits and drops trailing zeros', () => {
    expect(formatNumber(0.5, 4)).toBe('0.5');
    expect(formatNumber(-1.23456, 3)).toBe('−1.23');
    expect(formatNumber(1.5e-7, 3)).toBe('1.5e-7');
    expect(formatNumber(Infinity)).toBe('∞');
    expect(formatNumber(-2.5, 4, { ascii: true })).toBe('-2.5');
    // A Q of 4160 to 3 digits: a whole number, not "4.16e3".
    expect(formatNumber(4163.7, 3)).toBe('4160');
    expect(formatNumber(-12345.6, 4)).toBe('−12350');
    expect(formatNumber(999999.9, 4)).toBe('1000000');
  });
  it('chooses Hz or kHz and s, ms or µs', () => {
    expect(formatHz(3150)).toBe('3.15 kHz');
    expect(formatHz(50)).toBe('50 Hz');
    expect(formatSeconds(0.0125)).toBe('12.5 ms');
    expect(formatSeconds(2e-6, 3, { ascii: true })).toBe('2 us');
  });
  it('prints a conjugate with a minus sign', () => {
    expect(formatComplex(0.5, -0.25)).toBe('0.5 − 0.25j');
    expect(formatComplex(0.5, -0.25, 4, { ascii: true })).toBe('0.5 - 0.25j');
  });

  // [level in dB, page text, command-line text]
  const LEVELS: [number, string, string][] = [
    [9.6e-15, '0 dB', '0 dB'], // a unit gain through a cascade, off by rounding
    [-3.1e-13, '0 dB', '0 dB'],
    [-5e-7, '0 dB', '0 dB'],
    [0, '0 dB', '0 dB'],
    [2e-6, '2e-6 dB', '2e-6 dB'],
    [0.0143, '0.0143 dB', '0.0143 dB'],
    [-40.2, '−40.2 dB', '-40.2 dB'],
    [-123.456789, '−123.5 dB', '-123.5 dB'],
    [-299.9, '−299.9 dB', '-299.9 dB'],
    [-322, '< −300 dB', '< -300 dB'], // |H| of 1e-16: no double tells it from zero next to 0 dB
    [-Infinity, '−∞ dB (exact zero)', '-inf dB (exact zero)'],
    [Infinity, '+∞ dB (infinite)', '+inf dB (infinite)'],
    [NaN, 'undefined', 'undefined'],
  ];
  it.each(LEVELS)('a level of %s dB reads %s', (db, page, cli) => {
    expect(formatDb(db)).toBe(page);
    expect(formatDb(db, 4, { ascii: true })).toBe(cli);
  });

  const FIGURES: [number, number, string][] = [
    [-86.94, 1, '−86.9'],
    [-0.04, 1, '0.0'],
    [0.04, 1, '0.0'],
    [-6.02, 1, '−6.0'],
    [-350, 1, '< −300'],
    [-Infinity, 1, '−∞'],
  ];
  it.each(FIGURES)('the figure of %s dB with %s decimals reads %s', (db, decimals, text) => {
    expect(formatDbFigure(db, decimals)).toBe(text);
  });

  const SIGNED: [number, string][] = [
    [0.19, '+0.19 dB'],
    [-2.01, '−2.01 dB'],
    [9.6e-15, '0 dB'],
    [-Infinity, '−∞ dB (exact zero)'],
  ];
  it.each(SIGNED)('a level difference of %s dB reads %s', (db, text) => {
    expect(formatSignedDb(db)).toBe(text);
  });

  const MARGINS: [number, string][] = [
    [0.0143, 'passes by 0.0143 dB'],
    [0.01432, 'passes by 0.0143 dB'],
    [-2.0149, 'fails by 2.01 dB'],
    [3e-9, 'passes at the limit (within 1e-6 dB)'],
    [-3e-9, 'passes at the limit (within 1e-6 dB)'],
    [Infinity, 'passes: no limit applies here'],
    [-Infinity, 'fails: a root on the unit circle takes the response to ±∞ dB'],
    [NaN, 'not judged'],
  ];
  it.each(MARGINS)('a margin of %s dB reads “%s”', (m, text) => {
    expect(formatMargin(m)).toBe(text);
  });

  it('shows a margin as 0 dB exactly where the mask lets it pass', () => {
    expect(DB_RESOLUTION).toBe(MASK_PASS_TOLERANCE_DB);
  });
});
