/**
 * JSON as RFC 8259 defines it, read strictly for design files: the same values JSON.parse gives, but a key
 * that appears twice in one object is refused (JSON.parse silently keeps the last, so a second "poles" could
 * swap in other roots), nesting deeper than a limit is refused before it costs anything, and every error
 * names its line and column.
 */

export type StrictJsonResult =
  { ok: true; value: unknown } | { ok: false; message: string; position: number };

/** Line and column (both from 1) of a 0-based offset into the text. */
export function lineColumn(text: string, position: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < position; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: position - start + 1 };
}

class JsonError extends Error {
  constructor(
    message: string,
    readonly position: number,
  ) {
    super(message);
  }
}

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const ESCAPES: Record<string, string> = {
  '"': '"',
  '\\': '\\',
  '/': '/',
  b: '\b',
  f: '\f',
  n: '\n',
  r: '\r',
  t: '\t',
};

class Reader {
  private i = 0;
  constructor(
    private readonly text: string,
    private readonly maxDepth: number,
  ) {}

  private where(p = this.i) {
    const { line, column } = lineColumn(this.text, p);
    return `line ${line}, column ${column}`;
  }

  private fail(what: string, p = this.i): never {
    throw new JsonError(`${what} at ${this.where(p)}`, p);
  }

  private space(): void {
    const t = this.text;
    for (;;) {
      const c = t.charCodeAt(this.i);
      if (c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09) this.i++;
      else return;
    }
  }

  document(): unknown {
    this.space();
    const v = this.value(0);
    this.space();
    if (this.i < this.text.length) this.fail('unexpected text after the end of the JSON value');
    return v;
  }

  private value(depth: number): unknown {
    const t = this.text;
    const c = t[this.i];
    if (c === '{' || c === '[') {
      if (depth >= this.maxDepth) this.fail(`the JSON is nested more than ${this.maxDepth} deep`);
      return c === '{' ? this.object(depth + 1) : this.array(depth + 1);
    }
    if (c === '"') return this.string();
    if (c === 't' && t.startsWith('true', this.i)) return ((this.i += 4), true);
    if (c === 'f' && t.startsWith('false', this.i)) return ((this.i += 5), false);
    if (c === 'n' && t.startsWith('null', this.i)) return ((this.i += 4), null);
    NUMBER.lastIndex = this.i;
    const m = NUMBER.exec(t);
    if (m && m[0].length > 0) {
      this.i += m[0].length;
      return Number(m[0]);
    }
    this.fail(this.i >= t.length ? 'the JSON ends too early' : `unexpected character ${JSON.stringify(c)}`);
  }

  private string(): string {
    const t = this.text;
    const start = ++this.i;
    let out = '';
    let from = start;
    for (;;) {
      const c = t.charCodeAt(this.i);
      if (Number.isNaN(c)) this.fail('a text is not closed with "', start - 1);
      if (c === 0x22) {
        out += t.slice(from, this.i++);
        return out;
      }
      if (c < 0x20) this.fail('a control character must be escaped inside a text');
      if (c !== 0x5c) {
        this.i++;
        continue;
      }
      out += t.slice(from, this.i);
      const e = t[this.i + 1];
      if (e === 'u') {
        const hex = t.slice(this.i + 2, this.i + 6);
        if (!/^[0-9a-fA-F]{4}$/.test(hex)) this.fail('\\u must be followed by four hexadecimal digits');
        out += String.fromCharCode(parseInt(hex, 16));
        this.i += 6;
      } else if (e !== undefined && e in ESCAPES) {
        out += ESCAPES[e];
        this.i += 2;
      } else this.fail(`unknown escape \\${e ?? ''}`);
      from = this.i;
    }
  }

  private array(depth: number): unknown[] {
    this.i++;
    const out: unknown[] = [];
    this.space();
    if (this.text[this.i] === ']') return (this.i++, out);
    for (;;) {
      this.space();
      out.push(this.value(depth));
      this.space();
      const c = this.text[this.i];
      if (c === ',') this.i++;
      else if (c === ']') return (this.i++, out);
      else this.fail("expected ',' or ']'");
    }
  }

  private object(depth: number): Record<string, unknown> {
    this.i++;
    const out: Record<string, unknown> = {};
    const seen = new Map<string, number>();
    this.space();
    if (this.text[this.i] === '}') return (this.i++, out);
    for (;;) {
      this.space();
      if (this.text[this.i] !== '"') this.fail('expected a key in double quotes');
      const at = this.i;
      const key = this.string();
      const first = seen.get(key);
      if (first !== undefined)
        throw new JsonError(
          `the key ${JSON.stringify(key)} is given twice in one object, at ${this.where(at)} (first at ${this.where(first)})`,
          at,
        );
      seen.set(key, at);
      this.space();
      if (this.text[this.i] !== ':') this.fail("expected ':' after a key");
      this.i++;
      this.space();
      // defineProperty, as JSON.parse does, so that a key "__proto__" stays a plain field.
      Object.defineProperty(out, key, {
        value: this.value(depth),
        enumerable: true,
        writable: true,
        configurable: true,
      });
      this.space();
      const c = this.text[this.i];
      if (c === ',') this.i++;
      else if (c === '}') return (this.i++, out);
      else this.fail("expected ',' or '}'");
    }
  }
}

/** Reads JSON text strictly (see the top of this file); `maxDepth` bounds the nesting of arrays and objects. */
export function parseStrictJson(text: string, maxDepth: number): StrictJsonResult {
  try {
    return { ok: true, value: new Reader(text, maxDepth).document() };
  } catch (e) {
    if (e instanceof JsonError) return { ok: false, message: e.message, position: e.position };
    throw e;
  }
}
