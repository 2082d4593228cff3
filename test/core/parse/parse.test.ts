import { describe, expect, it } from 'vitest';
import {
  detectForm,
  parseCoefficients,
  parseDifferenceEquation,
  parseNumber,
  parseRational,
  parseRoots,
  parseSystem,
} from '../../../src/core/parse/index.ts';
import type { Result, TransferFunction } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** The value of an ok Result, failing the test with the error message otherwise. */
function value<T>(r: Result<T>): T {
  if (!r.ok) throw new Error(`expected ok, got: ${r.error.message}`);
  return r.value;
}

/** b, a divided by a[0], trailing zeros dropped, -0 as 0: the form two equal systems share. */
function normalised(tf: TransferFunction): TransferFunction {
  const trim = (p: number[]): number[] => {
    let e = p.length;
    while (e > 1 && p[e - 1] === 0) e--;
    return p.slice(0, e).map((v) => v / tf.a[0]! + 0);
  };
  return { b: trim(tf.b), a: trim(tf.a) };
}

// y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]: a double pole at 0.8 and zeros at ±1.
// H(z) = (1 - z^-2)/(1 - 1.6 z^-1 + 0.64 z^-2) = (z-1)(z+1)/(z-0.8)^2, expanded by hand (common practice).
const EXAMPLE = { b: [1, 0, -1], a: [1, -1.6, 0.64] };

describe('parseSystem: one system, every entry form', () => {
  const exact: [string, string][] = [
    ['y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]', 'difference equation, delay form'],
    ['y[n+2] - 1.6y[n+1] + 0.64y[n] = x[n+2] - x[n]', 'difference equation, advance form'],
    ['y[n] - 1.6y[n-1] + 0.64y[n-2] = x[n] - x[n-2]', 'difference equation, delay form'],
    ['x[n] - x[n-2] + 1.6 y[n-1] - 0.64*y[n-2] = y[n]', 'difference equation, delay form'],
    ['y(n) = 1.6y(n-1) - 0.64 y(n-2) + x(n) - x(n-2)', 'difference equation, delay form'],
    [
      'y[n] = 0.8 y[n-1] + 0.8 y[n-1] - 0.32 y[n-2] - 0.32y[n-2] + x[n] - x[n-2]',
      'difference equation, delay form',
    ],
    ['y[n+1] = 1.6 y[n] - 0.64 y[n-1] + x[n+1] - x[n-1]', 'difference equation, shifted form'],
    ['H(z) = (z^2 - 1)/(z^2 - 1.6z + 0.64)', 'H(z) in z'],
    ['(1 - z^-2)/(1 - 1.6z^-1 + 0.64z^-2)', 'H(z) in z^-1'],
    ['(1 - z^(-2))/(1 - 1.6 z⁻¹ + 0.64/z^2)', 'H(z) in z^-1'],
    ['H(z) = (1 - z⁻²) / (1 - 1.6/z + 0.64 z^-2)', 'H(z) in z^-1'],
    ['(z - 1/z)/(z - 1.6 + 0.64 z^-1)', 'H(z) in z and z^-1'],
    ['1/((1 - 1.6z^-1 + 0.64z^-2)/(1 - z^-2))', 'H(z) in z^-1'],
    ['b = [1, 0, -1]; a = [1, -1.6, 0.64]', 'coefficient lists b and a'],
    ['b: 1 0 -1  a: 1 -1.6 0.64', 'coefficient lists b and a'],
    ['1, 0, -1\n1, -1.6, 0.64', 'coefficient lists b and a'],
    ['[1 0 -1] [1 -1.6 0.64]', 'coefficient lists b and a'],
    ['num = 1, 0, -1\nden = 1, -(1.6), 16/25', 'coefficient lists b and a'],
  ];
  it.each(exact)('%s gives b=[1,0,-1], a=[1,-1.6,0.64] exactly', (text, detail) => {
    const parsed = value(parseSystem(text));
    expect(parsed.detail).toBe(detail);
    expect(normalised(parsed.tf)).toEqual(EXAMPLE);
  });

  const rounded = [
    '(z-1)(z+1)/(z-0.8)^2',
    'H(z) = (z - 1)(z + 1) / (z - 0.8)^2',
    '(1 - z^-1)(1 + z^-1)/(1 - 0.8z^-1)^2',
    'zeros: 1, -1; poles: 0.8 x2',
    'zeros: ±1; poles: 0.8, 0.8; gain: 1',
    'poles = [0.8 0.8]; zeros = [1 -1]',
    'zeros: 1@0deg, 1∠180°; poles: 0.8 x2',
  ];
  it.each(rounded)('%s gives the same system within rounding', (text) => {
    const tf = normalised(value(parseSystem(text)).tf);
    expectClose(tf.b, EXAMPLE.b, { abs: 1e-15 }, 'b');
    expectClose(tf.a, EXAMPLE.a, { abs: 1e-15 }, 'a'); // 0.8^2 = 0.6400000000000001 in doubles
  });

  it('keeps b, a as typed, not normalised', () => {
    expect(value(parseSystem('2y[n] - y[n-1] = 4x[n]')).tf).toEqual({ b: [4], a: [2, -1] });
    expect(value(parseSystem('x[n] = y[n] - 0.5y[n-1]')).tf).toEqual({ b: [1], a: [1, -0.5] });
    expect(value(parseSystem('(2 - z^-1)/(4 - 2z^-1)')).tf).toEqual({ b: [2, -1], a: [4, -2] });
    expect(value(parseSystem('b = [2]; a = [4, 1]')).tf).toEqual({ b: [2], a: [4, 1] });
  });

  it('reads the sign arrangement of output and input freely', () => {
    const a = value(parseSystem('y[n] - 0.5y[n-1] = x[n]')).tf;
    const b = value(parseSystem('y[n] = 0.5 y[n-1] + x[n]')).tf;
    const c = value(parseSystem('0 = x[n] - y[n] + 0.5y[n-1]')).tf;
    expect(normalised(a)).toEqual({ b: [1], a: [1, -0.5] });
    expect(normalised(b)).toEqual(normalised(a));
    expect(normalised(c)).toEqual(normalised(a));
  });

  it('accepts implicit and explicit products, fractions, exponents and parentheses in coefficients', () => {
    const tf = value(
      parseSystem('y[n] = 0.5y[n-1] + 2 x[n] + (1/3)x[n-1] - 1e-3*x[n-2] + 2^-3 x[n-3] - (0.9^2) x[n-4]'),
    );
    expect(tf.tf).toEqual({ b: [2, 1 / 3, -0.001, 0.125, -0.81], a: [1, -0.5] });
    expect(value(parseSystem('y[n] = -(-0.25) y[n-2] + x[n]')).tf).toEqual({ b: [1], a: [1, 0, -0.25] });
  });

  it('recognises an FIR coefficient list and a lone y[n]', () => {
    const fir = value(parseSystem('0.25, 0.5, 0.25'));
    expect(fir.detail).toBe('coefficient list b (FIR)');
    expect(fir.tf).toEqual({ b: [0.25, 0.5, 0.25], a: [1] });
    expect(value(parseSystem('y[n] = (x[n] + x[n-1] + x[n-2])/3')).tf).toEqual({
      b: [1 / 3, 1 / 3, 1 / 3],
      a: [1],
    });
  });

  it('expands products, powers and a scale factor of H(z) in z^-1', () => {
    const tf = value(parseSystem('0.5 (1+z^-1)^2 / (1 - 1.2 z^-1 + 0.72 z^-2)')).tf;
    expect(tf).toEqual({ b: [0.5, 1, 0.5], a: [1, -1.2, 0.72] }); // (1+x)^2 = 1 + 2x + x^2, by hand
  });

  it('aligns mixed degrees: a numerator of lower degree in z becomes a delay', () => {
    // (z - 0.5)/(z^2 - 1.2z + 0.72) = (z^-1 - 0.5 z^-2)/(1 - 1.2 z^-1 + 0.72 z^-2), common practice
    expect(value(parseSystem('(z-0.5)/(z^2-1.2z+0.72)')).tf).toEqual({ b: [0, 1, -0.5], a: [1, -1.2, 0.72] });
    const cubic = value(parseSystem('(z-0.5)(z+1)^2/((z^2-1.2z+0.72) z)')).tf;
    // (z-0.5)(z^2+2z+1) = z^3 + 1.5z^2 - 0.5, by hand
    expect(cubic).toEqual({ b: [1, 1.5, 0, -0.5], a: [1, -1.2, 0.72] });
  });

  it('returns the zpk of a roots entry with complex roots stored once, im > 0', () => {
    const parsed = value(parseSystem('zeros: -1 x2; poles: 0.5±0.5j; gain: 0.25'));
    expect(parsed.form).toBe('roots');
    expect(parsed.zpk).toEqual({
      zeros: [{ re: -1, im: 0, multiplicity: 2 }],
      poles: [{ re: 0.5, im: 0.5, multiplicity: 1 }],
      gain: 0.25,
    });
    // 0.25 (z+1)^2 / (z^2 - z + 0.5), by hand
    expect(parsed.tf).toEqual({ b: [0.25, 0.5, 0.25], a: [1, -1, 0.5] });
  });
});

describe('parseRoots syntax', () => {
  it('treats a lone complex root, its explicit conjugate and ± alike', () => {
    const pair = [{ re: 0.5, im: 0.5, multiplicity: 1 }];
    for (const t of [
      'poles: 0.5+0.5j',
      'poles: 0.5-0.5j',
      'poles: 0.5±0.5j',
      'poles: 0.5+-0.5j',
      'poles: 0.5+0.5j, 0.5-0.5j',
      'poles: 0.5 + 0.5i',
    ]) {
      expect(value(parseRoots(t)).poles, t).toEqual(pair);
    }
    expect(value(parseRoots('poles: 0.5+0.5j x2')).poles).toEqual([{ re: 0.5, im: 0.5, multiplicity: 2 }]);
  });

  it('reads polar roots in degrees and radians', () => {
    const deg = value(parseRoots('poles: 0.9∠30°')).poles[0]!;
    const at = value(parseRoots('poles: 0.9@30deg')).poles[0]!;
    const rad = value(parseRoots('poles: 0.9@pi/6rad')).poles[0]!;
    for (const r of [deg, at, rad]) {
      expectClose(
        [r.re, r.im],
        [(0.9 * Math.sqrt(3)) / 2, 0.45],
        { rel: 1e-15 },
        'cos/sin 30°, common practice',
      );
    }
    expect(value(parseRoots('zeros: 1∠180°')).zeros).toEqual([{ re: -1, im: 0, multiplicity: 1 }]);
  });

  it('reads ± of a real offset as two real roots, gain expressions and empty sections', () => {
    expect(value(parseRoots('zeros: 0.5±0.2')).zeros.map((r) => r.re)).toEqual([0.7, 0.3]);
    const z = value(parseRoots('gain: 10^(-6/20); zeros: none; poles: []'));
    expect(z).toEqual({ zeros: [], poles: [], gain: Math.pow(10, -0.3) });
  });
});

describe('the other entry points', () => {
  it('parseNumber reads constant expressions', () => {
    expect(value(parseNumber('1/3'))).toBe(1 / 3);
    expect(value(parseNumber('2.5e-3'))).toBe(0.0025);
    expect(value(parseNumber('-0.5^2'))).toBe(-0.25); // unary minus binds looser than ^, common practice
    expect(value(parseNumber('2^-3'))).toBe(0.125);
    expect(value(parseNumber('2^3^2'))).toBe(512); // right-associative
    expect(value(parseNumber(' (1 + 2)(3) − 1 '))).toBe(8);
    expect(value(parseNumber('pi/2'))).toBe(Math.PI / 2);
  });

  it('each form-specific parser agrees with parseSystem', () => {
    expect(
      normalised(value(parseDifferenceEquation('y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]'))),
    ).toEqual(EXAMPLE);
    expect(normalised(value(parseRational('(1 - z^-2)/(1 - 1.6z^-1 + 0.64z^-2)')))).toEqual(EXAMPLE);
    expect(normalised(value(parseCoefficients('1 0 -1; 1 -1.6 0.64')))).toEqual(EXAMPLE);
  });

  it('splits white-space lists the matrix way', () => {
    expect(value(parseCoefficients('1 -0.5')).b).toEqual([1, -0.5]);
    expect(value(parseCoefficients('1 - 0.5')).b).toEqual([0.5]);
    expect(value(parseCoefficients('1 -(1/2) 2^-2')).b).toEqual([1, -0.5, 0.25]);
  });

  it('detects the form from the names used', () => {
    expect(detectForm('zeros: 1')).toBe('roots');
    expect(detectForm('y[n] = x[n]')).toBe('equation');
    expect(detectForm('1/(1 - 0.5z^-1)')).toBe('rational');
    expect(detectForm('1, 2, 3')).toBe('coefficients');
  });
});
