/**
 * Hand edits that keep an FIR linear phase.
 *
 * The taps of a real FIR are symmetric or antisymmetric (linear phase, common practice) exactly when its
 * zero set is closed under z → 1/z* (the Z-transform of the time-reversed taps has the reciprocal zeros, and
 * real taps give the conjugates). Roots are stored once per conjugate pair (im > 0), so a quadruplet
 * z, z*, 1/z, 1/z* is two stored entries, z and 1/z* (same angle, reciprocal radius); a zero on the circle is
 * its own reciprocal (one stored pair); a real zero r goes with 1/r (two stored real zeros); a zero at ±1 is
 * alone. Zeros at the origin only shift the taps and are left out of the picture.
 *
 * linearPhaseShape says which stored zero goes with which, or which have no partner; moveKeepingLinearPhase
 * moves a zero with its partner (the design stays linear phase); restoreLinearPhase gives every zero without
 * a partner one again.
 */
import type { Root } from '../../types.ts';

/** Relative distance within which a zero counts as another's reciprocal, or as on the unit circle. */
export const PARTNER_TOLERANCE = 1e-6;

/** Smallest imaginary part a pair keeps (as store/rootEdits.ts: a pair stays a pair on the real axis). */
const MIN_PAIR_IM = 1e-9;

export interface LinearPhaseShape {
  /**
   * Per stored zero: the index of its reciprocal partner, its own index when it is its own reciprocal (on
   * the circle, or ±1), −1 at the origin (a shift), −2 when it has no partner (an orphan).
   */
  partner: Int32Array;
  /** The stored zeros without a partner. */
  orphans: number[];
  /** Stored zeros (not at the origin) that have a partner or are their own. */
  partnered: number;
  /** Whether the zero set is closed under z → 1/z*: the taps are symmetric or antisymmetric. */
  linear: boolean;
  /** The constant group delay in samples when linear: the poles at the origin, less the zeros there, less half the rest. */
  delaySamples: number;
}

const atOrigin = (z: Root) => z.re === 0 && z.im === 0;

/** Mismatch of w against z's reciprocal 1/z*, relative to the reciprocal's size (at least 1). */
function reciprocalMismatch(z: Root, w: Root): number {
  const r2 = z.re * z.re + z.im * z.im;
  const re = z.re / r2;
  const im = z.im / r2;
  return Math.hypot(w.re - re, w.im - im) / Math.max(1, Math.sqrt(re * re + im * im));
}

/** |1 − |z||: how far a zero is from the unit circle. */
const offCircle = (z: Root) => Math.abs(Math.hypot(z.re, z.im) - 1);

const cache = new WeakMap<readonly Root[], LinearPhaseShape>();

/**
 * Pairs each stored zero with its reciprocal. A zero takes the nearest unpaired zero of the same kind (real
 * or pair) and multiplicity within PARTNER_TOLERANCE; one without such a partner but on the circle (±1 for
 * a real zero) is its own. `poles` gives the delay (every pole at the origin is a sample of delay).
 */
export function linearPhaseShape(zeros: readonly Root[], poles: readonly Root[] = []): LinearPhaseShape {
  let shape = cache.get(zeros);
  if (!shape) {
    shape = pairUp(zeros);
    cache.set(zeros, shape);
  }
  if (!shape.linear) return shape;
  let delay = 0;
  for (const p of poles) delay += p.multiplicity;
  for (let i = 0; i < zeros.length; i++) {
    const z = zeros[i]!;
    const count = z.im > 0 ? 2 * z.multiplicity : z.multiplicity;
    delay -= atOrigin(z) ? count : count / 2;
  }
  return { ...shape, delaySamples: delay };
}

function pairUp(zeros: readonly Root[]): LinearPhaseShape {
  const n = zeros.length;
  const partner = new Int32Array(n).fill(-2);
  for (let i = 0; i < n; i++) if (atOrigin(zeros[i]!)) partner[i] = -1;
  // Pairs first, nearest mismatch first within each zero's search, so a zero on the circle with a twin
  // beside it (a double zero held as two entries) pairs with the twin.
  for (let i = 0; i < n; i++) {
    if (partner[i] !== -2) continue;
    const z = zeros[i]!;
    let best = -1;
    let bestMiss = PARTNER_TOLERANCE;
    for (let j = i + 1; j < n; j++) {
      if (partner[j] !== -2) continue;
      const w = zeros[j]!;
      if ((w.im === 0) !== (z.im === 0) || w.multiplicity !== z.multiplicity) continue;
      const miss = reciprocalMismatch(z, w);
      if (miss <= bestMiss) {
        bestMiss = miss;
        best = j;
      }
    }
    if (best >= 0) {
      partner[i] = best;
      partner[best] = i;
    }
  }
  for (let i = 0; i < n; i++) {
    if (partner[i] !== -2) continue;
    if (offCircle(zeros[i]!) <= PARTNER_TOLERANCE) partner[i] = i;
  }
  const orphans: number[] = [];
  let partnered = 0;
  for (let i = 0; i < n; i++) {
    if (partner[i] === -2) orphans.push(i);
    else if (partner[i]! >= 0) partnered++;
  }
  return { partner, orphans, partnered, linear: orphans.length === 0, delaySamples: NaN };
}

/** z's reciprocal 1/z* (same angle, reciprocal radius), as a stored root of z's multiplicity. */
function reciprocalOf(z: Root): Root {
  const r2 = z.re * z.re + z.im * z.im;
  return { re: z.re / r2, im: z.im / r2, multiplicity: z.multiplicity };
}

/** z put on the unit circle (exactly ±1 for a real zero). */
function onCircle(z: Root): Root {
  if (z.im === 0) return z.re === Math.sign(z.re) ? z : { ...z, re: Math.sign(z.re) };
  const r = Math.hypot(z.re, z.im);
  return r === 1 ? z : { ...z, re: z.re / r, im: z.im / r };
}

/**
 * The zeros with every pair made exactly reciprocal (the lower index stays, its partner follows) and every
 * self-partnered zero exactly on the circle: the taps are then symmetric to rounding, not to the root
 * finder's 1e-10. Entries that already are stay the same objects.
 */
function exactly(zeros: readonly Root[], shape: LinearPhaseShape): Root[] {
  const out = zeros.slice();
  for (let i = 0; i < zeros.length; i++) {
    const p = shape.partner[i]!;
    if (p === i) out[i] = onCircle(zeros[i]!);
    else if (p > i) {
      const w = reciprocalOf(zeros[i]!);
      const old = zeros[p]!;
      if (old.re !== w.re || old.im !== w.im) out[p] = w;
    }
  }
  return out;
}

/**
 * Moves stored zero `index` towards (re, im) keeping a linear-phase zero set linear phase: its partner
 * follows to the reciprocal (a quadruplet, or a real pair r, 1/r); a zero on the circle moves along the
 * circle (to the pointer's angle); a zero at ±1 stays. Returns null when the set is not linear phase (the
 * caller moves the zero alone) or the zero sits at the origin; the same array when nothing can move.
 */
export function moveKeepingLinearPhase(
  zeros: readonly Root[],
  index: number,
  re: number,
  im: number,
): Root[] | null {
  const old = zeros[index];
  if (!old || !Number.isFinite(re) || !Number.isFinite(im)) return null;
  const shape = linearPhaseShape(zeros);
  if (!shape.linear) return null;
  const p = shape.partner[index]!;
  if (p < 0) return null;
  if (p === index && old.im === 0) return zeros as Root[]; // ±1 is alone: any move breaks linear phase
  const out = exactly(zeros, shape);
  if (p === index) {
    const angle = Math.atan2(Math.max(MIN_PAIR_IM, Math.abs(im)), re);
    if (re === 0 && im === 0) return out;
    out[index] = { ...old, re: Math.cos(angle), im: Math.sin(angle) };
    return out;
  }
  const moved: Root =
    old.im === 0 ? { ...old, re, im: 0 } : { ...old, re, im: Math.max(MIN_PAIR_IM, Math.abs(im)) };
  if (moved.re === 0 && moved.im === 0) return out;
  out[index] = moved;
  out[p] = reciprocalOf(moved);
  return out;
}

/** What restoreLinearPhase did, for the page to say. */
export interface LinearPhaseRestore {
  zeros: Root[];
  /** Zeros moved to the reciprocal of another that had lost its partner. */
  moved: number;
  /** Zeros added as the reciprocal of one whose partner was gone. */
  added: number;
}

/**
 * Gives every zero without a partner one again. Zeros without partners are paired with each other where
 * one is near the other's reciprocal (same kind and multiplicity; nearest first): one stays and the other
 * moves to its reciprocal, `keep` staying when it is one of them (the zero the user just edited), else the
 * lower index. A zero left alone gets its reciprocal added. Stored zeros keep their order; added ones go
 * at the end. Already paired zeros are made exactly reciprocal too.
 */
export function restoreLinearPhase(zeros: readonly Root[], keep: number | null = null): LinearPhaseRestore {
  const shape = linearPhaseShape(zeros);
  const out = exactly(zeros, shape);
  const orphans = shape.orphans.slice();
  const candidates: { a: number; b: number; miss: number }[] = [];
  for (let x = 0; x < orphans.length; x++) {
    for (let y = x + 1; y < orphans.length; y++) {
      const a = orphans[x]!;
      const b = orphans[y]!;
      const za = zeros[a]!;
      const zb = zeros[b]!;
      if ((za.im === 0) !== (zb.im === 0) || za.multiplicity !== zb.multiplicity) continue;
      candidates.push({ a, b, miss: Math.min(reciprocalMismatch(za, zb), reciprocalMismatch(zb, za)) });
    }
  }
  candidates.sort((u, v) => u.miss - v.miss);
  const done = new Set<number>();
  let moved = 0;
  for (const { a, b } of candidates) {
    if (done.has(a) || done.has(b)) continue;
    done.add(a);
    done.add(b);
    const [stay, go] = b === keep ? [b, a] : [a, b];
    out[go] = reciprocalOf(zeros[stay]!);
    moved++;
  }
  let added = 0;
  for (const i of orphans) {
    if (done.has(i)) continue;
    out.push(reciprocalOf(zeros[i]!));
    added++;
  }
  return { zeros: out, moved, added };
}
