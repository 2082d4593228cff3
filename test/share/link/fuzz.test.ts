/**
 * Fuzzing the link codec: 10 000 valid designs must come back bitwise equal; random links must give a design
 * or a message, never an exception, and whatever design they give must itself survive a round trip; and a
 * link of today's format that was changed in any way — 10 000 single bit flips, 10 000 edits and cuts — must
 * never open: the check value refuses it as altered or cut.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromBase64Url, toBase64Url } from '../../../src/share/link/base64url.ts';
import { decodeLink, encodeLink, linkFragment, LINK_PREFIX } from '../../../src/share/link/index.ts';
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

  it("survives random payload bytes in the unchecked first format, and opens none in today's", () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
        checkDecode('pw1.' + toBase64Url(bytes));
        expect(decodeLink(LINK_PREFIX + toBase64Url(bytes)).ok).toBe(false);
      }),
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

  /** Links of today's format for designs of every shape (names, notes, designers, masks, settings). */
  const someLinks = fc.sample(anySharedDesign, { seed: 6005, numRuns: 40 }).map(encodeLink);
  someLinks.push(
    encodeLink({ design: demoDesign(), view: { timeInput: 'sine', sineHz: 50 } }),
    encodeLink({
      design: {
        ...demoDesign(),
        designer: { kind: 'notch', fs: 2000, f0: 50, q: 30 },
        typed: { b: [1, 2], a: [1], text: 'b=1 2' },
      },
      view: {},
    }),
  );

  /** A changed link of today's format: refused, and as altered or cut when its prefix survived. */
  function refused(original: string, changed: string): void {
    if (changed === original) return;
    const r = decodeLink(changed);
    if (r.ok) throw new Error(`a changed link opened:\n  ${original}\n  ${changed}`);
    // A flip that makes a '#' or breaks the prefix leaves no link of today's format: any refusal will do.
    if (linkFragment(changed)?.startsWith(LINK_PREFIX) && !/altered or cut/.test(r.message))
      throw new Error(`unexpected message for ${changed}: ${r.message}`);
  }

  it('opens no link with one bit flipped, in its bytes or in its text (10 000 flips)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...someLinks), fc.nat(), fc.boolean(), (link, at, inBytes) => {
        if (inBytes) {
          const bytes = fromBase64Url(link.slice(LINK_PREFIX.length))!;
          const bit = at % (bytes.length * 8);
          bytes[bit >> 3]! ^= 1 << (bit & 7);
          refused(link, LINK_PREFIX + toBase64Url(bytes));
        } else {
          const bit = at % (link.length * 7);
          const i = Math.floor(bit / 7);
          const c = String.fromCharCode(link.charCodeAt(i) ^ (1 << (bit % 7)));
          refused(link, link.slice(0, i) + c + link.slice(i + 1));
        }
      }),
      { seed: 6006, numRuns: RUNS },
    );
  });

  it('opens no mutated or truncated valid link (10 000 edits and cuts)', () => {
    const edit = fc.record({
      at: fc.nat(),
      del: fc.nat({ max: 4 }),
      ins: fc.string({ unit: fc.constantFrom(...B64), maxLength: 4 }),
    });
    fc.assert(
      fc.property(
        fc.constantFrom(...someLinks),
        fc.array(edit, { minLength: 1, maxLength: 4 }),
        fc.nat(),
        (s, edits, cut) => {
          const m = edits.reduce((acc, e) => {
            const at = 4 + (e.at % (acc.length - 3));
            return acc.slice(0, at) + e.ins + acc.slice(at + e.del);
          }, s);
          const changed = cut % 3 === 0 ? m.slice(0, 4 + (cut % (m.length - 3))) : m;
          checkDecode(changed);
          refused(s, changed);
        },
      ),
      { seed: 6004, numRuns: RUNS },
    );
  });
});
