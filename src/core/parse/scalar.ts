/** Real-number algebra and parseNumber: a single constant expression such as 1/3, 2.5e-3, -0.5^2, pi/4. */
import type { Result } from '../types.ts';
import { Cursor, found, type Node } from './ast.ts';
import { fail, guard } from './errors.ts';
import { evaluate, type Algebra } from './evaluate.ts';
import { tokenize, type Token } from './lexer.ts';

/** Fails unless v is finite, naming the operation that produced it. */
export function finite(v: number, pos: number, what: string): number {
  if (!Number.isFinite(v)) fail(`${what} is not a finite number`, pos, 'values that stay finite');
  return v;
}

/** Named constants accepted wherever a number is. */
export function constantNamed(name: string): number | undefined {
  return name === 'pi' ? Math.PI : undefined;
}

export const realAlgebra: Algebra<number> = {
  num: (v) => v,
  name(name, at) {
    const c = constantNamed(name);
    if (c === undefined) fail(`unknown name '${name}' in a number`, at.pos, 'digits, + - * / ^ ( ) and pi');
    return c;
  },
  signal: (name, _k, at) => fail(`'${name}[…]' has no place in a number`, at.pos, 'a number'),
  neg: (a) => -a,
  add: (a, b, at) => finite(a + b, at.pos, 'the sum'),
  sub: (a, b, at) => finite(a - b, at.pos, 'the difference'),
  mul: (a, b, at) => finite(a * b, at.pos, 'the product'),
  div(a, b, at) {
    if (b === 0) fail('division by zero', at.pos, 'a nonzero divisor');
    return finite(a / b, at.pos, 'the quotient');
  },
  pow: (a, b, at) => finite(Math.pow(a, b), at.pos, 'the power'),
};

/** Parses tokens[from, to) as one real-number expression, requiring the whole range to be used. */
export function realFromTokens(tokens: readonly Token[], from: number, to: number): number {
  const cur = new Cursor(tokens, from, to);
  if (cur.atEnd()) fail('expected a number, found nothing', cur.peek().pos, 'a number');
  const node: Node = cur.expression();
  if (!cur.atEnd()) fail(`expected an operator or the end of the number${found(cur.peek())}`, cur.peek().pos);
  return evaluate(node, realAlgebra);
}

/** Value of a single number expression such as '1/3', '2.5e-3' or '-0.5^2' (= -0.25). */
export function parseNumber(text: string): Result<number> {
  return guard(text, () => {
    const tokens = tokenize(text);
    return realFromTokens(tokens, 0, tokens.length - 1);
  });
}
