/**
 * Text forms of a system, each one readable again by parseSystem (src/core/parse): H(z) as a ratio in z or
 * in z^-1, factored, as a difference equation, as coefficient lists, and in the roots syntax. With no
 * `digits` option every number is printed in its shortest form that reads back to the same double, so
 * coefficient, equation and rational forms round-trip exactly.
 */
import type { Root, TransferFunction, Zpk } from '../types.ts';
import { formatNumber, joinTerms, trimTrailingZeros, type PrintOptions, type Term } from './terms.ts';

export { formatNumber, type PrintOptions } from './terms.ts';

/** Options for printRoots. */
export interface RootPrintOptions extends PrintOptions {
  /** Complex roots as radius∠angle° instead of re±imj. */
  polar?: boolean;
}

/** Terms of an array in powers of z^-1 read as a polynomial in z after multiplying by z^(len-1). */
function termsInZ(p: readonly number[], len: number): Term[] {
  return p.map((coef, k) => {
    const power = len - 1 - k;
    return { coef, body: power === 0 ? '' : power === 1 ? 'z' : `z^${power}` };
  });
}

function termsInZinv(p: readonly number[]): Term[] {
  return p.map((coef, k) => ({ coef, body: k === 0 ? '' : `z^-${k}` }));
}

function ratio(num: string, den: string): string {
  return den === '1' ? `H(z) = ${num}` : `H(z) = (${num}) / (${den})`;
}

/** H(z) as a ratio of polynomials in z (both multiplied by the same power of z), e.g. '(z^2 - 1) / (...)'. */
export function printRationalZ(tf: TransferFunction, opts: PrintOptions = {}): string {
  const b = trimTrailingZeros(tf.b);
  const a = trimTrailingZeros(tf.a);
  const len = Math.max(b.length, a.length);
  const pad = (p: number[]): number[] => [...p, ...new Array<number>(len - p.length).fill(0)];
  return ratio(joinTerms(termsInZ(pad(b), len), opts), joinTerms(termsInZ(pad(a), len), opts));
}

/** H(z) as a ratio of polynomials in z^-1, e.g. '(1 - z^-2) / (1 - 1.6z^-1 + 0.64z^-2)'. */
export function printRationalZinv(tf: TransferFunction, opts: PrintOptions = {}): string {
  return ratio(joinTerms(termsInZinv(tf.b), opts), joinTerms(termsInZinv(tf.a), opts));
}

/** One factor in z: 'z', '(z - 0.5)', or the real quadratic '(z^2 - 2re z + |r|^2)' of a conjugate pair. */
function factor(r: Root, opts: PrintOptions): string {
  const terms: Term[] =
    r.im === 0
      ? [
          { coef: 1, body: 'z' },
          { coef: -r.re, body: '' },
        ]
      : [
          { coef: 1, body: 'z^2' },
          { coef: -2 * r.re, body: 'z' },
          { coef: r.re * r.re + r.im * r.im, body: '' },
        ];
  const text = joinTerms(terms, opts);
  const base = text === 'z' ? 'z' : `(${text})`;
  return r.multiplicity === 1 ? base : `${base}^${r.multiplicity}`;
}

function factors(roots: readonly Root[], opts: PrintOptions): string[] {
  return roots.filter((r) => r.multiplicity > 0).map((r) => factor(r, opts));
}

/** H(z) = k·Π(z - zᵢ)/Π(z - pᵢ) with conjugate pairs as real quadratics, e.g. '0.5 (z + 1)^2 / (z^2 - z + 0.5)'. */
export function printFactored(zpk: Zpk, opts: PrintOptions = {}): string {
  const top = factors(zpk.zeros, opts);
  const bottom = factors(zpk.poles, opts);
  const k = formatNumber(zpk.gain, opts);
  let num: string;
  if (top.length === 0) num = k;
  else if (k === '1') num = top.join(' ');
  else if (k === '-1') num = `-${top.join(' ')}`;
  else num = `${k} ${top.join(' ')}`;
  if (bottom.length === 0) return `H(z) = ${num}`;
  const den = bottom.length === 1 ? bottom[0]! : `(${bottom.join(' ')})`;
  return `H(z) = ${num} / ${den}`;
}

function sample(name: 'x' | 'y', offset: number): string {
  return offset === 0 ? `${name}[n]` : offset > 0 ? `${name}[n+${offset}]` : `${name}[n${offset}]`;
}

/**
 * 'a0 y[n] = -a1 y[n-1] - ... + b0 x[n] + b1 x[n-1] + ...' (delay form), or the same with indices shifted
 * so the oldest sample is n (advance form). a0 is written as it is (omitted when 1), so nothing is divided.
 */
export function printDifferenceEquation(
  tf: TransferFunction,
  form: 'delay' | 'advance',
  opts: PrintOptions = {},
): string {
  const b = trimTrailingZeros(tf.b);
  const a = trimTrailingZeros(tf.a);
  const shift = form === 'advance' ? Math.max(a.length, b.length) - 1 : 0;
  const lhs = joinTerms([{ coef: a[0] ?? 1, body: sample('y', shift) }], opts, ' ');
  const rhs: Term[] = [
    ...a.slice(1).map((c, i) => ({ coef: -c, body: sample('y', shift - i - 1) })),
    ...b.map((c, i) => ({ coef: c, body: sample('x', shift - i) })),
  ];
  return `${lhs} = ${joinTerms(rhs, opts, ' ')}`;
}

/** 'b = [1, 0, -1]; a = [1, -1.6, 0.64]'. */
export function printCoefficients(tf: TransferFunction, opts: PrintOptions = {}): string {
  const list = (p: readonly number[]): string => `[${p.map((v) => formatNumber(v, opts)).join(', ')}]`;
  return `b = ${list(tf.b)}; a = ${list(tf.a)}`;
}

function rootText(r: Root, opts: RootPrintOptions): string {
  let text: string;
  if (r.im === 0) text = formatNumber(r.re, opts);
  else if (opts.polar) {
    const radius = formatNumber(Math.hypot(r.re, r.im), opts);
    text = `${radius}∠${formatNumber((Math.atan2(r.im, r.re) * 180) / Math.PI, opts)}°`;
  } else {
    const re = r.re === 0 ? '' : formatNumber(r.re, opts);
    text = `${re}±${formatNumber(r.im, opts)}j`;
  }
  return r.multiplicity === 1 ? text : `${text} x${r.multiplicity}`;
}

function rootList(roots: readonly Root[], opts: RootPrintOptions): string {
  const live = roots.filter((r) => r.multiplicity > 0);
  return live.length === 0 ? 'none' : live.map((r) => rootText(r, opts)).join(', ');
}

/** Zeros, poles and gain in the roots syntax of src/core/parse/roots.ts, e.g. 'zeros: -1 x2; poles: 0.9±0.3j; gain: 0.1'. */
export function printRoots(zpk: Zpk, opts: RootPrintOptions = {}): string {
  const gain = formatNumber(zpk.gain, opts);
  return `zeros: ${rootList(zpk.zeros, opts)}; poles: ${rootList(zpk.poles, opts)}; gain: ${gain}`;
}
