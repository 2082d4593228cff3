/** One door for every designer: check the description against its registry entry, design, describe. */
import type { Result } from '../types.ts';
import { checkParameters } from './checkParameters.ts';
import { designerEntry } from './registry.ts';
import type { DesignResult } from './result.ts';
import type { DesignerSpec } from './spec.ts';
import { DesignInputError, guard } from './validate.ts';

export { COMB_DIVISOR_TOLERANCE } from './entries/notches.ts';

/**
 * Runs a designer description: its zeros/poles/gain and a one-line note, or an InputError saying what to
 * change and naming the parameter at fault.
 */
export function runDesigner(spec: DesignerSpec): Result<DesignResult> {
  return guard(() => {
    const entry = designerEntry(spec.kind);
    if (!entry)
      throw new DesignInputError(
        `designer kind '${String(spec.kind)}' is not known`,
        'a kind of the registry',
        'kind',
      );
    checkParameters(entry, spec);
    return (entry.design as (s: DesignerSpec) => DesignResult)(spec);
  });
}
