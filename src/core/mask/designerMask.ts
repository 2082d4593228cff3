/** The mask a designer's own requirement implies, whatever the designer. */
import type { DesignerSpec } from '../design/index.ts';
import type { RequirementMask } from './types.ts';
import { maskFromIirDesigner } from './fromRequirement.ts';
import { maskFromNotchDesigner } from './notchMask.ts';

/**
 * A classical design's pass and stop bands (when its requirement is complete), or for notching designers flat
 * pass bands between the notches and a narrow stop region at each centre; null when the designer implies none.
 */
export function maskFromDesigner(spec: DesignerSpec): RequirementMask | null {
  return spec.kind === 'iir' ? maskFromIirDesigner(spec) : maskFromNotchDesigner(spec);
}
