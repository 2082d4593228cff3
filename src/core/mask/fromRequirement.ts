/** Masks built from a stated requirement: a classical pass-/stop-band requirement, or notches with a pass band. */
import type { Requirement } from '../design/requirement.ts';
import { requirementRegions } from '../design/requirement.ts';
import type { DesignerSpec } from '../design/spec.ts';
import type { InputError, Result } from '../types.ts';
import type { MaskRegion, RequirementMask } from './types.ts';
import { validateMask } from './validate.ts';
import { shortNumber } from '../shortNumber.ts';

const fmt = (v: number) => shortNumber(v, 6);

/**
 * The mask of a classical requirement, with both limits where the requirement implies them: each pass band
 * lies between a ceiling of +rippleDb (or `passUpperDb` when given: the user's stated limit) and a floor of
 * −rippleDb (at most rippleDb of loss), and each stop band lies below −attenuationDb. Designs normalised to a
 * 0 dB peak (Butterworth, Chebyshev, elliptic) swing between 0 and −rippleDb, so they pass; a bump above the
 * pass band fails at its top. Region ids: 'pass', 'stop', or 'pass-1', 'pass-2' … when there are several.
 */
export function maskFromRequirement(req: Requirement, opts: { passUpperDb?: number } = {}): RequirementMask {
  const { pass, stop } = requirementRegions(req);
  const name = (kind: string, i: number, n: number) => (n === 1 ? kind : `${kind}-${i + 1}`);
  const ceiling = opts.passUpperDb ?? req.rippleDb;
  const regions: MaskRegion[] = [
    ...pass.map(([fromHz, toHz], i): MaskRegion => ({
      id: name('pass', i, pass.length),
      kind: 'pass',
      fromHz,
      toHz,
      lowerDb: -req.rippleDb,
      upperDb: ceiling,
      label: `pass band, at most ${fmt(req.rippleDb)} dB loss, at most ${fmt(ceiling)} dB gain`,
    })),
    ...stop.map(([fromHz, toHz], i): MaskRegion => ({
      id: name('stop', i, stop.length),
      kind: 'stop',
      fromHz,
      toHz,
      upperDb: -req.attenuationDb,
      label: `stop band, at least ${fmt(req.attenuationDb)} dB down`,
    })),
  ];
  return { regions: regions.sort((a, b) => a.fromHz - b.fromHz) };
}

/** A requirement of notches at given frequencies with pass bands held flat, all in Hz and dB. */
export interface NotchRequirement {
  /** Sample rate, Hz. */
  fs: number;
  /** Centres of the frequencies to remove, Hz. */
  notchesHz: readonly number[];
  /** Each notch region spans centre ± halfWidthHz (clipped to [0, fs/2]). */
  halfWidthHz: number;
  /** Least attenuation over each notch region, dB (> 0). */
  attenuationDb: number;
  /** Frequency ranges [from, to] in Hz that must stay flat. */
  passHz: readonly (readonly [number, number])[];
  /** Pass regions stay within ±passToleranceDb of 0 dB. */
  passToleranceDb: number;
}

/** The mask of a notch requirement, e.g. pass 0–20 Hz within ±0.1 dB, ≥ 40 dB down at 50/150/250 ± 0.5 Hz. */
export function maskFromNotchRequirement(req: NotchRequirement): Result<RequirementMask> {
  const bad = (message: string, expected: string): Result<RequirementMask> => ({
    ok: false,
    error: { message, expected } satisfies InputError,
  });
  if (!(req.halfWidthHz > 0 && Number.isFinite(req.halfWidthHz)))
    return bad(`notch half-width ${req.halfWidthHz} Hz is not accepted`, 'a half-width > 0 Hz');
  if (!(req.attenuationDb > 0 && Number.isFinite(req.attenuationDb)))
    return bad(`attenuation ${req.attenuationDb} dB is not accepted`, 'an attenuation > 0 dB');
  if (!(req.passToleranceDb > 0 && Number.isFinite(req.passToleranceDb)))
    return bad(`pass tolerance ${req.passToleranceDb} dB is not accepted`, 'a tolerance > 0 dB');
  const nyq = req.fs / 2;
  const regions: MaskRegion[] = [
    ...req.passHz.map(([fromHz, toHz], i): MaskRegion => ({
      id: req.passHz.length === 1 ? 'pass' : `pass-${i + 1}`,
      kind: 'pass',
      fromHz,
      toHz,
      lowerDb: -req.passToleranceDb,
      upperDb: req.passToleranceDb,
      label: `flat within ±${fmt(req.passToleranceDb)} dB`,
    })),
    ...req.notchesHz.map((f): MaskRegion => ({
      id: `notch-${fmt(f)}`,
      kind: 'stop',
      fromHz: Math.max(0, f - req.halfWidthHz),
      toHz: Math.min(nyq, f + req.halfWidthHz),
      upperDb: -req.attenuationDb,
      label: `${fmt(f)} Hz at least ${fmt(req.attenuationDb)} dB down`,
    })),
  ];
  return validateMask({ regions: regions.sort((a, b) => a.fromHz - b.fromHz) }, req.fs);
}

/**
 * The mask a designer description implies: a classical design carrying a complete requirement (pass-band
 * and stop-band edges, ripple, attenuation) gives its requirement's mask; anything else gives null.
 */
export function maskFromIirDesigner(spec: DesignerSpec): RequirementMask | null {
  if (spec.kind !== 'iir') return null;
  const { passbandHz, stopbandHz, rippleDb, attenuationDb } = spec;
  if (!passbandHz || !stopbandHz || rippleDb === undefined || attenuationDb === undefined) return null;
  const mask = maskFromRequirement({
    response: spec.response,
    passbandHz,
    stopbandHz,
    rippleDb,
    attenuationDb,
    fs: spec.fs,
  });
  return validateMask(mask, spec.fs).ok ? mask : null;
}
