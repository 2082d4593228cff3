/** Which form field a designer's InputError is about, read from the parameter it names. */
import type { InputError } from '../../../core/types.ts';
import type { DesignFormState, FieldKey } from './designKinds.ts';

/** Message patterns of runDesigner's errors and the field each one points at. */
const RULES: readonly [RegExp, FieldKey | ((s: DesignFormState) => FieldKey)][] = [
  [/^(f0\b|fs\/f0)/, 'f0'],
  [/^(harmonic|no harmonics)/, 'harmonics'],
  [/^bandwidthHz\b/, 'bandwidth'],
  [/^q\b/, 'q'],
  [/width is too wide|^give exactly one of bandwidthHz/, (s) => (s.width === 'q' ? 'q' : 'bandwidth')],
  [/^cutoffHz\b/, 'cutoff'],
  [/^gainDb\b/, 'gainDb'],
  [/^(shelf )?slope\b/, 'slope'],
  [/^bandwidthOctaves\b/, 'octaves'],
  [/^(order\b|the requirement needs order)/, 'order'],
  [/^edges\[1\]/, 'edgeHigh'],
  [/^edges\b/, 'edgeLow'],
  [/^pass-band edges\[1\]/, 'passHigh'],
  [/^pass-band edges\b/, 'passLow'],
  [/^stop-band edges\[1\]/, 'stopHigh'],
  [/^stop-band edges\b/, 'stopLow'],
  [/^pass-band ripple\b/, 'ripple'],
  [/^stop-band attenuation\b/, 'attenuation'],
  [/^pass-band .* and stop-band .* do not fit/, 'stopLow'],
];

/** The field an error names, or null when it is about the design as a whole (e.g. the sample rate). */
export function errorField(error: InputError, s: DesignFormState): FieldKey | null {
  for (const [re, field] of RULES)
    if (re.test(error.message)) return typeof field === 'string' ? field : field(s);
  return null;
}

/** The error as one sentence: what was wrong, then what is accepted. */
export function errorText(error: InputError): string {
  return `${error.message}; expected ${error.expected}`;
}
