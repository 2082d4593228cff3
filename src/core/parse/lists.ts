/**
 * Helpers for list-shaped input (coefficient lists, root lists): splitting a token range into items at
 * top-level commas, or at white space in the way matrix-style numeric tools do, where '1 -0.5' is two items
 * and '1 - 0.5' is one.
 */
import { fail } from './errors.ts';
import type { Token } from './lexer.ts';

/** A half-open token range [from, to). */
export interface Span {
  from: number;
  to: number;
}

const OPENERS = '([';
const CLOSERS = ')]';
const BINARY = new Set(['+', '-', '*', '/', '^', '±', '∠', '@']);

/** Bracket depth before each token of the range, failing on a closer with no opener. */
function depths(tokens: readonly Token[], span: Span): number[] {
  const out: number[] = [];
  let d = 0;
  for (let i = span.from; i < span.to; i++) {
    const t = tokens[i]!;
    if (t.kind === 'op' && CLOSERS.includes(t.text)) {
      d--;
      if (d < 0) fail(`unmatched '${t.text}'`, t.pos, 'balanced brackets');
    }
    out.push(d);
    if (t.kind === 'op' && OPENERS.includes(t.text)) d++;
  }
  return out;
}

/** Splits a range into items at top-level commas; empty items are errors except a trailing one. */
export function splitCommas(tokens: readonly Token[], span: Span): Span[] {
  const d = depths(tokens, span);
  const items: Span[] = [];
  let start = span.from;
  for (let i = span.from; i < span.to; i++) {
    const t = tokens[i]!;
    if (t.kind === 'op' && t.text === ',' && d[i - span.from] === 0) {
      if (i === start) fail('expected a value before this comma', t.pos, 'a value');
      items.push({ from: start, to: i });
      start = i + 1;
    }
  }
  if (start < span.to) items.push({ from: start, to: span.to });
  return items;
}

/** Index of the first token at bracket depth 0 that is one of the operators, or -1. */
export function topLevelIndex(tokens: readonly Token[], span: Span, ops: readonly string[]): number {
  const d = depths(tokens, span);
  for (let i = span.from; i < span.to; i++) {
    const t = tokens[i]!;
    if (t.kind === 'op' && ops.includes(t.text) && d[i - span.from] === 0) return i;
  }
  return -1;
}

/** True when some top-level token of the range is the given operator. */
export function hasTopLevel(tokens: readonly Token[], span: Span, op: string): boolean {
  return topLevelIndex(tokens, span, [op]) >= 0;
}

/**
 * Splits at white space: a token after white space starts a new item unless the previous token was an
 * operator or an opener, or it is itself an operator other than a sign stuck to what follows ('-0.5'), or
 * the caller says it belongs to what precedes it (a unit, a repeat count).
 */
export function splitSpaces(
  tokens: readonly Token[],
  span: Span,
  joinsBefore: (t: Token) => boolean = () => false,
): Span[] {
  const d = depths(tokens, span);
  const items: Span[] = [];
  let start = span.from;
  for (let i = span.from + 1; i < span.to; i++) {
    const t = tokens[i]!;
    const prev = tokens[i - 1]!;
    if (!t.space || d[i - span.from] !== 0) continue;
    const prevJoins = prev.kind === 'op' && (BINARY.has(prev.text) || OPENERS.includes(prev.text));
    if (prevJoins) continue;
    const next = tokens[i + 1];
    const sign = t.kind === 'op' && (t.text === '-' || t.text === '+') && next !== undefined && !next.space;
    const joins = t.kind === 'op' && !sign && (BINARY.has(t.text) || CLOSERS.includes(t.text));
    if (joins || joinsBefore(t)) continue;
    items.push({ from: start, to: i });
    start = i;
  }
  if (start < span.to) items.push({ from: start, to: span.to });
  return items;
}

/** Removes one pair of brackets enclosing the whole range, if there is one. */
export function unwrapBrackets(tokens: readonly Token[], span: Span): Span {
  if (span.to - span.from < 2) return span;
  const first = tokens[span.from]!;
  const last = tokens[span.to - 1]!;
  if (!(first.kind === 'op' && first.text === '[' && last.kind === 'op' && last.text === ']')) return span;
  const d = depths(tokens, span);
  // The opening bracket must close at the very end, not earlier as in '[1] [2]'.
  for (let i = span.from + 1; i < span.to - 1; i++) if (d[i - span.from] === 0) return span;
  return { from: span.from + 1, to: span.to - 1 };
}
