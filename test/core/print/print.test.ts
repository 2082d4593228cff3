import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseRoots, parseSystem, zpkToTransferFunction } from '../../../src/core/parse/index.ts';
import {
  formatNumber,
  printCoefficients,
  printDifferenceEquation,
  printFactored,
  printRationalZ,
  printRationalZinv,
  printRoots,
} from '../../../src/core/print/index.ts';
import type { Root, TransferFunction, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const EXAMPLE = { b: [1, 0, -1], a: [1, -1.6, 0.64] };
const EXAMPLE_ZPK: Zpk = {
  zeros: [
    { re: 1, im: 0, multiplicity: 1 },
    { re: -1, im: 0, multiplicity: 1 },
  ],
  poles: [{ re: 0.8, im: 0, multiplicity: 2 }],
  gain: 1,
};

/** Trailing zeros dropped and -0 read as 0, optionally divided by a[0]: the arrays equal systems share. */
function trimmed(tf: TransferFunction, normalise = false): TransferFunction {
  const a0 = normalise ? tf.a[0]! : 1;
  const trim = (p: readonly number[]): number[] => {
    const q = p.map((v) => v / a0 + 0);
    let e = q.length;
    while (e > 1 && q[e - 1] === 0) e--;
    return q.slice(0, e);
  };
  return { b: trim(tf.b), a: trim(tf.a) };
}

function reparse(text: string): TransferFunction {
  const r = parseSystem(text);
  if (!r.ok) throw new Error(`'${text}' did not parse: ${r.error.message}`);
  return r.value.tf;
}

describe('printed forms', () => {
  it('print the example system as expected', () => {
    expect(printRationalZ(EXAMPLE)).toBe('H(z) = (z^2 - 1) / (z^2 - 1.6z + 0.64)');
    expect(printRationalZinv(EXAMPLE)).toBe('H(z) = (1 - z^-2) / (1 - 1.6z^-1 + 0.64z^-2)');
    expect(printDifferenceEquation(EXAMPLE, 'delay')).toBe('y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]');
    expect(printDifferenceEquation(EXAMPLE, 'advance')).toBe(
      'y[n+2] = 1.6 y[n+1] - 0.64 y[n] + x[n+2] - x[n]',
    );
    expect(printCoefficients(EXAMPLE)).toBe('b = [1, 0, -1]; a = [1, -1.6, 0.64]');
    expect(printFactored(EXAMPLE_ZPK)).toBe('H(z) = (z - 1) (z + 1) / (z - 0.8)^2');
    expect(printRoots(EXAMPLE_ZPK)).toBe('zeros: 1, -1; poles: 0.8 x2; gain: 1');
  });

  it('print complex roots, gains, a pole at the origin and empty lists', () => {
    const zpk: Zpk = {
      zeros: [],
      poles: [
        { re: 0.5, im: 0.5, multiplicity: 1 },
        { re: 0, im: 0, multiplicity: 1 },
      ],
      gain: -0.25,
    };
    expect(printFactored(zpk)).toBe('H(z) = -0.25 / ((z^2 - z + 0.5) z)');
    expect(printRoots(zpk)).toBe('zeros: none; poles: 0.5±0.5j, 0; gain: -0.25');
    expect(printRoots({ ...zpk, poles: [{ re: 0, im: 0.9, multiplicity: 3 }] })).toBe(
      'zeros: none; poles: ±0.9j x3; gain: -0.25',
    );
    expect(
      printRoots({ zeros: [], poles: [{ re: 0, im: 0.5, multiplicity: 1 }], gain: 1 }, { polar: true }),
    ).toBe('zeros: none; poles: 0.5∠90°; gain: 1');
  });

  it('writes a0 as typed rather than dividing by it', () => {
    expect(printDifferenceEquation({ b: [0, 3], a: [2, -1, 0] }, 'delay')).toBe('2 y[n] = y[n-1] + 3 x[n-1]');
    expect(printDifferenceEquation({ b: [1, 1], a: [-1] }, 'advance')).toBe('-y[n+1] = x[n+1] + x[n]');
  });

  it('rounds to significant digits on request, shortest round trip otherwise', () => {
    expect(formatNumber(0.1 + 0.2)).toBe('0.30000000000000004');
    expect(formatNumber(0.1 + 0.2, { digits: 6 })).toBe('0.3');
    expect(formatNumber(1 / 3, { digits: 4 })).toBe('0.3333');
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(1.5e-7)).toBe('1.5e-7');
    expect(printCoefficients({ b: [1 / 3], a: [1, -2 / 3] }, { digits: 3 })).toBe(
      'b = [0.333]; a = [1, -0.667]',
    );
  });
});

// Random coefficients: mostly ordinary doubles, with exact zeros, small integers and extremes mixed in.
const coefficient = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: -1e3, max: 1e3, noNaN: true }) },
  { weight: 2, arbitrary: fc.constant(0) },
  { weight: 1, arbitrary: fc.integer({ min: -5, max: 5 }) },
  { weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
);
const nonzero = coefficient.filter((v) => v !== 0);
const tfArb: fc.Arbitrary<TransferFunction> = fc
  .tuple(
    fc.array(coefficient, { minLength: 1, maxLength: 9 }),
    nonzero,
    fc.array(coefficient, { maxLength: 8 }),
  )
  .map(([b, a0, rest]) => ({ b, a: [a0, ...rest] }))
  // A system must stay a system once divided by a[0]: finite, with a numerator that does not underflow to 0.
  .filter(
    ({ b, a }) => [...b, ...a].every((v) => Number.isFinite(v / a[0]!)) && b.some((v) => v / a[0]! !== 0),
  );

const root: fc.Arbitrary<Root> = fc.record({
  re: fc.double({ min: -2, max: 2, noNaN: true }),
  im: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 2, noNaN: true })),
  multiplicity: fc.integer({ min: 1, max: 3 }),
});
const degree = (rs: readonly Root[]): number =>
  rs.reduce((s, r) => s + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
const distinct = (rs: Root[]): Root[] =>
  rs.filter((r, i) => rs.findIndex((o) => o.re === r.re && o.im === r.im) === i);
const zpkArb: fc.Arbitrary<Zpk> = fc
  .record({
    zeros: fc.array(root, { maxLength: 4 }).map(distinct),
    poles: fc.array(root, { maxLength: 4 }).map(distinct),
    gain: fc.double({ min: -100, max: 100, noNaN: true }).filter((g) => g !== 0),
  })
  .filter((z) => degree(z.zeros) <= degree(z.poles) && degree(z.poles) <= 12)
  .map((z) => ({
    ...z,
    zeros: z.zeros.map((r) => ({ ...r, re: r.re + 0 })),
    poles: z.poles.map((r) => ({ ...r, re: r.re + 0 })),
  }));

/** Coefficient-wise agreement scaled by the largest coefficient (cancellation makes some entries tiny). */
function expectSameTf(actual: TransferFunction, expected: TransferFunction, rel: number): void {
  const scale = (p: readonly number[]): number => Math.max(...p.map(Math.abs));
  const a = trimmed(actual);
  const e = trimmed(expected);
  expectClose(a.b, e.b, { abs: rel * scale(e.b) }, 'b');
  expectClose(a.a, e.a, { abs: rel * scale(e.a) }, 'a');
}

describe('parse(print(system)) gives the system back', () => {
  // The equation and list forms give the very arrays back; the rational forms too, except that a ratio of
  // two plain numbers is folded into one, hence the comparison after dividing by a[0] (exact either way).
  const exactPrinters: [string, (tf: TransferFunction) => string, boolean][] = [
    ['rational in z', printRationalZ, true],
    ['rational in z^-1', printRationalZinv, true],
    ['delay-form equation', (tf) => printDifferenceEquation(tf, 'delay'), false],
    ['advance-form equation', (tf) => printDifferenceEquation(tf, 'advance'), false],
    ['coefficient lists', printCoefficients, false],
  ];
  it.each(exactPrinters)('exactly for the %s', (_name, print, normalise) => {
    fc.assert(
      fc.property(tfArb, (tf) => {
        expect(trimmed(reparse(print(tf)), normalise)).toEqual(trimmed(tf, normalise));
      }),
      { seed: 424242, numRuns: 400 },
    );
  });

  it('the example system in every printed form normalises to the same b, a', () => {
    const texts = [
      printRationalZ(EXAMPLE),
      printRationalZinv(EXAMPLE),
      printDifferenceEquation(EXAMPLE, 'delay'),
      printDifferenceEquation(EXAMPLE, 'advance'),
      printCoefficients(EXAMPLE),
      printFactored(EXAMPLE_ZPK),
      printRoots(EXAMPLE_ZPK),
      printRoots(EXAMPLE_ZPK, { polar: true }),
    ];
    for (const t of texts) expectSameTf(reparse(t), EXAMPLE, 1e-15);
  });

  it('within 1e-12 for factored and roots forms of random zeros/poles/gain', () => {
    fc.assert(
      fc.property(zpkArb, (zpk) => {
        const expected = zpkToTransferFunction(zpk);
        expectSameTf(reparse(printFactored(zpk)), expected, 1e-12);
        expectSameTf(reparse(printRoots(zpk)), expected, 1e-12);
        expectSameTf(reparse(printRoots(zpk, { polar: true })), expected, 1e-12);
      }),
      { seed: 1234, numRuns: 400 },
    );
  });

  it('the roots form gives the zeros, poles and gain back exactly', () => {
    fc.assert(
      fc.property(zpkArb, (zpk) => {
        const r = parseRoots(printRoots(zpk));
        expect(r.ok && r.value).toEqual(zpk);
      }),
      { seed: 5678, numRuns: 400 },
    );
  });
});
