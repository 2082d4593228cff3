import { describe, expect, it } from 'vitest';
import {
  frequencyStep,
  frequencyStepHz,
  radiusStep,
  RADIUS_FROM_CIRCLE,
} from '../../../src/views/plane/nudge.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const step = (r: number, d: 'out' | 'in', fine = false) => {
  const m = radiusStep(r, d, fine);
  if (!m.ok) throw new Error(m.why);
  return m.radius;
};

describe('radius steps', () => {
  it('near the circle move a tenth (Shift: a hundredth) of the distance to it', () => {
    const r = 0.99372; // the hum notch's poles
    expectClose(1 - step(r, 'out'), (1 - r) / 1.1, { rel: 0.01 });
    expectClose(1 - step(r, 'in'), (1 - r) * 1.1, { rel: 0.01 });
    expectClose(1 - step(r, 'out', true), (1 - r) / 1.01, { rel: 0.001 });
  });

  it('never cross or reach the unit circle, however many presses, from inside or outside', () => {
    for (const start of [0.5, 0.9, 0.999, 1 - 1e-9, 1.5, 1.001, 1 + 1e-9]) {
      let r = start;
      const inside = start < 1;
      for (let i = 0; i < 2000; i++) {
        const m = radiusStep(r, inside ? 'out' : 'in', false);
        if (!m.ok) break; // as close as double precision allows
        expect(m.radius < 1).toBe(inside);
        expect(m.radius).not.toBe(1);
        r = m.radius;
      }
      expect(Math.abs(r - 1)).toBeLessThan(1e-12);
    }
  });

  it('steps a root outside the circle by the same rule on 1/r', () => {
    expectClose(step(1.25, 'in'), 1 / step(0.8, 'out'), { rel: 1e-15 });
    expectClose(step(1.25, 'out'), 1 / step(0.8, 'in'), { rel: 1e-15 });
  });

  it('moves a root on the circle inward only, and one at the origin outward only', () => {
    expect(step(1, 'in')).toBe(1 - RADIUS_FROM_CIRCLE);
    expect(step(1, 'in', true)).toBe(1 - RADIUS_FROM_CIRCLE / 10);
    const out = radiusStep(1, 'out', false);
    expect(out.ok).toBe(false);
    expect(out.ok ? '' : out.why).toMatch(/never takes a root across/);
    expect(step(0, 'out')).toBeGreaterThan(0);
    expect(radiusStep(0, 'in', false).ok).toBe(false);
    // Inward presses approach the origin and never go through it.
    let r = 0.5;
    for (let i = 0; i < 500; i++) r = step(r, 'in');
    expect(r).toBeGreaterThan(0);
    expect(r).toBeLessThan(1e-15);
  });
});

describe('frequency steps', () => {
  it('fit the sample rate: 0.1 Hz at 2 kHz, 1 Hz at 48 kHz; Shift a tenth', () => {
    expect(frequencyStepHz(2000, false)).toBeCloseTo(0.1, 15);
    expect(frequencyStepHz(2000, true)).toBeCloseTo(0.01, 15);
    expect(frequencyStepHz(48000, false)).toBeCloseTo(1, 15);
    expect(frequencyStepHz(44100, false)).toBeCloseTo(1, 15);
    expect(frequencyStepHz(1, false)).toBeCloseTo(1e-4, 18);
  });

  it('land on the step grid, one step per press, within 0…fs/2', () => {
    expectClose(frequencyStep(49.97, 'up', 0.1, 2000), 50, { rel: 1e-12 });
    expectClose(frequencyStep(50, 'up', 0.1, 2000), 50.1, { rel: 1e-12 });
    expectClose(frequencyStep(50.0000000001, 'up', 0.1, 2000), 50.1, { rel: 1e-12 });
    expectClose(frequencyStep(50.03, 'down', 0.1, 2000), 50, { rel: 1e-12 });
    expectClose(frequencyStep(50, 'down', 0.01, 2000), 49.99, { rel: 1e-12 });
    expect(frequencyStep(999.95, 'up', 0.1, 2000)).toBe(1000);
    expect(frequencyStep(0.05, 'down', 0.1, 2000)).toBe(0);
  });
});
