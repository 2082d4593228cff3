/**
 * Fuzzing parseSystem with 10 000 cases per generator (the entry box and the command line both use it):
 * every input gives a system or a positioned message, never an exception or the catch-all message.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSystem } from '../../../src/core/parse/index.ts';

const RUNS = 10_000;
const SEEDS = [
  'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]',
  'H(z) = (z-0.5)(z+1)^2/((z^2-1.2z+0.72) z)',
  '0.5 (1+z⁻¹)^2 / (1 - 1.2 z^(-1) + 0.72/z^2)',
  'b = [1, 0, -1]; a = [1, -1.6, 0.64]',
  'zeros: -1 x2, 0.5±0.5j; poles: 0.9∠30°, 0.8@0.5rad; gain: 10^(-3/20)',
];
const TOKENS = [
  ...'0123456789.+-*/^()[],;:=±∠@° \nxyzjnkabeH',
  'z^-1',
  'z^1000000',
  '^999999999',
  '1e308',
  'x1000000',
  'zeros:',
  'poles:',
  'gain:',
];

function check(text: string): void {
  const r = parseSystem(text);
  if (r.ok) return;
  expect(r.error.message.length).toBeGreaterThan(0);
  expect(r.error.message).not.toBe('the input could not be read');
  const p = r.error.position ?? 0;
  expect(p >= 0 && p <= text.length).toBe(true);
}

describe('parseSystem fuzz', () => {
  it('on token soup, including huge powers and multiplicities', () => {
    const text = fc.array(fc.constantFrom(...TOKENS), { maxLength: 30 }).map((a) => a.join(''));
    fc.assert(fc.property(text, check), { seed: 8001, numRuns: RUNS });
  });

  it('on mutated valid systems', () => {
    const edit = fc.record({
      at: fc.nat(),
      del: fc.nat({ max: 3 }),
      ins: fc.array(fc.constantFrom(...TOKENS), { maxLength: 2 }).map((a) => a.join('')),
    });
    const mutated = fc
      .tuple(fc.constantFrom(...SEEDS), fc.array(edit, { minLength: 1, maxLength: 3 }))
      .map(([s, edits]) =>
        edits.reduce((acc, e) => {
          const at = e.at % (acc.length + 1);
          return acc.slice(0, at) + e.ins + acc.slice(at + e.del);
        }, s),
      );
    fc.assert(fc.property(mutated, check), { seed: 8002, numRuns: RUNS });
  });
});
