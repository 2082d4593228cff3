/** Zod schema of the designer that produced a design (DesignerSpec in src/core/design), kept with the design. */
import { z } from 'zod';
import type { DesignerSpec } from '../../core/design/index.ts';
import { MAX_DESIGN_ORDER } from '../../core/design/index.ts';
import { finite } from './common.ts';
import { MAX_EDGES, MAX_HARMONICS } from './limits.ts';

const opt = finite.exactOptional();
const edges = z.array(finite).min(1).max(MAX_EDGES).exactOptional();
const width = { bandwidthHz: opt, q: opt };

/** Every designer kind with its parameters; numbers are only bounded here, runDesigner checks their sense. */
export const designerSpec = z.discriminatedUnion('kind', [
  z.object({ kind: z.enum(['notch', 'peak']), fs: finite, f0: finite, ...width }),
  z.object({ kind: z.literal('dcBlocker'), fs: finite, cutoffHz: finite }),
  z.object({
    kind: z.literal('harmonicNotch'),
    fs: finite,
    f0: finite,
    harmonics: z.array(z.number().int().min(1).max(1_000_000)).max(MAX_HARMONICS),
    ...width,
  }),
  z.object({ kind: z.literal('comb'), fs: finite, f0: finite, type: z.enum(['notch', 'peak']), ...width }),
  z.object({
    kind: z.literal('peakingEq'),
    fs: finite,
    f0: finite,
    gainDb: finite,
    q: opt,
    bandwidthOctaves: opt,
  }),
  z.object({
    kind: z.enum(['lowShelf', 'highShelf']),
    fs: finite,
    f0: finite,
    gainDb: finite,
    q: opt,
    slope: opt,
  }),
  z.object({
    kind: z.literal('iir'),
    fs: finite,
    family: z.enum(['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic']),
    response: z.enum(['lowpass', 'highpass', 'bandpass', 'bandstop']),
    order: z.union([z.number().int().min(1).max(MAX_DESIGN_ORDER), z.literal('auto')]),
    edgesHz: edges,
    rippleDb: opt,
    attenuationDb: opt,
    passbandHz: edges,
    stopbandHz: edges,
  }),
]);

// The schema must describe exactly the engine's type: these fail to compile if the two drift apart.
type Parsed = z.output<typeof designerSpec>;
export const designerSchemaMatches: [Parsed] extends [DesignerSpec]
  ? [DesignerSpec] extends [Parsed]
    ? true
    : false
  : false = true;
