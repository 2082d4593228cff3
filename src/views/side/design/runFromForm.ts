/** Runs a designer from the form and, in the same undo step, sets the mask its requirement implies. */
import type { DesignerSpec, DesignResult } from '../../../core/design/index.ts';
import type { Result } from '../../../core/types.ts';
import type { WorkbenchState } from '../../../store/store.ts';
import { maskFromDesigner } from '../../../core/mask/index.ts';

/**
 * Replaces the roots by the designer's output; with `setMask`, the mask becomes the requirement's (notch
 * masks are built here, classical ones by the engine). Both changes are one undo step (a gesture).
 */
export function runDesignerWithMask(
  store: WorkbenchState,
  spec: DesignerSpec,
  setMask: boolean,
): Result<DesignResult> {
  store.beginGesture();
  try {
    const r = store.runDesigner(spec, 'keep');
    if (r.ok && setMask) store.setMask(maskFromDesigner(spec));
    return r;
  } finally {
    store.endGesture();
  }
}
