import { describe, it, expect } from 'vitest';
import {
  formatHzTick,
  formatTickValue,
  linearTicks,
  logTicks,
  spacedTicks,
} from '../../../src/views/chart/ticks.ts';

describe('linearTicks', () => {
  it('puts ticks on 1-2-5 steps inside the range', () => {
    // 0…1000 Hz with about 5 ticks: a step of 200 (common practice: 1, 2, 5 × 10^k steps)
    const t = linearTicks(0, 1000, 5);
    expect(t.map((x) => x.value)).toEqual([0, 200, 400, 600, 800, 1000]);
    expect(t.map((x) => x.label)).toEqual(['0', '200', '400', '600', '800', '1000']);
  });
  it('labels with only the decimals the step needs, and a true minus sign', () => {
    const t = linearTicks(-0.5, 0.5, 4);
    expect(t.map((x) => x.label)).toEqual(['−0.4', '−0.2', '0', '0.2', '0.4']);
  });
  it('uses the formatter it is given', () => {
    expect(linearTicks(0, 2000, 4, (v) => formatHzTick(v)).map((x) => x.label)).toEqual([
      '0',
      '500',
      '1k',
      '1.5k',
      '2k',
    ]);
  });
  it('gives nothing for an empty or non-finite range', () => {
    expect(linearTicks(1, 1, 5)).toEqual([]);
    expect(linearTicks(0, Infinity, 5)).toEqual([]);
  });
});

describe('formatTickValue', () => {
  it('prints a tiny rounding residue as 0', () => {
    expect(formatTickValue(1e-17, 0.1)).toBe('0');
    expect(formatTickValue(0.30000000000000004, 0.1)).toBe('0.3');
  });
});

describe('logTicks', () => {
  it('labels decades and marks 2…9 as grid lines over a wide span', () => {
    const t = logTicks(1, 1000, 4);
    expect(t.filter((x) => x.label).map((x) => x.label)).toEqual(['1', '10', '100', '1k']);
    expect(t.length).toBe(28); // 9 per decade × 3 decades + the closing 1000
  });
  it('labels 2 and 5 too when the span is narrow', () => {
    const t = logTicks(10, 1000, 8);
    expect(t.filter((x) => x.label).map((x) => x.label)).toEqual([
      '10',
      '20',
      '50',
      '100',
      '200',
      '500',
      '1k',
    ]);
  });
  it('stays within the range', () => {
    const t = logTicks(0.3, 70);
    expect(Math.min(...t.map((x) => x.value))).toBeGreaterThanOrEqual(0.3);
    expect(Math.max(...t.map((x) => x.value))).toBeLessThanOrEqual(70);
  });
});

describe('spacedTicks', () => {
  it('thins the ticks until the labels are far enough apart', () => {
    // 120 dB over 100 px with labels ≥ 24 px apart: 20 dB steps would be 16.7 px, so 50 dB steps.
    const t = spacedTicks(-120, 0, 100, 24);
    expect(t.map((x) => x.value)).toEqual([-100, -50, 0]);
    // Given room, it keeps the finer step.
    expect(spacedTicks(-120, 0, 400, 24).map((x) => x.value)).toContain(-20);
  });
});
