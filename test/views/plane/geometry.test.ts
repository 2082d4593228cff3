import { describe, it, expect } from 'vitest';
import {
  fitView,
  FIT_MIN_SPAN,
  HOME_VIEW,
  pixelToZ,
  planeScale,
  zoomAbout,
} from '../../../src/views/plane/geometry.ts';
import { frequencyRingTicks } from '../../../src/views/plane/frequencyRing.ts';
import { nudgeDelta, NUDGE_FINE_STEP, NUDGE_STEP } from '../../../src/views/plane/nudge.ts';
import { rootAriaLabel } from '../../../src/views/plane/rootLabel.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('planeScale', () => {
  it('shows span either side of the centre along the shorter side, with one scale for both axes', () => {
    const s = planeScale({ span: 1.3, centre: { re: 0, im: 0 } }, 800, 400);
    expectClose(s.k, 400 / 2.6, { rel: 1e-12 });
    expectClose([s.y(1.3), s.y(-1.3)], [0, 400], { abs: 1e-9 });
    expectClose(s.x(1) - s.x(0), s.y(0) - s.y(1), { abs: 1e-9 });
  });
  it('pixelToZ inverts the scale', () => {
    const s = planeScale({ span: 0.2, centre: { re: 0.9, im: 0.1 } }, 640, 480);
    const z = pixelToZ(s, s.x(0.95), s.y(0.02));
    expectClose([z.re, z.im], [0.95, 0.02], { abs: 1e-12 });
  });
});

describe('zoomAbout', () => {
  it('keeps the point under the pointer fixed', () => {
    const v0 = { span: 1.3, centre: { re: 0, im: 0 } };
    const at = { re: 0.8, im: 0.3 };
    const v1 = zoomAbout(v0, 0.5, at);
    expect(v1.span).toBeCloseTo(0.65, 12);
    const s0 = planeScale(v0, 500, 500);
    const s1 = planeScale(v1, 500, 500);
    expectClose([s1.x(at.re), s1.y(at.im)], [s0.x(at.re), s0.y(at.im)], { abs: 1e-9 });
  });
});

describe('fitView', () => {
  it('frames roots packed near z = 1 closely', () => {
    const v = fitView([
      { re: 0.99, im: 0.01 },
      { re: 0.99, im: -0.01 },
      { re: 0.98, im: 0 },
    ]);
    expect(v.span).toBeGreaterThanOrEqual(FIT_MIN_SPAN);
    expect(v.span).toBeLessThan(0.05);
    expectClose([v.centre.re, v.centre.im], [0.985, 0], { abs: 1e-12 });
  });
  it('falls back to the unit-circle view without roots', () => {
    expect(fitView([])).toEqual(HOME_VIEW);
  });
});

describe('frequencyRingTicks', () => {
  it('gives round values from DC to Nyquist, Nyquist at angle π', () => {
    const t = frequencyRingTicks(2000, 5);
    expect(t.map((x) => x.hz)).toEqual([0, 200, 400, 600, 800, 1000]); // d3.ticks(0, 1000, 5), d3-array 3
    expectClose(t[t.length - 1]!.angle, Math.PI, { abs: 1e-15 });
  });
  it('drops a round tick that would crowd the Nyquist label', () => {
    const hz = frequencyRingTicks(44100, 6).map((x) => x.hz);
    expect(hz).toEqual([0, 5000, 10000, 15000, 22050]); // 20000 is too close to 22050
  });
});

describe('nudgeDelta and the root labels', () => {
  it('steps by the stated amounts', () => {
    expect(nudgeDelta('ArrowRight', false)).toEqual({ dre: NUDGE_STEP, dim: 0 });
    expect(nudgeDelta('ArrowDown', true)).toEqual({ dre: 0, dim: -NUDGE_FINE_STEP });
    expect(nudgeDelta('a', false)).toBeNull();
  });
  it('reads a pair by frequency and radius', () => {
    const w = (2 * Math.PI * 50) / 2000;
    const label = rootAriaLabel(
      'pole',
      { re: 0.99 * Math.cos(w), im: 0.99 * Math.sin(w), multiplicity: 1 },
      2000,
    );
    expect(label).toBe('Pole pair at 50 Hz, radius 0.99, multiplicity 1');
    expect(rootAriaLabel('zero', { re: -1, im: 0, multiplicity: 2 }, 2000)).toBe(
      'Real zero at z = −1, multiplicity 2',
    );
  });
});
