/**
 * The largest design the bounds of src/core/model/limits.ts allow, written with the costliest characters for
 * each container: a control character (six characters in JSON, "\u0001") or a character of the Basic
 * Multilingual Plane above U+0800 (three bytes of UTF-8 in a link). Numbers take their longest forms.
 */
import type { Design } from '../../src/core/model/design.ts';
import type { Root } from '../../src/core/types.ts';
import {
  MAX_COEFFICIENTS,
  MAX_MASK_REGIONS,
  MAX_MULTIPLICITY,
  MAX_NAME_CHARS,
  MAX_NOTE_CHARS,
  MAX_ORDER,
  MAX_REGION_ID_CHARS,
  MAX_REGION_LABEL_CHARS,
  MAX_TYPED_TEXT_CHARS,
  MAX_HARMONICS,
  MAX_PARTS,
} from '../../src/core/model/limits.ts';

/** A long double, and one that is not short in the link's decimal packing either. */
const LONG = -1.2345678901234566e-300;
const long = (i: number) => LONG * (1 + i * 1e-9);

/** `n` characters of `c`, with a running index in the ids so they stay unique. */
const text = (c: string, n: number) => c.repeat(n);

function roots(): Root[] {
  // MAX_ORDER/2 complex roots of multiplicity 1: the most entries an order allows, each with two long numbers.
  return Array.from({ length: MAX_ORDER / 2 }, (_, i) => ({ re: long(i), im: -long(i), multiplicity: 1 }));
}

/** The worst-case design for a character `c` (see the top of this file). */
export function worstCaseDesign(c: string): Design {
  const idOf = (i: number) => (String(i) + text(c, MAX_REGION_ID_CHARS)).slice(0, MAX_REGION_ID_CHARS);
  return {
    sampleRate: 987654321.0123457,
    zeros: roots(),
    poles: roots(),
    gainRule: { kind: 'fixed', value: LONG },
    name: text(c, MAX_NAME_CHARS),
    note: text(c, MAX_NOTE_CHARS),
    typed: {
      b: Array.from({ length: MAX_COEFFICIENTS }, (_, i) => long(i)),
      a: Array.from({ length: MAX_COEFFICIENTS }, (_, i) => long(-i)),
      text: text(c, MAX_TYPED_TEXT_CHARS),
    },
    // A composed design of the most parts, each with the longest designer description (a design holds
    // either one `designer` or its `parts`, and the parts are the larger): the stored roots are spread over
    // the parts, 8 per part and none for the last.
    parts: Array.from({ length: MAX_PARTS }, (_, p) => ({
      designer: {
        kind: 'harmonicNotch' as const,
        fs: LONG,
        f0: long(p),
        harmonics: Array.from({ length: MAX_HARMONICS }, (_, i) => 999_999 - i),
        bandwidthHz: LONG,
      },
      zeros: p < MAX_PARTS - 1 ? MAX_ORDER / 2 / (MAX_PARTS - 1) : 0,
      poles: p < MAX_PARTS - 1 ? MAX_ORDER / 2 / (MAX_PARTS - 1) : 0,
      gain: long(p),
    })),
    mask: {
      regions: Array.from({ length: MAX_MASK_REGIONS }, (_, i) => ({
        id: idOf(i),
        kind: 'band' as const,
        fromHz: long(i),
        toHz: long(i + 1),
        upperDb: long(i + 2),
        lowerDb: long(i + 3),
        label: text(c, MAX_REGION_LABEL_CHARS),
      })),
    },
    implementation: {
      structure: 'df1',
      wordLength: 32,
      fractionBits: 31,
      dataWordLength: 32,
      accumulatorBits: 64,
      rounding: 'truncate',
      overflow: 'saturate',
      scaling: 'linf',
      ordering: 'descending',
      gainDistribution: 'spread',
      pairing: 'keep-odd',
      feedbackSign: 'negated',
      firForm: 'symmetric',
    },
  };
}

/** One root of the largest multiplicity, as an FIR of the largest order has at the origin. */
export const maxMultiplicityRoot: Root = { re: 0, im: 0, multiplicity: MAX_MULTIPLICITY };
