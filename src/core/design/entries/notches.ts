/** Registry entries of the designers that remove or pick out a frequency: notch, resonator, harmonics, comb, DC blocker. */
import { defineDesigner } from '../parameters.ts';
import { designEngine } from '../engineSlot.ts';
import { checkInBand } from '../checkInBand.ts';
import { DesignInputError } from '../validate.ts';
import { shortNumber } from '../../shortNumber.ts';
import { MAX_HARMONICS, MAX_ORDER } from '../../model/limits.ts';
import { NOTCH_WIDTH, bandwidth, centre, fmt, humHz, quality, r3, startWidth, widthHz } from './common.ts';

const GROUP = 'Remove or pick out a frequency';
/** Tolerance on fs/f0 being a whole number for a comb (relative to that number). */
export const COMB_DIVISOR_TOLERANCE = 1e-9;
const tail = (fs: number) => `, fs ${fmt(fs)} Hz`;

/** A second-order notch (zeros on the circle) or resonator (a peak) at f0, its width as a bandwidth or Q. */
function resonanceDesigner<const K extends 'notch' | 'peak'>(kind: K) {
  const notch = kind === 'notch';
  return defineDesigner({
    kind,
    parameters: [centre('Centre', 'centre in Hz'), bandwidth, quality('quality factor f0/bandwidth')],
    alternatives: [NOTCH_WIDTH],
    variants: [
      {
        id: kind,
        cli: kind,
        label: notch ? 'Notch' : 'Resonator (peak)',
        group: GROUP,
        ...(!notch && { prefer: ['q'] }),
        example: () => (notch ? { fs: 1000, f0: 50, bandwidthHz: 2 } : { fs: 8000, f0: 1200, q: 25 }),
        start: (fs) => ({ f0: notch ? humHz(fs) : r3(0.15 * fs), ...startWidth(fs) }),
      },
    ],
    design(spec) {
      const bw = widthHz(spec, spec.f0, spec.fs / 2, `a ${kind} at fs ${fmt(spec.fs)} Hz`);
      return {
        zpk: (notch ? designEngine().designNotch : designEngine().designPeak)(spec.f0, bw, spec.fs),
        note: `${kind} at ${fmt(spec.f0)} Hz, −3 dB width ${fmt(bw)} Hz (Q ${fmt(spec.f0 / bw)})${tail(spec.fs)}`,
      };
    },
  });
}

export const notchDesigner = resonanceDesigner('notch');
export const peakDesigner = resonanceDesigner('peak');

export const dcBlockerDesigner = defineDesigner({
  kind: 'dcBlocker',
  parameters: [
    {
      key: 'cutoffHz',
      flag: 'cutoff',
      label: '−3 dB at',
      what: '−3 dB frequency in Hz',
      unit: 'Hz',
      type: 'number',
      range: 'band',
      presence: 'required',
    },
  ],
  variants: [
    {
      id: 'dcBlocker',
      cli: 'dc-blocker',
      label: 'DC blocker',
      group: GROUP,
      example: () => ({ fs: 1000, cutoffHz: 0.5 }),
      start: (fs) => ({ cutoffHz: r3(fs / 1000) }),
    },
  ],
  design: (spec) => ({
    zpk: designEngine().designDcBlocker(spec.cutoffHz, spec.fs),
    note: `DC blocker, −3 dB at ${fmt(spec.cutoffHz)} Hz${tail(spec.fs)}`,
  }),
});

/** Notches at h·f0 for each harmonic number h (1 = the fundamental); with q the width grows as h·f0/q. */
export const harmonicNotchDesigner = defineDesigner({
  kind: 'harmonicNotch',
  parameters: [
    centre('Fundamental', 'fundamental in Hz', 'fundamental'),
    {
      key: 'harmonics',
      flag: 'harmonics',
      label: 'Harmonics',
      short: 'harmonics',
      hint: '1 = the fundamental',
      what: 'harmonic numbers, 1 = the fundamental',
      type: 'list',
      item: 'whole',
      count: { max: MAX_HARMONICS },
      noun: 'harmonic',
      presence: 'required',
    },
    bandwidth,
    quality('quality factor f0/bandwidth'),
  ],
  alternatives: [NOTCH_WIDTH],
  variants: [
    {
      id: 'harmonicNotch',
      cli: 'harmonic-notch',
      label: 'Notches at harmonics',
      group: GROUP,
      example: () => ({ fs: 2000, f0: 50, harmonics: [1, 3, 5], bandwidthHz: 2 }),
      start: (fs) => ({ f0: humHz(fs), harmonics: [1, 3, 5], ...startWidth(fs) }),
    },
  ],
  design(spec) {
    const { f0, fs } = spec;
    for (const [i, h] of spec.harmonics.entries()) checkInBand(`harmonic ${h}`, h * f0, fs, 'harmonics', i);
    const hs = [...new Set(spec.harmonics)].sort((a, b) => a - b);
    const widths = hs.map((h) =>
      widthHz(spec.q === undefined ? spec : { q: spec.q }, h * f0, fs / 2, `harmonic ${h}`),
    );
    const zpk = designEngine().designHarmonicNotches(f0, hs, (h) => widths[hs.indexOf(h)]!, fs);
    const width = spec.q === undefined ? `width ${fmt(widths[0]!)} Hz each` : `Q ${fmt(spec.q)} each`;
    return { zpk, note: `notches at harmonics ${hs.join(', ')} of ${fmt(f0)} Hz, ${width}${tail(fs)}` };
  },
});

/** Teeth at every multiple of f0 (fs/f0 must be a whole number), including DC. */
export const combDesigner = defineDesigner({
  kind: 'comb',
  parameters: [
    centre('Tooth spacing', 'tooth spacing in Hz, fs/f0 whole', 'spacing', 'fs divided by a whole number'),
    {
      key: 'type',
      flag: 'teeth',
      label: 'Teeth',
      short: 'teeth',
      what: 'teeth as notches or peaks (default notch)',
      type: 'choice',
      options: [
        { value: 'notch', label: 'notches' },
        { value: 'peak', label: 'peaks' },
      ],
      fallback: 'notch',
      control: 'segmented',
      presence: 'required',
    },
    bandwidth,
    quality('quality factor f0/bandwidth'),
  ],
  alternatives: [NOTCH_WIDTH],
  variants: [
    {
      id: 'comb',
      cli: 'comb',
      label: 'Comb (every multiple)',
      group: GROUP,
      example: () => ({ fs: 1000, f0: 50, q: 30, type: 'notch' }),
      start: (fs) => ({
        f0: r3(fs / Math.max(2, Math.round(fs / humHz(fs)))),
        type: 'notch',
        ...startWidth(fs),
      }),
    },
  ],
  design(spec) {
    const { f0, fs } = spec;
    const n = Math.round(fs / f0);
    if (Math.abs(fs / f0 - n) > COMB_DIVISOR_TOLERANCE * n)
      throw new DesignInputError(
        `fs/f0 = ${fmt(fs / f0)} is not a whole number`,
        `f0 = fs/N for a whole number N >= 2, e.g. ${fmt(fs / Math.max(2, n))} Hz`,
        'f0',
      );
    if (n > MAX_ORDER)
      throw new DesignInputError(
        `teeth ${fmt(f0)} Hz apart at fs ${fmt(fs)} Hz make a comb of order ${n}`,
        `an order of at most ${MAX_ORDER}: f0 = fs/N with N ≤ ${MAX_ORDER}, e.g. ${shortNumber(fs / MAX_ORDER, 12)} Hz or more`,
        'f0',
      );
    const bw = widthHz(spec, f0, f0, `a comb whose teeth are ${fmt(f0)} Hz apart`);
    return {
      zpk: designEngine().designComb(f0, bw, spec.type, fs),
      note: `${spec.type} comb of order ${n} at every multiple of ${fmt(f0)} Hz, −3 dB width ${fmt(bw)} Hz${tail(fs)}`,
    };
  },
});
