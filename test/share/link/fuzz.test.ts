/**
 * Fuzzing the link codec: 10 000 valid designs must come back bitwise equal; 10 000 random, mutated and
 * truncated links must give a design or a message, never an exception, and whatever design they give must
 * itself survive a round trip.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toBase64Url } from '../../../src/share/link/base64url.ts';
import { decodeLink, encodeLink } from '../../../src/share/link/index.ts';
import { demoDesign } from '../../../src/store/demo.ts';
import { anySharedDesign, bitwiseDifference } from '../arbitraries.ts';

const RUNS = 10_000;
const B64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

/** decodeLink never throws; a failure has a message; a success re-encodes to the same design. */
function checkDecode(text: string): void {
  const r = decodeLink(text);
  if (!r.ok) {
    expect(r.message.length).toBeGreaterThan(0);
    return;
  }
  const again = decodeLink(encodeLink(r.value));
  expect(again.ok).toBe(true);
  if (again.ok) expect(bitwiseDifference(again.value, r.value)).toBeNull();
}

describe('link codec fuzz', () => {
  it('round-trips valid designs bit for bit', () => {
    fc.assert(
      fc.property(anySharedDesign, (shared) => {
        const r = decodeLink(encodeLink(shared));
        if (!r.ok) throw new Error(r.message);
        const diff = bitwiseDifference(r.value, shared);
        if (diff) throw new Error(diff);
      }),
      { seed: 6001, numRuns: RUNS },
    );
  });

  it('survives random payload bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => checkDecode('pw1.' + toBase64Url(bytes))),
      { seed: 6002, numRuns: RUNS },
    );
  });

  it('survives random link text', () => {
    const chars = fc
      .array(fc.constantFrom(...B64, '.', '#', '%', '=', '+'), { maxLength: 200 })
      .map((a) => a.join(''));
    fc.assert(
      fc.property(fc.constantFrom('pw1.', '#pw1.', 'pw2.', 'http://x/#pw1.', ''), chars, (p, body) =>
        checkDecode(p + body),
      ),
      { seed: 6003, numRuns: RUNS },
    );
  });

  it('survives mutated and truncated valid links', () => {
    const links = [
      encodeLink({ design: demoDesign(), view: { timeInput: 'sine', sineHz: 50 } }),
      encodeLink({
        design: {
          ...demoDesign(),
          designer: { kind: 'notch', fs: 2000, f0: 50, q: 30 },
          typed: { b: [1, 2], a: [1], text: 'b=1 2' },
        },
        view: {},
      }),
    ];
    const edit = fc.record({
      at: fc.nat(),
      del: fc.nat({ max: 4 }),
      ins: fc.string({ unit: fc.constantFrom(...B64), maxLength: 4 }),
    });
    const mutated = fc
      .tuple(fc.constantFrom(...links), fc.array(edit, { minLength: 1, maxLength: 4 }), fc.nat())
      .map(([s, edits, cut]) => {
        const m = edits.reduce((acc, e) => {
          const at = 4 + (e.at % (acc.length - 3));
          return acc.slice(0, at) + e.ins + acc.slice(at + e.del);
        }, s);
        return cut % 3 === 0 ? m.slice(0, 4 + (cut % (m.length - 3))) : m;
      });
    fc.assert(
      fc.property(mutated, (t) => checkDecode(t)),
      { seed: 6004, numRuns: RUNS },
    );
  });
});
