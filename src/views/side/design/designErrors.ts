/** Which form field a designer's InputError is about: the parameter (and list item) the error names. */
import type { InputError } from '../../../core/types.ts';
import { kindOf, visibleFields, type DesignFormState } from './designKinds.ts';

/** The id of the field an error names, or null when it is about the design as a whole (e.g. the sample rate). */
export function errorField(error: InputError, s: DesignFormState): string | null {
  const key = error.parameter;
  if (key === undefined) return null;
  const fields = visibleFields(s);
  const mine = fields.filter((f) => f.parameter.key === key);
  if (mine.length) return (mine.find((f) => f.item === (error.index ?? 0)) ?? mine[0]!).id;
  // A parameter not shown (the other of an alternative pair): the one shown in its place.
  const alt = (kindOf(s.kind).entry.alternatives ?? []).find((a) => a.keys.includes(key));
  const shown = alt && fields.find((f) => alt.keys.includes(f.parameter.key));
  return shown ? shown.id : null;
}

/** The error as one sentence: what was wrong, then what is accepted. */
export function errorText(error: InputError): string {
  return `${error.message}; expected ${error.expected}`;
}
