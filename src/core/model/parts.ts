/**
 * Composed designs: a design is a cascade of parts, each with its own designer description (re-runnable,
 * editable, removable), plus at most one part of roots placed by hand. The design's root lists stay the
 * one source of truth the plane, the plots and the exports read; a part owns a run of them, in order: the
 * first part's zeros come first in `design.zeros`, then the second's, and likewise for the poles.
 *
 * Forms kept for older files and links: a design of one designed part is stored as before, with `designer`
 * and no `parts`; a design with no designer has no parts. `parts` is present only for two parts or more.
 *
 * Gain: designers give a fixed gain. With a fixed gain rule, adding a part multiplies the design's gain by
 * the part's, removing divides by it and re-running swaps the old part gain for the new, so a gain set by
 * hand stays as a factor; any other rule (0 dB at DC …) normalises the whole cascade and the parts' gains
 * are kept only for that bookkeeping.
 */
import type { Root } from '../types.ts';
import type { DesignerSpec } from '../design/index.ts';
import type { Design, RootKind } from './design.ts';

/** One part of a composed design. */
export interface DesignPart {
  /** The designer that made the part; absent for the part holding roots placed by hand. */
  designer?: DesignerSpec;
  /** How many stored zeros of the design belong to this part (a run, in part order). */
  zeros: number;
  /** How many stored poles belong to this part. */
  poles: number;
  /** The part's gain factor as its designer gave it (1 for roots placed by hand). */
  gain: number;
}

/** The roots and gain a designer produced, for a part. */
export interface PartOutput {
  zeros: readonly Root[];
  poles: readonly Root[];
  gain: number;
}

const fixedGain = (d: Design) => (d.gainRule.kind === 'fixed' ? d.gainRule.value : null);

/**
 * The parts of any design: its `parts`, or one part for its designer, or one hand part for roots without
 * a designer, or none for an empty design without a designer.
 */
export function partsOf(design: Design): DesignPart[] {
  if (design.parts) return design.parts;
  const zeros = design.zeros.length;
  const poles = design.poles.length;
  const gain = fixedGain(design) ?? 1;
  if (design.designer) return [{ designer: design.designer, zeros, poles, gain }];
  return zeros + poles > 0 ? [{ zeros, poles, gain }] : [];
}

/** Where a part's roots start in the design's lists. */
function startOf(parts: readonly DesignPart[], index: number): { zeros: number; poles: number } {
  let zeros = 0;
  let poles = 0;
  for (let i = 0; i < index; i++) {
    zeros += parts[i]!.zeros;
    poles += parts[i]!.poles;
  }
  return { zeros, poles };
}

/** The stored roots of part `index`. */
export function partRoots(design: Design, index: number): { zeros: Root[]; poles: Root[] } {
  const parts = partsOf(design);
  const s = startOf(parts, index);
  const p = parts[index];
  if (!p) return { zeros: [], poles: [] };
  return {
    zeros: design.zeros.slice(s.zeros, s.zeros + p.zeros),
    poles: design.poles.slice(s.poles, s.poles + p.poles),
  };
}

/** The part that owns stored root `index` of the given kind, or -1. */
export function partOfRoot(design: Design, kind: RootKind, index: number): number {
  const parts = partsOf(design);
  let start = 0;
  for (let i = 0; i < parts.length; i++) {
    const n = kind === 'zero' ? parts[i]!.zeros : parts[i]!.poles;
    if (index < start + n) return i;
    start += n;
  }
  return -1;
}

/** The design with the given parts, in the stored form: `designer` for one designed part, `parts` for two or more. */
function withPartList(design: Design, parts: DesignPart[]): Design {
  const { parts: _parts, designer: _designer, ...rest } = design;
  if (parts.length >= 2) return { ...rest, parts };
  const only = parts[0];
  return only?.designer ? { ...rest, designer: only.designer } : rest;
}

const copy = (roots: readonly Root[]) =>
  roots.map((r) => ({ re: r.re, im: r.im, multiplicity: r.multiplicity }));

/** Removes `removeCount` parts at `index` and puts `part` there (when given); the gain follows (see above). */
function spliceAt(
  design: Design,
  index: number,
  removeCount: 0 | 1,
  part: { designer?: DesignerSpec; output: PartOutput } | null,
): Design {
  const parts = partsOf(design).slice();
  const s = startOf(parts, index);
  const old = removeCount ? parts[index]! : null;
  const zeros = design.zeros.slice();
  const poles = design.poles.slice();
  const added = part ? { zeros: copy(part.output.zeros), poles: copy(part.output.poles) } : null;
  zeros.splice(s.zeros, old?.zeros ?? 0, ...(added?.zeros ?? []));
  poles.splice(s.poles, old?.poles ?? 0, ...(added?.poles ?? []));
  const next: DesignPart[] = part
    ? [
        {
          ...(part.designer && { designer: part.designer }),
          zeros: part.output.zeros.length,
          poles: part.output.poles.length,
          gain: part.output.gain,
        },
      ]
    : [];
  parts.splice(index, removeCount, ...next);
  const k = fixedGain(design);
  let gainRule = design.gainRule;
  if (k !== null) {
    let value = k;
    if (old && old.gain !== 0 && Number.isFinite(old.gain)) value /= old.gain;
    if (part) value *= part.output.gain;
    gainRule = { kind: 'fixed', value };
  }
  const { typed: _typed, ...rest } = design;
  return withPartList({ ...rest, zeros, poles, gainRule }, parts);
}

/**
 * The design with a designed part added to the cascade: after every designed part and before the roots
 * placed by hand (which stay a part of their own).
 */
export function addPart(design: Design, designer: DesignerSpec, output: PartOutput): Design {
  const parts = partsOf(design);
  const at = parts.length > 0 && !parts[parts.length - 1]!.designer ? parts.length - 1 : parts.length;
  return spliceAt(design, at, 0, { designer, output });
}

/** The design with part `index` replaced by a new designer output (a re-run or an edit of that part). */
export function replacePart(
  design: Design,
  index: number,
  designer: DesignerSpec,
  output: PartOutput,
): Design {
  if (!partsOf(design)[index]) return design;
  return spliceAt(design, index, 1, { designer, output });
}

/** The design without part `index` (its roots go; the other parts keep theirs). */
export function removePart(design: Design, index: number): Design {
  if (!partsOf(design)[index]) return design;
  return spliceAt(design, index, 1, null);
}

/**
 * The parts after one root list was changed by a root edit (withRoots): a move keeps every part; a root
 * appended joins the hand part (made when missing, so a designed part's re-run does not remove it); a root
 * removed leaves the part that owned it (an emptied hand part goes). Any other change of the list (it was
 * replaced wholesale) leaves the design without parts: nothing can say any longer which root is whose.
 */
export function partsAfterRootEdit(design: Design, kind: RootKind, roots: readonly Root[]): Design {
  if (!design.parts && !design.designer) return design;
  const before = kind === 'zero' ? design.zeros : design.poles;
  const key = kind === 'zero' ? 'zeros' : 'poles';
  if (roots.length === before.length) return design;
  const parts = partsOf(design).map((p) => ({ ...p }));
  if (roots.length === before.length + 1 && before.every((r, i) => r === roots[i])) {
    const last = parts[parts.length - 1];
    if (last && !last.designer) last[key] += 1;
    else parts.push({ zeros: 0, poles: 0, gain: 1, [key]: 1 });
    // A one-designer design keeps its old form until a root is added by hand.
    return withPartList(design, parts);
  }
  if (roots.length === before.length - 1) {
    let gone = before.findIndex((r, i) => r !== roots[i]);
    if (gone < 0) gone = before.length - 1;
    if (!before.slice(gone + 1).every((r, i) => r === roots[gone + i])) return withPartList(design, []);
    const owner = partOfRoot(design, kind, gone);
    if (owner < 0) return withPartList(design, []);
    parts[owner]![key] -= 1;
    const kept = parts.filter((p) => p.designer || p.zeros + p.poles > 0);
    if (!design.parts) return design; // one designed part: it stays, edited by hand
    return withPartList(design, kept);
  }
  const { parts: _parts, ...rest } = design;
  return rest;
}
