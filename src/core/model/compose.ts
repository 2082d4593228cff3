/**
 * Composing a design from designers: adding a designed part to a design with the whole's mask following,
 * and the mask the parts imply together. Used by the store's actions and by `polewright design --add-to`.
 */
import type { Result } from '../types.ts';
import { runDesigner, type DesignerSpec, type DesignResult } from '../design/light.ts';
import * as masks from '../mask/index.ts';
import type { RequirementMask } from '../mask/index.ts';
import type { Design } from './design.ts';
import { addPart, partsOf } from './parts.ts';

/**
 * What happens to the whole mask when a part is added: 'fill' and 'replace' carve the part's requirement
 * into the mask (or take it when there is none), 'keep' leaves the mask alone.
 */
export type PartMaskPolicy = 'fill' | 'replace' | 'keep';

/**
 * The mask the parts imply together: the first designed part's own, with each later part's carved in (as
 * adding them one by one makes it), or null when no part implies one.
 */
export function maskOfParts(design: Design): RequirementMask | null {
  let mask: RequirementMask | null = null;
  for (const part of partsOf(design)) {
    const implied = part.designer ? masks.maskFromDesigner(part.designer) : null;
    if (implied) mask = mask ? masks.composeMask(mask, implied, design.sampleRate) : implied;
  }
  return mask;
}

/** The whole design's mask after adding a part with this description, by the policy (see PartMaskPolicy). */
function maskAfterAdding(design: Design, spec: DesignerSpec, policy: PartMaskPolicy): Design['mask'] {
  if (policy === 'keep') return design.mask;
  const implied = masks.maskFromDesigner(spec);
  if (!implied) return policy === 'replace' ? undefined : design.mask;
  return design.mask ? masks.composeMask(design.mask, implied, design.sampleRate) : implied;
}

/**
 * Adds a designed part to the cascade (a notch on top of a low-pass), after the designed parts and before
 * the roots placed by hand; the design keeps its sample rate, so the part is designed there. The mask
 * ('fill' and 'replace': the whole's mask with the part's stop regions carved in; 'keep': unchanged).
 */
export function addDesignerPart(
  design: Design,
  spec: DesignerSpec,
  policy: PartMaskPolicy = 'fill',
): Result<{ design: Design; result: DesignResult }> {
  const atRate = { ...spec, fs: design.sampleRate } as DesignerSpec;
  const r = runDesigner(atRate);
  if (!r.ok) return r;
  const added = addPart(design, atRate, r.value.zpk);
  const mask = maskAfterAdding(design, atRate, policy);
  const { mask: _mask, ...rest } = added;
  return { ok: true, value: { design: mask ? { ...rest, mask } : rest, result: r.value } };
}
