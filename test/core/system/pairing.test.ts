/**
 * The sorted pairing of zpkToSections gives exactly the sections of the straightforward scan it replaced
 * (scanPairing.ts, which follows scipy's zpk2sos loop root by root), on random root sets full of ties:
 * repeated roots, roots at the origin, equal distances from the circle, real and complex mixed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { zpkToSections } from '../../../src/core/system/index.ts';
import type { Root } from '../../../src/core/types.ts';
import { scanPairing } from './scanPairing.ts';

const coordinate = fc.oneof(
  fc.constantFrom(0, 0.5, -0.5, 1, -1, 0.9, 0.25),
  fc.double({ min: -1.5, max: 1.5, noNaN: true }),
);
const root: fc.Arbitrary<Root> = fc.oneof(
  fc.record({ re: coordinate, im: fc.constant(0), multiplicity: fc.integer({ min: 1, max: 5 }) }),
  fc.record({
    re: coordinate,
    im: coordinate.map((v) => Math.abs(v) || 0.5),
    multiplicity: fc.integer({ min: 1, max: 3 }),
  }),
);

describe('sorted pairing', () => {
  it('matches the scan on 3000 random root sets, bit for bit', () => {
    fc.assert(
      fc.property(
        fc.array(root, { maxLength: 12 }),
        fc.array(root, { maxLength: 12 }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.constantFrom('nearest' as const, 'keep-odd' as const),
        (zeros, poles, gain, pairing) => {
          const zpk = { zeros, poles, gain };
          expect(zpkToSections(zpk, { pairing })).toEqual(scanPairing(zpk, { pairing }));
        },
      ),
      { seed: 18_003, numRuns: 3000 },
    );
  });

  it('pairs an order-1024 FIR and a comb of order 1024 like the scan', () => {
    const fir = {
      zeros: Array.from({ length: 512 }, (_, k) => ({
        re: 0.99 * Math.cos((Math.PI * (k + 0.5)) / 512),
        im: 0.99 * Math.sin((Math.PI * (k + 0.5)) / 512),
        multiplicity: 1,
      })),
      poles: [{ re: 0, im: 0, multiplicity: 1024 }],
      gain: 1,
    };
    expect(zpkToSections(fir)).toEqual(scanPairing(fir));
    const comb = {
      zeros: fir.zeros.map((z) => ({ ...z, re: z.re / 0.99, im: z.im / 0.99 })),
      poles: fir.zeros,
      gain: 0.9,
    };
    expect(zpkToSections(comb)).toEqual(scanPairing(comb));
  });
});
