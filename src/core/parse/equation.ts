/**
 * Linear constant-coefficient difference equations:
 *   'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]'            (delay form)
 *   'y[n+2] - 1.6y[n+1] + 0.64y[n] = x[n+2] - x[n]'             (advance form)
 * Terms may sit on either side, in any order, repeated (they add up), written y[n-1] or y(n-1), with
 * coefficients that are any constant expression. The equation is shifted so that the newest sample index
 * becomes n, which is why both forms give the same H(z) (common practice).
 */
import type { Result, TransferFunction } from '../types.ts';
import { Cursor, found, type Node } from './ast.ts';
import { checkTransferFunction } from './check.ts';
import { fail, guard } from './errors.ts';
import { evaluate, startOf, type Algebra } from './evaluate.ts';
import { tokenize } from './lexer.ts';
import { constantNamed, finite, realAlgebra } from './scalar.ts';

/** Either a plain number or a linear combination of samples (key 'y:-1' -> coefficient). */
type Lin = { kind: 'const'; v: number } | { kind: 'lin'; terms: Map<string, number> };

const ACCEPTED = 'terms like 0.5 y[n-1] or x[n], with + - and a single =';

function lin(key: string, c: number): Lin {
  return { kind: 'lin', terms: new Map([[key, c]]) };
}

function scale(a: Lin & { kind: 'lin' }, s: number, pos: number): Lin {
  const terms = new Map<string, number>();
  for (const [k, v] of a.terms) terms.set(k, finite(v * s, pos, 'a coefficient'));
  return { kind: 'lin', terms };
}

function addLin(a: Lin, b: Lin, sign: 1 | -1, at: Node & { t: 'bin' }): Lin {
  if (a.kind === 'const' && b.kind === 'const')
    return { kind: 'const', v: finite(a.v + sign * b.v, at.pos, 'the sum') };
  if (a.kind === 'const' || b.kind === 'const') {
    const [k, where] = a.kind === 'const' ? [a.v, at.a] : [(b as { v: number }).v, at.b];
    if (k !== 0) {
      fail(
        'a constant term multiplies neither x nor y, so the equation is not linear',
        startOf(where),
        ACCEPTED,
      );
    }
    return a.kind === 'const' ? (sign === 1 ? b : scale(b as Lin & { kind: 'lin' }, -1, at.pos)) : a;
  }
  const terms = new Map(a.terms);
  for (const [k, v] of b.terms) terms.set(k, finite((terms.get(k) ?? 0) + sign * v, at.pos, 'a coefficient'));
  return { kind: 'lin', terms };
}

const linAlgebra: Algebra<Lin> = {
  num: (v) => ({ kind: 'const', v }),
  name(name, at) {
    const c = constantNamed(name);
    if (c !== undefined) return { kind: 'const', v: c };
    if (name === 'x' || name === 'y') fail(`expected '[' after '${name}'`, at.pos + 1, `${name}[n-1]`);
    if (name === 'n') fail("'n' may appear only inside a sample index such as y[n-1]", at.pos, ACCEPTED);
    return fail(`unknown name '${name}' in the equation`, at.pos, 'x[...], y[...], numbers and pi');
  },
  signal: (name, k, _at) => lin(`${name}:${k}`, 1),
  neg: (a, at) => (a.kind === 'const' ? { kind: 'const', v: -a.v } : scale(a, -1, at.pos)),
  add: (a, b, at) => addLin(a, b, 1, at),
  sub: (a, b, at) => addLin(a, b, -1, at),
  mul(a, b, at) {
    if (a.kind === 'const' && b.kind === 'const') return { kind: 'const', v: realAlgebra.mul(a.v, b.v, at) };
    if (a.kind === 'lin' && b.kind === 'lin') {
      fail('a product of two signal samples is not linear', at.pos, 'a number times x[...] or y[...]');
    }
    return a.kind === 'lin'
      ? scale(a, (b as { v: number }).v, at.pos)
      : scale(b as Lin & { kind: 'lin' }, a.v, at.pos);
  },
  div(a, b, at) {
    if (b.kind === 'lin') fail('dividing by a signal sample is not linear', at.pos, 'division by a number');
    if (a.kind === 'const') return { kind: 'const', v: realAlgebra.div(a.v, b.v, at) };
    if (b.v === 0) fail('division by zero', at.pos, 'a nonzero divisor');
    const terms = new Map<string, number>();
    for (const [k, v] of a.terms) terms.set(k, finite(v / b.v, at.pos, 'a coefficient'));
    return { kind: 'lin', terms };
  },
  pow(a, b, at) {
    if (a.kind === 'lin')
      fail('a power of a signal sample is not linear', at.pos, 'a number times x[...] or y[...]');
    if (b.kind === 'lin') fail('an exponent must be a number', at.pos, 'a number');
    return { kind: 'const', v: realAlgebra.pow(a.v, b.v, at) };
  },
};

/** Terms of one side of the equation, as a map key -> coefficient (a lone 0 side is allowed). */
function side(node: Node): Map<string, number> {
  const v = evaluate(node, linAlgebra);
  if (v.kind === 'lin') return v.terms;
  if (v.v !== 0)
    fail('a constant term multiplies neither x nor y, so the equation is not linear', startOf(node));
  return new Map();
}

export interface ParsedEquation {
  tf: TransferFunction;
  /** 'delay form' (newest index n), 'advance form' (oldest index n) or 'shifted form'. */
  form: string;
}

/** Difference equation -> b, a in powers of z^-1, with the first term's sign as typed (a0 not normalised). */
export function equationFromText(text: string): ParsedEquation {
  const tokens = tokenize(text);
  const cur = new Cursor(tokens, 0, tokens.length - 1);
  if (cur.atEnd()) fail('expected a difference equation, found nothing', 0, ACCEPTED);
  const lhs = cur.expression();
  if (!cur.isOp('=')) fail(`expected '=' or an operator${found(cur.peek())}`, cur.peek().pos, ACCEPTED);
  cur.next();
  if (cur.atEnd()) fail("expected terms after '='", cur.peek().pos, ACCEPTED);
  const rhs = cur.expression();
  if (!cur.atEnd())
    fail(`expected an operator or the end of the equation${found(cur.peek())}`, cur.peek().pos);
  const left = side(lhs);
  const right = side(rhs);
  const all = new Map(left);
  for (const [k, v] of right) all.set(k, (all.get(k) ?? 0) - v);
  const idx = (name: string): number[] =>
    [...all].filter(([k, v]) => k.startsWith(name) && v !== 0).map(([k]) => Number(k.slice(2)));
  const ys = idx('y:');
  const xs = idx('x:');
  if (ys.length === 0)
    fail('the equation has no output term y[...] (or its y terms cancel)', 0, 'a term in y[n]');
  if (xs.length === 0)
    fail('the equation has no input term x[...] (or its x terms cancel)', 0, 'a term in x[n]');
  const newest = Math.max(...ys, ...xs);
  const oldest = Math.min(...ys, ...xs);
  if (Math.max(...xs) > Math.max(...ys)) {
    fail(
      `x[n${offset(Math.max(...xs))}] is newer than every output term: the output would depend on future input`,
      0,
      'an output term y[...] at least as new as every input term',
    );
  }
  // Keep the newest output's coefficient as typed: if it was written on the right, flip both sides.
  const sign = (left.get(`y:${newest}`) ?? 0) !== 0 ? 1 : -1;
  const a = new Array<number>(newest - oldest + 1).fill(0);
  const b = new Array<number>(newest - oldest + 1).fill(0);
  for (const [k, v] of all) {
    const d = newest - Number(k.slice(2));
    if (k.startsWith('y:')) a[d] = sign * v;
    else b[d] = -sign * v;
  }
  const form = newest === 0 ? 'delay form' : oldest === 0 ? 'advance form' : 'shifted form';
  return { tf: checkTransferFunction(trimEnds({ b, a }), 0), form };
}

function offset(k: number): string {
  return k === 0 ? '' : k > 0 ? `+${k}` : `${k}`;
}

/** Drops trailing zeros that only the other array needed, keeping at least one coefficient. */
function trimEnds(tf: TransferFunction): TransferFunction {
  const trim = (p: number[]): number[] => {
    let e = p.length;
    while (e > 1 && p[e - 1] === 0) e--;
    return p.slice(0, e);
  };
  return { b: trim(tf.b), a: trim(tf.a) };
}

/** Difference equation -> b, a in powers of z^-1 (not normalised). */
export function parseDifferenceEquation(text: string): Result<TransferFunction> {
  return guard(text, () => equationFromText(text).tf);
}
