/** One door for every designer: check the description, design, describe; bad parameters give an InputError. */
import type { Result } from '../types.ts';
import { designComb, designHarmonicNotches } from './comb.ts';
import type { EqWidth } from './equaliser.ts';
import { designPeakingEq, designShelf } from './equaliser.ts';
import { designDcBlocker, designNotch, designPeak } from './notch.ts';
import { runIir } from './runIir.ts';
import type { DesignerSpec, DesignResult, NotchWidth } from './spec.ts';
import { DesignInputError, guard, inBand, oneOf, positive, sampleRate } from './validate.ts';
import { shortNumber } from '../shortNumber.ts';

/** Tolerance on fs/f0 being a whole number for a comb (relative to that number). */
export const COMB_DIVISOR_TOLERANCE = 1e-9;

const fmt = (v: number) => shortNumber(v, 6);

/** −3 dB width in Hz from a bandwidth or Q at centre f, below the limit `below` Hz. */
function widthHz(w: NotchWidth, f: number, below: number, what: string): number {
  const which = oneOf(['bandwidthHz', 'q'], w.bandwidthHz, w.q);
  const bw = which === 0 ? positive('bandwidthHz', w.bandwidthHz, 'Hz') : f / positive('q', w.q, '');
  if (!(bw < below))
    throw new DesignInputError(
      `a ${fmt(bw)} Hz width is too wide for ${what}`,
      `a width below ${fmt(below)} Hz (Q above ${fmt(f / below)})`,
    );
  return bw;
}

function eqWidth(
  spec: { q?: number; bandwidthOctaves?: number; slope?: number },
  alt: 'bandwidthOctaves' | 'slope',
): EqWidth {
  const which = oneOf(['q', alt], spec.q, spec[alt]);
  if (which === 0) return { q: positive('q', spec.q, '') };
  return alt === 'slope'
    ? { slope: positive('slope', spec.slope, '') }
    : { bandwidthOctaves: positive('bandwidthOctaves', spec.bandwidthOctaves, 'octaves') };
}

function gainDb(v: number): number {
  if (!Number.isFinite(v)) throw new DesignInputError(`gainDb = ${v} is not accepted`, 'a finite gain in dB');
  return v;
}

function design(spec: DesignerSpec): DesignResult {
  const fs = sampleRate(spec.fs);
  const tail = `, fs ${fmt(fs)} Hz`;
  switch (spec.kind) {
    case 'notch':
    case 'peak': {
      const f0 = inBand('f0', spec.f0, fs);
      const bw = widthHz(spec, f0, fs / 2, `a ${spec.kind} at fs ${fmt(fs)} Hz`);
      const zpk = spec.kind === 'notch' ? designNotch(f0, bw, fs) : designPeak(f0, bw, fs);
      return {
        zpk,
        note: `${spec.kind} at ${fmt(f0)} Hz, −3 dB width ${fmt(bw)} Hz (Q ${fmt(f0 / bw)})${tail}`,
      };
    }
    case 'dcBlocker': {
      const fc = inBand('cutoffHz', spec.cutoffHz, fs);
      return { zpk: designDcBlocker(fc, fs), note: `DC blocker, −3 dB at ${fmt(fc)} Hz${tail}` };
    }
    case 'harmonicNotch': {
      const f0 = inBand('f0', spec.f0, fs);
      if (!spec.harmonics.length)
        throw new DesignInputError('no harmonics chosen', 'harmonic numbers 1, 2, 3 … (1 = the fundamental)');
      for (const h of spec.harmonics) {
        if (!Number.isInteger(h) || h < 1)
          throw new DesignInputError(
            `harmonic ${h} is not accepted`,
            'whole numbers from 1 (the fundamental)',
          );
        inBand(`harmonic ${h} (${fmt(h * f0)} Hz)`, h * f0, fs);
      }
      const hs = [...new Set(spec.harmonics)].sort((a, b) => a - b);
      const widths = hs.map((h) =>
        widthHz(spec.q === undefined ? spec : { q: spec.q }, h * f0, fs / 2, `harmonic ${h}`),
      );
      const zpk = designHarmonicNotches(f0, hs, (h) => widths[hs.indexOf(h)]!, fs);
      const width = spec.q === undefined ? `width ${fmt(widths[0]!)} Hz each` : `Q ${fmt(spec.q)} each`;
      return { zpk, note: `notches at harmonics ${hs.join(', ')} of ${fmt(f0)} Hz, ${width}${tail}` };
    }
    case 'comb': {
      const f0 = inBand('f0', spec.f0, fs);
      const n = Math.round(fs / f0);
      if (Math.abs(fs / f0 - n) > COMB_DIVISOR_TOLERANCE * n)
        throw new DesignInputError(
          `fs/f0 = ${fmt(fs / f0)} is not a whole number`,
          `f0 = fs/N for a whole number N >= 2, e.g. ${fmt(fs / Math.max(2, n))} Hz`,
        );
      const bw = widthHz(spec, f0, f0, `a comb whose teeth are ${fmt(f0)} Hz apart`);
      return {
        zpk: designComb(f0, bw, spec.type, fs),
        note: `${spec.type} comb of order ${n} at every multiple of ${fmt(f0)} Hz, −3 dB width ${fmt(bw)} Hz${tail}`,
      };
    }
    case 'peakingEq': {
      const f0 = inBand('f0', spec.f0, fs);
      const g = gainDb(spec.gainDb);
      return {
        zpk: designPeakingEq(f0, g, eqWidth(spec, 'bandwidthOctaves'), fs),
        note: `peaking EQ ${fmt(g)} dB at ${fmt(f0)} Hz${tail}`,
      };
    }
    case 'lowShelf':
    case 'highShelf': {
      const f0 = inBand('f0', spec.f0, fs);
      const g = gainDb(spec.gainDb);
      const width = eqWidth(spec, 'slope');
      const a = 10 ** (g / 40);
      if ('slope' in width && (a + 1 / a) * (1 / width.slope - 1) + 2 < 0)
        throw new DesignInputError(
          `shelf slope ${fmt(width.slope)} is too steep for ${fmt(g)} dB`,
          `a slope up to ${fmt(1 / (1 - 2 / (a + 1 / a)))}`,
        );
      const low = spec.kind === 'lowShelf';
      return {
        zpk: designShelf(low, f0, g, width, fs),
        note: `${low ? 'low' : 'high'} shelf ${fmt(g)} dB, midpoint ${fmt(f0)} Hz${tail}`,
      };
    }
    case 'iir':
      return runIir(spec);
  }
}

/** Runs a designer description: its zeros/poles/gain and a one-line note, or an InputError saying what to change. */
export function runDesigner(spec: DesignerSpec): Result<DesignResult> {
  return guard(() => design(spec));
}
