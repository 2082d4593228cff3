import { describe, it, expect } from 'vitest';
import { checkSamples, checkSineHz } from '../../../src/views/time/bounds.ts';
import { TIME_SAMPLES_MAX, TIME_SAMPLES_MIN } from '../../../src/core/model/limits.ts';
import { timeLayout, timeUnit } from '../../../src/views/time/layout.ts';
import { sampleAfterKey } from '../../../src/views/time/sampleKeys.ts';

describe('time view fields', () => {
  it('accepts a whole number of samples within bounds and explains anything else', () => {
    expect(checkSamples('1024')).toEqual({ ok: true, value: 1024 });
    expect(checkSamples(String(TIME_SAMPLES_MIN))).toEqual({ ok: true, value: TIME_SAMPLES_MIN });
    const big = checkSamples(String(TIME_SAMPLES_MAX + 1));
    expect(big.ok).toBe(false);
    expect(!big.ok && big.message).toMatch(/65536/);
    expect(checkSamples('12.5').ok).toBe(false);
    expect(checkSamples('lots').ok).toBe(false);
  });
  it('accepts a sine frequency from 0 to Nyquist', () => {
    expect(checkSineHz('50', 2000)).toEqual({ ok: true, value: 50 });
    expect(checkSineHz('1000', 2000).ok).toBe(true);
    const over = checkSineHz('1000.5', 2000);
    expect(!over.ok && over.message).toMatch(/1000 Hz/);
    expect(checkSineHz('-1', 2000).ok).toBe(false);
  });
  it('picks s, ms or µs for the seconds axis', () => {
    expect(timeUnit(0.128).unit).toBe('ms');
    expect(timeUnit(30).unit).toBe('s');
    expect(timeUnit(1e-4)).toEqual({ unit: 'µs', factor: 1e6 });
  });
  it('keeps the plot inside its box', () => {
    const r = timeLayout(500, 300);
    expect(r.left).toBeGreaterThan(0);
    expect(r.right).toBeLessThan(500);
    expect(r.bottom).toBeLessThan(300);
    expect(r.top).toBeLessThan(r.bottom);
  });
});

describe('sampleAfterKey', () => {
  it('moves one sample per arrow, ten with Shift, and stays within 0…n−1', () => {
    expect(sampleAfterKey('ArrowRight', false, 5, 256)).toBe(6);
    expect(sampleAfterKey('ArrowLeft', true, 5, 256)).toBe(0);
    expect(sampleAfterKey('PageUp', false, 250, 256)).toBe(255);
    expect(sampleAfterKey('End', false, null, 256)).toBe(255);
    expect(sampleAfterKey('ArrowRight', false, null, 256)).toBe(1);
    expect(sampleAfterKey('x', false, 3, 256)).toBeUndefined();
  });
});
