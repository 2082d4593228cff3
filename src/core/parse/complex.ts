/** Complex-number algebra for roots typed as 0.5+0.5j (j or i is the imaginary unit). */
import type { Complex } from '../types.ts';
import { fail } from './errors.ts';
import type { Algebra } from './evaluate.ts';
import { constantNamed, finite } from './scalar.ts';

const ACCEPTED = 'numbers, j (or i), + - * / ( ) and pi';

function checked(z: Complex, pos: number, what: string): Complex {
  finite(z.re, pos, what);
  finite(z.im, pos, what);
  return z;
}

export const complexAlgebra: Algebra<Complex> = {
  num: (v) => ({ re: v, im: 0 }),
  name(name, at) {
    if (name === 'j' || name === 'i') return { re: 0, im: 1 };
    const c = constantNamed(name);
    if (c === undefined) fail(`unknown name '${name}' in a root`, at.pos, ACCEPTED);
    return { re: c, im: 0 };
  },
  signal: (name, _k, at) => fail(`'${name}[…]' has no place in a root`, at.pos, ACCEPTED),
  neg: (a) => ({ re: -a.re, im: -a.im }),
  add: (a, b, at) => checked({ re: a.re + b.re, im: a.im + b.im }, at.pos, 'the sum'),
  sub: (a, b, at) => checked({ re: a.re - b.re, im: a.im - b.im }, at.pos, 'the difference'),
  mul(a, b, at) {
    // Skip zero parts so that 0.5j stays exactly (0, 0.5) instead of picking up 0 * Infinity-style noise.
    const re = (a.im === 0 || b.im === 0 ? 0 : -a.im * b.im) + a.re * b.re;
    const im = (a.im === 0 ? 0 : a.im * b.re) + (b.im === 0 ? 0 : a.re * b.im);
    return checked({ re, im }, at.pos, 'the product');
  },
  div(a, b, at) {
    if (b.re === 0 && b.im === 0) fail('division by zero', at.pos, 'a nonzero divisor');
    if (b.im === 0) return checked({ re: a.re / b.re, im: a.im / b.re }, at.pos, 'the quotient');
    const d = b.re * b.re + b.im * b.im;
    const re = (a.re * b.re + a.im * b.im) / d;
    const im = (a.im * b.re - a.re * b.im) / d;
    return checked({ re, im }, at.pos, 'the quotient');
  },
  pow: (_a, _b, at) =>
    fail(
      "'^' is not used in a root: to repeat a root write x and a count after it, as in 0.5 x2",
      at.pos,
      'x2',
    ),
};
