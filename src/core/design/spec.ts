/**
 * Designer descriptions: what produced a design, kept with it so that it can be re-run with new values. The
 * type follows from the registry (registry.ts): a kind and its parameters, frequencies in Hz at sample rate
 * fs (Hz).
 */
import type { SpecOfEntry } from './parameters.ts';
import type { DESIGNERS } from './registry.ts';
import type { IirSpec } from './entries/classicalParameters.ts';

/** Every designer and its parameters. */
export type DesignerSpec = SpecOfEntry<(typeof DESIGNERS)[number]>;

export type { IirSpec };
export type { DesignResult } from './result.ts';
