/**
 * Masks with both limits in the pass band, against scipy.signal (fixture mask_limits, gen_mask_limits.py):
 * least-order designs of scipy's order estimation meet the requirement, so the requirement's mask passes them;
 * a bump above the pass band fails at the bump, against the ceiling.
 */
import { describe, expect, it } from 'vitest';
import { evaluateMask, maskFromRequirement } from '../../../src/core/mask/index.ts';
import { designIir, runDesigner, type BandShape, type IirFamily } from '../../../src/core/design/index.ts';
import type { Root, Zpk } from '../../../src/core/types.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { fixtureRoots, type C } from '../design/helpers.ts';

interface Extremes {
  maxDb: number;
  minDb?: number;
}
interface DesignCase {
  family: IirFamily;
  response: BandShape;
  passbandHz: number[];
  stopbandHz: number[];
  rippleDb: number;
  attenuationDb: number;
  fs: number;
  order: number;
  zeros: (C | number)[];
  poles: (C | number)[];
  gain: number;
  regions: (Extremes & { kind: 'pass' | 'stop'; fromHz: number; toHz: number })[];
}
interface Fixture {
  designs: DesignCase[];
  bump: {
    fs: number;
    rippleDb: number;
    attenuationDb: number;
    passbandHz: number[];
    stopbandHz: number[];
    zeros: (C | number)[];
    poles: (C | number)[];
    gain: number;
    pass: Extremes;
    peakAtHz: number;
  };
}

/** A full root list (conjugates included) in the stored form: upper-half and real roots, once each. */
function stored(list: (C | number)[]): Root[] {
  return fixtureRoots(list)
    .filter((r) => r.im >= -1e-12 * Math.max(1, Math.abs(r.re)))
    .map((r) => ({ re: r.re, im: Math.abs(r.im) < 1e-12 ? 0 : r.im, multiplicity: 1 }));
}
const zpkOf = (c: { zeros: (C | number)[]; poles: (C | number)[]; gain: number }): Zpk => ({
  zeros: stored(c.zeros),
  poles: stored(c.poles),
  gain: c.gain,
});

const fx = loadFixture<Fixture>('mask_limits');
/** How far the mask's refined worst point may lie beyond scipy's best point on its 20001-point grid, dB. */
const GRID_SLACK_DB = 1e-3;

describe('two-sided requirement masks against scipy order estimation', () => {
  it.each(fx.designs.map((c) => [`${c.family} ${c.response} order ${c.order}`, c] as const))(
    '%s: scipy meets its specification, and so does ours',
    (_l, c) => {
      const req = {
        response: c.response,
        passbandHz: c.passbandHz,
        stopbandHz: c.stopbandHz,
        rippleDb: c.rippleDb,
        attenuationDb: c.attenuationDb,
        fs: c.fs,
      };
      const mask = maskFromRequirement(req);
      // Both limits in every pass band: the ceiling at +ripple, the floor at −ripple.
      for (const r of mask.regions.filter((x) => x.kind === 'pass'))
        expect([r.lowerDb, r.upperDb]).toEqual([-c.rippleDb, c.rippleDb]);
      // scipy.signal.{butter,cheby1,cheby2,ellip}(order from *ord) 1.17: the design scipy says meets the spec
      const scipy = evaluateMask(mask, zpkOf(c), c.fs);
      expect(scipy.pass, JSON.stringify(scipy.regions)).toBe(true);
      c.regions.forEach((want, i) => {
        const got = scipy.regions[i]!;
        // scipy.signal.freqz_zpk 1.17 on a dense grid: the mask's worst margin is no better than the grid's
        // extremes say, and no worse than a grid step can hide.
        const upper = want.kind === 'pass' ? c.rippleDb - want.maxDb : -c.attenuationDb - want.maxDb;
        const lower = want.minDb === undefined ? Infinity : want.minDb + c.rippleDb;
        const grid = Math.min(upper, lower);
        expect(got.worstMarginDb).toBeLessThanOrEqual(grid + 1e-9);
        expect(got.worstMarginDb).toBeGreaterThanOrEqual(grid - GRID_SLACK_DB);
      });
      // Ours, at the order scipy estimates (order 'auto' must find the same), passes the same mask.
      const ours = runDesigner({ kind: 'iir', family: c.family, order: 'auto', ...req });
      if (!ours.ok) throw new Error(ours.error.message);
      expect(ours.value.zpk.poles.reduce((n, p) => n + (p.im === 0 ? 1 : 2) * p.multiplicity, 0)).toBe(
        c.response === 'bandpass' ? 2 * c.order : c.order,
      );
      expect(evaluateMask(mask, ours.value.zpk, c.fs).pass).toBe(true);
    },
  );

  it('one order less than scipy estimates fails the same mask', () => {
    // scipy's order is the least that meets the specification, so order − 1 breaks a limit whatever its
    // edges: here the pass-band edges (the stop-band edges for Chebyshev II, whose edge is where it stops).
    for (const c of fx.designs.filter((d) => d.order > 1)) {
      const zpk = designIir({
        family: c.family,
        response: c.response,
        order: c.order - 1,
        edgesHz: c.family === 'chebyshev2' ? c.stopbandHz : c.passbandHz,
        fs: c.fs,
        rippleDb: c.rippleDb,
        attenuationDb: c.attenuationDb,
      });
      expect(evaluateMask(maskFromRequirement(c), zpk, c.fs).pass, `${c.family} ${c.response}`).toBe(false);
    }
  });

  it('a bump above the pass band fails against the ceiling, at the bump', () => {
    const b = fx.bump;
    const mask = maskFromRequirement({ ...b, response: 'lowpass' });
    const v = evaluateMask(mask, zpkOf(b), b.fs);
    expect(v.pass).toBe(false);
    const pass = v.regions.find((r) => r.id === 'pass')!;
    expect(pass.pass).toBe(false);
    expect(pass.limit).toBe('upper');
    expect(v.worstRegionId).toBe('pass');
    // scipy.signal.freqz_zpk 1.17, 20001 points over 0–120 Hz: peak +2.5998 dB at 81.996 Hz
    expectClose(pass.worstDb, b.pass.maxDb, { abs: GRID_SLACK_DB }, 'peak level');
    expectClose(pass.worstMarginDb, b.rippleDb - b.pass.maxDb, { abs: GRID_SLACK_DB }, 'margin');
    expectClose(pass.worstAtHz, b.peakAtHz, { abs: 0.05 }, 'peak place');
  });
});
