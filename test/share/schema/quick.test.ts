/**
 * The quick reader (the page's first view reads sessions and links with it, before the zod schemas load)
 * against the full reader: whatever it accepts, the full reader accepts too and gives the same document,
 * keys in the same order and numbers bit for bit; and it accepts everything the workbench writes, so the
 * first view never has to wait for the full reader in ordinary use.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toDocument } from '../../../src/share/document.ts';
import { stringifyExact } from '../../../src/share/exactJson.ts';
import { readDocument } from '../../../src/share/schema/migrate.ts';
import { quickReadDocument, quickReadView } from '../../../src/share/schema/quick.ts';
import { readView } from '../../../src/share/schema/full.ts';
import { parseStrictJson } from '../../../src/share/strictJson.ts';
import { demoDesign } from '../../../src/store/demo.ts';
import { emptyDesign } from '../../../src/core/model/design.ts';
import { addDesignerPart } from '../../../src/core/model/compose.ts';
import type { DesignerSpec } from '../../../src/core/design/index.ts';
import { mutatedText } from '../../helpers/mutate.ts';
import { anySharedDesign, bitwiseDifference } from '../arbitraries.ts';

const RUNS = 4000;

/** Fails when the quick reader accepts what the full one refuses, or reads it differently. */
function agrees(json: unknown): boolean {
  const quick = quickReadDocument(json);
  if (quick === null) return false;
  const full = readDocument(json);
  if (!full.ok) throw new Error(`the quick reader accepted what the full one refuses: ${full.message}`);
  const diff = bitwiseDifference(quick, full.document);
  if (diff) throw new Error(`the readers differ at ${diff}`);
  // Key order too: a session written back must be the same text.
  expect(stringifyExact(quick)).toBe(stringifyExact(full.document));
  return true;
}

const strange = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(
    undefined,
    null,
    NaN,
    Infinity,
    -0,
    -1,
    0.5,
    1e9 + 1,
    2 ** 32,
    '',
    'auto',
    'x'.repeat(300),
    '\ud800',
    [],
    {},
    [1],
    { kind: 'dc' },
  ),
);

/** Every [path, parent] in a JSON-like value, for mutating one place. */
function places(v: unknown, path: (string | number)[] = []): (string | number)[][] {
  if (typeof v !== 'object' || v === null) return [path];
  const keys = Array.isArray(v) ? v.map((_, i) => i) : Object.keys(v);
  return [path, ...keys.flatMap((k) => places((v as Record<string | number, unknown>)[k], [...path, k]))];
}

/** A copy of `doc` with the value at `path` replaced (or its key removed, or a key added beside it). */
function mutate(doc: unknown, path: (string | number)[], how: 'set' | 'delete' | 'add', value: unknown) {
  const copy = structuredClone(doc) as Record<string | number, unknown>;
  if (path.length === 0) return how === 'set' ? value : copy;
  let parent = copy;
  for (const k of path.slice(0, -1)) parent = parent[k] as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  if (how === 'set') parent[last] = value;
  else if (how === 'delete') {
    if (Array.isArray(parent)) parent.splice(Number(last), 1);
    else delete parent[last];
  } else if (!Array.isArray(parent)) parent.extra = value;
  else parent.push(value);
  return copy;
}

describe('the quick design reader', () => {
  it('reads every document the workbench writes, as the full reader does', () => {
    fc.assert(
      fc.property(anySharedDesign, (shared) => {
        const doc = JSON.parse(stringifyExact(toDocument(shared))) as unknown;
        expect(agrees(doc)).toBe(true);
        expect(agrees(toDocument(shared))).toBe(true); // a decoded link is a plain object, not JSON text
        const view = quickReadView(shared.view);
        expect(view).not.toBeNull();
        expect(bitwiseDifference(view, readView(shared.view))).toBeNull();
      }),
      { seed: 14001, numRuns: RUNS },
    );
  });

  it('accepts only what the full reader accepts, with one place of a valid document changed', () => {
    const mutated = anySharedDesign.chain((shared) => {
      const doc = toDocument(shared);
      return fc.record({
        doc: fc.constant(doc),
        path: fc.constantFrom(...places(doc)),
        how: fc.constantFrom('set', 'delete', 'add') as fc.Arbitrary<'set' | 'delete' | 'add'>,
        value: strange,
      });
    });
    let accepted = 0;
    fc.assert(
      fc.property(mutated, ({ doc, path, how, value }) => {
        if (agrees(mutate(doc, path, how, value))) accepted++;
      }),
      { seed: 14002, numRuns: RUNS },
    );
    // Some changes keep the document valid (an added unknown key, another valid number): both agree there.
    expect(accepted).toBeGreaterThan(RUNS / 10);
  });

  it('accepts only what the full reader accepts, for any JSON and mutated file text', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 5 }), (v) => void agrees(v)),
      { seed: 14003, numRuns: RUNS },
    );
    const files = [stringifyExact(toDocument({ design: demoDesign(), view: { timeSamples: 512 } }))];
    const alphabet = [...'{}[]":,-0123456789.eE ', 'true', 'null', '"auto"', '"re"', '"kind"', '-0'];
    fc.assert(
      fc.property(mutatedText(files, alphabet, 6), (t) => {
        const json = parseStrictJson(t, 32);
        if (json.ok) agrees(json.value);
      }),
      { seed: 14004, numRuns: RUNS },
    );
  });

  it('leaves a composed design (its parts) to the full reader, which keeps them', () => {
    const fs = 1000;
    let design = emptyDesign(fs);
    const lowpass = {
      kind: 'iir',
      family: 'any',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [100],
      stopbandHz: [200],
      rippleDb: 1,
      attenuationDb: 20,
      fs,
    } as DesignerSpec;
    for (const spec of [
      lowpass,
      { kind: 'notch', f0: 50, bandwidthHz: 4, fs },
      { kind: 'notch', f0: 73.3, q: 30, fs },
    ] as DesignerSpec[]) {
      const r = addDesignerPart(design, spec);
      if (!r.ok) throw new Error(r.error.message);
      design = r.value.design;
    }
    const doc = toDocument({ design, view: {} });
    expect(doc.parts).toHaveLength(3);
    expect(quickReadDocument(JSON.parse(stringifyExact(doc)))).toBeNull();
    const full = readDocument(JSON.parse(stringifyExact(doc)));
    expect(full.ok && full.document.parts).toEqual(doc.parts);
    const mutated = fc.record({
      path: fc.constantFrom(...places(doc).filter((p) => p[0] === 'parts')),
      how: fc.constantFrom('set', 'delete', 'add') as fc.Arbitrary<'set' | 'delete' | 'add'>,
      value: strange,
    });
    fc.assert(
      fc.property(mutated, ({ path, how, value }) => void agrees(mutate(doc, path, how, value))),
      { seed: 14005, numRuns: 1000 },
    );
  });

  it('leaves other versions and refusals to the full reader', () => {
    const doc = toDocument({ design: demoDesign(), view: {} });
    expect(quickReadDocument({ ...doc, version: 1 })).toBeNull(); // migrated by the full reader
    expect(quickReadDocument({ ...doc, sampleRate: 0 })).toBeNull();
    expect(quickReadDocument({ ...doc, zeros: [{ re: 0, im: -1, multiplicity: 1 }] })).toBeNull();
    expect(quickReadDocument({ ...doc, designer: { kind: 'notch', fs: 2000 } })).toBeNull(); // f0 missing
    expect(quickReadView({ timeInput: 'chirp' })).toBeNull();
    expect(quickReadDocument(doc)).not.toBeNull();
  });
});
