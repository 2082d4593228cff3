/** Pure edits of a design's roots, used by the store's actions. */
import type { Root } from '../core/types.ts';
import { rootsOf, withRoots, type Design, type RootRef } from '../core/model/design.ts';
import { MAX_MULTIPLICITY } from '../core/model/limits.ts';

/**
 * Smallest imaginary part a conjugate pair keeps while dragged onto the real axis: the pair stays a pair
 * (the user joins it into a double real root on purpose), and im > 0 keeps meaning "conjugate implied".
 */
export const MIN_PAIR_IM = 1e-9;

/** Moves a root: a real root stays on the real axis, a pair keeps im > 0 (its mirror follows). */
export function moveRoot(design: Design, ref: RootRef, re: number, im: number): Design {
  const roots = rootsOf(design, ref.kind);
  const old = roots[ref.index];
  if (!old || !Number.isFinite(re) || !Number.isFinite(im)) return design;
  const next: Root =
    old.im === 0 ? { ...old, re, im: 0 } : { ...old, re, im: Math.max(MIN_PAIR_IM, Math.abs(im)) };
  const copy = roots.slice();
  copy[ref.index] = next;
  return withRoots(design, ref.kind, copy);
}

/** Adds a root (a real root, or a pair when im ≠ 0), stored with im ≥ 0. */
export function addRoot(design: Design, kind: RootRef['kind'], root: Root): Design {
  const stored: Root = { re: root.re, im: Math.abs(root.im), multiplicity: Math.max(1, root.multiplicity) };
  return withRoots(design, kind, [...rootsOf(design, kind), stored]);
}

/** Removes one stored root (with its conjugate mirror). */
export function deleteRoot(design: Design, ref: RootRef): Design {
  const roots = rootsOf(design, ref.kind);
  if (!roots[ref.index]) return design;
  return withRoots(
    design,
    ref.kind,
    roots.filter((_, i) => i !== ref.index),
  );
}

/** Sets the multiplicity of one root (1…MAX_MULTIPLICITY). */
export function setMultiplicity(design: Design, ref: RootRef, multiplicity: number): Design {
  const roots = rootsOf(design, ref.kind);
  const old = roots[ref.index];
  const m = Math.round(multiplicity);
  if (!old || !(m >= 1 && m <= MAX_MULTIPLICITY) || m === old.multiplicity) return design;
  const copy = roots.slice();
  copy[ref.index] = { ...old, multiplicity: m };
  return withRoots(design, ref.kind, copy);
}

/** Turns a real root into a conjugate pair at the same place, split by `im` (same multiplicity). */
export function splitRoot(design: Design, ref: RootRef, im = 0.05): Design {
  const roots = rootsOf(design, ref.kind);
  const old = roots[ref.index];
  if (!old || old.im !== 0) return design;
  const copy = roots.slice();
  copy[ref.index] = { ...old, im: Math.abs(im) || MIN_PAIR_IM };
  return withRoots(design, ref.kind, copy);
}

/** Turns a conjugate pair into a real root of twice the multiplicity at its real part. */
export function joinPair(design: Design, ref: RootRef): Design {
  const roots = rootsOf(design, ref.kind);
  const old = roots[ref.index];
  if (!old || old.im === 0) return design;
  const copy = roots.slice();
  copy[ref.index] = { re: old.re, im: 0, multiplicity: Math.min(MAX_MULTIPLICITY, old.multiplicity * 2) };
  return withRoots(design, ref.kind, copy);
}
