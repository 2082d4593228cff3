/** Checks a settings change before it is made, so a field can say what is wrong inline and change nothing. */
import { validateSettings, type ImplementationSettings } from '../../../core/fixed/index.ts';
import { mergeImplementationPatch } from '../../../store/implementation.ts';
import type { NumberFieldRule } from '../../shared/fieldReading.ts';

/** A bit-count field of the settings: a whole number the engine accepts for that setting. */
export function bitsRule(
  current: ImplementationSettings,
  field: 'wordLength' | 'dataWordLength' | 'accumulatorBits' | 'fractionBits',
): NumberFieldRule {
  return {
    typedUnit: 'bits',
    check: (x) =>
      Number.isInteger(x) ? patchProblem(current, { [field]: x }) : 'Type a whole number of bits.',
  };
}

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
