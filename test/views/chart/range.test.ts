import { describe, it, expect } from 'vitest';
import {
  DB_FLOOR_BELOW_PEAK,
  dbExtent,
  dbRange,
  finiteExtent,
  settleRange,
  type Range,
} from '../../../src/views/chart/range.ts';

describe('finiteExtent', () => {
  it('ignores NaN and infinities', () => {
    expect(finiteExtent([3, NaN, -Infinity, -2, Infinity, 7])).toEqual([-2, 7]);
    expect(finiteExtent([NaN, Infinity])).toBeNull();
  });
});

describe('dbRange', () => {
  it('clips an exact notch (−∞ dB) to the floor below the peak', () => {
    const db = Float64Array.of(0, -3, -Infinity, -6);
    expect(dbExtent(db)).toEqual([-DB_FLOOR_BELOW_PEAK, 0]);
    const [lo, hi] = dbRange(db);
    expect(hi).toBe(0);
    expect(lo).toBeGreaterThanOrEqual(-DB_FLOOR_BELOW_PEAK - 20);
    expect(lo).toBeLessThanOrEqual(-DB_FLOOR_BELOW_PEAK);
  });
  it('follows shallow data closely with nice ends', () => {
    const [lo, hi] = dbRange(Float64Array.of(-0.5, -37, 2.2));
    expect(lo).toBe(-40);
    expect(hi).toBe(10);
  });
  it('does not add an empty step above a peak that barely passes 0 dB', () => {
    const db = Float64Array.of(0.01, -3, -Infinity);
    expect(dbRange(db)[1]).toBe(0);
    expect(dbRange(Float64Array.of(0.8, -30))[1]).toBeGreaterThanOrEqual(0.8); // a real overshoot still fits
  });
  it('keeps a flat response readable (at least 12 dB tall)', () => {
    const [lo, hi] = dbRange(Float64Array.of(0, 0, 0));
    expect(hi - lo).toBeGreaterThanOrEqual(12);
    expect(lo).toBeLessThan(0);
    expect(hi).toBeGreaterThan(0);
  });
  it('survives an all-zero magnitude', () => {
    expect(dbRange(Float64Array.of(-Infinity, -Infinity))).toEqual([-120, 0]);
  });
});

describe('settleRange', () => {
  const cur: Range = [-60, 0];
  it('keeps the same range object while the data still fits well', () => {
    expect(settleRange(cur, [-50, -2], [-50, 0])).toBe(cur);
  });
  it('grows at once when the data leaves the range', () => {
    expect(settleRange(cur, [-70, -2], [-80, 0])).toEqual([-80, 0]);
    expect(settleRange(cur, [-50, 3], [-50, 10])).toEqual([-50, 10]);
  });
  it('shrinks only once the data has become much smaller', () => {
    expect(settleRange(cur, [-35, -1], [-40, 0])).toBe(cur); // 40 of 60: keep
    expect(settleRange(cur, [-18, -1], [-20, 0])).toEqual([-20, 0]); // 20 of 60: shrink
  });
  it('holds still when asked, and starts from the wanted range', () => {
    expect(settleRange(cur, [-300, 50], [-300, 50], true)).toBe(cur);
    expect(settleRange(null, [-3, 1], [-4, 2], true)).toEqual([-4, 2]);
  });
  it('never oscillates: settling twice on the same data is a fixed point', () => {
    const data: Range = [-18, -1];
    const once = settleRange(cur, data, [-20, 0]);
    expect(settleRange(once, data, [-20, 0])).toBe(once);
  });
});
