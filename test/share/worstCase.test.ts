/**
 * The containers fit the design's bounds: the largest design src/core/model/limits.ts allows, written with
 * the costliest characters, goes through a design file, a link and a saved session within their own limits
 * and comes back bit for bit; one step past any bound is refused by the door and by every reader alike.
 */
import { describe, expect, it } from 'vitest';
import { designProblem } from '../../src/core/model/check.ts';
import { MAX_MASK_REGIONS, MAX_ORDER } from '../../src/core/model/limits.ts';
import { runDesigner } from '../../src/core/design/index.ts';
import { maskFromDesigner } from '../../src/core/mask/index.ts';
import { loadSession, saveSession, sessionKey } from '../../src/share/autosave.ts';
import { readSharedFile, writeSharedFile } from '../../src/share/designFile.ts';
import { readShared, toDocument } from '../../src/share/document.ts';
import { decodeLink, encodeLink } from '../../src/share/link/index.ts';
import { MAX_FILE_CHARS, MAX_LINK_CHARS } from '../../src/share/schema/limits.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import type { Design } from '../../src/core/model/design.ts';
import { bitwiseDifference } from './arbitraries.ts';
import { worstCaseDesign } from './worstCase.ts';

/** localStorage per site in Chromium, characters (keys and values), measured with the project's Chromium. */
const CHROMIUM_STORAGE_CHARS = 5_242_880;

const CASES: [string, string][] = [
  ['a control character (6 characters in JSON)', '\u0001'],
  ['a 3-byte UTF-8 character', '€'],
  ['plain ASCII', 'a'],
];

describe('the largest design fits every container', () => {
  it.each(CASES)('with %s', (_, c) => {
    const design = worstCaseDesign(c);
    expect(designProblem(design)).toBeNull();
    const file = writeSharedFile({ design, view: {} });
    expect(file.length).toBeLessThanOrEqual(MAX_FILE_CHARS);
    const read = readSharedFile(file);
    if (!read.ok) throw new Error(read.message);
    expect(bitwiseDifference(read.value.design, design)).toBeNull();
    const link = encodeLink({ design, view: {} });
    expect(link.length).toBeLessThanOrEqual(MAX_LINK_CHARS);
    const opened = decodeLink(link);
    if (!opened.ok) throw new Error(opened.message);
    expect(bitwiseDifference(opened.value.design, design)).toBeNull();
    const storage = memoryStorage(CHROMIUM_STORAGE_CHARS);
    const session = { design, past: [design], future: [], view: {}, tab: 't', lineage: 'l', savedAt: 1 };
    expect(saveSession(storage, session)).toMatchObject({ ok: true });
    expect(bitwiseDifference(loadSession(storage, sessionKey('t'))!.design, design)).toBeNull();
  });

  it('keeps a notch comb of the largest order with its own mask (a region per tooth and gap)', () => {
    for (const n of [MAX_ORDER, MAX_ORDER - 1]) {
      const spec = { kind: 'comb' as const, fs: 48_000, f0: 48_000 / n, type: 'notch' as const, q: 30 };
      const r = runDesigner(spec);
      if (!r.ok) throw new Error(r.error.message);
      const mask = maskFromDesigner(spec)!;
      expect(mask.regions.length).toBeGreaterThan(n);
      expect(mask.regions.length).toBeLessThanOrEqual(MAX_MASK_REGIONS);
      const design: Design = {
        sampleRate: spec.fs,
        zeros: r.value.zpk.zeros,
        poles: r.value.zpk.poles,
        gainRule: { kind: 'fixed', value: r.value.zpk.gain },
        name: 'comb',
        note: r.value.note,
        designer: spec,
        mask,
      };
      expect(designProblem(design)).toBeNull();
      expect(readShared(toDocument({ design, view: {} })).ok).toBe(true);
    }
    expect(runDesigner({ kind: 'comb', fs: 2000, f0: 1, type: 'notch', q: 30 })).toMatchObject({
      ok: false,
      error: { message: expect.stringMatching(/order 2000/) },
    });
  });
});

describe('one step past a bound is refused by the door and by the readers alike', () => {
  const base = worstCaseDesign('a');
  const past: [string, Design][] = [
    [
      'one more root than the order',
      { ...base, zeros: [...base.zeros, { re: 0.5, im: 0, multiplicity: 1 }] },
    ],
    ['a multiplicity above the order', { ...base, poles: [{ re: 0, im: 0, multiplicity: MAX_ORDER + 1 }] }],
    ['a longer name', { ...base, name: base.name + 'x' }],
    ['a longer note', { ...base, note: base.note + 'x' }],
    ['a longer typed text', { ...base, typed: { ...base.typed!, text: base.typed!.text + 'x' } }],
    ['one more coefficient', { ...base, typed: { ...base.typed!, b: [...base.typed!.b, 1] } }],
    [
      'one more mask region',
      { ...base, mask: { regions: [...base.mask!.regions, { ...base.mask!.regions[0]!, id: 'extra' }] } },
    ],
    ['a sample rate above 1 GHz', { ...base, sampleRate: 1.000000001e9 }],
    ['one more part', { ...base, parts: [...base.parts!, { ...base.parts!.at(-1)! }] }],
  ];
  it.each(past)('%s', (_, design) => {
    const problem = designProblem(design);
    expect(problem).not.toBeNull();
    const read = readShared(toDocument({ design, view: {} }));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toContain(problem!.path.join('.'));
  });
});
