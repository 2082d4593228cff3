import { describe, it, expect } from 'vitest';
import { hzToOmega, omegaGridToHz, omegaToHz, type Hertz, type RadPerSample } from '../../src/core/units.ts';
import { rootFrequencyHz, rootAngle } from '../../src/core/readouts.ts';
import { responseAt } from '../../src/core/response/index.ts';
import { magnitudeDbAt } from '../../src/core/response/magnitude.ts';
import { designNotch } from '../../src/core/design/index.ts';
import { makeSine } from '../../src/core/time/inputs.ts';
import { readAt } from '../../src/core/response/readAt.ts';
import type { Zpk } from '../../src/core/types.ts';

describe('hertz and radians per sample', () => {
  it('convert both ways, with Nyquist exactly fs/2 at any rate', () => {
    // common practice: ω = 2π·f/fs
    expect(hzToOmega(250, 1000)).toBe(Math.PI / 2);
    for (const fs of [1000, 44100, 48000, 7, 2.5e6 / 3, 1e9]) {
      expect(omegaToHz(Math.PI, fs)).toBe(fs / 2);
      expect(omegaToHz(hzToOmega(fs / 7, fs), fs)).toBeCloseTo(fs / 7, 9);
    }
    expect(Array.from(omegaGridToHz([0, Math.PI / 2, Math.PI], 2000))).toEqual([0, 500, 1000]);
  });
});

/**
 * Never called: these lines are checked by the compiler (npm run typecheck). Each @ts-expect-error fails the
 * type check if the call it marks compiles, i.e. if a frequency in Hz could be passed as an angle or back.
 */
export function unitsTheCompilerKeepsApart(zpk: Zpk) {
  const z = { re: 0, im: 1 };
  const hz: Hertz = rootFrequencyHz(z, 1000);
  const w: RadPerSample = rootAngle(z);
  // @ts-expect-error a frequency in Hz is not an angle in radians per sample
  responseAt(zpk, hz);
  // @ts-expect-error likewise for the magnitude reader
  magnitudeDbAt(zpk, hz);
  // @ts-expect-error an angle is not a centre frequency in Hz
  designNotch(w, 2, 1000);
  // @ts-expect-error the sine input takes radians per sample
  makeSine(hz, 16);
  // @ts-expect-error the read-out at a cross-hair takes hertz
  readAt(zpk, 1000, w);
  // Converted, each is fine; and plain numbers (literals, array elements) are accepted as either.
  return [responseAt(zpk, hzToOmega(hz, 1000)), designNotch(omegaToHz(w, 1000), 2, 1000), makeSine(0.1, 4)];
}
