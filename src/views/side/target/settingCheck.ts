/** Checks a settings change before it is made, so a field can say what is wrong inline and change nothing. */
import { validateSettings, type ImplementationSettings } from '../../../core/fixed/index.ts';
import { mergeImplementationPatch } from '../../../store/implementation.ts';

/** Why the patch would be refused ("… ; accepted: …"), or null when it is fine. */
export function patchProblem(
  current: ImplementationSettings,
  patch: Partial<ImplementationSettings>,
): string | null {
  const r = validateSettings(mergeImplementationPatch(current, patch));
  if (r.ok) return null;
  const m = r.error.message;
  return `${m.charAt(0).toUpperCase()}${m.slice(1)}; use ${r.error.expected ?? 'another value'}.`;
}
