/**
 * Zeros/poles/gain -> cascade of second-order sections, with the pairing and ordering rules of scipy's
 * zpk2sos for digital systems: poles are taken from the one closest to the unit circle outwards and paired
 * with their nearest zeros; sections are filled from the last one backwards, so the section nearest the
 * circle runs last; the gain goes into the first section.
 *
 * One deliberate difference: scipy pads missing zeros with zeros at the origin, which advances the cascade by
 * (poles − zeros) samples. Here a padded zero is a "delay" (a zero at infinity): its section numerator is
 * shifted right instead, so the cascade is exactly H(z) = k·Π(z − zᵢ)/Π(z − pᵢ). Pairing is unchanged.
 *
 * A second one: with every pole at the origin (an FIR kept as roots) the sections' denominators are all
 * alike and their order is free, and the zeros-only cascade in the pairing's order is numerically useless
 * from order ~128 (an order-512 least-squares low-pass came out 1e84 off its taps: a prefix of the cascade,
 * holding the zeros of one part of the circle, amplifies what the rest must then cancel). There the sections
 * run in bit-reversed order of their zeros' angle ranks (core/multiplyOut.ts), so every prefix has zeros
 * spread around the whole circle and its response stays a scaled likeness of the whole (order 512:
 * 1e-12 of the largest tap).
 */
import type { Root, Section, Zpk } from '../types.ts';
import { rootCount } from './rootList.ts';
import { NearestPoints } from './nearest.ts';
import { bitReversedOrder } from '../multiplyOut.ts';

/** How sections are formed when the order is odd: one extra pole/zero pair at the origin, or a first-order section. */
export type SectionPairing = 'nearest' | 'keep-odd';

interface Item {
  re: number;
  im: number;
  /** A padded zero at infinity: contributes z^-1 to its section instead of a factor (1 − 0·z^-1). */
  delay: boolean;
}

/** One entry per root (im >= 0, multiplicity expanded), in scipy _cplxreal order: complex pairs then reals. */
function items(roots: readonly Root[], extraReal: Item[]): Item[] {
  const cplx: Item[] = [];
  const real: Item[] = [];
  for (const r of roots) {
    for (let m = 0; m < r.multiplicity; m++)
      (r.im === 0 ? real : cplx).push({ re: r.re, im: r.im, delay: false });
  }
  real.push(...extraReal);
  cplx.sort((x, y) => x.re - y.re || Math.abs(x.im) - Math.abs(y.im));
  real.sort((x, y) => x.re - y.re);
  return [...cplx, ...real];
}

const zeroItems = (n: number, delay: boolean): Item[] =>
  Array.from({ length: n }, () => ({ re: 0, im: 0, delay }));

/** Monic polynomial of up to two roots (a complex root brings its conjugate), right-aligned in three slots. */
function quadratic(roots: readonly Item[]): [number, number, number] {
  let p = [1];
  for (const r of roots) {
    if (r.delay) continue;
    const f = r.im !== 0 ? [1, -2 * r.re, r.re * r.re + r.im * r.im] : [1, -r.re];
    const q = new Array<number>(p.length + f.length - 1).fill(0);
    p.forEach((pi, i) => f.forEach((fj, j) => (q[i + j]! += pi * fj)));
    p = q;
  }
  while (p.length < 3) p.unshift(0);
  return [p[0]!, p[1]!, p[2]!];
}

/**
 * Groups roots into section-sized factors in list order: a complex root alone (it brings its conjugate),
 * real roots two at a time, an odd one out with a literal origin root.
 */
function factors(list: readonly Item[]): Item[][] {
  const out: Item[][] = list.filter((x) => x.im !== 0).map((x) => [x]);
  const real = list.filter((x) => x.im === 0);
  for (let i = 0; i < real.length; i += 2)
    out.push([real[i]!, real[i + 1] ?? { re: 0, im: 0, delay: false }]);
  return out;
}

/**
 * Fallback when the nearest-zero rules run out of suitable zeros (scipy raises there, e.g. one real zero
 * left for two real poles with only complex zeros remaining): factors are paired in order, which keeps the
 * cascade exact though not optimally paired.
 */
function pairInOrder(z: readonly Item[], p: readonly Item[]): Section[] {
  const zf = factors(z);
  const pf = factors(p);
  return pf.map((ps, i) => {
    const b = quadratic(zf[i] ?? []);
    const a = quadratic(ps);
    return [b[0], b[1], b[2], a[0], a[1], a[2]];
  });
}

/**
 * Second-order sections of the zpk (scipy zpk2sos pairing, exact delays), gain in the first section; with every
 * pole at the origin, in bit-reversed order of their zeros' angles (see the file comment).
 */
export function zpkToSections(zpk: Zpk, opts: { pairing?: SectionPairing } = {}): Section[] {
  if (noRoots(zpk)) return [[zpk.gain, 0, 0, 1, 0, 0]];
  const sections = pairSections(zpk, opts.pairing ?? 'nearest');
  const ordered = zpk.poles.every((p) => p.re === 0 && p.im === 0) ? interleavedByAngle(sections) : sections;
  return withGain(ordered, zpk.gain);
}

/** The sections in the pairing's own order (scipy's), gain in the first: what zpkToSections reorders. */
export function pairedSections(zpk: Zpk, opts: { pairing?: SectionPairing } = {}): Section[] {
  if (noRoots(zpk)) return [[zpk.gain, 0, 0, 1, 0, 0]];
  return withGain(pairSections(zpk, opts.pairing ?? 'nearest'), zpk.gain);
}

function withGain(sections: Section[], gain: number): Section[] {
  const first = sections[0]!;
  for (let i = 0; i < 3; i++) first[i]! *= gain;
  return sections;
}

const noRoots = (zpk: Zpk) => rootCount(zpk.zeros) === 0 && rootCount(zpk.poles) === 0;

/** The sections of the pairing, without the gain (at least one root). */
function pairSections(zpk: Zpk, pairing: SectionPairing): Section[] {
  const nz = rootCount(zpk.zeros);
  const np = rootCount(zpk.poles);
  const n = Math.max(nz, np);
  const odd = n % 2 === 1 && pairing === 'nearest' ? 1 : 0;
  const z = items(zpk.zeros, [...zeroItems(np - nz > 0 ? np - nz : 0, true), ...zeroItems(odd, false)]);
  const p = items(zpk.poles, zeroItems(Math.max(0, nz - np) + odd, false));
  const sections = new Array<Section>((n + 1) >> 1);
  const [zAll, pAll] = [[...z], [...p]];
  const found = (i: number) => {
    if (i < 0) throw new RangeError('no zero of the required kind left');
    return i;
  };
  try {
    fill(sections, z, p, found);
  } catch {
    sections.splice(0, sections.length, ...pairInOrder(zAll, pAll));
  }
  return sections;
}

/** The angle in [0, π] of a section numerator's zeros (the upper one of a pair; the first of two reals). */
function zeroAngle([b0, b1, b2]: Section): number {
  if (b0 === 0) return b1 === 0 || -b2 / b1 >= 0 ? 0 : Math.PI; // a delay and at most one zero
  const d = b1 * b1 - 4 * b0 * b2;
  if (d < 0) return Math.atan2(Math.sqrt(-d), -b1 / Math.sign(b0));
  // the larger root by size, taken without cancellation
  const r = (-b1 - Math.sign(b1 || 1) * Math.sqrt(d)) / (2 * b0);
  return r < 0 ? Math.PI : 0;
}

/** Sections whose denominators are alike, taken in bit-reversed order of their zeros' angle ranks. */
function interleavedByAngle(sections: Section[]): Section[] {
  const angle = sections.map(zeroAngle);
  const rank = sections.map((_, i) => i).sort((a, b) => angle[a]! - angle[b]! || a - b);
  return Array.from(bitReversedOrder(sections.length), (k) => sections[rank[k]!]!);
}

/** Distance from the unit circle, by which poles are taken (closest first). */
const circleDistance = (x: Item) => Math.abs(1 - Math.hypot(x.re, x.im));

/**
 * Poles in the order the pairing takes them — closest to the unit circle first, list order on ties — sorted
 * once, with the real ones in the same order for the partner of a real pole.
 */
class PoleQueue {
  private readonly order: number[];
  private readonly realOrder: number[];
  private readonly used: Uint8Array;
  private at = 0;
  private realAt = 0;
  realLeft: number;
  left: number;

  constructor(private readonly p: readonly Item[]) {
    const d = p.map(circleDistance);
    this.order = p.map((_, i) => i).sort((a, b) => d[a]! - d[b]! || a - b);
    this.realOrder = this.order.filter((i) => p[i]!.im === 0);
    this.used = new Uint8Array(p.length);
    this.realLeft = this.realOrder.length;
    this.left = p.length;
  }

  private mark(i: number): Item {
    this.used[i] = 1;
    this.left--;
    if (this.p[i]!.im === 0) this.realLeft--;
    return this.p[i]!;
  }

  /** The remaining pole closest to the unit circle. */
  takeWorst(): Item {
    while (this.used[this.order[this.at]!]) this.at++;
    return this.mark(this.order[this.at]!);
  }

  /** The remaining real pole closest to the unit circle. */
  takeWorstReal(): Item {
    while (this.used[this.realOrder[this.realAt]!]) this.realAt++;
    const i = this.realOrder[this.realAt];
    if (i === undefined) throw new RangeError('no real pole left');
    return this.mark(i);
  }
}

/**
 * The scipy zpk2sos loop: consumes z and p, filling sections from the last one backwards. The poles are
 * sorted once by their distance from the circle and the zeros searched by real part (nearest.ts), so the
 * pairing costs O(n log n) for n roots rather than a scan of every remaining root per section.
 */
function fill(sections: Section[], z: Item[], p: Item[], found: (i: number) => number): void {
  const poles = new PoleQueue(p);
  const zeros = new NearestPoints(z);
  let zLeft = z.length;
  const takeZero = (i: number): Item => {
    zeros.remove(found(i));
    zLeft--;
    return z[i]!;
  };
  const origin: Item = { re: 0, im: 0, delay: false };
  for (let si = sections.length - 1; si >= 0; si--) {
    const p1 = poles.takeWorst();
    let zs: Item[];
    let ps: Item[];
    if (p1.im === 0 && poles.realLeft === 0) {
      zs = [takeZero(zeros.nearest(p1.re, p1.im, 'real')), origin];
      ps = [p1, origin];
    } else if (poles.left + 1 === zLeft && p1.im !== 0 && poles.realLeft === 1 && zeros.count('real') === 1) {
      zs = [takeZero(zeros.nearest(p1.re, p1.im, 'complex'))];
      ps = [p1];
    } else {
      ps = p1.im === 0 ? [p1, poles.takeWorstReal()] : [p1];
      zs = [];
      if (zLeft > 0) {
        const z1 = takeZero(zeros.nearest(p1.re, p1.im, 'any'));
        zs.push(z1);
        if (z1.im === 0 && zLeft > 0) zs.push(takeZero(zeros.nearest(p1.re, p1.im, 'real')));
      }
    }
    const b = quadratic(zs);
    const a = quadratic(ps);
    sections[si] = [b[0], b[1], b[2], a[0], a[1], a[2]];
  }
}
