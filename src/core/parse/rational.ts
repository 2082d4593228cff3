/**
 * H(z) typed as a rational expression in z and/or z^-1: 'H(z) = (z-0.5)(z+1)^2/(z^2-1.2z+0.72)',
 * '(1 - z^-1)/(1 - 0.9z^-1)', '0.5(1+z⁻¹)^2 / (1 - 1.2/z + 0.72 z^(-2))'. Products, whole-number powers and
 * nested fractions are expanded exactly as written; no common factor is cancelled.
 */
import type { Result, TransferFunction } from '../types.ts';
import { Cursor, found } from './ast.ts';
import { fail, guard } from './errors.ts';
import { evaluate, type Algebra } from './evaluate.ts';
import {
  addRatio,
  constantOf,
  divRatio,
  highPower,
  isZero,
  mulRatio,
  ONE,
  powRatio,
  scaleLaurent,
  type Laurent,
  type Ratio,
} from './laurent.ts';
import { tokenize, type Token } from './lexer.ts';
import { constantNamed, finite } from './scalar.ts';
import { checkTransferFunction } from './check.ts';

const constant = (v: number): Ratio => ({ num: v === 0 ? { low: 0, c: [] } : { low: 0, c: [v] }, den: ONE });

/** The value of a ratio that is a plain number, else undefined. */
function constantRatio(r: Ratio): number | undefined {
  const n = constantOf(r.num);
  const d = constantOf(r.den);
  return n === undefined || d === undefined ? undefined : n / d;
}

const ACCEPTED = 'numbers, z, z^-1, + - * / ^ ( ) and pi';

const ratioAlgebra: Algebra<Ratio> = {
  num: (v) => constant(v),
  name(name, at) {
    if (name === 'z') return { num: { low: 1, c: [1] }, den: ONE };
    const c = constantNamed(name);
    if (c === undefined) fail(`unknown name '${name}' in H(z)`, at.pos, ACCEPTED);
    return constant(c);
  },
  signal: (name, _k, at) =>
    fail(`'${name}[…]' belongs in a difference equation, not in H(z)`, at.pos, ACCEPTED),
  neg: (a) => ({ num: scaleLaurent(a.num, -1), den: a.den }),
  add: (a, b, at) => addRatio(a, b, 1, at.pos),
  sub: (a, b, at) => addRatio(a, b, -1, at.pos),
  mul(a, b, at) {
    const ka = constantRatio(a);
    const kb = constantRatio(b);
    if (ka !== undefined && kb !== undefined) return constant(finite(ka * kb, at.pos, 'the product'));
    return mulRatio(a, b, at.pos);
  },
  div(a, b, at) {
    const ka = constantRatio(a);
    const kb = constantRatio(b);
    if (ka !== undefined && kb !== undefined && kb !== 0)
      return constant(finite(ka / kb, at.pos, 'the quotient'));
    return divRatio(a, b, at.pos);
  },
  pow(a, b, at) {
    const e = constantRatio(b);
    if (e === undefined)
      fail('an exponent must be a plain number, not an expression in z', at.pos, 'z^2, z^-1');
    const ka = constantRatio(a);
    if (ka !== undefined) return constant(finite(Math.pow(ka, e), at.pos, 'the power'));
    if (!Number.isInteger(e)) fail(`a power of z must be a whole number, not ${e}`, at.pos, 'z^2, z^-1');
    return powRatio(a, e, at.pos);
  },
};

/** Skips an 'H(z) =' or 'H =' prefix; returns the index of the first token of the expression. */
function skipPrefix(tokens: readonly Token[]): number {
  const t = (i: number): string => tokens[i]?.text ?? '';
  if (/^[A-Za-z]$/.test(t(0)) && t(0) !== 'z') {
    if (t(1) === '(' && t(2) === 'z' && t(3) === ')' && t(4) === '=') return 5;
    if (t(1) === '=') return 2;
  }
  return 0;
}

/** The ratio described by text, before it is turned into b/a arrays. */
export function ratioFromText(text: string): Ratio {
  const tokens = tokenize(text);
  const cur = new Cursor(tokens, skipPrefix(tokens), tokens.length - 1);
  if (cur.atEnd()) fail('expected an expression for H(z), found nothing', cur.peek().pos, ACCEPTED);
  const node = cur.expression();
  if (!cur.atEnd()) {
    const t = cur.peek();
    fail(`expected an operator or the end of H(z)${found(t)}`, t.pos, ACCEPTED);
  }
  return evaluate(node, ratioAlgebra);
}

/** How a ratio was written, for the detail line: in z, in z^-1, or both. */
export function ratioVariable(r: Ratio): string {
  const parts = [r.num, r.den].filter((p) => !isZero(p));
  if (parts.every((p) => p.low >= 0)) return 'H(z) in z';
  if (parts.every((p) => highPower(p) <= 0)) return 'H(z) in z^-1';
  return 'H(z) in z and z^-1';
}

/** Coefficient of z^(top-i) for i = 0..top-low, the b/a array in powers of z^-1 after multiplying by z^-top. */
function toDescending(p: Laurent, top: number): number[] {
  const out = new Array<number>(top - p.low + 1).fill(0);
  p.c.forEach((v, i) => (out[top - (p.low + i)] = v));
  return out;
}

/** How many more powers of z the numerator reaches than the denominator (0 for a causal H(z)). */
export function ratioExcess(r: Ratio): number {
  return Math.max(0, highPower(r.num) - highPower(r.den));
}

/**
 * b, a in powers of z^-1 for num/den, both multiplied by the same power of z so the newest term is z^0.
 * An improper H(z) (numerator of higher degree: more zeros than poles, not causal) is delayed by its excess,
 * i.e. z^-excess·H(z) — poles at the origin are added so a causal filter can realise it; parseSystem says so.
 */
export function ratioToTransferFunction(r: Ratio): TransferFunction {
  if (isZero(r.num)) fail('the numerator is zero, so H(z) = 0', 0, 'a nonzero numerator');
  const top = Math.max(highPower(r.num), highPower(r.den));
  const tf = { b: toDescending(r.num, top), a: toDescending(r.den, top - ratioExcess(r)) };
  return checkTransferFunction(tf, 0);
}

/** H(z) typed as a rational expression in z or z^-1 -> b, a in powers of z^-1 (not normalised). */
export function parseRational(text: string): Result<TransferFunction> {
  return guard(text, () => ratioToTransferFunction(ratioFromText(text)));
}
