/** One door for every designer: check the description against its registry entry, design, describe. */
import type { Result } from '../types.ts';
import { checkParameters } from './checkParameters.ts';
import { designerEntry } from './registry.ts';
import type { DesignResult } from './result.ts';
import type { DesignerSpec } from './spec.ts';
import { DesignInputError, guard } from './validate.ts';
import { separationProblem } from './separation.ts';

export { COMB_DIVISOR_TOLERANCE } from './entries/notches.ts';

/**
 * Runs a designer description: its zeros/poles/gain and a one-line note, or an InputError saying what to
 * change and naming the parameter at fault. A design whose roots double precision cannot keep apart
 * (separation.ts) is refused, never returned with roots that merge or a response that is not defined.
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
    const result = (entry.design as (s: DesignerSpec) => DesignResult)(spec);
    // The classical designers say this themselves, with the largest order that works.
    const beyond = separationProblem(result.zpk);
    if (beyond)
      throw new DesignInputError(
        `this design puts ${beyond}`,
        'a wider width or band (a lower Q), further from 0 Hz and fs/2',
      );
    return result;
  });
}
