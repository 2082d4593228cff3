import { describe, expect, it } from 'vitest';
import { linearScale, niceDomain } from '../../../src/views/chart/linearScale.ts';

describe('niceDomain', () => {
  // d3-scale 4.0.3: scaleLinear().domain([a, b]).nice(count).domain(), computed with it before the page
  // dropped that package.
  it.each([
    [0, 1, 5, [0, 1]],
    [-3.7, 12.2, 5, [-5, 15]],
    [-123.4, 7.01, 4, [-150, 50]],
    [0.00123, 0.0456, 6, [0, 0.05]],
    [-60, 0.3, 5, [-60, 10]],
    [12, -3, 5, [15, -5]],
    [1e-9, 3e-9, 3, [1e-9, 3e-9]],
    [-1e6, 2.5e6, 8, [-1e6, 2.5e6]],
    [-0.5, 0.5, 10, [-0.5, 0.5]],
    [5, 5.000001, 4, [5, 5.000001]],
    [-179.9, 180, 6, [-200, 200]],
    [0.1, 0.7, 1, [0, 1]],
  ])('[%d, %d] for %d ticks is %j', (a, b, count, nice) => {
    expect(niceDomain(a, b, count)).toEqual(nice);
  });
});

describe('linearScale', () => {
  // d3-scale 4.0.3: scaleLinear().domain(d).range(r), value and invert, bit for bit.
  it('maps and inverts as d3-scale did', () => {
    const x = linearScale([-1.3, 1.7], [0, 640]);
    const y = linearScale([-0.9, 0.9], [480, 0]);
    expect(x(0.25)).toBe(330.6666666666667);
    expect(x.invert(123.4)).toBe(-0.7215625000000001);
    expect(y(0.25)).toBe(173.33333333333337);
    expect(y.invert(123.4)).toBe(0.43725);
    expect(x(-1.3)).toBe(0);
    expect(x.invert(640)).toBe(1.7);
    expect(x.domain()).toEqual([-1.3, 1.7]);
    expect(y.ticks(4)).toEqual([-0.5, 0, 0.5]);
  });

  it('puts an empty domain in the middle of the range', () => {
    expect(linearScale([2, 2], [0, 100])(2)).toBe(50);
  });
});
