/**
 * The strict JSON reader gives JSON.parse's values (the outside reference: the JavaScript engine's own JSON
 * reader) for every text JSON.parse accepts that has no repeated key and no deep nesting, refuses what
 * JSON.parse refuses, and refuses repeated keys and deep nesting with their line and column.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lineColumn, parseStrictJson } from '../../src/share/strictJson.ts';

const DEPTH = 32;

describe('strict JSON', () => {
  it('reads what JSON.parse reads, to the same values (−0 and __proto__ included)', () => {
    fc.assert(
      fc.property(fc.json({ depthSize: 'small', noUnicodeString: false }), (text) => {
        const r = parseStrictJson(text, DEPTH);
        if (!r.ok) throw new Error(`${r.message}: ${text}`);
        expect(r.value).toStrictEqual(JSON.parse(text));
      }),
      { seed: 18_005, numRuns: 3000 },
    );
    const r = parseStrictJson('{"__proto__": {"polluted": true}, "z": -0, "e": 1E+2}', DEPTH);
    expect(r.ok && Object.is((r.value as { z: number }).z, -0)).toBe(true);
    expect(r.ok && (r.value as { e: number }).e).toBe(100);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('refuses what JSON.parse refuses', () => {
    for (const text of [
      '',
      '{',
      '[1,]',
      '{"a":1,}',
      "{'a':1}",
      '01',
      '1.',
      '.5',
      '+1',
      'NaN',
      '"\u0001"',
      '"\\x"',
      '[1] 2',
      'tru',
      '"\\u12g4"',
    ]) {
      expect(() => JSON.parse(text), text).toThrow();
      expect(parseStrictJson(text, DEPTH).ok, text).toBe(false);
    }
  });

  it('refuses a key given twice in one object, naming both places', () => {
    const text = '{\n  "poles": [],\n  "name": "x",\n  "poles": [{"re": 2}]\n}';
    const r = parseStrictJson(text, DEPTH);
    expect(r).toMatchObject({
      ok: false,
      message: expect.stringMatching(
        /"poles" is given twice.*line 4, column 3 \(first at line 2, column 3\)/,
      ),
    });
    // The same key in different objects is fine.
    expect(parseStrictJson('[{"a":1},{"a":2}]', DEPTH).ok).toBe(true);
  });

  it('refuses nesting deeper than the limit before reading further', () => {
    const deep = '['.repeat(DEPTH + 1) + ']'.repeat(DEPTH + 1);
    expect(parseStrictJson(deep, DEPTH)).toMatchObject({
      ok: false,
      message: expect.stringMatching(/nested more than 32 deep/),
    });
    expect(parseStrictJson('['.repeat(DEPTH) + ']'.repeat(DEPTH), DEPTH).ok).toBe(true);
    // A million brackets cost a refusal at the 33rd.
    expect(parseStrictJson('['.repeat(1_000_000), DEPTH)).toMatchObject({ ok: false, position: DEPTH });
  });

  it('names lines and columns from 1', () => {
    expect(lineColumn('ab\ncd\nef', 0)).toEqual({ line: 1, column: 1 });
    expect(lineColumn('ab\ncd\nef', 4)).toEqual({ line: 2, column: 2 });
    expect(lineColumn('ab\ncd\nef', 6)).toEqual({ line: 3, column: 1 });
    expect(parseStrictJson('{\n  "a": 1\n  "b": 2}', DEPTH)).toMatchObject({
      message: expect.stringMatching(/line 3, column 3/),
    });
  });
});
