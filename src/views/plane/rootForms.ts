/**
 * The ways the number strip shows and takes a selected root: radius and angle, real and imaginary parts,
 * and for a pole pair frequency with Q or with −3 dB width, and for a zero pair over a pole pair (a notch)
 * frequency, depth and width — the conversions are the engine's (core/rootShape.ts). Pure: text in, the
 * roots to move (one undo step) or a message naming the field out.
 */
import type { Design, RootRef } from '../../core/model/design.ts';
import { rootFrequencyHz } from '../../core/readouts.ts';
import {
  maxPairWidthHz,
  notchDepth,
  poleRadiusForWidth,
  widthForPoleRadius,
  zeroRadiusForDepth,
} from '../../core/rootShape.ts';
import type { Root } from '../../core/types.ts';
import { hzToOmega } from '../../core/units.ts';
import { readNumberField, type NumberFieldRule } from '../shared/fieldReading.ts';
import { formatNumber } from '../shared/format.ts';
import {
  parseCartesian,
  parsePolar,
  parseReal,
  radiansToAngle,
  type AngleUnit,
  type Parsed,
} from './numberEntry.ts';

export type RootForm = 'polar' | 'cartesian' | 'q' | 'width' | 'notch';

/** One move of the edit: a stored root to a new place. */
export interface RootMove {
  ref: RootRef;
  re: number;
  im: number;
}

/** What the strip needs to know about the selected root. */
export interface Selected {
  ref: RootRef;
  root: Root;
  /** For a zero pair: the pole pair that makes it a notch, if there is one. */
  partner: { ref: RootRef; root: Root } | null;
}

const FIELD_DIGITS = 6;
const fmt = (x: number) => formatNumber(x, FIELD_DIGITS);
const radiusOf = (z: Root) => Math.hypot(z.re, z.im);

/**
 * The pole pair inside the circle nearest in frequency to a zero pair, when it lies within its own −3 dB
 * width of the zero's frequency and no closer to the circle than the zero: the pair that makes a notch.
 */
export function notchPartner(design: Design, zero: RootRef): Selected['partner'] {
  const z = design.zeros[zero.index];
  if (zero.kind !== 'zero' || !z || z.im === 0) return null;
  const fs = design.sampleRate;
  const fz = rootFrequencyHz(z, fs);
  let best: Selected['partner'] = null;
  let gap = Infinity;
  design.poles.forEach((p, index) => {
    const r = radiusOf(p);
    const width = widthForPoleRadius(r, fs);
    if (p.im === 0 || width === null || r > radiusOf(z)) return;
    const d = Math.abs(rootFrequencyHz(p, fs) - fz);
    if (d <= width && d < gap) {
      gap = d;
      best = { ref: { kind: 'pole', index }, root: p };
    }
  });
  return best;
}

/** The forms offered for a root, with their labels. */
export function formsFor(sel: Selected): { form: RootForm; label: string }[] {
  if (sel.root.im === 0) return [{ form: 'polar', label: 'position' }];
  const forms: { form: RootForm; label: string }[] = [
    { form: 'polar', label: 'radius, angle' },
    { form: 'cartesian', label: 're, im' },
  ];
  if (sel.ref.kind === 'pole' && radiusOf(sel.root) < 1)
    forms.push({ form: 'q', label: 'frequency, Q' }, { form: 'width', label: 'frequency, −3 dB width' });
  if (sel.partner) forms.push({ form: 'notch', label: 'notch: frequency, depth, width' });
  return forms;
}

/** A field of the strip: its label, its text, and the words of its tooltip. */
export interface FormField {
  label: string;
  text: string;
  title: string;
  /** The unit written after the field, if any. */
  unit?: string;
}

/** The fields of a form for the selected root (texts as they stand now). */
export function fieldsOf(form: RootForm, sel: Selected, unit: AngleUnit, fs: number): FormField[] {
  const { root } = sel;
  const r = radiusOf(root);
  const f = rootFrequencyHz(root, fs);
  const hz = (x: number): FormField => ({ label: 'f', text: fmt(x), title: 'Frequency', unit: 'Hz' });
  if (root.im === 0) return [{ label: 'z', text: fmt(root.re), title: 'Position on the real axis' }];
  switch (form) {
    case 'cartesian':
      return [
        { label: 're', text: fmt(root.re), title: 'Real part' },
        { label: 'im', text: fmt(root.im), title: 'Imaginary part' },
      ];
    case 'q': {
      const w = widthForPoleRadius(r, fs);
      return [hz(f), { label: 'Q', text: w ? fmt(f / w) : '', title: 'Q = frequency / −3 dB width' }];
    }
    case 'width': {
      const w = widthForPoleRadius(r, fs);
      return [hz(f), { label: 'width', text: w ? fmt(w) : '', title: '−3 dB width', unit: 'Hz' }];
    }
    case 'notch': {
      const p = sel.partner!.root;
      const depth = notchDepth(r, radiusOf(p), hzToOmega(f, fs));
      const w = widthForPoleRadius(radiusOf(p), fs);
      return [
        hz(f),
        {
          label: 'depth',
          text: depth === 0 ? '−∞' : fmt(20 * Math.log10(depth)),
          title: 'Depth of the notch (−inf: zeros on the unit circle)',
          unit: 'dB',
        },
        { label: 'width', text: w ? fmt(w) : '', title: '−3 dB width (sets the pole pair)', unit: 'Hz' },
      ];
    }
    default:
      return [
        { label: 'r', text: fmt(r), title: 'Radius' },
        { label: '∠', text: fmt(radiansToAngle(Math.atan2(root.im, root.re), unit, fs)), title: 'Angle' },
      ];
  }
}

/** One field read by its rule; the message names the field. */
function field(what: string, text: string, rule: NumberFieldRule): Parsed<number> {
  const r = readNumberField(text, rule);
  return r.ok ? { ok: true, value: r.value! } : { ok: false, message: `${what}: ${r.message}` };
}

/** A pair's frequency: above 0 and below fs/2. */
const frequencyRule = (fs: number): NumberFieldRule => ({
  typedUnit: 'Hz',
  check: (x) =>
    x > 0 && x < fs / 2 ? null : `a pair's frequency is above 0 and below fs/2 (${formatNumber(fs / 2)} Hz)`,
});
/** A −3 dB width: above 0 and at most fs/4 (the poles meet at the origin there). */
const widthRule = (fs: number): NumberFieldRule => ({
  typedUnit: 'Hz',
  check: (x) =>
    x > 0 && x <= maxPairWidthHz(fs)
      ? null
      : `a −3 dB width is above 0 and at most fs/4 (${formatNumber(maxPairWidthHz(fs))} Hz)`,
});
const qRule = (f: number, fs: number): NumberFieldRule => ({
  check: (q) =>
    q > 0 && f / q <= maxPairWidthHz(fs)
      ? null
      : `Q is above 0, and at least ${formatNumber(f / maxPairWidthHz(fs))} here (a width of at most fs/4)`,
});
/** A notch's depth: 0 dB or below; −inf puts the zeros on the circle. */
const depthRule: NumberFieldRule = {
  typedUnit: 'dB',
  check: (x) => (x <= 0 ? null : 'a notch depth is 0 dB or below (−40 dB: a hundredth)'),
};
const MINUS_INFINITY = /^\s*[-−]\s*(inf|infinity|∞)\s*(dB)?\s*$/i;

/** A pair at radius r and frequency f (Hz). */
const at = (ref: RootRef, r: number, f: number, fs: number): RootMove => {
  const w = hzToOmega(f, fs);
  return { ref, re: r * Math.cos(w), im: r * Math.sin(w) };
};

/** Reads the fields of a form into the moves they ask for, or the message of the first wrong field. */
export function readForm(
  form: RootForm,
  texts: readonly string[],
  sel: Selected,
  unit: AngleUnit,
  fs: number,
): Parsed<RootMove[]> {
  const { ref, root } = sel;
  const [a = '', b = '', c = ''] = texts;
  if (root.im === 0) {
    const x = parseReal(a);
    return x.ok ? { ok: true, value: [{ ref, re: x.value, im: 0 }] } : x;
  }
  if (form === 'polar' || form === 'cartesian') {
    const p = form === 'polar' ? parsePolar(a, b, unit, fs) : parseCartesian(a, b);
    return p.ok ? { ok: true, value: [{ ref, ...p.value }] } : p;
  }
  const f = field('Frequency', a, frequencyRule(fs));
  if (!f.ok) return f;
  if (form === 'q' || form === 'width') {
    const w =
      form === 'q'
        ? (() => {
            const q = field('Q', b, qRule(f.value, fs));
            return q.ok ? { ok: true as const, value: f.value / q.value } : q;
          })()
        : field('Width', b, widthRule(fs));
    if (!w.ok) return w;
    return { ok: true, value: [at(ref, poleRadiusForWidth(w.value, fs)!, f.value, fs)] };
  }
  // A notch: the width sets the pole pair, the depth the zero pair, both at the frequency.
  const w = field('Width', c, widthRule(fs));
  if (!w.ok) return w;
  const rp = poleRadiusForWidth(w.value, fs)!;
  let depth = 0;
  if (!MINUS_INFINITY.test(b)) {
    const d = field('Depth', b, depthRule);
    if (!d.ok) return d;
    depth = 10 ** (d.value / 20);
  }
  const rz = zeroRadiusForDepth(depth, rp, hzToOmega(f.value, fs))!;
  return { ok: true, value: [at(ref, rz, f.value, fs), at(sel.partner!.ref, rp, f.value, fs)] };
}
