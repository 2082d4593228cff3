import { describe, it, expect } from 'vitest';
import { frequencyGrid, responseZpk } from '../../../src/core/response/index.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { DB_FLOOR_BELOW_PEAK } from '../../../src/views/chart/range.ts';
import {
  cursorStepsForKey,
  startHz,
  stepHz,
  CURSOR_STEPS_PER_AXIS,
} from '../../../src/views/frequency/cursor.ts';
import { frequencyLayout, type PlotRect } from '../../../src/views/frequency/layout.ts';
import {
  delaySeries,
  frequencyDomain,
  magnitudeSeries,
  phaseSeries,
} from '../../../src/views/frequency/series.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { omegaGridToHz } from '../../../src/core/units.ts';

// A zero exactly on the circle at DC (H = 1 − z^-1) and a resonant pole pair.
const zpk: Zpk = {
  zeros: [{ re: 1, im: 0, multiplicity: 1 }],
  poles: [{ re: 0.9 * Math.cos(1), im: 0.9 * Math.sin(1), multiplicity: 1 }],
  gain: 1,
};
const r = responseZpk(zpk, frequencyGrid(256));

describe('frequency plot series', () => {
  it('dB magnitude keeps −∞ at the exact zero but its axis stops at the floor below the peak', () => {
    expect(r.magnitudeDb[0]).toBe(-Infinity);
    const s = magnitudeSeries(r, 'db');
    expect(s.data[1] - s.data[0]).toBe(DB_FLOOR_BELOW_PEAK);
    expect(s.title).toMatch(/dB/);
  });
  it('linear magnitude starts at zero', () => {
    const s = magnitudeSeries(r, 'linear');
    expect(s.wanted[0]).toBe(0);
    expect(s.wanted[1]).toBeGreaterThanOrEqual(Math.max(...r.magnitude));
  });
  it('phase is in degrees: wrapped on ±180°, unwrapped on multiples of a degree step', () => {
    const w = phaseSeries(r, 'wrapped');
    expect(w.wanted).toEqual([-180, 180]);
    expectClose(w.scale, 180 / Math.PI, { rel: 1e-15 });
    const u = phaseSeries(r, 'unwrapped');
    expect(u.wanted[0] % 45).toBe(-0);
    expect(u.wanted[0]).toBeLessThanOrEqual(u.data[0]);
    expect(u.wanted[1]).toBeGreaterThanOrEqual(u.data[1]);
  });
  it('group delay in ms is samples × 1000 / fs', () => {
    const samples = delaySeries(r, 'samples', 8000);
    const ms = delaySeries(r, 'ms', 8000);
    expectClose(ms.data, [samples.data[0] * 0.125, samples.data[1] * 0.125], { rel: 1e-12 });
    expect(ms.title).toBe('Group delay (ms)');
    expect(ms.key).not.toBe(samples.key);
  });
  it('maps rad/sample to Hz and picks the frequency domain by axis kind', () => {
    const hz = omegaGridToHz(Float64Array.of(0, Math.PI / 2, Math.PI), 2000);
    expectClose(hz, [0, 500, 1000], { abs: 1e-12 });
    expect(frequencyDomain(hz, 2000, 'linear')).toEqual([0, 1000]);
    expect(frequencyDomain(hz, 2000, 'log')).toEqual([500, 1000]); // the lowest positive grid frequency
  });
});

describe('cross-hair keys', () => {
  it('maps arrows, Page keys and Home/End', () => {
    expect(cursorStepsForKey('ArrowRight', false)).toBe(1);
    expect(cursorStepsForKey('ArrowLeft', true)).toBe(-10);
    expect(cursorStepsForKey('Home', false)).toBe('start');
    expect(cursorStepsForKey('a', false)).toBeNull();
  });
  it('steps evenly in Hz on a linear axis and in ratio on a log axis, within the domain', () => {
    expectClose(stepHz(500, [0, 1000], 'linear', 1), 500 + 1000 / CURSOR_STEPS_PER_AXIS, { rel: 1e-12 });
    expectClose(stepHz(10, [1, 1000], 'log', CURSOR_STEPS_PER_AXIS / 3), 100, { rel: 1e-12 }); // a third of 3 decades
    expect(stepHz(999.9, [0, 1000], 'linear', 10)).toBe(1000);
    expect(stepHz(5, [0, 1000], 'linear', 'start')).toBe(0);
    expectClose(startHz([1, 10000], 'log'), 100, { rel: 1e-12 });
  });
});

describe('frequencyLayout', () => {
  const h = (p: { top: number; bottom: number }) => p.bottom - p.top;
  it('stacks magnitude over phase over group delay inside a tall box, magnitude the tallest', () => {
    const l = frequencyLayout(640, 420);
    expect(l.compact).toBe(false);
    expect(l.plots.map((p) => p.key)).toEqual(['magnitude', 'phase', 'delay']);
    const [m, p, d] = l.plots.map((x) => x.rect) as [PlotRect, PlotRect, PlotRect];
    expect(m.top).toBeGreaterThan(0);
    expect(m.bottom).toBeLessThan(p.top);
    expect(p.bottom).toBeLessThan(d.top);
    expect(d.bottom).toBeLessThan(420);
    expect(m.right).toBeLessThan(640);
    expect(h(m)).toBeGreaterThan(h(p));
    expect(Math.abs(h(p) - h(d))).toBeLessThanOrEqual(1);
  });
  it('in a short box shows magnitude and the one plot asked for, each still readable', () => {
    const l = frequencyLayout(520, 240, 'delay');
    expect(l.compact).toBe(true);
    expect(l.plots.map((p) => p.key)).toEqual(['magnitude', 'delay']);
    for (const p of l.plots) expect(h(p.rect)).toBeGreaterThanOrEqual(50);
  });
});
