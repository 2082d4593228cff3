/**
 * A generated test signal as the form holds it: parts whose fields are the text the user typed, checked
 * into engine generator specs and summed at the design's sample rate. Presets follow the invented
 * scenarios (hopper scale with 50 Hz hum, bench audio with a 60 Hz ground loop).
 */
import type { GeneratorSpec } from '../../core/signal/index.ts';
import { readListField, readNumberField, type NumberFieldRule } from '../shared/fieldReading.ts';

export type PartKind = GeneratorSpec['kind'];

/** One part: its kind and the typed text of each of its fields. */
export interface RecipePart {
  kind: PartKind;
  fields: Record<string, string>;
}

export interface Recipe {
  parts: RecipePart[];
  /** Seconds, as typed. */
  duration: string;
}

/** A field of a part: key, label, unit and the default text. */
export interface FieldSpec {
  key: string;
  label: string;
  unit?: string;
  initial: string;
  /** A comma-separated list of numbers rather than one. */
  list?: boolean;
}

export const PART_KINDS: { kind: PartKind; label: string; fields: FieldSpec[] }[] = [
  {
    kind: 'tones',
    label: 'Tones',
    fields: [
      { key: 'frequencies', label: 'at', unit: 'Hz', initial: '50, 150', list: true },
      { key: 'amplitude', label: 'amplitude', initial: '0.1' },
    ],
  },
  {
    kind: 'hum',
    label: 'Mains hum',
    fields: [
      { key: 'fundamental', label: 'at', unit: 'Hz', initial: '50' },
      { key: 'harmonics', label: 'harmonic amplitudes', initial: '0.1, 0, 0.05, 0, 0.03', list: true },
      { key: 'drift', label: 'drift ±', unit: 'Hz', initial: '0.2' },
      { key: 'driftPeriod', label: 'every', unit: 's', initial: '20' },
    ],
  },
  {
    kind: 'step',
    label: 'Step',
    fields: [
      { key: 'at', label: 'at', unit: 's', initial: '1' },
      { key: 'level', label: 'to', initial: '0.5' },
    ],
  },
  {
    kind: 'impulse-train',
    label: 'Impulse train',
    fields: [
      { key: 'period', label: 'every', unit: 's', initial: '0.5' },
      { key: 'amplitude', label: 'height', initial: '1' },
    ],
  },
  {
    kind: 'white-noise',
    label: 'White noise',
    fields: [
      { key: 'rms', label: 'RMS', initial: '0.01' },
      { key: 'seed', label: 'seed', initial: '1' },
    ],
  },
  {
    kind: 'pink-noise',
    label: 'Pink noise',
    fields: [
      { key: 'rms', label: 'RMS', initial: '0.05' },
      { key: 'seed', label: 'seed', initial: '1' },
    ],
  },
];

/** Longest signal the form makes, s. */
export const MAX_DURATION_S = 600;
/** Most samples the form makes (ten minutes at 48 kHz). */
export const MAX_GENERATED_SAMPLES = 600 * 48000;

/** A new part of the kind with its default fields. */
export function newPart(kind: PartKind, fields: Record<string, string> = {}): RecipePart {
  const spec = PART_KINDS.find((k) => k.kind === kind)!;
  return { kind, fields: Object.fromEntries(spec.fields.map((f) => [f.key, fields[f.key] ?? f.initial])) };
}

export const PRESETS: { id: string; label: string; recipe: Recipe }[] = [
  {
    id: 'hopper',
    label: 'Hopper scale: load step with 50 Hz hum',
    recipe: {
      duration: '10',
      parts: [
        newPart('step', { at: '2', level: '0.4' }),
        newPart('tones', { frequencies: '1.5', amplitude: '0.02' }),
        newPart('hum', { fundamental: '50', harmonics: '0.1, 0, 0.05, 0, 0.03', drift: '0.2' }),
        newPart('white-noise', { rms: '0.002' }),
      ],
    },
  },
  {
    id: 'bench-audio',
    label: 'Bench audio: tones and pink noise with 60 Hz hum to the 7th',
    recipe: {
      duration: '10',
      parts: [
        newPart('tones', { frequencies: '220, 440', amplitude: '0.1' }),
        newPart('pink-noise', { rms: '0.03' }),
        newPart('hum', {
          fundamental: '60',
          harmonics: '0.05, 0.02, 0.03, 0.01, 0.015, 0.005, 0.01',
          drift: '0.1',
        }),
      ],
    },
  },
  { id: 'hum', label: 'Hum alone (50 Hz)', recipe: { duration: '10', parts: [newPart('hum')] } },
  { id: 'step', label: 'A step', recipe: { duration: '2', parts: [newPart('step')] } },
];

/** The signal's duration: seconds above 0, up to MAX_DURATION_S (s or ms may be typed). */
export const durationRule: NumberFieldRule = {
  typedUnit: 's',
  check: (x) => (x > 0 && x <= MAX_DURATION_S ? null : `Duration: seconds above 0, up to ${MAX_DURATION_S}.`),
};

/** A problem in the form: which part (0-based; -1 for the duration) and field, and what is accepted. */
export interface RecipeError {
  part: number;
  field: string;
  message: string;
}

type Checked<T> = { ok: true; value: T } | { ok: false; error: RecipeError };

/** Checks the form and builds the engine's specs and the sample count at sample rate fs (Hz). */
export function checkRecipe(recipe: Recipe, fs: number): Checked<{ specs: GeneratorSpec[]; n: number }> {
  const duration = readNumberField(recipe.duration, durationRule);
  if (!duration.ok) return fail(-1, 'duration', duration.message);
  const seconds = duration.value!;
  const n = Math.round(seconds * fs);
  if (n > MAX_GENERATED_SAMPLES) {
    return fail(
      -1,
      'duration',
      `${seconds} s at ${fs} Hz is ${n} samples; at most ${MAX_GENERATED_SAMPLES} are made.`,
    );
  }
  if (n < 1) return fail(-1, 'duration', `${seconds} s is under one sample at ${fs} Hz.`);
  if (recipe.parts.length === 0) return fail(-1, 'parts', 'Add at least one part.');
  const specs: GeneratorSpec[] = [];
  for (let i = 0; i < recipe.parts.length; i++) {
    const r = partSpec(recipe.parts[i]!, i, fs);
    if (!r.ok) return r;
    specs.push(r.value);
  }
  return { ok: true, value: { specs, n } };
}

function fail<T>(part: number, field: string, message: string): Checked<T> {
  return { ok: false, error: { part, field, message } };
}

function partSpec(p: RecipePart, i: number, fs: number): Checked<GeneratorSpec> {
  const nyquist = fs / 2;
  const num = (key: string, ok: (x: number) => boolean, accepted: string): number | RecipeError => {
    const text = p.fields[key] ?? '';
    const r = readNumberField(text, {
      ...typedUnitOf(p.kind, key),
      check: (x) => (ok(x) ? null : `"${text}": ${accepted}.`),
    });
    return r.ok ? r.value! : { part: i, field: key, message: r.message };
  };
  const list = (key: string, ok: (x: number) => boolean, accepted: string): number[] | RecipeError => {
    const text = p.fields[key] ?? '';
    const r = readListField(text, (x) => (ok(x) ? null : `"${text}": ${accepted}, separated by commas.`));
    return r.ok ? r.value : { part: i, field: key, message: r.message };
  };
  const below = (what: string) => `${what} from 0 up to half the sample rate (${nyquist} Hz)`;
  const any = () => true;
  const positive = (x: number) => x > 0;
  let spec: GeneratorSpec | RecipeError;
  switch (p.kind) {
    case 'tones': {
      const f = list('frequencies', (x) => x >= 0 && x < nyquist, below('frequencies'));
      const a = num('amplitude', any, 'an amplitude such as 0.1');
      spec = isErr(f)
        ? f
        : isErr(a)
          ? a
          : { kind: 'tones', tones: f.map((frequencyHz) => ({ frequencyHz, amplitude: a })) };
      break;
    }
    case 'hum': {
      const f0 = num('fundamental', (x) => x > 0 && x < nyquist, below('a frequency'));
      const amps = list('harmonics', any, 'amplitudes of the fundamental, 2nd, 3rd … harmonic');
      const d = num('drift', (x) => x >= 0, 'a drift of 0 Hz or more');
      const T = num('driftPeriod', positive, 'a period above 0 s');
      if (isErr(f0) || isErr(amps) || isErr(d) || isErr(T)) {
        spec = [f0, amps, d, T].find(isErr)!;
        break;
      }
      const high = amps.findIndex((a, h) => a !== 0 && (h + 1) * f0 >= nyquist);
      spec =
        high >= 0
          ? {
              part: i,
              field: 'harmonics',
              message: `Harmonic ${high + 1} (${(high + 1) * f0} Hz) is at or above half the sample rate (${nyquist} Hz); set its amplitude to 0.`,
            }
          : { kind: 'hum', fundamentalHz: f0, harmonicAmplitudes: amps, driftHz: d, driftPeriodSeconds: T };
      break;
    }
    case 'step': {
      const at = num('at', (x) => x >= 0, 'a time of 0 s or more');
      const level = num('level', any, 'a level such as 0.5');
      spec = isErr(at) ? at : isErr(level) ? level : { kind: 'step', atSeconds: at, level };
      break;
    }
    case 'impulse-train': {
      const period = num('period', (x) => x * fs >= 1, `a period of at least one sample (${1 / fs} s)`);
      const amplitude = num('amplitude', any, 'a height such as 1');
      spec = isErr(period)
        ? period
        : isErr(amplitude)
          ? amplitude
          : { kind: 'impulse-train', periodSeconds: period, amplitude };
      break;
    }
    case 'white-noise':
    case 'pink-noise': {
      const rms = num('rms', (x) => x >= 0, 'an RMS of 0 or more');
      const seed = num('seed', (x) => Number.isInteger(x), 'a whole number');
      spec = isErr(rms) ? rms : isErr(seed) ? seed : { kind: p.kind, rms, seed: seed >>> 0 };
      break;
    }
  }
  return isErr(spec) ? { ok: false, error: spec } : { ok: true, value: spec };
}

/** The unit a part's field may be typed in (the unit it shows, when the reader knows it). */
function typedUnitOf(kind: PartKind, key: string): { typedUnit?: 'Hz' | 's' } {
  const unit = PART_KINDS.find((k) => k.kind === kind)?.fields.find((f) => f.key === key)?.unit;
  return unit === 'Hz' || unit === 's' ? { typedUnit: unit } : {};
}

function isErr(x: unknown): x is RecipeError {
  return typeof x === 'object' && x !== null && 'message' in x && 'part' in x;
}

/** A short description of the parts, for the signal's name. */
export function describeRecipe(recipe: Recipe): string {
  const names = recipe.parts.map((p) => PART_KINDS.find((k) => k.kind === p.kind)!.label.toLowerCase());
  return `${names.join(' + ')} (${recipe.duration} s)`;
}

/** What the recording worker needs to make a signal (see loader.ts showGenerated). */
export interface GeneratedSignal {
  name: string;
  sampleRate: number;
  specs: GeneratorSpec[];
  /** Number of samples. */
  n: number;
}

/** The recipe as a signal to make at fs Hz (generateSum of the parts), or the first problem in the form. */
export function recipeSignal(recipe: Recipe, fs: number, name?: string): Checked<GeneratedSignal> {
  const r = checkRecipe(recipe, fs);
  if (!r.ok) return r;
  return { ok: true, value: { name: name ?? describeRecipe(recipe), sampleRate: fs, ...r.value } };
}
