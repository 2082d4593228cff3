/**
 * The mask a notching designer's own numbers imply: flat pass bands between the notches and a narrow stop
 * region at each notch centre (notch, harmonic notches, notch comb).
 */
import type { DesignerSpec } from '../design/index.ts';
import type { RequirementMask } from './types.ts';
import { maskFromNotchRequirement } from './fromRequirement.ts';

/** Pass regions stop this many −3 dB widths short of a notch centre (a notch loses ~0.04 dB there). */
export const NOTCH_PASS_GAP_WIDTHS = 5;
/** Pass regions must stay within ± this of 0 dB, dB. */
export const NOTCH_PASS_TOLERANCE_DB = 0.2;
/** Stop region half-width as a fraction of the narrowest −3 dB width (a notch is ~22 dB down there). */
export const NOTCH_STOP_HALF_WIDTH = 1 / 25;
/** Least attenuation asked of each notch's stop region, dB. */
export const NOTCH_STOP_ATTENUATION_DB = 20;

/** Notch centres and −3 dB widths (Hz) of a notching designer, or null for any other designer. */
function notchesOf(spec: DesignerSpec): { hz: number; width: number }[] | null {
  const nyq = spec.fs / 2;
  switch (spec.kind) {
    case 'notch':
      return [{ hz: spec.f0, width: spec.bandwidthHz ?? spec.f0 / (spec.q ?? NaN) }];
    case 'harmonicNotch':
      return [...new Set(spec.harmonics)].map((h) => ({
        hz: h * spec.f0,
        width: spec.q === undefined ? (spec.bandwidthHz ?? NaN) : (h * spec.f0) / spec.q,
      }));
    case 'comb': {
      if (spec.type !== 'notch') return null;
      const width = spec.bandwidthHz ?? spec.f0 / (spec.q ?? NaN);
      const out: { hz: number; width: number }[] = [];
      const teeth = Math.floor(nyq / spec.f0 + 1e-9);
      for (let k = 0; k <= teeth; k++) out.push({ hz: Math.min(k * spec.f0, nyq), width });
      return out;
    }
    default:
      return null;
  }
}

/** The mask a notching designer implies, or null for other designers (or unusable numbers). */
export function maskFromNotchDesigner(spec: DesignerSpec): RequirementMask | null {
  const notches = notchesOf(spec);
  if (!notches || !notches.every((n) => n.width > 0 && Number.isFinite(n.width))) return null;
  const sorted = [...notches].sort((a, b) => a.hz - b.hz);
  const nyq = spec.fs / 2;
  const passHz: [number, number][] = [];
  let from = 0;
  for (const n of sorted) {
    const to = n.hz - NOTCH_PASS_GAP_WIDTHS * n.width;
    if (to > from) passHz.push([from, to]);
    from = Math.max(from, n.hz + NOTCH_PASS_GAP_WIDTHS * n.width);
  }
  if (from < nyq) passHz.push([from, nyq]);
  const r = maskFromNotchRequirement({
    fs: spec.fs,
    notchesHz: sorted.map((n) => n.hz),
    halfWidthHz: Math.min(...sorted.map((n) => n.width)) * NOTCH_STOP_HALF_WIDTH,
    attenuationDb: NOTCH_STOP_ATTENUATION_DB,
    passHz,
    passToleranceDb: NOTCH_PASS_TOLERANCE_DB,
  });
  return r.ok ? r.value : null;
}
