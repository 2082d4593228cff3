/**
 * The Design page's form as data: its text fields read into a designer description (or a message per
 * field that is not a number), and a designer description written back into the form for re-running.
 */
import type { DesignerSpec, IirSpec } from '../../../core/design/index.ts';
import { readListField, readNumberField, type FieldReading } from '../../shared/fieldReading.ts';
import { TYPED_UNITS, type TypedUnitName } from '../../../core/parse/typedNumber.ts';
import { fieldLabel } from './fieldLabels.ts';
import {
  defaultForm,
  isBand,
  isClassical,
  visibleFields,
  type DesignFormState,
  type FieldKey,
  type FormKind,
} from './designKinds.ts';

export type FieldErrors = Partial<Record<FieldKey, string>>;

export type FormReading = { ok: true; spec: DesignerSpec } | { ok: false; errors: FieldErrors };

/** Reads "1, 3, 5" (a list of typed numbers) into harmonic numbers, or says what is wrong. */
export function readHarmonics(text: string): FieldReading<number[]> {
  return readListField(text, (h) =>
    Number.isInteger(h) && h >= 1
      ? null
      : `${h} is not a harmonic number; type whole numbers from 1, e.g. 1, 3, 5`,
  );
}

/** True when a requirement field is left empty (allowed for a given order: then there is no requirement). */
const blank = (s: DesignFormState, k: FieldKey) => s.values[k].trim() === '';

/** Requirement fields of a classical form, in spec order. */
const REQUIREMENT: readonly FieldKey[] = ['passLow', 'passHigh', 'stopLow', 'stopHigh'];

/**
 * Reads the form into a designer description at sample rate fs (Hz). Fields that are not numbers get a
 * message each; ranges and consistency are left to the designer, whose error names the parameter.
 */
export function readForm(s: DesignFormState, fs: number): FormReading {
  const errors: FieldErrors = {};
  const fields = visibleFields(s);
  const optional = new Set<FieldKey>();
  if (isClassical(s.kind) && !s.autoOrder) {
    // With a given order the requirement is optional (it gives margins and a mask); so is a level the
    // family does not use.
    REQUIREMENT.forEach((k) => optional.add(k));
    if (s.family === 'butterworth' || s.family === 'chebyshev2') optional.add('ripple');
    if (s.family === 'butterworth' || s.family === 'chebyshev1') optional.add('attenuation');
  }
  const num: Partial<Record<FieldKey, number>> = {};
  for (const k of fields) {
    const text = s.values[k].trim();
    if (k === 'harmonics') continue;
    if (text === '') {
      if (!optional.has(k)) errors[k] = 'required: type a number';
      continue;
    }
    const unit = fieldLabel(k, s.kind, s.family).unit;
    const typed = unit !== undefined && unit in TYPED_UNITS ? { typedUnit: unit as TypedUnitName } : {};
    const r = readNumberField(text, typed);
    if (r.ok) num[k] = r.value!;
    else errors[k] = r.message;
  }
  let harmonics: number[] | null = null;
  if (fields.includes('harmonics')) {
    const r = readHarmonics(s.values.harmonics);
    if (r.ok) harmonics = r.value;
    else errors.harmonics = r.message;
  }
  if (isClassical(s.kind) && !s.autoOrder) {
    const given = fields.filter((k) => REQUIREMENT.includes(k) && !blank(s, k));
    if (given.length > 0 && given.length < fields.filter((k) => REQUIREMENT.includes(k)).length)
      for (const k of fields)
        if (REQUIREMENT.includes(k) && blank(s, k))
          errors[k] = 'fill every requirement edge, or leave them all empty';
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, spec: specOf(s, fs, num, harmonics ?? []) };
}

function specOf(
  s: DesignFormState,
  fs: number,
  n: Partial<Record<FieldKey, number>>,
  harmonics: number[],
): DesignerSpec {
  const f0 = n.f0!;
  const width = s.width === 'q' ? { q: n.q! } : { bandwidthHz: n.bandwidth! };
  switch (s.kind) {
    case 'notch':
    case 'peak':
      return { kind: s.kind, fs, f0, ...width };
    case 'harmonicNotch':
      return { kind: 'harmonicNotch', fs, f0, harmonics, ...width };
    case 'comb':
      return { kind: 'comb', fs, f0, type: s.combType, ...width };
    case 'dcBlocker':
      return { kind: 'dcBlocker', fs, cutoffHz: n.cutoff! };
    case 'peakingEq':
      return {
        kind: 'peakingEq',
        fs,
        f0,
        gainDb: n.gainDb!,
        ...(s.eqWidth === 'octaves' ? { bandwidthOctaves: n.octaves! } : { q: n.q! }),
      };
    case 'lowShelf':
    case 'highShelf':
      return {
        kind: s.kind,
        fs,
        f0,
        gainDb: n.gainDb!,
        ...(s.eqWidth === 'slope' ? { slope: n.slope! } : { q: n.q! }),
      };
    default: {
      const two = isBand(s.kind);
      const pair = (a: FieldKey, b: FieldKey) => (two ? [n[a]!, n[b]!] : [n[a]!]);
      const spec: IirSpec = { kind: 'iir', fs, family: s.family, response: s.kind, order: 'auto' };
      if (!s.autoOrder) {
        spec.order = n.order!;
        spec.edgesHz = pair('edgeLow', 'edgeHigh');
      }
      if (n.passLow !== undefined) {
        spec.passbandHz = pair('passLow', 'passHigh');
        spec.stopbandHz = pair('stopLow', 'stopHigh');
      }
      if (n.ripple !== undefined) spec.rippleDb = n.ripple;
      if (n.attenuation !== undefined) spec.attenuationDb = n.attenuation;
      return spec;
    }
  }
}

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

/** The form showing a designer description (for changing its parameters and re-running). */
export function formOf(spec: DesignerSpec): DesignFormState {
  const kind: FormKind = spec.kind === 'iir' ? spec.response : spec.kind;
  const s = defaultForm(kind, spec.fs);
  const v = s.values;
  switch (spec.kind) {
    case 'notch':
    case 'peak':
    case 'harmonicNotch':
    case 'comb':
      v.f0 = text(spec.f0);
      s.width = spec.q !== undefined ? 'q' : 'bandwidth';
      if (spec.q !== undefined) v.q = text(spec.q);
      if (spec.bandwidthHz !== undefined) v.bandwidth = text(spec.bandwidthHz);
      if (spec.kind === 'harmonicNotch') v.harmonics = spec.harmonics.join(', ');
      if (spec.kind === 'comb') s.combType = spec.type;
      break;
    case 'dcBlocker':
      v.cutoff = text(spec.cutoffHz);
      break;
    case 'peakingEq':
    case 'lowShelf':
    case 'highShelf':
      v.f0 = text(spec.f0);
      v.gainDb = text(spec.gainDb);
      if (spec.q !== undefined) v.q = text(spec.q);
      if (spec.kind === 'peakingEq' && spec.bandwidthOctaves !== undefined) {
        s.eqWidth = 'octaves';
        v.octaves = text(spec.bandwidthOctaves);
      }
      if (spec.kind !== 'peakingEq' && spec.slope !== undefined) {
        s.eqWidth = 'slope';
        v.slope = text(spec.slope);
      }
      break;
    case 'iir': {
      s.family = spec.family;
      s.autoOrder = spec.order === 'auto';
      if (spec.order !== 'auto') v.order = text(spec.order);
      const [e0, e1] = spec.edgesHz ?? [];
      if (e0 !== undefined) v.edgeLow = text(e0);
      if (e1 !== undefined) v.edgeHigh = text(e1);
      const [p0, p1] = spec.passbandHz ?? [];
      const [s0, s1] = spec.stopbandHz ?? [];
      v.passLow = text(p0);
      v.passHigh = text(p1);
      v.stopLow = text(s0);
      v.stopHigh = text(s1);
      v.ripple = text(spec.rippleDb);
      v.attenuation = text(spec.attenuationDb);
      break;
    }
  }
  return s;
}
