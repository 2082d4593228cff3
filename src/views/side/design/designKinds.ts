/**
 * The designers the Design page offers, the fields each one shows, and starting values scaled to the
 * sample rate (taken from the invented scenarios: 50 Hz hum at 2 kHz, a 120 Hz anti-alias low-pass at
 * 1 kHz, a 1.2 kHz tone detector at 8 kHz).
 */
import type { BandShape, IirFamily } from '../../../core/design/index.ts';

/** What the form designs: the engine's designer kinds, with the classical band shapes listed one by one. */
export type FormKind =
  | 'notch'
  | 'peak'
  | 'dcBlocker'
  | 'harmonicNotch'
  | 'comb'
  | 'peakingEq'
  | 'lowShelf'
  | 'highShelf'
  | BandShape;

/** Every text field the form can show. */
export type FieldKey =
  | 'f0'
  | 'bandwidth'
  | 'q'
  | 'cutoff'
  | 'harmonics'
  | 'gainDb'
  | 'octaves'
  | 'slope'
  | 'order'
  | 'edgeLow'
  | 'edgeHigh'
  | 'passLow'
  | 'passHigh'
  | 'stopLow'
  | 'stopHigh'
  | 'ripple'
  | 'attenuation';

/** The whole form: choices, and every field's text as typed (fields not shown keep their text). */
export interface DesignFormState {
  kind: FormKind;
  family: IirFamily;
  /** Notch, peak, harmonic notches and comb: width as a −3 dB bandwidth in Hz or as Q. */
  width: 'bandwidth' | 'q';
  /** Peaking EQ: Q or octaves; shelves: Q or slope. */
  eqWidth: 'q' | 'octaves' | 'slope';
  combType: 'notch' | 'peak';
  /** Classical designs: the least order meeting the requirement instead of a given order. */
  autoOrder: boolean;
  values: Record<FieldKey, string>;
}

export interface KindInfo {
  kind: FormKind;
  label: string;
  group: 'Remove or pick out a frequency' | 'Equaliser sections' | 'Classical filters';
}

export const KINDS: readonly KindInfo[] = [
  { kind: 'notch', label: 'Notch', group: 'Remove or pick out a frequency' },
  { kind: 'harmonicNotch', label: 'Notches at harmonics', group: 'Remove or pick out a frequency' },
  { kind: 'comb', label: 'Comb (every multiple)', group: 'Remove or pick out a frequency' },
  { kind: 'peak', label: 'Resonator (peak)', group: 'Remove or pick out a frequency' },
  { kind: 'dcBlocker', label: 'DC blocker', group: 'Remove or pick out a frequency' },
  { kind: 'peakingEq', label: 'Peaking EQ', group: 'Equaliser sections' },
  { kind: 'lowShelf', label: 'Low shelf', group: 'Equaliser sections' },
  { kind: 'highShelf', label: 'High shelf', group: 'Equaliser sections' },
  { kind: 'lowpass', label: 'Low-pass', group: 'Classical filters' },
  { kind: 'highpass', label: 'High-pass', group: 'Classical filters' },
  { kind: 'bandpass', label: 'Band-pass', group: 'Classical filters' },
  { kind: 'bandstop', label: 'Band-stop', group: 'Classical filters' },
];

export const FAMILIES: readonly { family: IirFamily; label: string }[] = [
  { family: 'butterworth', label: 'Butterworth' },
  { family: 'chebyshev1', label: 'Chebyshev I' },
  { family: 'chebyshev2', label: 'Chebyshev II' },
  { family: 'elliptic', label: 'Elliptic' },
];

/** True for the classical band shapes. */
export function isClassical(kind: FormKind): kind is BandShape {
  return kind === 'lowpass' || kind === 'highpass' || kind === 'bandpass' || kind === 'bandstop';
}

/** True for kinds whose width is a bandwidth or Q. */
export const hasNotchWidth = (k: FormKind) =>
  k === 'notch' || k === 'peak' || k === 'harmonicNotch' || k === 'comb';

/** Two edges per band for band-pass and band-stop, one otherwise. */
export const isBand = (k: FormKind) => k === 'bandpass' || k === 'bandstop';

/** The text fields shown for the form's current choices, in reading order. */
export function visibleFields(s: DesignFormState): FieldKey[] {
  const k = s.kind;
  if (hasNotchWidth(k)) {
    const head: FieldKey[] = k === 'harmonicNotch' ? ['f0', 'harmonics'] : ['f0'];
    return [...head, s.width === 'q' ? 'q' : 'bandwidth'];
  }
  if (k === 'dcBlocker') return ['cutoff'];
  if (k === 'peakingEq') return ['f0', 'gainDb', s.eqWidth === 'octaves' ? 'octaves' : 'q'];
  if (k === 'lowShelf' || k === 'highShelf') return ['f0', 'gainDb', s.eqWidth === 'slope' ? 'slope' : 'q'];
  const two = isBand(k);
  const edges: FieldKey[] = s.autoOrder ? [] : two ? ['order', 'edgeLow', 'edgeHigh'] : ['order', 'edgeLow'];
  const req: FieldKey[] = two ? ['passLow', 'passHigh', 'stopLow', 'stopHigh'] : ['passLow', 'stopLow'];
  return [...edges, ...req, 'ripple', 'attenuation'];
}

/** A value rounded to 3 significant digits, as text. */
const r3 = (v: number) => String(Number(v.toPrecision(3)));

/** Starting values for every field at sample rate fs (Hz). */
export function defaultValues(fs: number): Record<FieldKey, string> {
  const nyq = fs / 2;
  // 50 Hz mains where it fits comfortably below Nyquist, else a twentieth of fs.
  const hum = nyq > 400 ? 50 : fs / 20;
  const at = (fraction: number) => r3(fraction * fs);
  return {
    f0: r3(hum),
    bandwidth: r3(nyq > 400 ? 2 : hum / 25),
    q: '25',
    cutoff: r3(fs / 1000),
    harmonics: '1, 3, 5',
    gainDb: '6',
    octaves: '1',
    slope: '1',
    order: '4',
    edgeLow: at(0.12),
    edgeHigh: at(0.2),
    passLow: at(0.1),
    passHigh: at(0.2),
    stopLow: at(0.4),
    stopHigh: at(0.3),
    ripple: '1',
    attenuation: '60',
  };
}

/** Values that suit a kind at fs (band edges nest the right way round; f0 where that kind is usually used). */
function kindValues(kind: FormKind, fs: number): Partial<Record<FieldKey, string>> {
  const at = (fraction: number) => r3(fraction * fs);
  switch (kind) {
    case 'peak':
      return { f0: at(0.15), q: '25' };
    case 'comb':
      return { f0: r3(fs / Math.max(2, Math.round(fs / Number(defaultValues(fs).f0)))) };
    case 'peakingEq':
      return { f0: at(0.1), q: '1' };
    case 'lowShelf':
      return { f0: at(0.05), q: '0.707' };
    case 'highShelf':
      return { f0: at(0.2), q: '0.707', gainDb: '-6' };
    case 'highpass':
      return { edgeLow: at(0.1), passLow: at(0.12), stopLow: at(0.03), attenuation: '40' };
    case 'bandpass':
      return {
        edgeLow: at(0.1),
        edgeHigh: at(0.2),
        passLow: at(0.11),
        passHigh: at(0.19),
        stopLow: at(0.05),
        stopHigh: at(0.3),
        attenuation: '30',
      };
    case 'bandstop':
      return {
        edgeLow: at(0.1),
        edgeHigh: at(0.2),
        passLow: at(0.07),
        passHigh: at(0.26),
        stopLow: at(0.14),
        stopHigh: at(0.16),
        attenuation: '30',
      };
    default:
      return {};
  }
}

/** A fresh form for a kind at sample rate fs (Hz). */
export function defaultForm(kind: FormKind, fs: number): DesignFormState {
  return {
    kind,
    family: 'butterworth',
    width: kind === 'peak' ? 'q' : 'bandwidth',
    eqWidth: 'q',
    combType: 'notch',
    autoOrder: false,
    values: { ...defaultValues(fs), ...kindValues(kind, fs) },
  };
}

/** The form switched to another kind: the values that kind starts from, keeping the family and order mode. */
export function withKind(s: DesignFormState, kind: FormKind, fs: number): DesignFormState {
  const fresh = defaultForm(kind, fs);
  return { ...fresh, family: s.family, autoOrder: s.autoOrder };
}
