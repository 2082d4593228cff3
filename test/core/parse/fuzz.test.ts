import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  parseCoefficients,
  parseDifferenceEquation,
  parseNumber,
  parseRational,
  parseRoots,
  parseSystem,
} from '../../../src/core/parse/index.ts';
import type { Result } from '../../../src/core/types.ts';
import { mutatedText } from '../../helpers/mutate.ts';

const PARSERS: ((t: string) => Result<unknown>)[] = [
  parseSystem,
  parseDifferenceEquation,
  parseRational,
  parseCoefficients,
  parseRoots,
  parseNumber,
];

const VALID = [
  'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]',
  'y[n+2] - 1.6y[n+1] + 0.64y[n] = x[n+2] - x[n]',
  'H(z) = (z-0.5)(z+1)^2/((z^2-1.2z+0.72) z)',
  '0.5 (1+z⁻¹)^2 / (1 - 1.2 z^(-1) + 0.72/z^2)',
  'b = [1, 0, -1]; a = [1, -1.6, 0.64]',
  'b: 1 0 -1  a: 1 -1.6 0.64',
  '1, 0, -1\n1, -1.6, 0.64',
  'zeros: -1 x2, 0.5±0.5j; poles: 0.9∠30°, 0.8@0.5rad; gain: 10^(-3/20)',
];
const ALPHABET = [
  ...'0123456789.+-*/^()[],;:=±∠@°⁻¹² \nxyznjkpbaeHgr',
  'zeros:',
  'poles:',
  'gain:',
  'x2',
  'deg',
  'rad',
  'pi',
];

/** Every parser returns ok or an error whose position lies inside the text; none throws. */
function checkAll(text: string): void {
  for (const parse of PARSERS) {
    const r = parse(text);
    if (!r.ok) {
      expect(typeof r.error.message).toBe('string');
      expect(r.error.message.length).toBeGreaterThan(0);
      // The catch-all message means an unexpected exception inside the parser: a bug, not a user mistake.
      expect(r.error.message).not.toBe('the input could not be read');
      const p = r.error.position ?? 0;
      expect(Number.isInteger(p)).toBe(true);
      expect(p).toBeGreaterThanOrEqual(0);
      expect(p).toBeLessThanOrEqual(text.length);
    }
  }
}

describe('parsers never throw', () => {
  it('on random strings from the input alphabet', () => {
    const text = fc.array(fc.constantFrom(...ALPHABET), { maxLength: 40 }).map((a) => a.join(''));
    fc.assert(
      fc.property(text, (t) => checkAll(t)),
      { seed: 20240611, numRuns: 3000 },
    );
  });

  it('on arbitrary unicode strings', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), (t) => checkAll(t)),
      { seed: 7, numRuns: 1000 },
    );
  });

  it('on mutated valid inputs', () => {
    const mutated = mutatedText(VALID, ALPHABET, 3);
    fc.assert(
      fc.property(mutated, (t) => checkAll(t)),
      { seed: 99, numRuns: 3000 },
    );
  });
});
