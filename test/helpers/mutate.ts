/** Fuzzing input: valid texts broken by a few random edits, for readers that must fail with a message. */
import fc from 'fast-check';

/**
 * Texts made from one of `valid` by one to four edits, each deleting up to `maxDelete` characters at a
 * random place and inserting up to three tokens drawn from `alphabet` there.
 */
export function mutatedText(
  valid: readonly string[],
  alphabet: readonly string[],
  maxDelete: number,
): fc.Arbitrary<string> {
  const edit = fc.record({
    at: fc.nat(),
    del: fc.nat({ max: maxDelete }),
    ins: fc.array(fc.constantFrom(...alphabet), { maxLength: 3 }).map((a) => a.join('')),
  });
  return fc
    .tuple(fc.constantFrom(...valid), fc.array(edit, { minLength: 1, maxLength: 4 }))
    .map(([s, edits]) =>
      edits.reduce((acc, e) => {
        const at = e.at % (acc.length + 1);
        return acc.slice(0, at) + e.ins + acc.slice(at + e.del);
      }, s),
    );
}
