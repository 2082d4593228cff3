import { describe, it, expect } from 'vitest';
import { CLIP_OVERSHOOT_PX, dotsPath, linePath, stemsPath } from '../../../src/views/chart/paths.ts';
import { fromPixel, toPixel, toPixels, type AxisMap } from '../../../src/views/chart/pixels.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** The (x, y) points of a path made of M/L commands, with the command letter. */
function commands(d: string): { c: string; x: number; y: number }[] {
  return [...d.matchAll(/([ML])(-?[\d.]+) (-?[\d.]+)/g)].map((m) => ({
    c: m[1]!,
    x: Number(m[2]),
    y: Number(m[3]),
  }));
}

describe('linePath', () => {
  const band = { top: 10, bottom: 110 };
  it('draws one sub-path through every point', () => {
    const d = linePath([0, 1, 2], [20, 30, 40], band);
    expect(d).toBe('M0 20L1 30L2 40');
  });
  it('clamps ±∞ (e.g. −∞ dB at an exact notch) just past the plot edges', () => {
    const pts = commands(linePath([0, 1, 2], [50, Infinity, -Infinity], band));
    expect(pts.map((p) => p.y)).toEqual([50, band.bottom + CLIP_OVERSHOOT_PX, band.top - CLIP_OVERSHOOT_PX]);
  });
  it('breaks at NaN and at jumps larger than maxJumpPx', () => {
    expect(linePath([0, 1, 2, 3], [20, NaN, 30, 31], band)).toBe('M0 20M2 30L3 31');
    expect(linePath([0, 1, 2], [20, 100, 101], { ...band, maxJumpPx: 50 })).toBe('M0 20M1 100L2 101');
  });
  it('thins dense data to the lowest and highest point per pixel column and keeps a one-point notch', () => {
    // 1000 points over 10 pixel columns, with a single deep point in column 4.
    const n = 1000;
    const x = new Float64Array(n);
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      x[i] = (i / n) * 10;
      y[i] = 20 + (i % 7);
    }
    y[437] = 105;
    const pts = commands(linePath(x, y, { ...band, thin: true }));
    expect(pts.length).toBeLessThanOrEqual(2 * 11);
    expect(Math.max(...pts.map((p) => p.y))).toBe(105);
    // x stays in order: the thinned line never doubles back.
    for (let i = 1; i < pts.length; i++) expect(pts[i]!.x).toBeGreaterThanOrEqual(pts[i - 1]!.x);
    const unthinned = commands(linePath(x, y, band));
    expect(unthinned.length).toBe(n);
  });
});

describe('stemsPath and dotsPath', () => {
  it('draws every stem from the baseline in one path', () => {
    expect(stemsPath([1, 2], [5, 30], 20, 0, 100)).toBe('M1 20V5M2 20V30');
  });
  it('builds 1024 stems as one string of 1024 moves', () => {
    const n = 1024;
    const d = stemsPath(
      Float64Array.from({ length: n }, (_, i) => i),
      new Float64Array(n),
      50,
      0,
      100,
    );
    expect(d.split('M').length - 1).toBe(n);
  });
  it('leaves out dots outside the plot', () => {
    const d = dotsPath([1, 2], [50, 500], 2, 0, 100);
    expect(d.split('M').length - 1).toBe(1);
  });
});

describe('pixel maps', () => {
  const lin: AxisMap = { kind: 'linear', d0: 0, d1: 1000, p0: 50, p1: 550 };
  const log: AxisMap = { kind: 'log', d0: 1, d1: 1000, p0: 0, p1: 300 };
  it('maps and inverts linear and log axes', () => {
    expectClose(toPixel(lin, 250), 175, { abs: 1e-12 });
    expectClose(toPixel(log, 10), 100, { abs: 1e-9 }); // one decade of three = one third
    expectClose(fromPixel(log, 200), 100, { rel: 1e-12 });
    expectClose(fromPixel(lin, toPixel(lin, 123.4)), 123.4, { rel: 1e-12 });
  });
  it('maps arrays with a unit factor, and non-positive values on a log axis to NaN', () => {
    expectClose(toPixels(lin, [0.5], 1000), [300], { abs: 1e-9 }); // 500 of 1000 → halfway from 50 to 550
    const p = toPixels(log, [0, 100]);
    expect(Number.isNaN(p[0]!)).toBe(true);
    expectClose(p[1]!, 200, { abs: 1e-9 });
  });
});

describe('stemsPath thinning', () => {
  it('merges the stems of one pixel column into one segment that covers them and the baseline', () => {
    // Four samples in column 3 (x 2.6…3.4), one in column 5; baseline at y = 50.
    const d = stemsPath([2.6, 2.9, 3.1, 3.4, 5], [40, 70, 45, 52, 10], 50, 0, 100, true);
    expect(d).toBe('M3 40V70M5 10V50');
  });
});
