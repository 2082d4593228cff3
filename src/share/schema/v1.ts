/**
 * Design file version 1 (the first release), kept so that old files still open; see migrate.ts.
 *   { "polewright": "design", "version": 1, "name", "note", "sampleRate",
 *     "zeros": [{re, im, multiplicity}], "poles": [...], "gainRule": {...}, "typed"?: {b, a, text} }
 */
import { z } from 'zod';
import { checkDesignLimits, coefficients, gainRule, plainText, roots, sampleRate } from './common.ts';
import { MAX_NAME_CHARS, MAX_NOTE_CHARS, MAX_TYPED_TEXT_CHARS } from '../../core/model/limits.ts';

export const designDocumentV1 = z
  .object({
    polewright: z.literal('design'),
    version: z.literal(1),
    name: plainText(MAX_NAME_CHARS).default(''),
    note: plainText(MAX_NOTE_CHARS).default(''),
    sampleRate,
    zeros: roots,
    poles: roots,
    gainRule,
    typed: z
      .object({ b: coefficients, a: coefficients, text: plainText(MAX_TYPED_TEXT_CHARS) })
      .exactOptional(),
  })
  .superRefine(checkDesignLimits);

export type DesignDocumentV1 = z.output<typeof designDocumentV1>;
