/**
 * Zeros, poles and gain in Polewright's own short syntax:
 *
 *   zeros: -1 x2, 0.5±0.5j;  poles: 0.9∠30°, 0.8@0.5rad, 0.7;  gain: 0.25
 *
 * - Sections are labelled zeros (or zero, z), poles (or pole, p) and gain (or k), each followed by ':' or
 *   '='; they may come in any order, on one line or several; a missing section is empty (gain 1).
 * - Roots are separated by commas (or by white space as in '1 -1'); brackets around a list are optional;
 *   'none' stands for an empty list.
 * - A root is a real or complex number: 0.5+0.5j (j or i), or polar r∠θ° / r@θdeg / r@θrad, where the
 *   angle's unit is required.
 * - a±b (also a+-b) means the two roots a+b and a-b: for real a and imaginary b that is one conjugate pair.
 * - A complex root without its conjugate means the pair: the system has real coefficients. Typing the
 *   conjugate as well does not add a second pair ('0.5+0.5j, 0.5-0.5j' is one pair).
 * - A root repeated m times is written with ' xm' after it ('-1 x2'); '^' is not used in roots, so that
 *   '0.5^2' is never misread.
 * - The gain k is that of H(z) = k·Π(z−zᵢ)/Π(z−pᵢ), a real number expression (10^(-3/20) is fine).
 */
import type { Complex, Result, Root, Zpk } from '../types.ts';
import { Cursor, found } from './ast.ts';
import { complexAlgebra } from './complex.ts';
import { fail, guard } from './errors.ts';
import { evaluate } from './evaluate.ts';
import { tokenize, type Token } from './lexer.ts';
import { hasTopLevel, topLevelIndex, splitCommas, splitSpaces, unwrapBrackets, type Span } from './lists.ts';
import { realFromTokens } from './scalar.ts';
import { MAX_DEGREE } from './laurent.ts';

/**
 * A polar root's imaginary part below this fraction of its radius is taken as exactly zero: sin(180°) in
 * floating point is about 1.2e-16, and a root typed at 180° is meant to be real.
 */
export const POLAR_REAL_SNAP = 4 * Number.EPSILON;

type Section = 'zeros' | 'poles' | 'gain';
const LABELS: Record<string, Section> = {
  zeros: 'zeros',
  zero: 'zeros',
  z: 'zeros',
  poles: 'poles',
  pole: 'poles',
  p: 'poles',
  gain: 'gain',
  k: 'gain',
};
export const ROOTS_SYNTAX = "'zeros: -1 x2, 0.5±0.5j; poles: 0.9∠30°, 0.8@0.5rad; gain: 0.25'";
const STOP = new Set(['x', 'X', 'deg', 'rad']);
const isOp = (t: Token | undefined, s: string): boolean => t !== undefined && t.kind === 'op' && t.text === s;

function labelAt(tokens: readonly Token[], i: number): Section | undefined {
  const t = tokens[i]!;
  if (t.kind !== 'id' || !(t.text in LABELS)) return undefined;
  return isOp(tokens[i + 1], ':') || isOp(tokens[i + 1], '=') ? LABELS[t.text] : undefined;
}

/** One complex value from tokens[from, to); '^' and unknown names are refused with a reason. */
function complexFrom(tokens: readonly Token[], s: Span): Complex {
  const cur = new Cursor(tokens, s.from, s.to, { stopNames: STOP });
  if (cur.atEnd()) fail('expected a root, found nothing', cur.peek().pos, ROOTS_SYNTAX);
  const node = cur.expression();
  if (!cur.atEnd())
    fail(`expected ',' or the end of the root${found(cur.peek())}`, cur.peek().pos, ROOTS_SYNTAX);
  return evaluate(node, complexAlgebra);
}

/** r∠θ with its unit, from the magnitude range and the angle range (a leading ± on the angle is allowed). */
function polar(tokens: readonly Token[], mag: Span, angle: Span): Complex {
  const r = complexFrom(tokens, mag);
  if (r.im !== 0) fail('the radius of a polar root must be real', tokens[mag.from]!.pos, 'a real radius');
  const to = angle.to;
  const from = isOp(tokens[angle.from], '±') ? angle.from + 1 : angle.from;
  const unit = tokens[to - 1];
  let scale = 0;
  if (isOp(unit, '°') || (unit?.kind === 'id' && unit.text === 'deg')) scale = Math.PI / 180;
  else if (unit?.kind === 'id' && unit.text === 'rad') scale = 1;
  else
    fail(
      'a polar angle needs its unit: ° (or deg) or rad',
      unit?.end ?? tokens[to]!.pos,
      "'30°', '30deg' or '0.5rad'",
    );
  const theta = realFromTokens(tokens, from, to - 1) * scale;
  const re = r.re * Math.cos(theta);
  const im = r.re * Math.sin(theta);
  return { re, im: Math.abs(im) <= POLAR_REAL_SNAP * Math.abs(r.re) ? 0 : im };
}

/** The roots one list item stands for (before merging), each with the item's repeat count. */
function readItem(tokens: readonly Token[], item: Span): Root[] {
  const from = item.from;
  let to = item.to;
  let multiplicity = 1;
  const mark = tokens[to - 2];
  if (to - from >= 3 && mark?.kind === 'id' && (mark.text === 'x' || mark.text === 'X')) {
    const count = tokens[to - 1]!;
    if (
      count.kind !== 'num' ||
      !Number.isInteger(count.value) ||
      count.value < 1 ||
      count.value > MAX_DEGREE
    ) {
      fail(`expected a whole repeat count from 1 to ${MAX_DEGREE} after 'x'`, count.pos, 'x2');
    }
    multiplicity = count.value;
    to -= 2;
  }
  const at = tokens[from]!.pos;
  let values: Complex[];
  const p = topLevelIndex(tokens, { from, to }, ['∠', '@']);
  const pm = topLevelIndex(tokens, { from, to }, ['±']);
  if (p >= 0) values = [polar(tokens, { from, to: p }, { from: p + 1, to })];
  else if (pm >= 0) {
    const a = pm === from ? { re: 0, im: 0 } : complexFrom(tokens, { from, to: pm });
    const b = complexFrom(tokens, { from: pm + 1, to });
    const plus = { re: a.re + b.re, im: a.im + b.im };
    const minus = { re: a.re - b.re, im: a.im - b.im };
    values = [plus, minus];
  } else values = [complexFrom(tokens, { from, to })];
  return values.map((v) => {
    if (!Number.isFinite(v.re) || !Number.isFinite(v.im)) fail('the root is not a finite number', at);
    return { re: v.re + 0, im: v.im + 0, multiplicity };
  });
}

/**
 * Roots of one section's list. Equal real roots add up their counts. A complex root and its conjugate are
 * counted apart, and the pair is there as often as the more frequent of the two was typed: '0.5+0.5j',
 * '0.5±0.5j' and '0.5+0.5j, 0.5-0.5j' are all one pair; '0.5+0.5j x2' is two.
 */
function readRoots(tokens: readonly Token[], span: Span): Root[] {
  const inner = unwrapBrackets(tokens, span);
  if (inner.to <= inner.from) return [];
  const only = tokens[inner.from]!;
  if (inner.to - inner.from === 1 && only.kind === 'id' && only.text === 'none') return [];
  const joins = (t: Token): boolean => (t.kind === 'id' && STOP.has(t.text)) || isOp(t, '°');
  const items = hasTopLevel(tokens, inner, ',')
    ? splitCommas(tokens, inner)
    : splitSpaces(tokens, inner, joins);
  const counts: { re: number; im: number; up: number; down: number }[] = [];
  let order = 0;
  for (const item of items) {
    for (const r of readItem(tokens, item)) {
      // Counted as typed (a pair typed as both conjugates counts twice), so work stops early on long lists.
      order += r.multiplicity;
      if (order > MAX_DEGREE)
        fail(
          `the list has more than ${MAX_DEGREE} roots`,
          tokens[item.from]!.pos,
          `at most ${MAX_DEGREE} roots (conjugates and repeats counted)`,
        );
      const im = Math.abs(r.im);
      let c = counts.find((o) => o.re === r.re && o.im === im);
      if (!c) counts.push((c = { re: r.re, im, up: 0, down: 0 }));
      if (r.im < 0) c.down += r.multiplicity;
      else c.up += r.multiplicity;
    }
  }
  return counts.map((c) => ({
    re: c.re,
    im: c.im,
    multiplicity: c.im === 0 ? c.up + c.down : Math.max(c.up, c.down),
  }));
}

/** Zeros, poles and gain from the roots syntax described at the top of this file. */
export function zpkFromText(text: string): Zpk {
  const tokens = tokenize(text);
  const end = tokens.length - 1;
  let i = 0;
  while (i < end && isOp(tokens[i], ';')) i++;
  if (i >= end || labelAt(tokens, i) === undefined) {
    fail("expected 'zeros:', 'poles:' or 'gain:'", tokens[i]!.pos, ROOTS_SYNTAX);
  }
  const seen = new Set<Section>();
  const zpk: Zpk = { zeros: [], poles: [], gain: 1 };
  while (i < end) {
    const which = labelAt(tokens, i)!;
    if (seen.has(which)) fail(`'${which}' is given twice`, tokens[i]!.pos, 'each section once');
    seen.add(which);
    let j = i + 2;
    while (j < end && labelAt(tokens, j) === undefined) j++;
    let to = j;
    while (to > i + 2 && isOp(tokens[to - 1], ';')) to--;
    const span = { from: i + 2, to };
    if (which === 'gain') {
      if (to <= i + 2) fail('expected a value after gain', tokens[to]!.pos, 'a real number');
      zpk.gain = realFromTokens(tokens, span.from, span.to);
      if (zpk.gain === 0) fail('a gain of 0 makes H(z) = 0', tokens[span.from]!.pos, 'a nonzero gain');
    } else zpk[which] = readRoots(tokens, span);
    i = j;
  }
  return zpk;
}

/** Zeros, poles and gain typed in the roots syntax (see the comment at the top of roots.ts). */
export function parseRoots(text: string): Result<Zpk> {
  return guard(text, () => zpkFromText(text));
}
