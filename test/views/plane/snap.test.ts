import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  snapPoint,
  snapToFrequencyGrid,
  snapToRadius,
  type SnapSettings,
} from '../../../src/views/plane/snap.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const base: SnapSettings = { mode: 'none', radius: 0.9, frequencyHz: 50, sampleRate: 2000 };
const TOL = { abs: 1e-12 };

describe('snapToRadius', () => {
  it('keeps the angle and sets the radius', () => {
    const z = snapToRadius({ re: 0.3, im: 0.4 }, 1); // |z| = 0.5, angle atan2(4, 3)
    expectClose([z.re, z.im], [0.6, 0.8], TOL); // 3-4-5 triangle, common practice
  });
  it('sends the origin to +r on the real axis', () => {
    expect(snapToRadius({ re: 0, im: 0 }, 0.7)).toEqual({ re: 0.7, im: 0 });
  });
});

describe('snapToFrequencyGrid', () => {
  it('rounds the angle to the nearest step in Hz and keeps the radius', () => {
    // 2000 Hz sampling: 47 Hz rounds to 50 Hz, angle 2π·50/2000 = π/20.
    const w = (2 * Math.PI * 47) / 2000;
    const z = snapToFrequencyGrid({ re: 0.9 * Math.cos(w), im: 0.9 * Math.sin(w) }, 50, 2000);
    expectClose([z.re, z.im], [0.9 * Math.cos(Math.PI / 20), 0.9 * Math.sin(Math.PI / 20)], TOL);
  });
  it('works on the mirror half (negative imaginary part)', () => {
    const w = (2 * Math.PI * 160) / 2000;
    const z = snapToFrequencyGrid({ re: Math.cos(w), im: -Math.sin(w) }, 50, 2000);
    const ws = (2 * Math.PI * 150) / 2000;
    expectClose([z.re, z.im], [Math.cos(ws), -Math.sin(ws)], TOL);
  });
  it('never passes Nyquist even when the step does not divide fs/2', () => {
    const z = snapToFrequencyGrid({ re: -0.5, im: 0.01 }, 300, 2000); // 1000 Hz would round to 1200
    expect(Math.atan2(z.im, z.re)).toBeLessThanOrEqual(Math.PI);
    expectClose(Math.hypot(z.re, z.im), Math.hypot(-0.5, 0.01), { rel: 1e-12 });
    expectClose(Math.abs(Math.atan2(z.im, z.re)), Math.PI, { abs: 1e-12 });
  });
  it('lands on a multiple of the step for any point (seeded property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.integer({ min: 1, max: 200 }),
        (re, im, step) => {
          fc.pre(Math.hypot(re, im) > 1e-6);
          const z = snapToFrequencyGrid({ re, im }, step, 2000);
          const hz = (Math.abs(Math.atan2(z.im, z.re)) * 2000) / (2 * Math.PI);
          const onGrid = Math.abs(hz / step - Math.round(hz / step)) < 1e-6 || Math.abs(hz - 1000) < 1e-6;
          expect(onGrid).toBe(true);
          expectClose(Math.hypot(z.re, z.im), Math.hypot(re, im), { rel: 1e-12 });
        },
      ),
      { seed: 20240601, numRuns: 300 },
    );
  });
});

describe('snapPoint', () => {
  it('"none" leaves a pair where the pointer is and puts a real root on the axis', () => {
    expect(snapPoint({ re: 0.2, im: 0.3 }, base)).toEqual({ re: 0.2, im: 0.3 });
    expect(snapPoint({ re: 0.2, im: 0.3 }, base, true)).toEqual({ re: 0.2, im: 0 });
  });
  it('"circle" puts a pair on |z| = 1 and a real root at ±1', () => {
    const z = snapPoint({ re: 0.2, im: 0.3 }, { ...base, mode: 'circle' });
    expectClose(Math.hypot(z.re, z.im), 1, TOL);
    expectClose(z.im / z.re, 1.5, { rel: 1e-12 });
    expect(snapPoint({ re: -0.3, im: 0.5 }, { ...base, mode: 'circle' }, true)).toEqual({ re: -1, im: 0 });
  });
  it('"radius" uses the chosen radius; "real-axis" drops the imaginary part', () => {
    const z = snapPoint({ re: 0, im: 2 }, { ...base, mode: 'radius', radius: 0.95 });
    expectClose([z.re, z.im], [0, 0.95], TOL);
    expect(snapPoint({ re: 0.4, im: -0.7 }, { ...base, mode: 'real-axis' })).toEqual({ re: 0.4, im: 0 });
  });
  it('"frequency" leaves a real root alone on the axis', () => {
    expect(snapPoint({ re: 0.4, im: 0.2 }, { ...base, mode: 'frequency' }, true)).toEqual({ re: 0.4, im: 0 });
  });
});
