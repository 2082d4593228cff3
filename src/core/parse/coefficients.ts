/**
 * Coefficient lists in powers of z^-1. Accepted layouts:
 *   'b = [1, 0, -1]; a = [1, -1.6, 0.64]'     labelled (b/num/numerator, a/den/denominator; '=' or ':')
 *   'b: 1 0 -1  a: 1 -1.6 0.64'               white-space separated ('1 -1.6' is two values, '1 - 1.6' one)
 *   '1, 0, -1' and '1, -1.6, 0.64' on two lines (or split by ';', or as '[..] [..]'): b first, then a
 *   a single list: an FIR filter, a = [1]
 * Values may be expressions such as 1/3 or 2^-3.
 */
import type { Result, TransferFunction } from '../types.ts';
import { checkTransferFunction } from './check.ts';
import { fail, guard } from './errors.ts';
import { tokenize, type Token } from './lexer.ts';
import { hasTopLevel, splitCommas, splitSpaces, unwrapBrackets, type Span } from './lists.ts';
import { realFromTokens } from './scalar.ts';
import { MAX_COEFFICIENTS } from '../model/limits.ts';

const LABELS: Record<string, 'b' | 'a'> = {
  b: 'b',
  B: 'b',
  num: 'b',
  numerator: 'b',
  a: 'a',
  A: 'a',
  den: 'a',
  denominator: 'a',
};
const ACCEPTED = "'b = [1, 0, -1]; a = [1, -0.5]', or one list per line (b, then a)";

const isOp = (t: Token | undefined, s: string): boolean => t !== undefined && t.kind === 'op' && t.text === s;

/** Index of a label token (followed by '=' or ':') at i, or -1. */
function labelAt(tokens: readonly Token[], i: number): 'b' | 'a' | undefined {
  const t = tokens[i]!;
  if (t.kind !== 'id' || !(t.text in LABELS)) return undefined;
  return isOp(tokens[i + 1], '=') || isOp(tokens[i + 1], ':') ? LABELS[t.text] : undefined;
}

/** Drops ';' separators at either end of a range. */
function trimSeparators(tokens: readonly Token[], s: Span): Span {
  let { from, to } = s;
  while (from < to && isOp(tokens[from], ';')) from++;
  while (to > from && isOp(tokens[to - 1], ';')) to--;
  return { from, to };
}

/** Values of one list: brackets optional, commas or white space between values. */
function readList(tokens: readonly Token[], span: Span, name: string): number[] {
  const inner = unwrapBrackets(tokens, trimSeparators(tokens, span));
  if (inner.to <= inner.from) fail(`the list ${name} is empty`, tokens[span.from]!.pos, 'at least one value');
  const items = hasTopLevel(tokens, inner, ',') ? splitCommas(tokens, inner) : splitSpaces(tokens, inner);
  const extra = items[MAX_COEFFICIENTS];
  if (extra)
    fail(
      `the list ${name} has ${items.length} values`,
      tokens[extra.from]!.pos,
      `at most ${MAX_COEFFICIENTS} values (order ${MAX_COEFFICIENTS - 1})`,
    );
  return items.map((it) => realFromTokens(tokens, it.from, it.to));
}

/** Ranges of the lists when no label is given: split at ';', line breaks, or between '] ['. */
function unlabelledGroups(tokens: readonly Token[], end: number): Span[] {
  const groups: Span[] = [];
  let start = 0;
  let depth = 0;
  for (let i = 0; i < end; i++) {
    const t = tokens[i]!;
    const prev = tokens[i - 1];
    const breakHere =
      depth === 0 && i > start && (t.line || isOp(t, ';') || (isOp(t, '[') && isOp(prev, ']')));
    if (breakHere) {
      groups.push({ from: start, to: i });
      start = isOp(t, ';') ? i + 1 : i;
    }
    if (isOp(t, '[') || isOp(t, '(')) depth++;
    if (isOp(t, ']') || isOp(t, ')')) depth = Math.max(0, depth - 1);
  }
  if (start < end) groups.push({ from: start, to: end });
  return groups.map((g) => trimSeparators(tokens, g)).filter((g) => g.to > g.from);
}

/** b, a from coefficient lists, exactly as typed (a[0] not normalised). */
export function coefficientsFromText(text: string): TransferFunction {
  const tokens = tokenize(text);
  const end = tokens.length - 1;
  const lists: Partial<Record<'b' | 'a', number[]>> = {};
  const labelled = tokens.some((_, i) => i < end && labelAt(tokens, i) !== undefined);
  if (labelled) {
    if (labelAt(tokens, 0) === undefined) fail("expected 'b =' or 'a =' first", tokens[0]!.pos, ACCEPTED);
    let i = 0;
    while (i < end) {
      const which = labelAt(tokens, i)!;
      let j = i + 2;
      while (j < end && labelAt(tokens, j) === undefined) j++;
      if (lists[which]) fail(`the list ${which} is given twice`, tokens[i]!.pos, 'each list once');
      lists[which] = readList(tokens, { from: i + 2, to: j }, which);
      i = j;
    }
  } else {
    const groups = unlabelledGroups(tokens, end);
    if (groups.length === 0) fail('expected coefficient lists, found nothing', 0, ACCEPTED);
    if (groups.length > 2) {
      fail('expected at most two lists (b, then a)', tokens[groups[2]!.from]!.pos, ACCEPTED);
    }
    lists.b = readList(tokens, groups[0]!, 'b');
    if (groups[1]) lists.a = readList(tokens, groups[1], 'a');
  }
  if (!lists.b) fail('the numerator list b is missing', text.length, "'b = [...]'");
  const tf = { b: lists.b, a: lists.a ?? [1] };
  if (tf.a[0] === 0) {
    fail(
      'a[0] is zero: the newest output sample has no coefficient',
      0,
      'a list a whose first value is nonzero',
    );
  }
  return checkTransferFunction(tf, 0);
}

/** Coefficient lists -> b, a in powers of z^-1 (a defaults to [1], the FIR case). */
export function parseCoefficients(text: string): Result<TransferFunction> {
  return guard(text, () => coefficientsFromText(text));
}
