/**
 * The sorted pairing of zpkToSections gives exactly the sections of the straightforward scan it replaced
 * (scanPairing.ts, which follows scipy's zpk2sos loop root by root), on random root sets full of ties:
 * repeated roots, roots at the origin, equal distances from the circle, real and complex mixed. (With every
 * pole at the origin zpkToSections then reorders the same sections: pairedSections is the pairing alone, and
 * zpkToSections must hold the same sections.)
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { zpkToSections } from '../../../src/core/system/index.ts';
import { pairedSections, type SectionPairing } from '../../../src/core/system/sections.ts';
import type { Section } from '../../../src/core/types.ts';
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

/** zpkToSections holds the pairing's sections (in its own order): compared at gain 1, as sorted lists. */
function expectSameSections(zpk: { zeros: Root[]; poles: Root[] }, pairing: SectionPairing = 'nearest') {
  const unit = { ...zpk, gain: 1 };
  const key = (s: Section) => JSON.stringify(s);
  expect(zpkToSections(unit, { pairing }).map(key).sort()).toEqual(
    pairedSections(unit, { pairing }).map(key).sort(),
  );
}

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
          const paired = pairedSections(zpk, { pairing });
          expect(paired).toEqual(scanPairing(zpk, { pairing }));
          expectSameSections(zpk, pairing);
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
    expect(pairedSections(fir)).toEqual(scanPairing(fir));
    expectSameSections(fir);
    const comb = {
      zeros: fir.zeros.map((z) => ({ ...z, re: z.re / 0.99, im: z.im / 0.99 })),
      poles: fir.zeros,
      gain: 0.9,
    };
    expect(zpkToSections(comb)).toEqual(scanPairing(comb));
  });
});
