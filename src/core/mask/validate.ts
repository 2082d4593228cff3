/** Checks of a requirement mask against a sample rate, with errors a user can act on. */
import type { InputError, Result } from '../types.ts';
import type { MaskRegion, RequirementMask } from './types.ts';
import { shortNumber } from '../shortNumber.ts';

const fmt = (v: number) => shortNumber(v, 10);

const KINDS = ['pass', 'stop', 'band'] as const;

/** What is wrong with one region at sample rate fs (Hz), or null when it is acceptable. */
export function regionProblem(region: MaskRegion, fs: number): InputError | null {
  const at = `region ${JSON.stringify(region.id)}`;
  const nyq = fs / 2;
  const bad = (message: string, expected: string): InputError => ({ message: `${at}: ${message}`, expected });
  if (!KINDS.includes(region.kind))
    return bad(`kind '${String(region.kind)}' is not known`, KINDS.join(', '));
  for (const [name, v] of [
    ['fromHz', region.fromHz],
    ['toHz', region.toHz],
  ] as const) {
    if (!Number.isFinite(v) || v < 0 || v > nyq)
      return bad(
        `${name} = ${fmt(v)} Hz lies outside [0, ${fmt(nyq)}] Hz`,
        `a frequency from 0 to fs/2 = ${fmt(nyq)} Hz`,
      );
  }
  if (!(region.fromHz < region.toHz))
    return bad(
      `fromHz = ${fmt(region.fromHz)} Hz is not below toHz = ${fmt(region.toHz)} Hz`,
      'fromHz < toHz',
    );
  for (const [name, v] of [
    ['upperDb', region.upperDb],
    ['lowerDb', region.lowerDb],
  ] as const) {
    if (v !== undefined && !Number.isFinite(v))
      return bad(`${name} = ${fmt(v)} is not accepted`, 'a finite level in dB');
  }
  const { upperDb: u, lowerDb: l } = region;
  if (region.kind === 'pass' && l === undefined)
    return bad('a pass region needs a lower limit', 'lowerDb, e.g. −0.1 dB (upperDb optional, e.g. +0.1 dB)');
  if (region.kind === 'stop' && u === undefined)
    return bad('a stop region needs an upper limit', 'upperDb, e.g. −40 dB');
  if (region.kind === 'stop' && l !== undefined)
    return bad('a stop region takes no lower limit', "upperDb only (use kind 'band' for both limits)");
  if (u === undefined && l === undefined) return bad('no limit given', 'upperDb, lowerDb or both');
  if (u !== undefined && l !== undefined && !(u > l))
    return bad(`upperDb = ${fmt(u)} dB is not above lowerDb = ${fmt(l)} dB`, 'upperDb > lowerDb');
  return null;
}

/** The mask if every region is acceptable at sample rate fs (Hz) and ids are unique, else the first problem. */
export function validateMask(mask: RequirementMask, fs: number): Result<RequirementMask> {
  if (!(fs > 0 && Number.isFinite(fs)))
    return {
      ok: false,
      error: { message: `sample rate ${fmt(fs)} Hz is not accepted`, expected: 'a sample rate > 0 Hz' },
    };
  const seen = new Set<string>();
  for (const region of mask.regions) {
    if (!region.id)
      return { ok: false, error: { message: 'a region has an empty id', expected: 'a unique id, e.g. r1' } };
    if (seen.has(region.id))
      return {
        ok: false,
        error: {
          message: `region id ${JSON.stringify(region.id)} is used twice`,
          expected: 'a unique id per region',
        },
      };
    seen.add(region.id);
    const problem = regionProblem(region, fs);
    if (problem) return { ok: false, error: problem };
  }
  return { ok: true, value: mask };
}
