/**
 * Fuzzing the design-file loader: 10 000 valid designs must read back bitwise equal through the file text;
 * 10 000 random or mutated files (JSON text and JSON values) must give a design or a message, never throw.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readSharedFile, writeSharedFile } from '../../src/share/designFile.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { mutatedText } from '../helpers/mutate.ts';
import { anySharedDesign, bitwiseDifference } from './arbitraries.ts';

const RUNS = 10_000;

function checkRead(text: string): void {
  const r = readSharedFile(text);
  if (!r.ok) {
    expect(r.message.length).toBeGreaterThan(0);
    return;
  }
  const again = readSharedFile(writeSharedFile(r.value));
  expect(again.ok).toBe(true);
  if (again.ok) expect(bitwiseDifference(again.value, r.value)).toBeNull();
}

describe('design file fuzz', () => {
  it('round-trips valid designs bit for bit', () => {
    fc.assert(
      fc.property(anySharedDesign, (shared) => {
        const r = readSharedFile(writeSharedFile(shared));
        if (!r.ok) throw new Error(r.message);
        const diff = bitwiseDifference(r.value, shared);
        if (diff) throw new Error(diff);
      }),
      { seed: 7001, numRuns: RUNS },
    );
  });

  it('survives arbitrary JSON values, bare or inside a design envelope', () => {
    const value = fc.jsonValue({ maxDepth: 4 });
    const doc = fc.oneof(
      value,
      fc
        .record({
          polewright: fc.constant('design'),
          version: fc.constantFrom(1, 2, 3, 1.5, '2'),
          body: fc.dictionary(
            fc.constantFrom(
              'name',
              'note',
              'sampleRate',
              'zeros',
              'poles',
              'gainRule',
              'typed',
              'designer',
              'view',
              '__proto__',
            ),
            value,
          ),
        })
        .map(({ body, ...env }) => ({ ...body, ...env })),
    );
    fc.assert(
      fc.property(doc, (d) => checkRead(JSON.stringify(d))),
      { seed: 7002, numRuns: RUNS },
    );
  });

  it('survives mutated valid files', () => {
    const files = [
      writeSharedFile({ design: demoDesign(), view: { timeSamples: 512 } }),
      writeSharedFile({
        design: {
          ...demoDesign(),
          typed: { b: [1, -0], a: [1, 0.5], text: 'H' },
          designer: { kind: 'dcBlocker', fs: 2000, cutoffHz: 5 },
        },
        view: {},
      }),
    ];
    const alphabet = [
      ...'{}[]":,-0123456789.eE \n',
      'true',
      'null',
      '"re"',
      '"im"',
      '"multiplicity"',
      '1e309',
      '-0',
    ];
    const mutated = mutatedText(files, alphabet, 6);
    fc.assert(
      fc.property(mutated, (t) => checkRead(t)),
      { seed: 7003, numRuns: RUNS },
    );
  });
});
