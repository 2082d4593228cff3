/**
 * The Design form as data, derived from the designer registry (src/core/design/registry.ts): the kinds it
 * offers (the registry's variants, grouped), the fields each shows for the choices made, and starting
 * values from the registry's scenarios.
 */
import {
  DESIGNER_VARIANTS,
  textFor,
  type DesignValues,
  type DesignerEntry,
  type DesignerVariant,
  type Parameter,
} from '../../../core/design/index.ts';

/** The whole form: the chosen kind, every field's text as typed, and the choices made. */
export interface DesignFormState {
  /** The chosen variant's id (e.g. "notch", "lowpass"). */
  kind: string;
  /** Text of each field by field id: a parameter's key, or key.0 / key.1 for the items of an edge list. */
  values: Record<string, string>;
  /** Choice parameters by key (family, teeth), and each alternative pair by its first key: the key chosen. */
  choices: Record<string, string>;
  /** The order parameter set to "auto" (the least order meeting the requirement). */
  autoOrder: boolean;
}

/** A text field of the form: one number, a free list, or the one or two items of an edge list. */
export interface FormField {
  id: string;
  parameter: Parameter;
  /** 0 or 1 for an item of an edge list (a list of exactly one or two numbers). */
  item?: number;
}

/** The form's kinds, as the registry lists them. */
export const KINDS: readonly DesignerVariant[] = DESIGNER_VARIANTS.map((v) => v.variant);
/** Groups of the kind list, in order. */
export const GROUPS: readonly string[] = [...new Set(KINDS.map((k) => k.group))];

/** The registry entry and variant of a form kind. */
export function kindOf(kind: string): { entry: DesignerEntry; variant: DesignerVariant } {
  const found = DESIGNER_VARIANTS.find((v) => v.variant.id === kind);
  if (!found) throw new Error(`designKinds: no designer variant "${kind}"`);
  return found;
}

/** The parameters a kind asks for (those its variant does not fix). */
export const openParameters = (entry: DesignerEntry, variant: DesignerVariant): Parameter[] =>
  entry.parameters.filter((p) => !(p.key in (variant.fixed ?? {})));

/** The values the form's labels and conditions read: kind, fixed values, choices and the order mode. */
export function formValues(s: DesignFormState): DesignValues {
  const { entry, variant } = kindOf(s.kind);
  const values: Record<string, unknown> = { kind: entry.kind, ...variant.fixed };
  for (const p of entry.parameters)
    if (p.type === 'choice' && s.choices[p.key]) values[p.key] = s.choices[p.key];
  if (entry.parameters.some((p) => p.type === 'order')) values.order = s.autoOrder ? 'auto' : 0;
  return values;
}

/** The key of an alternative pair shown for the form's choice (the other one is not asked for). */
export function chosenAlternative(entry: DesignerEntry, key: string, s: DesignFormState): boolean {
  const alt = (entry.alternatives ?? []).find((a) => a.keys.includes(key));
  return !alt || (s.choices[alt.keys[0]] ?? alt.keys[0]) === key;
}

/** How many items an edge list has for these values, or null for a free list. */
export function itemCount(p: Parameter, values: DesignValues): number | null {
  return p.type === 'list' && p.count.exactly ? p.count.exactly(values) : null;
}

/** The text fields shown for the form's choices, in reading order. */
export function visibleFields(s: DesignFormState): FormField[] {
  const { entry, variant } = kindOf(s.kind);
  const values = formValues(s);
  const out: FormField[] = [];
  for (const p of openParameters(entry, variant)) {
    if (p.type === 'choice' || (p.type === 'order' && s.autoOrder)) continue;
    if (!chosenAlternative(entry, p.key, s) || (p.shownWhen && !p.shownWhen(values))) continue;
    const n = itemCount(p, values);
    if (n === null) out.push({ id: p.key, parameter: p });
    else for (let i = 0; i < n; i++) out.push({ id: `${p.key}.${i}`, parameter: p, item: i });
  }
  return out;
}

/** A field's label, unit and hint for the form's choices. */
export function fieldLabel(
  f: FormField,
  s: DesignFormState,
): { label: string; unit?: string; hint?: string } {
  const values = formValues(s);
  const hint = textFor(f.parameter.hint, values);
  return {
    label: textFor(f.parameter.label, values) ?? f.parameter.key,
    ...(f.parameter.unit && { unit: f.parameter.unit }),
    ...(hint && { hint }),
  };
}

/** A value as the form shows it. */
const asText = (v: unknown) => (Array.isArray(v) ? v.join(', ') : v === undefined ? '' : String(v));

/** A fresh form for a kind at sample rate fs (Hz), with the registry's starting values. */
export function defaultForm(kind: string, fs: number): DesignFormState {
  const { entry, variant } = kindOf(kind);
  const start = variant.start(fs);
  const s: DesignFormState = { kind, values: {}, choices: {}, autoOrder: start.order === 'auto' };
  for (const p of openParameters(entry, variant)) {
    const v = start[p.key];
    if (p.type === 'choice') s.choices[p.key] = String(v ?? p.fallback ?? p.options[0]!.value);
    else if (p.type === 'list' && p.count.exactly) {
      const list = Array.isArray(v) ? v : [];
      for (let i = 0; i < p.count.max; i++) s.values[`${p.key}.${i}`] = asText(list[i]);
    } else s.values[p.key] = asText(v);
  }
  for (const alt of entry.alternatives ?? [])
    s.choices[alt.keys[0]] = alt.keys.find((k) => variant.prefer?.includes(k)) ?? alt.keys[0];
  return s;
}

/** The form switched to another kind: that kind's starting values, keeping the family and order mode. */
export function withKind(s: DesignFormState, kind: string, fs: number): DesignFormState {
  const fresh = defaultForm(kind, fs);
  for (const [key, value] of Object.entries(s.choices))
    if (
      key in fresh.choices &&
      kindOf(kind).entry.parameters.some((p) => p.key === key && p.type === 'choice')
    )
      fresh.choices[key] = value;
  return { ...fresh, autoOrder: s.autoOrder };
}

/** Text of one field from a description's value (for showing a designer in the form). */
export function fieldText(f: FormField, value: unknown): string {
  return f.item === undefined ? asText(value) : asText(Array.isArray(value) ? value[f.item] : undefined);
}
