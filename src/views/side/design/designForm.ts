/**
 * The Design page's form as data: its text fields read into a designer description (each by the one reader
 * of typed numbers, with the field's unit), and a designer description written back into the form for
 * re-running. Which fields are required follows from the registry; ranges and consistency are left to the
 * designer, whose error names the parameter.
 */
import {
  isRequired,
  variantOf,
  type DesignValues,
  type DesignerSpec,
  type Parameter,
} from '../../../core/design/index.ts';
import { readListField, readNumberField, type FieldReading } from '../../shared/fieldReading.ts';
import {
  KINDS,
  defaultForm,
  fieldText,
  formValues,
  itemCount,
  kindOf,
  openParameters,
  visibleFields,
  type DesignFormState,
  type FormField,
} from './designKinds.ts';

export type FieldErrors = Partial<Record<string, string>>;

export type FormReading = { ok: true; spec: DesignerSpec } | { ok: false; errors: FieldErrors };

/** One field's text read as its parameter takes it: a number (in the parameter's unit) or a list. */
export function readFieldText(p: Parameter, text: string): FieldReading<number | number[] | undefined> {
  if (p.type === 'list' && !p.count.exactly) return readListField(text);
  return readNumberField(text, p.unit ? { typedUnit: p.unit } : {});
}

/** Reads the form into a designer description at sample rate fs (Hz), or a message per field. */
export function readForm(s: DesignFormState, fs: number): FormReading {
  const { entry, variant } = kindOf(s.kind);
  const errors: FieldErrors = {};
  const values: Record<string, unknown> = { ...formValues(s), fs };
  if (s.autoOrder) values.order = 'auto';
  else delete values.order;
  const fields = visibleFields(s);
  const items = new Map<string, (number | undefined)[]>();
  for (const f of fields) {
    const text = s.values[f.id] ?? '';
    if (text.trim() === '') continue;
    const r = readFieldText(f.parameter, text);
    if (!r.ok) errors[f.id] = r.message;
    else if (f.item === undefined) values[f.parameter.key] = r.value;
    else {
      const list = items.get(f.parameter.key) ?? [];
      list[f.item] = r.value as number;
      items.set(f.parameter.key, list);
    }
  }
  for (const [key, list] of items) values[key] = list;
  // The alternative shown (a width as bandwidth or Q) is the one the description gives: it is required.
  const alternativeKeys = new Set((entry.alternatives ?? []).flatMap((a) => a.keys));
  // Blank fields: an error where the parameter is required for the values given, or where an edge list is half filled.
  for (const f of fields) {
    if ((s.values[f.id] ?? '').trim() !== '' || errors[f.id]) continue;
    const p = f.parameter;
    const partly = f.item !== undefined && items.has(p.key);
    if (partly) errors[f.id] = 'Nothing is typed; fill every edge of this band, or leave them all empty';
    else if (isRequired(p, values as DesignValues) || alternativeKeys.has(p.key))
      errors[f.id] = 'Nothing is typed; required: type a number';
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  for (const [key, list] of items) values[key] = list.filter((v) => v !== undefined);
  for (const p of openParameters(entry, variant))
    if (p.type === 'choice') values[p.key] = s.choices[p.key] ?? p.fallback ?? p.options[0]!.value;
  return { ok: true, spec: values as DesignerSpec };
}

/** The form showing a designer description (for changing its parameters and re-running). */
export function formOf(spec: DesignerSpec): DesignFormState {
  const found = variantOf(spec);
  if (!found) return defaultForm(KINDS[0]!.id, spec.fs);
  const { entry, variant } = found;
  const s = defaultForm(variant.id, spec.fs);
  const given = spec as unknown as Record<string, unknown>;
  for (const p of openParameters(entry, variant))
    if (p.type === 'choice') s.choices[p.key] = String(given[p.key]);
  for (const alt of entry.alternatives ?? [])
    s.choices[alt.keys[0]] = given[alt.keys[1]] !== undefined ? alt.keys[1] : alt.keys[0];
  s.autoOrder = given.order === 'auto';
  const values = formValues(s);
  for (const p of openParameters(entry, variant)) {
    if (p.type === 'choice' || given[p.key] === undefined) {
      if (p.section === 'requirement') clearParameter(s, p, values);
      continue;
    }
    if (p.type === 'order' && given[p.key] === 'auto') continue;
    const n = itemCount(p, values);
    if (n === null) s.values[p.key] = fieldText({ id: p.key, parameter: p }, given[p.key]);
    else
      for (let i = 0; i < n; i++)
        s.values[`${p.key}.${i}`] = fieldText({ id: '', parameter: p, item: i }, given[p.key]);
  }
  return s;
}

/** A requirement parameter the description does not have is shown empty (it was not part of the design). */
function clearParameter(s: DesignFormState, p: Parameter, values: DesignValues): void {
  const n = itemCount(p, values);
  if (n === null) s.values[p.key] = '';
  else for (let i = 0; i < n; i++) s.values[`${p.key}.${i}`] = '';
}

export type { FormField };
