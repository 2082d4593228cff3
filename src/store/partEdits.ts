/**
 * Edits of a composed design's parts, for the store's designerEdit and partsEdit (one undo step each). They
 * load with the Design page, which is the only place that makes them. A mask that is the one the parts
 * imply follows a part's change or removal; a mask edited by hand is kept as it is.
 */
import type { Result } from '../core/types.ts';
import type { DesignerSpec, DesignResult } from '../core/design/index.ts';
import type { Design } from '../core/model/design.ts';
import { removePart } from '../core/model/parts.ts';
import { addDesignerPart, maskOfParts, type PartMaskPolicy } from '../core/model/compose.ts';
import { rerunPartOn, type DesignerPatch } from './designer.ts';
// directly: core/mask/index.ts is in the first view, and sameMask is not needed there
import { sameMask } from '../core/mask/same.ts';

type DesignerEdit = (d: Design) => Result<{ design: Design; result: DesignResult }>;

/** The design after a part changed, with its mask following the parts when it was the one they implied. */
export function withPartsMask(before: Design, after: Design): Design {
  const derived = maskOfParts(before);
  if (!before.mask || !derived || !sameMask(before.mask, derived)) return after;
  const next = maskOfParts(after);
  const { mask: _mask, ...rest } = after;
  return next ? { ...rest, mask: next } : rest;
}

/** Adds a designed part to the cascade at the design's sample rate (core/model/compose.ts). */
export const addPartEdit =
  (spec: DesignerSpec, policy: PartMaskPolicy = 'fill'): DesignerEdit =>
  (d) =>
    addDesignerPart(d, spec, policy);

/** Re-runs designed part `index` with changed parameters (its hand edits are replaced). */
export const rerunPartEdit =
  (index: number, patch: DesignerPatch = {}): DesignerEdit =>
  (d) => {
    const r = rerunPartOn(d, index, patch);
    return r.ok ? { ok: true, value: { ...r.value, design: withPartsMask(d, r.value.design) } } : r;
  };

/** Removes part `index` and its roots from the cascade. */
export const removePartEdit =
  (index: number) =>
  (d: Design): Design => {
    const after = removePart(d, index);
    return after === d ? d : withPartsMask(d, after);
  };
