/**
 * Recursive-descent parser for the expression language shared by all entry forms:
 *   sum     := product (('+'|'-') product)*
 *   product := unary (('*'|'/') unary | implicit)*      implicit: a name or '(' right after, as in 0.5y[n-1]
 *   unary   := ('+'|'-') unary | power
 *   power   := primary ['^' unary]                       right-associative, so 2^-3 and z^-1 read naturally
 *   primary := number | name | x[n±k] | y[n±k] | '(' sum ')'
 * Unary minus binds looser than '^', so -0.5^2 is -(0.5^2), the usual mathematical reading.
 * The tree is evaluated later in whichever algebra the form needs (numbers, polynomials in z, signals).
 */
import { fail } from './errors.ts';
import { MAX_ORDER } from '../model/limits.ts';
import type { Token } from './lexer.ts';

export type Node =
  | { t: 'num'; v: number; pos: number }
  | { t: 'id'; name: string; pos: number }
  | { t: 'sig'; name: 'x' | 'y'; k: number; pos: number }
  | { t: 'neg'; a: Node; pos: number }
  | { t: 'bin'; op: '+' | '-' | '*' | '/' | '^'; a: Node; b: Node; pos: number };

/** Deepest nesting accepted, far beyond any real entry and well inside the JavaScript stack. */
export const MAX_NESTING = 200;
/** Largest sample offset accepted in x[n±k] / y[n±k]: the largest order a design may have. */
export const MAX_SAMPLE_OFFSET = MAX_ORDER;

export interface ParseOptions {
  /** Names that end an expression instead of multiplying it (units and markers of the roots syntax). */
  stopNames?: ReadonlySet<string>;
}

/** A cursor over tokens[from, to): past `to` it reports an end token at the offset of tokens[to]. */
export class Cursor {
  private i: number;
  private depth = 0;
  constructor(
    private readonly tokens: readonly Token[],
    from: number,
    private readonly to: number,
    private readonly opts: ParseOptions = {},
  ) {
    this.i = from;
  }

  /** The token at the cursor (an end token once the range is used up). */
  peek(ahead = 0): Token {
    const j = this.i + ahead;
    if (j < this.to) return this.tokens[j]!;
    const last = this.tokens[Math.min(this.to, this.tokens.length - 1)]!;
    return { ...last, kind: 'end', text: '', value: NaN, end: last.pos };
  }

  next(): Token {
    const t = this.peek();
    if (this.i < this.to) this.i++;
    return t;
  }

  atEnd(): boolean {
    return this.peek().kind === 'end';
  }

  isOp(s: string, ahead = 0): boolean {
    const t = this.peek(ahead);
    return t.kind === 'op' && t.text === s;
  }

  expectOp(s: string, what: string): Token {
    if (!this.isOp(s)) fail(`expected '${s}' ${what}${found(this.peek())}`, this.peek().pos, `'${s}'`);
    return this.next();
  }

  /** Parses one full expression (a sum). */
  expression(): Node {
    if (++this.depth > MAX_NESTING) fail('the expression is nested too deeply', this.peek().pos);
    let left = this.product();
    while (this.isOp('+') || this.isOp('-')) {
      const op = this.next();
      const right = this.product();
      left = { t: 'bin', op: op.text as '+' | '-', a: left, b: right, pos: op.pos };
    }
    this.depth--;
    return left;
  }

  private product(): Node {
    let left = this.unary();
    for (;;) {
      const t = this.peek();
      if (t.kind === 'op' && (t.text === '*' || t.text === '/')) {
        this.next();
        left = { t: 'bin', op: t.text, a: left, b: this.unary(), pos: t.pos };
      } else if (this.startsImplicitFactor(t)) {
        left = { t: 'bin', op: '*', a: left, b: this.power(), pos: t.pos };
      } else return left;
    }
  }

  private startsImplicitFactor(t: Token): boolean {
    if (t.kind === 'op') return t.text === '(';
    return t.kind === 'id' && !(this.opts.stopNames?.has(t.text) ?? false);
  }

  private unary(): Node {
    const t = this.peek();
    if (t.kind === 'op' && (t.text === '-' || t.text === '+')) {
      this.next();
      if (++this.depth > MAX_NESTING) fail('the expression is nested too deeply', t.pos);
      const a = this.unary();
      this.depth--;
      return t.text === '-' ? { t: 'neg', a, pos: t.pos } : a;
    }
    return this.power();
  }

  private power(): Node {
    const base = this.primary();
    if (!this.isOp('^')) return base;
    const op = this.next();
    if (++this.depth > MAX_NESTING) fail('the expression is nested too deeply', op.pos);
    const exp = this.unary();
    this.depth--;
    return { t: 'bin', op: '^', a: base, b: exp, pos: op.pos };
  }

  private primary(): Node {
    const t = this.peek();
    if (t.kind === 'num') {
      this.next();
      return { t: 'num', v: t.value, pos: t.pos };
    }
    if (t.kind === 'id' && !(this.opts.stopNames?.has(t.text) ?? false)) {
      this.next();
      if ((t.text === 'x' || t.text === 'y') && (this.isOp('[') || this.isOp('('))) return this.signal(t);
      return { t: 'id', name: t.text, pos: t.pos };
    }
    if (t.kind === 'op' && t.text === '(') {
      this.next();
      const inner = this.expression();
      this.expectOp(')', `to close the '(' at column ${t.pos + 1}`);
      return inner;
    }
    return fail(`expected a number, a name or '('${found(t)}`, t.pos, 'a number, a name or (');
  }

  /** Reads the sample index of x[...] / y[...]: n, n-k or n+k with a whole number k. */
  private signal(name: Token): Node {
    const open = this.next();
    const close = open.text === '[' ? ']' : ')';
    const at = `${name.text}${open.text}`;
    const expected = 'a sample index like n, n-1 or n+2';
    const n = this.peek();
    if (!(n.kind === 'id' && n.text === 'n') || this.isOp('^', 1) || this.peek(1).kind !== 'op') {
      fail(`expected a sample index like n-1 after '${at}'${found(n)}`, n.pos, expected);
    }
    this.next();
    let k = 0;
    if (this.isOp('+') || this.isOp('-')) {
      const sign = this.next().text === '-' ? -1 : 1;
      const d = this.peek();
      if (d.kind !== 'num' || !Number.isInteger(d.value) || d.value > MAX_SAMPLE_OFFSET) {
        fail(
          `expected a whole-number offset up to ${MAX_SAMPLE_OFFSET} in '${at}n…'${found(d)}`,
          d.pos,
          expected,
        );
      }
      this.next();
      k = sign * d.value;
    }
    if (!this.isOp(close)) {
      fail(`expected '${close}' to close '${at}'${found(this.peek())}`, this.peek().pos, expected);
    }
    this.next();
    return { t: 'sig', name: name.text as 'x' | 'y', k, pos: name.pos };
  }
}

/** ", found 'x'" or ", found the end of the input", for messages. */
export function found(t: Token): string {
  return t.kind === 'end' ? ', found the end of the input' : `, found '${t.text}'`;
}
