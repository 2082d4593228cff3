import { describe, it, expect } from 'vitest';
import {
  evalZpkAt,
  frequencyGrid,
  groupDelaySeconds,
  responseAt,
  responseSections,
  refineAtRoots,
  responseZpk,
  wrapPhase,
} from '../../../src/core/response/index.ts';
import { zpkToSections } from '../../../src/core/system/index.ts';
import type { Root, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface FilterCase {
  name: string;
  zeros: Root[];
  poles: Root[];
  gain: number;
  omega: number[];
  re: number[];
  im: number[];
  magnitude_db: number[];
  phase: number[];
  phase_unwrapped: number[];
  sos_magnitude: number[];
  group_delay: number[];
  max_pole_radius: number;
}
interface TrapCase extends FilterCase {
  exact_max_radius: number;
  log_omega: number[];
  log_magnitude_db: number[];
}
interface OnCircle {
  zeros: Root[];
  poles: Root[];
  gain: number;
  omega: number[];
  re: number[];
  im: number[];
  group_delay: (number | null)[]; // null where scipy's own error bound leaves fewer than 4 digits
  group_delay_mp: number[];
}

const filters = loadFixture<FilterCase[]>('response_filters');
const trap = loadFixture<TrapCase>('response_trap');
const onCircle = loadFixture<OnCircle>('response_on_circle');
const zpkOf = (c: { zeros: Root[]; poles: Root[]; gain: number }): Zpk => ({
  zeros: c.zeros,
  poles: c.poles,
  gain: c.gain,
});
const hasZerosOnCircle = (c: FilterCase) => c.zeros.some((z) => Math.abs(Math.hypot(z.re, z.im) - 1) < 1e-9);

describe('responseZpk against scipy', () => {
  for (const c of [...filters, trap]) {
    describe(c.name, () => {
      const h = responseZpk(zpkOf(c), Float64Array.from(c.omega));
      it('complex response matches scipy freqz_zpk', () => {
        const mag = c.re.map((r, i) => Math.hypot(r, c.im[i]!));
        expectClose(h.magnitude, mag, { rel: 1e-9 }, '|H|'); // scipy.signal.freqz_zpk 1.17
        expectClose(h.magnitudeDb, c.magnitude_db, { abs: 1e-8 }, 'dB'); // scipy.signal.freqz_zpk 1.17
        const scale = Math.max(...mag);
        expectClose(h.re, c.re, { abs: 1e-9 * scale, rel: 1e-8 }, 're'); // scipy.signal.freqz_zpk 1.17
        expectClose(h.im, c.im, { abs: 1e-9 * scale, rel: 1e-8 }, 'im'); // scipy.signal.freqz_zpk 1.17
      });
      it('wrapped phase matches scipy (numpy.angle of freqz_zpk)', () => {
        const d = Array.from(h.phase, (p, i) => wrapPhase(p - c.phase[i]!));
        expectClose(d, new Array<number>(d.length).fill(0), { abs: 1e-7 }, 'phase'); // scipy.signal.freqz_zpk 1.17
      });
      it('unwrapped phase matches numpy.unwrap on a 64x finer grid (no on-circle zeros)', () => {
        if (hasZerosOnCircle(c)) {
          // numpy.unwrap cannot tell a +pi jump from a -pi jump at an exact zero; check consistency instead.
          const d = Array.from(h.phaseUnwrapped, (p, i) => wrapPhase(p - c.phase[i]!));
          expectClose(d, new Array<number>(d.length).fill(0), { abs: 1e-7 }, 'unwrapped vs wrapped');
          return;
        }
        expectClose(h.phaseUnwrapped, c.phase_unwrapped, { abs: 1e-7 }, 'unwrapped'); // numpy.unwrap 2.4
      });
      it('group delay matches the sum of scipy group_delay over its sections', () => {
        expectClose(h.groupDelay, c.group_delay, { rel: 1e-7, abs: 1e-7 }, 'tau'); // scipy.signal.group_delay 1.17
      });
      it('magnitude from sections matches scipy sosfreqz', () => {
        const hs = responseSections(zpkToSections(zpkOf(c)), Float64Array.from(c.omega));
        expectClose(hs.magnitude, c.sos_magnitude, { rel: 1e-9 }, '|H| sections'); // scipy.signal.sosfreqz 1.17
      });
    });
  }
});

describe('the expanded-polynomial trap (8th-order Butterworth, 10 Hz at 8 kHz)', () => {
  it('the expanded denominator, rounded to doubles, has a root outside the circle; the true poles are inside', () => {
    expect(trap.exact_max_radius).toBeGreaterThan(1.005); // mpmath 1.3 polyroots (80 digits) of scipy zpk2tf's a
    expectClose(trap.max_pole_radius, 0.99847, { abs: 1e-5 }); // scipy.signal.butter 1.17
  });
  it('the product form reports the true magnitude on a log grid from 1 Hz to 100 Hz', () => {
    const h = responseZpk(zpkOf(trap), Float64Array.from(trap.log_omega));
    expectClose(h.magnitudeDb, trap.log_magnitude_db, { abs: 1e-9 }, 'dB'); // scipy.signal.freqz_zpk 1.17
    // -3 dB at the 10 Hz cutoff (common practice for Butterworth)
    expectClose(
      20 * Math.log10(Math.hypot(...Object.values(responseAt(zpkOf(trap), (2 * Math.PI * 10) / 8000)))),
      -3.0103,
      {
        abs: 1e-3,
      },
    );
  });
});

describe('zeros on the unit circle and a pole pair next to it', () => {
  const zpk = zpkOf(onCircle);
  const h = responseZpk(zpk, Float64Array.from(onCircle.omega));
  const t = Math.PI / 4;
  it('complex response matches scipy freqz_zpk, exactly 0 at the zeros', () => {
    expectClose(h.re, onCircle.re, { abs: 1e-12, rel: 1e-9 }, 're'); // scipy.signal.freqz_zpk 1.17
    expectClose(h.im, onCircle.im, { abs: 1e-12, rel: 1e-9 }, 'im'); // scipy.signal.freqz_zpk 1.17
    expect(h.magnitude[2]).toBeLessThan(1e-15);
    expect(h.magnitudeDb[11]).toBeLessThan(-250);
  });
  it('group delay matches a 60-digit evaluation of the product form everywhere', () => {
    // mpmath 1.3 central difference of arg H, roots within 1e-15 of radius 1 put on the circle
    expectClose(h.groupDelay, onCircle.group_delay_mp, { rel: 1e-9 }, 'tau');
  });
  it('group delay matches scipy group_delay where scipy is reliable (1e-3 and more from a zero on the circle)', () => {
    const kept = onCircle.group_delay.flatMap((g, i) => (g === null ? [] : [i]));
    expect(kept).toEqual([0, 4, 5, 6, 7, 8, 9]); // scipy's error bound drops the points within 1e-6 of a zero
    const ours = kept.map((i) => h.groupDelay[i]!);
    expectClose(
      ours,
      kept.map((i) => onCircle.group_delay[i]!),
      { rel: 1e-8 },
      'tau',
    ); // scipy.signal.group_delay 1.17
  });
  it('at a zero on the circle the group delay is the two-sided limit', () => {
    // scipy's value there is noise (1e13..1e15); the mpmath truth checks ours at every point above
    expectClose(h.groupDelay[2]!, (h.groupDelay[1]! + h.groupDelay[3]!) / 2, { rel: 1e-8 });
    expectClose(h.groupDelay[11]!, h.groupDelay[10]!, { rel: 1e-9 });
  });
  it('unwrapped phase jumps by +pi across each zero on the circle and is continuous elsewhere', () => {
    const grid = Float64Array.from([t - 1e-9, t + 1e-9, 1.2 - 1e-9, 1.2 + 1e-9]);
    const p = responseZpk(zpk, grid).phaseUnwrapped;
    expectClose(p[1]! - p[0]!, Math.PI, { abs: 1e-6 }, 'jump'); // common practice: sign change of (ω − θ)
    expectClose(p[3]! - p[2]!, 0, { abs: 1e-6 }, 'no jump');
  });
  it('group delay right next to a zero on the circle stays at the analytic value (no blow-up)', () => {
    // Only zeros at radius exactly 1 nearby: each contributes -1/2 sample, so tau is smooth across t.
    const near = Float64Array.from([t - 1e-12, t, t + 1e-12]);
    const g = responseZpk(zpk, near).groupDelay;
    expectClose(g[0]!, g[1]!, { rel: 1e-9 });
    expectClose(g[2]!, g[1]!, { rel: 1e-9 });
  });
});

describe('gain convention with unequal zero and pole counts', () => {
  it('1/(z - 0.5) has one sample of extra delay compared with z/(z - 0.5)', () => {
    // common practice: H(z) = 1/(z - a) = z^-1/(1 - a z^-1)
    const w = Float64Array.from([0.3, 1.1]);
    const onePole: Zpk = { zeros: [], poles: [{ re: 0.5, im: 0, multiplicity: 1 }], gain: 1 };
    const withZero: Zpk = { ...onePole, zeros: [{ re: 0, im: 0, multiplicity: 1 }] };
    const a = responseZpk(onePole, w);
    const b = responseZpk(withZero, w);
    expectClose(
      a.groupDelay,
      Array.from(b.groupDelay, (v) => v + 1),
      { abs: 1e-14 },
    );
    const direct = responseAt(onePole, 1.1);
    const zr = Math.cos(1.1) - 0.5;
    const zi = Math.sin(1.1);
    expectClose([direct.re, direct.im], [zr / (zr * zr + zi * zi), -zi / (zr * zr + zi * zi)], {
      rel: 1e-14,
    });
  });
  it('a negative gain adds pi to the phase', () => {
    const w = Float64Array.from([0, 0.5]);
    const pos = responseZpk({ zeros: [], poles: [{ re: 0.2, im: 0.3, multiplicity: 1 }], gain: 1 }, w);
    const neg = responseZpk({ zeros: [], poles: [{ re: 0.2, im: 0.3, multiplicity: 1 }], gain: -1 }, w);
    expectClose(
      Array.from(neg.phase, (p, i) => wrapPhase(p - pos.phase[i]! - Math.PI)),
      [0, 0],
      { abs: 1e-14 },
    );
    expectClose(
      neg.re,
      Array.from(pos.re, (v) => -v),
      { abs: 1e-15 },
    );
  });
});

describe('responseZpk invariants', () => {
  it('agrees with evalZpkAt and with a numerical derivative of its own phase', () => {
    const zpk: Zpk = {
      zeros: [
        { re: 1.3, im: 0, multiplicity: 1 },
        { re: -0.4, im: 1.1, multiplicity: 2 },
      ],
      poles: [
        { re: 0.5, im: 0.6, multiplicity: 2 },
        { re: -0.95, im: 0, multiplicity: 1 },
        { re: 0.1, im: 0, multiplicity: 1 },
      ],
      gain: -0.7,
    };
    const w = frequencyGrid(301);
    const h = responseZpk(zpk, w);
    w.forEach((om, i) => {
      const p = evalZpkAt(zpk, Math.cos(om), Math.sin(om));
      expectClose([h.re[i]!, h.im[i]!], [p.re, p.im], { abs: 1e-12, rel: 1e-12 }, `H at ${om}`);
    });
    const d = 1e-6;
    for (const om of [0.2, 1.0, 2.5]) {
      const r = responseZpk(zpk, Float64Array.from([om - d, om, om + d]));
      const numeric = -(r.phaseUnwrapped[2]! - r.phaseUnwrapped[0]!) / (2 * d);
      expectClose(r.groupDelay[1]!, numeric, { rel: 1e-6 }, `tau at ${om}`);
    }
    // unwrapped phase: continuous (steps well below pi on this grid) and starting in (-pi, pi]
    for (let i = 1; i < w.length; i++)
      expect(Math.abs(h.phaseUnwrapped[i]! - h.phaseUnwrapped[i - 1]!)).toBeLessThan(1);
    expect(Math.abs(h.phaseUnwrapped[0]!)).toBeLessThanOrEqual(Math.PI);
  });
});

describe('frequencyGrid and groupDelaySeconds', () => {
  it('linear grid runs from 0 to pi inclusive', () => {
    const g = frequencyGrid(5);
    expectClose(g, [0, Math.PI / 4, Math.PI / 2, (3 * Math.PI) / 4, Math.PI], { abs: 1e-15 });
  });
  it('log grid is geometric from fMin to pi', () => {
    const g = frequencyGrid(4, { log: true, fMin: Math.PI / 1000 });
    expectClose(g, [Math.PI / 1000, Math.PI / 100, Math.PI / 10, Math.PI], { rel: 1e-12 });
    expect(() => frequencyGrid(4, { log: true, fMin: 0 })).toThrow(/log grid/);
  });
  it('converts samples to seconds', () => {
    expectClose(groupDelaySeconds(Float64Array.from([48, 4.8]), 48000), [1e-3, 1e-4], { rel: 1e-15 });
  });
});

describe('frequencyGrid on a band (a zoomed view)', () => {
  it('puts every point inside the band, ends exact, steps even', () => {
    const lo = (2 * Math.PI * 49.99) / 2000;
    const hi = (2 * Math.PI * 50.01) / 2000;
    const g = frequencyGrid(101, { fMin: lo, fMax: hi });
    expect(g[0]).toBe(lo);
    expect(g[100]).toBe(hi);
    for (let i = 1; i < g.length; i++) expectClose(g[i]! - g[i - 1]!, (hi - lo) / 100, { rel: 1e-9 });
    const lg = frequencyGrid(50, { log: true, fMin: 0.01, fMax: 0.1 });
    expect(lg[0]).toBe(0.01);
    expect(lg[49]).toBe(0.1);
    expectClose(lg[1]! / lg[0]!, lg[49]! / lg[48]!, { rel: 1e-12 });
  });

  it('refuses a band outside [0, π] or empty', () => {
    expect(() => frequencyGrid(4, { fMin: 1, fMax: 1 })).toThrow(RangeError);
    expect(() => frequencyGrid(4, { fMax: 4 })).toThrow(RangeError);
    expect(() => frequencyGrid(4, { log: true, fMin: 0, fMax: 1 })).toThrow(RangeError);
  });

  it('evaluates a 4 Hz-wide 50 Hz notch at fs = 2 kHz within ±0.01 Hz, matching direct evaluation of b/a', () => {
    // The 50 Hz notch with a −3 dB width of 4 Hz: zeros on the circle at ±w0, poles at radius
    // r = 1 − Δω/2 with Δω = 2π·4/2000 (the narrow-notch width relation, common practice).
    const fs = 2000;
    const w0 = (2 * Math.PI * 50) / fs;
    const r = 1 - (2 * Math.PI * 4) / fs / 2;
    const zpk: Zpk = {
      zeros: [{ re: Math.cos(w0), im: Math.sin(w0), multiplicity: 1 }],
      poles: [{ re: r * Math.cos(w0), im: r * Math.sin(w0), multiplicity: 1 }],
      gain: 1,
    };
    const lo = (2 * Math.PI * 49.99) / fs;
    const hi = (2 * Math.PI * 50.01) / fs;
    const resp = refineAtRoots(zpk, responseZpk(zpk, frequencyGrid(201, { fMin: lo, fMax: hi })));
    // b = [1, −2cos w0, 1], a = [1, −2r cos w0, r²], evaluated at e^{jω} by complex Horner in z⁻¹.
    const b = [1, -2 * Math.cos(w0), 1];
    const a = [1, -2 * r * Math.cos(w0), r * r];
    const at = (c: number[], w: number) => {
      let re = 0;
      let im = 0;
      for (const k of [2, 1, 0]) {
        // (re + j·im)·e^{−jω} + c[k]
        const nr = re * Math.cos(w) + im * Math.sin(w) + c[k]!;
        const ni = im * Math.cos(w) - re * Math.sin(w);
        re = nr;
        im = ni;
      }
      return Math.hypot(re, im);
    };
    let deepest = Infinity;
    for (let i = 0; i < resp.omega.length; i++) {
      const w = resp.omega[i]!;
      expect(w).toBeGreaterThanOrEqual(lo);
      expect(w).toBeLessThanOrEqual(hi);
      const direct = at(b, w) / at(a, w);
      // Next to a zero on the circle b/a loses digits to cancellation (about eps/|b|); the product form not.
      if (Math.abs(w - w0) > 1e-9) expectClose(resp.magnitude[i]!, direct, { rel: 1e-7 });
      deepest = Math.min(deepest, resp.magnitudeDb[i]!);
    }
    // The exact root angle is one of the points: the notch floor itself, not a shallow dip.
    expect(deepest).toBeLessThan(-250);
    // ±0.01 Hz from the notch: |H| ≈ 0.01/2 (half-width 2 Hz), about −46 dB (narrow-notch model, common practice).
    expectClose(resp.magnitudeDb[0]!, 20 * Math.log10(0.01 / 2), { abs: 0.1 });
  });
});
