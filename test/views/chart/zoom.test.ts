import { describe, expect, it } from 'vitest';
import { panBy, panSpan, spanMiddle, zoomSpan } from '../../../src/views/chart/zoom.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('zoomSpan', () => {
  it('keeps the value under the pointer in its place on a linear axis', () => {
    const s = zoomSpan([0, 1000], 250, 2);
    expectClose(s as unknown as number[], [125, 625], { abs: 1e-12 });
    // Where 250 sat (a quarter of the way) it still sits.
    expectClose((250 - s[0]) / (s[1] - s[0]), 0.25, { abs: 1e-15 });
  });

  it('zooms by equal ratios on a log axis', () => {
    const s = zoomSpan([1, 10000], 100, 2, 'log');
    // log10: [0, 4] about 2, halved: [1, 3].
    expectClose(s as unknown as number[], [10, 1000], { rel: 1e-12 });
  });

  it('zooming in then out by the same factor gives the span back', () => {
    const s = zoomSpan(zoomSpan([49, 53], 50.3, 1.5), 50.3, 1 / 1.5);
    expectClose(s as unknown as number[], [49, 53], { abs: 1e-12 });
  });
});

describe('panning', () => {
  it('a drag moves the value under the pointer with it', () => {
    expectClose(panSpan([10, 20], 15, 12) as unknown as number[], [13, 23], { abs: 1e-12 });
    expectClose(panSpan([10, 1000], 100, 10, 'log') as unknown as number[], [100, 10000], { rel: 1e-12 });
  });
  it('a key moves by a fraction of the span', () => {
    expectClose(panBy([0, 10], 0.1) as unknown as number[], [1, 11], { abs: 1e-12 });
    expectClose(panBy([0, 10], -1) as unknown as number[], [-10, 0], { abs: 1e-12 });
  });
  it('the middle of a log span is geometric', () => {
    expectClose(spanMiddle([10, 1000], 'log'), 100, { rel: 1e-12 });
    expect(spanMiddle([10, 20])).toBe(15);
  });
});
