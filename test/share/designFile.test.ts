import { describe, expect, it } from 'vitest';
import {
  MAX_FILE_CHARS,
  readDesignFile,
  readSharedFile,
  writeSharedFile,
} from '../../src/share/designFile.ts';
import { stringifyExact } from '../../src/share/exactJson.ts';
import { CURRENT_VERSION, readDocument } from '../../src/share/schema/migrate.ts';
import { demoDesign } from '../../src/store/demo.ts';

/** A version-1 file as the first release wrote it (by hand, from its documented shape). */
const V1_FILE = `{
  "polewright": "design",
  "version": 1,
  "name": "Old notch",
  "note": "saved by the first release",
  "sampleRate": 2000,
  "zeros": [{ "re": 0.9876883405951378, "im": 0.15643446504023087, "multiplicity": 1 }],
  "poles": [{ "re": 0.98, "im": 0.155, "multiplicity": 1 }],
  "gainRule": { "kind": "dc" },
  "typed": { "b": [1, -1.9753766811902755, 1], "a": [1, -1.96, 0.9845], "text": "b = ..." }
}`;

describe('design files', () => {
  it('migrates version 1 to the current version without changing a number', () => {
    const r = readSharedFile(V1_FILE);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.design.zeros[0]!.re).toBe(0.9876883405951378);
    expect(r.value.design.typed!.b[1]).toBe(-1.9753766811902755);
    expect(r.value.design.name).toBe('Old notch');
    expect(r.value.view).toEqual({});
    const written = JSON.parse(writeSharedFile(r.value));
    expect(written.version).toBe(CURRENT_VERSION);
  });

  it('fills a missing name and note of a version-1 file with empty text', () => {
    const doc = JSON.parse(V1_FILE);
    delete doc.name;
    delete doc.note;
    const r = readDocument(doc);
    expect(r.ok && r.document.name === '' && r.document.note === '').toBe(true);
  });

  it('writes −0 as -0 so that it reads back as −0', () => {
    expect(stringifyExact({ a: [-0, 0, 1e-7, 1e21] })).toBe('{"a":[-0,0,1e-7,1e+21]}');
    const design = { ...demoDesign(), gainRule: { kind: 'fixed' as const, value: -0 } };
    const r = readDesignFile(writeSharedFile({ design, view: {} }));
    expect(r.ok && Object.is((r.design.gainRule as { value: number }).value, -0)).toBe(true);
  });

  it('says what is wrong, where, and what is accepted', () => {
    const bad = (patch: Record<string, unknown>) => {
      const r = readSharedFile(JSON.stringify({ ...JSON.parse(V1_FILE), ...patch }));
      return r.ok ? '' : r.message;
    };
    expect(bad({ version: 3 })).toMatch(/newer Polewright \(version 3\).*1 to 2/);
    expect(bad({ polewright: 'other' })).toMatch(/"polewright" must be "design"/);
    expect(bad({ sampleRate: 0 })).toMatch(/sampleRate: must be a sample rate above 0/);
    expect(bad({ zeros: [{ re: 0, im: -1, multiplicity: 1 }] })).toMatch(/zeros\.0\.im: must be ≥ 0/);
    expect(
      bad({
        poles: [
          { re: 0, im: 0, multiplicity: 64 },
          ...Array(20).fill({ re: 0.1, im: 0.1, multiplicity: 64 }),
        ],
      }),
    ).toMatch(/poles: the poles have order 2624.*at most 1024/);
    expect(bad({ name: 'x'.repeat(201) })).toMatch(/name: must be at most 200/);
    expect(bad({ name: '\ud800' })).toMatch(/lone surrogate/);
    expect(readSharedFile('{"polewright":').ok).toBe(false);
    expect(readSharedFile('x'.repeat(MAX_FILE_CHARS + 1))).toMatchObject({
      ok: false,
      message: expect.stringMatching(new RegExp(`at most ${MAX_FILE_CHARS}`)),
    });
  });

  it('keeps markup in names and notes as plain text', () => {
    const design = {
      ...demoDesign(),
      name: '<img src=x onerror=alert(1)>',
      note: '<script>alert(1)</script>',
    };
    const r = readDesignFile(writeSharedFile({ design, view: {} }));
    expect(r.ok && r.design.name).toBe('<img src=x onerror=alert(1)>');
    expect(r.ok && r.design.note).toBe('<script>alert(1)</script>');
  });

  it('refuses implementation settings the engine refuses, and duplicate mask region ids', () => {
    const base = { ...JSON.parse(V1_FILE), version: 2 };
    const impl = {
      structure: 'df2t',
      wordLength: 16,
      fractionBits: 'auto',
      dataWordLength: 16,
      accumulatorBits: 20,
      rounding: 'nearest',
      overflow: 'saturate',
      scaling: 'linf',
      ordering: 'ascending',
      gainDistribution: 'first',
      pairing: 'nearest',
      feedbackSign: 'denominator',
    };
    const r = readDocument({ ...base, implementation: impl });
    expect(r.ok ? '' : r.message).toMatch(/implementation: a 20-bit accumulator cannot hold/);
    expect(readDocument({ ...base, implementation: { ...impl, accumulatorBits: 40 } }).ok).toBe(true);
    const region = { id: 'a', kind: 'stop', fromHz: 100, toHz: 200, upperDb: -40 };
    const m = readDocument({ ...base, mask: { regions: [region, region] } });
    expect(m.ok ? '' : m.message).toMatch(/mask\.regions\.1\.id: "a" is used twice/);
  });

  it('validates the designer against the engine type', () => {
    const doc = {
      ...JSON.parse(V1_FILE),
      version: 2,
      designer: { kind: 'iir', fs: 2000, family: 'butterworth', response: 'lowpass', order: 65 },
    };
    const r = readDocument(doc);
    expect(r.ok ? '' : r.message).toMatch(/designer\.order/);
    doc.designer.order = 'auto';
    expect(readDocument(doc).ok).toBe(true);
  });
});
