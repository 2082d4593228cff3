import { describe, it, expect } from 'vitest';
import { makeImpulse, makeSine, makeStep, makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('signals', () => {
  it('impulse and step have the textbook shapes', () => {
    expectClose(makeImpulse(4), [1, 0, 0, 0], { abs: 0 });
    expectClose(makeStep(3), [1, 1, 1], { abs: 0 });
    expect(makeImpulse(0).length).toBe(0);
  });

  it('sine is a cosine at the given frequency and phase', () => {
    const x = makeSine(Math.PI / 2, 4, Math.PI / 3);
    expectClose(x, [0.5, -Math.sqrt(3) / 2, -0.5, Math.sqrt(3) / 2], { abs: 1e-15 });
  });

  it('white noise is repeatable, has the requested spread, and is uncorrelated', () => {
    const n = 20000;
    const x = makeWhiteNoise(n, 42, 2);
    expect(Array.from(makeWhiteNoise(n, 42, 2))).toEqual(Array.from(x));
    let sum = 0;
    let sq = 0;
    let lag = 0;
    for (let k = 0; k < n; k++) {
      sum += x[k]!;
      sq += x[k]! * x[k]!;
      if (k > 0) lag += x[k]! * x[k - 1]!;
    }
    // sample statistics of N(0, 4): standard errors about 0.014 (mean), 0.04 (variance), 0.03 (lag covariance)
    expectClose(sum / n, 0, { abs: 0.06 });
    expectClose(sq / n, 4, { abs: 0.16 });
    expectClose(lag / n, 0, { abs: 0.12 });
    expect(makeWhiteNoise(3, 1).length).toBe(3);
  });
});
