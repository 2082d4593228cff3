/**
 * Design file version 2 (current): version 1 plus the designer that produced the design (or the parts of a composed design), its requirement
 * mask, its fixed-point implementation settings and the view settings worth sharing. The field-by-field description is in src/share/README.md.
 */
import { z } from 'zod';
import { checkDesignLimits, coefficients, finite, gainRule, plainText, roots, sampleRate } from './common.ts';
import { designerSpec } from './designer.ts';
import { implementationSettings, requirementMask } from './mask.ts';
import {
  MAX_NAME_CHARS,
  MAX_NOTE_CHARS,
  MAX_ORDER,
  MAX_PARTS,
  MAX_TYPED_TEXT_CHARS,
} from '../../core/model/limits.ts';
import { sharedView } from './view.ts';

/** How many stored roots a part owns. */
const rootCount = z.number().int().min(0).max(MAX_ORDER);

/**
 * A composed design's parts (added within version 2: an optional field, so older files still read; a
 * reader that does not know it keeps the roots, which are the whole cascade).
 */
const designParts = z
  .array(
    z.object({
      designer: designerSpec.exactOptional(),
      zeros: rootCount,
      poles: rootCount,
      gain: finite,
    }),
  )
  .max(MAX_PARTS);

export const designDocumentV2 = z
  .object({
    polewright: z.literal('design'),
    version: z.literal(2),
    name: plainText(MAX_NAME_CHARS).default(''),
    note: plainText(MAX_NOTE_CHARS).default(''),
    sampleRate,
    zeros: roots,
    poles: roots,
    gainRule,
    typed: z
      .object({ b: coefficients, a: coefficients, text: plainText(MAX_TYPED_TEXT_CHARS) })
      .exactOptional(),
    designer: designerSpec.exactOptional(),
    parts: designParts.exactOptional(),
    mask: requirementMask.exactOptional(),
    implementation: implementationSettings.exactOptional(),
    view: sharedView.exactOptional(),
  })
  .superRefine(checkDesignLimits);

export type DesignDocumentV2 = z.output<typeof designDocumentV2>;
