import { describe, it, expect } from 'vitest';
import { samplesRule, sineHzRule } from '../../../src/views/time/bounds.ts';
import { readNumberField, type NumberFieldRule } from '../../../src/views/shared/fieldReading.ts';
import { HZ_FIELD_CASES, NO_UNIT_CASES, expectNumberPolicy } from '../../helpers/numberPolicy.ts';
import { TIME_SAMPLES_MAX, TIME_SAMPLES_MIN } from '../../../src/core/model/limits.ts';
import { timeLayout, timeUnit } from '../../../src/views/time/layout.ts';
import { sampleAfterKey } from '../../../src/views/time/sampleKeys.ts';

describe('time view fields', () => {
  const read = (rule: NumberFieldRule) => (text: string) => readNumberField(text, rule);
  it('N samples reads typed numbers by the policy and keeps a whole number within bounds', () => {
    const admissible = (x: number) => Number.isInteger(x) && x >= TIME_SAMPLES_MIN && x <= TIME_SAMPLES_MAX;
    expectNumberPolicy({ read: read(samplesRule), admissible }, NO_UNIT_CASES.slice(1));
    expect(read(samplesRule)('1024')).toEqual({ ok: true, value: 1024 });
    expect(read(samplesRule)('1024 samples')).toEqual({ ok: true, value: 1024 });
    const big = read(samplesRule)(String(TIME_SAMPLES_MAX + 1));
    expect(!big.ok && big.message).toMatch(/65536/);
    expect(read(samplesRule)('12.5')).toEqual({ ok: false, message: 'Use a whole number of samples' });
  });
  it('the sine frequency reads typed numbers and Hz by the policy, from 0 to Nyquist', () => {
    const admissible = (x: number) => x >= 0 && x <= 1000;
    expectNumberPolicy({ read: read(sineHzRule(2000)), admissible }, HZ_FIELD_CASES);
    const over = read(sineHzRule(2000))('1000.5');
    expect(!over.ok && over.message).toMatch(/1000 Hz/);
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
