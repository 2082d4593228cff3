/**
 * Evaluates an expression tree in a chosen algebra: plain numbers, complex numbers, ratios of Laurent
 * polynomials in z, or linear combinations of signal samples. Each algebra decides what an operation means
 * and reports what it cannot do (a product of two signals, a power of z that is not whole...).
 */
import type { Node } from './ast.ts';

/** The operations an entry form gives meaning to; `at` is the node, for error positions. */
export interface Algebra<T> {
  num(v: number, at: Node): T;
  name(name: string, at: Node): T;
  signal(name: 'x' | 'y', k: number, at: Node): T;
  neg(a: T, at: Node): T;
  add(a: T, b: T, at: Node & { t: 'bin' }): T;
  sub(a: T, b: T, at: Node & { t: 'bin' }): T;
  mul(a: T, b: T, at: Node & { t: 'bin' }): T;
  div(a: T, b: T, at: Node & { t: 'bin' }): T;
  pow(a: T, b: T, at: Node & { t: 'bin' }): T;
}

/** Value of the tree in the algebra, bottom-up. */
export function evaluate<T>(node: Node, alg: Algebra<T>): T {
  switch (node.t) {
    case 'num':
      return alg.num(node.v, node);
    case 'id':
      return alg.name(node.name, node);
    case 'sig':
      return alg.signal(node.name, node.k, node);
    case 'neg':
      return alg.neg(evaluate(node.a, alg), node);
    case 'bin': {
      const a = evaluate(node.a, alg);
      const b = evaluate(node.b, alg);
      switch (node.op) {
        case '+':
          return alg.add(a, b, node);
        case '-':
          return alg.sub(a, b, node);
        case '*':
          return alg.mul(a, b, node);
        case '/':
          return alg.div(a, b, node);
        case '^':
          return alg.pow(a, b, node);
      }
    }
  }
}

/** Offset of the leftmost character of a subtree, for messages about a whole term. */
export function startOf(node: Node): number {
  return node.t === 'bin' ? Math.min(startOf(node.a), node.pos) : node.pos;
}
