import { describe, expect, it } from 'vitest';
import { designPeakingEq, designShelf } from '../../../src/core/design/index.ts';
import type { EqWidth } from '../../../src/core/design/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import type { C } from './helpers.ts';
import { allRoots, dbAt, fixtureRoots, responseHz, rootSetDistance } from './helpers.ts';

interface EqCase {
  kind: 'peakingEq' | 'lowShelf' | 'highShelf';
  fs: number;
  f0: number;
  gainDb: number;
  q?: number;
  bandwidthOctaves?: number;
  slope?: number;
  b: number[];
  a: number[];
  zeros: (C | number)[];
  poles: (C | number)[];
  curve: { f: number[]; magDb: number[]; phase: number[] };
}

const widthOf = (c: EqCase): EqWidth =>
  c.q !== undefined
    ? { q: c.q }
    : c.slope !== undefined
      ? { slope: c.slope }
      : { bandwidthOctaves: c.bandwidthOctaves! };
const design = (c: EqCase) =>
  c.kind === 'peakingEq'
    ? designPeakingEq(c.f0, c.gainDb, widthOf(c), c.fs)
    : designShelf(c.kind === 'lowShelf', c.f0, c.gainDb, widthOf(c), c.fs);

describe('equaliser biquads against the audio EQ cookbook formulas (R. Bristow-Johnson), evaluated in numpy 2.4', () => {
  const cases = loadFixture<EqCase[]>('design_eq');
  it.each(cases.map((c) => [`${c.kind} ${c.gainDb} dB at ${c.f0} Hz`, c] as const))('%s', (_l, c) => {
    const zpk = design(c);
    // numpy.roots of the cookbook b/a; scipy.signal.freqz 1.17 for the response
    expect(rootSetDistance(allRoots(zpk.zeros), fixtureRoots(c.zeros))).toBeLessThan(1e-12);
    expect(rootSetDistance(allRoots(zpk.poles), fixtureRoots(c.poles))).toBeLessThan(1e-12);
    expectClose(zpk.gain, c.b[0]!, { rel: 1e-13 }, 'gain b0/a0');
    const r = responseHz(zpk, c.curve.f, c.fs);
    expectClose(r.magnitudeDb, c.curve.magDb, { abs: 1e-10 }, 'dB');
  });
});

describe('equaliser published facts (audio EQ cookbook)', () => {
  it('a peaking section has exactly the requested gain at f0 and 0 dB at DC and Nyquist', () => {
    for (const g of [-18, -3, 0.5, 12])
      for (const width of [{ q: 0.7 }, { q: 8 }, { bandwidthOctaves: 2 }] as EqWidth[]) {
        const zpk = designPeakingEq(2500, g, width, 44100);
        expectClose(dbAt(zpk, 2500, 44100), g, { abs: 1e-9 }, `peak ${g}`);
        expectClose([dbAt(zpk, 0, 44100), dbAt(zpk, 22050, 44100)], [0, 0], { abs: 1e-9 });
      }
  });

  it('shelves reach the full gain on their side, half of it (in dB) at f0 and 0 dB on the other side', () => {
    for (const g of [-12, 6])
      for (const width of [{ slope: 1 }, { q: 0.5 }] as EqWidth[]) {
        const low = designShelf(true, 300, g, width, 48000);
        expectClose([dbAt(low, 0, 48000), dbAt(low, 300, 48000), dbAt(low, 24000, 48000)], [g, g / 2, 0], {
          abs: 1e-9,
        });
        const high = designShelf(false, 3000, g, width, 48000);
        expectClose(
          [dbAt(high, 0, 48000), dbAt(high, 3000, 48000), dbAt(high, 24000, 48000)],
          [0, g / 2, g],
          { abs: 1e-9 },
        );
      }
  });
});
