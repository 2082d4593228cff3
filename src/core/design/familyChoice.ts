/**
 * "Any family": the least-order design over the four classical families for one requirement. Each family is
 * estimated and designed; the least order wins, and families tied on order are told apart by the spread of
 * their group delay across the pass band (largest minus smallest, in samples), the flatter one winning,
 * because at equal order it is the difference a user of the filter notices first (a pulse keeps its shape).
 */
import type { Zpk } from '../types.ts';
import { responseZpk } from '../response/zpkResponse.ts';
import { hzToOmega } from '../units.ts';
import type { IirFamily } from './iir.ts';
import { requirementRegions, type Requirement } from './requirement.ts';

/** How families tied on order are told apart, in the words the page and the command line print. */
export const FAMILY_TIE_BREAK = 'least group-delay spread across the pass band';

/** Points per pass band on which the group-delay spread is measured. */
export const DELAY_SPREAD_POINTS = 512;

/** One family tried for the requirement: its least order and pass-band group-delay spread, or why not. */
export interface FamilyTrial {
  family: IirFamily;
  /** Least order meeting the requirement (absent when the family could not be designed). */
  order?: number;
  /** Largest minus smallest group delay across the pass band, samples (absent when not designed). */
  delaySpreadSamples?: number;
  /** Why the family was not designed (above the order limit, roots beyond double precision). */
  refused?: string;
}

/** The family picked and every family tried, in the registry's order. */
export interface FamilyChoice {
  picked: IirFamily;
  trials: FamilyTrial[];
  /** True when another family had the same order and the tie-break decided. */
  tieBroken: boolean;
}

/** Largest minus smallest group delay (samples) of a design across the requirement's pass band(s). */
export function passbandDelaySpread(zpk: Zpk, req: Requirement): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const [a, b] of requirementRegions(req).pass) {
    const omega = new Float64Array(DELAY_SPREAD_POINTS);
    for (let i = 0; i < DELAY_SPREAD_POINTS; i++)
      omega[i] = hzToOmega(a + ((b - a) * i) / (DELAY_SPREAD_POINTS - 1), req.fs);
    const gd = responseZpk(zpk, omega).groupDelay;
    for (const v of gd) {
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  return hi - lo;
}

/**
 * Picks the family of least order among the designed trials (ties: least pass-band group-delay spread).
 * `design` returns a family's order and roots, or throws to refuse it; returns null when every family is
 * refused (the caller reports the first refusal).
 */
export function chooseFamily<T extends { order: number; zpk: Zpk }>(
  families: readonly IirFamily[],
  req: Requirement,
  design: (family: IirFamily) => T,
): { choice: FamilyChoice; picked: T } | { choice: null; errors: unknown[] } {
  const trials: FamilyTrial[] = [];
  const done = new Map<IirFamily, T>();
  const errors: unknown[] = [];
  for (const family of families) {
    try {
      const d = design(family);
      done.set(family, d);
      trials.push({ family, order: d.order, delaySpreadSamples: passbandDelaySpread(d.zpk, req) });
    } catch (e) {
      errors.push(e);
      trials.push({ family, refused: e instanceof Error ? e.message : String(e) });
    }
  }
  const usable = trials.filter((t) => t.order !== undefined);
  if (usable.length === 0) return { choice: null, errors };
  const least = Math.min(...usable.map((t) => t.order!));
  const tied = usable.filter((t) => t.order === least);
  const best = tied.reduce((a, b) => (b.delaySpreadSamples! < a.delaySpreadSamples! ? b : a));
  return {
    choice: { picked: best.family, trials, tieBroken: tied.length > 1 },
    picked: done.get(best.family)!,
  };
}
