/**
 * The pairing as it was before it was sorted (a scan of every remaining root per section), kept as a
 * reference the sorted pairing must match exactly.
 */
import type { Root, Section, Zpk } from '../../../src/core/types.ts';
import { rootCount } from '../../../src/core/system/rootList.ts';

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

/** Index of the pole closest to the unit circle (first on ties), among those passing the filter. */
function worst(list: readonly Item[], only?: (x: Item) => boolean): number {
  let best = -1;
  let bestD = Infinity;
  list.forEach((x, i) => {
    if (only && !only(x)) return;
    const d = Math.abs(1 - Math.hypot(x.re, x.im));
    if (d < bestD) [best, bestD] = [i, d];
  });
  return best;
}

/** Index of the item nearest to `to` among real, complex or any items (first on ties); -1 if none. */
function nearest(list: readonly Item[], to: Item, which: 'real' | 'complex' | 'any'): number {
  let best = -1;
  let bestD = Infinity;
  list.forEach((x, i) => {
    if ((which === 'real' && x.im !== 0) || (which === 'complex' && x.im === 0)) return;
    const d = Math.hypot(x.re - to.re, x.im - to.im);
    if (d < bestD) [best, bestD] = [i, d];
  });
  return best;
}

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

function take(list: Item[], i: number): Item {
  return list.splice(i, 1)[0]!;
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

/** Second-order sections of the zpk (scipy zpk2sos pairing, exact delays), gain in the first section. */
export function scanPairing(zpk: Zpk, opts: { pairing?: 'nearest' | 'keep-odd' } = {}): Section[] {
  const pairing = opts.pairing ?? 'nearest';
  const nz = rootCount(zpk.zeros);
  const np = rootCount(zpk.poles);
  if (nz === 0 && np === 0) return [[zpk.gain, 0, 0, 1, 0, 0]];
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
  const first = sections[0]!;
  for (let i = 0; i < 3; i++) first[i]! *= zpk.gain;
  return sections;
}

/** The scipy zpk2sos loop: consumes z and p, filling sections from the last one backwards. */
function fill(sections: Section[], z: Item[], p: Item[], found: (i: number) => number): void {
  const count = (list: readonly Item[]) => list.filter((x) => x.im === 0).length;
  const isReal = (x: Item) => x.im === 0;
  const origin: Item = { re: 0, im: 0, delay: false };
  for (let si = sections.length - 1; si >= 0; si--) {
    const p1 = take(p, worst(p));
    let zs: Item[];
    let ps: Item[];
    if (p1.im === 0 && count(p) === 0) {
      zs = [take(z, found(nearest(z, p1, 'real'))), origin];
      ps = [p1, origin];
    } else if (p.length + 1 === z.length && p1.im !== 0 && count(p) === 1 && count(z) === 1) {
      zs = [take(z, found(nearest(z, p1, 'complex')))];
      ps = [p1];
    } else {
      ps = p1.im === 0 ? [p1, take(p, worst(p, isReal))] : [p1];
      zs = [];
      if (z.length > 0) {
        const z1 = take(z, nearest(z, p1, 'any'));
        zs.push(z1);
        if (z1.im === 0 && z.length > 0) zs.push(take(z, found(nearest(z, p1, 'real'))));
      }
    }
    const b = quadratic(zs);
    const a = quadratic(ps);
    sections[si] = [b[0], b[1], b[2], a[0], a[1], a[2]];
  }
}
