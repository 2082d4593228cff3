/**
 * Tokeniser shared by every entry form. It folds the typographic variants people paste (unicode minus,
 * times sign, superscript exponents such as z⁻¹, π) into one small set of tokens, each with its offset.
 */
import { fail } from './errors.ts';

export type TokenKind = 'num' | 'id' | 'op' | 'end';

export interface Token {
  kind: TokenKind;
  /** Normalised text: the operator symbol, the identifier, or the number as typed. */
  text: string;
  /** Numeric value of a 'num' token. */
  value: number;
  /** 0-based offset of the first character. */
  pos: number;
  /** Offset just past the last character. */
  end: number;
  /** Whitespace came right before this token. */
  space: boolean;
  /** A line break came right before this token. */
  line: boolean;
}

const SINGLE_OPS = '+-*/^()[],;:=±∠@°';
const ALIASES: Record<string, string> = {
  '−': '-',
  '–': '-',
  '×': '*',
  '·': '*',
  '⋅': '*',
  '÷': '/',
  '∓': '±',
  '（': '(',
  '）': ')',
};
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const NUMBER = /^(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
const IDENT = /^[A-Za-z_]+/;

/** Splits text into tokens ending with an 'end' token at text.length; throws ParseError on a stray character. */
export function tokenize(text: string): Token[] {
  const out: Token[] = [];
  let i = 0;
  let space = false;
  let line = false;
  const push = (kind: TokenKind, t: string, value: number, pos: number, end: number): void => {
    out.push({ kind, text: t, value, pos, end, space, line });
    space = false;
    line = false;
  };
  while (i < text.length) {
    const ch = text[i]!;
    if (/\s/.test(ch)) {
      space = true;
      if (ch === '\n' || ch === '\r') line = true;
      i++;
      continue;
    }
    const rest = text.slice(i, i + 40);
    const num = NUMBER.exec(rest);
    if (num) {
      const s = num[0].length < 40 ? num[0] : (NUMBER.exec(text.slice(i))?.[0] ?? num[0]);
      const v = Number(s);
      if (!Number.isFinite(v)) fail(`the number '${s.slice(0, 20)}' is too large`, i, 'a finite number');
      push('num', s, v, i, i + s.length);
      i += s.length;
      continue;
    }
    const id = IDENT.exec(rest);
    if (id) {
      const s = id[0].length < 40 ? id[0] : (IDENT.exec(text.slice(i))?.[0] ?? id[0]);
      push('id', s, NaN, i, i + s.length);
      i += s.length;
      continue;
    }
    if (ch === 'π') {
      push('id', 'pi', NaN, i, i + 1);
      i++;
      continue;
    }
    if (ch === '*' && text[i + 1] === '*') {
      push('op', '^', NaN, i, i + 2);
      i += 2;
      continue;
    }
    if (ch === '+' && text[i + 1] === '-') {
      push('op', '±', NaN, i, i + 2);
      i += 2;
      continue;
    }
    if (ch === '⁻' || ch === '⁺' || SUPERSCRIPT_DIGITS.includes(ch)) {
      i = superscript(text, i, push);
      continue;
    }
    const op = ALIASES[ch] ?? ch;
    if (SINGLE_OPS.includes(op)) {
      push('op', op, NaN, i, i + 1);
      i++;
      continue;
    }
    fail(`unexpected character '${ch}'`, i, 'numbers, + - * / ^ ( ), and the names of the form');
  }
  out.push({ kind: 'end', text: '', value: NaN, pos: text.length, end: text.length, space, line });
  return out;
}

/** Reads a superscript exponent such as ⁻¹ or ² as the tokens '^' and a number. */
function superscript(
  text: string,
  start: number,
  push: (kind: TokenKind, t: string, value: number, pos: number, end: number) => void,
): number {
  let i = start;
  let sign = 1;
  if (text[i] === '⁻' || text[i] === '⁺') {
    sign = text[i] === '⁻' ? -1 : 1;
    i++;
  }
  let digits = '';
  while (i < text.length && SUPERSCRIPT_DIGITS.includes(text[i]!)) {
    digits += String(SUPERSCRIPT_DIGITS.indexOf(text[i]!));
    i++;
  }
  if (digits === '')
    fail('expected superscript digits after the superscript sign', i, 'an exponent like z⁻¹');
  push('op', '^', NaN, start, start);
  push('num', (sign < 0 ? '-' : '') + digits, sign * Number(digits), start, i);
  return i;
}
