/** Zod schemas of the requirement mask (src/core/mask) and the implementation settings (src/core/fixed). */
import { z } from 'zod';
import type { RequirementMask } from '../../core/mask/index.ts';
import type { ImplementationSettings } from '../../core/fixed/index.ts';
import {
  MAX_ACCUMULATOR_BITS,
  MAX_WORD_LENGTH,
  MIN_WORD_LENGTH,
  validateSettings,
} from '../../core/fixed/index.ts';
import { finite, plainText } from './common.ts';
import { MAX_MASK_REGIONS, MAX_REGION_ID_CHARS, MAX_REGION_LABEL_CHARS } from '../../core/model/limits.ts';

const opt = finite.exactOptional();

/**
 * Regions are checked for shape and unique ids only: whether an edge lies below Nyquist depends on the
 * sample rate, which the user may change, so the mask view judges that (core/mask validateMask).
 */
export const requirementMask = z
  .object({
    regions: z
      .array(
        z.object({
          id: plainText(MAX_REGION_ID_CHARS).min(1, 'must not be empty'),
          kind: z.enum(['pass', 'stop', 'band']),
          fromHz: finite,
          toHz: finite,
          upperDb: opt,
          lowerDb: opt,
          label: plainText(MAX_REGION_LABEL_CHARS).exactOptional(),
        }),
      )
      .max(MAX_MASK_REGIONS),
  })
  .superRefine((m, ctx) => {
    const seen = new Set<string>();
    m.regions.forEach((r, i) => {
      if (seen.has(r.id))
        ctx.addIssue({ code: 'custom', path: ['regions', i, 'id'], message: `"${r.id}" is used twice` });
      seen.add(r.id);
    });
  });

const word = z.number().int().min(MIN_WORD_LENGTH).max(MAX_WORD_LENGTH);

export const implementationSettings = z
  .object({
    structure: z.enum(['df1', 'df2t']),
    wordLength: word,
    fractionBits: z.union([
      z.literal('auto'),
      z
        .number()
        .int()
        .min(0)
        .max(MAX_WORD_LENGTH - 1),
    ]),
    dataWordLength: word,
    accumulatorBits: z.number().int().min(1).max(MAX_ACCUMULATOR_BITS),
    rounding: z.enum(['nearest', 'truncate']),
    overflow: z.enum(['saturate', 'wrap']),
    scaling: z.enum(['linf', 'l2', 'l1', 'none']),
    ordering: z.enum(['ascending', 'descending']),
    gainDistribution: z.enum(['first', 'spread']),
    pairing: z.enum(['nearest', 'keep-odd']),
    feedbackSign: z.enum(['denominator', 'negated']),
    firForm: z.enum(['direct', 'symmetric']).exactOptional(),
  })
  .superRefine((s, ctx) => {
    const r = validateSettings(s);
    if (!r.ok)
      ctx.addIssue({
        code: 'custom',
        message: `${r.error.message} (accepted: ${r.error.expected ?? 'see the docs'})`,
      });
  });

// The schemas must describe exactly the engine's types: these fail to compile if they drift apart.
type M = z.output<typeof requirementMask>;
type I = z.output<typeof implementationSettings>;
export const maskSchemaMatches: [M] extends [RequirementMask]
  ? [RequirementMask] extends [M]
    ? true
    : false
  : false = true;
export const implementationSchemaMatches: [I] extends [ImplementationSettings]
  ? [ImplementationSettings] extends [I]
    ? true
    : false
  : false = true;
