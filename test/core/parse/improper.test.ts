import { describe, it, expect } from 'vitest';
import { parseSystem } from '../../../src/core/parse/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

function parsed(text: string) {
  const r = parseSystem(text);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('an improper H(z) (more zeros than poles) is read as its causal, delayed version', () => {
  it('(z-0.5)(z+1)^2/(z^2-1.2z+0.72) becomes z^-1·H(z) with a note', () => {
    const p = parsed('(z-0.5)(z+1)^2/(z^2-1.2z+0.72)');
    // Expanded by hand: (z-0.5)(z^2+2z+1) = z^3 + 1.5z^2 + 0z - 0.5.
    expectClose(p.tf.b, [1, 1.5, 0, -0.5], { abs: 1e-15 }, 'b');
    // z^-1·H(z) = (1 + 1.5z^-1 - 0.5z^-3) / (1 - 1.2z^-1 + 0.72z^-2): numerator over z^3, denominator over z^2.
    expectClose(p.tf.a, [1, -1.2, 0.72], { abs: 1e-15 }, 'a');
    expect(p.notes.join(' ')).toMatch(/1 more zero than poles.*pole at the origin/);
  });
  it('the roots form gets its origin pole too, and says so', () => {
    const p = parsed('zeros: 1, 2; poles: 0.5');
    expect(p.zpk?.poles).toContainEqual({ re: 0, im: 0, multiplicity: 1 });
    expect(p.notes).toHaveLength(1);
  });
  it('a proper H(z) has no note', () => {
    expect(parsed('(z^2-1)/(z^2-1.6z+0.64)').notes).toEqual([]);
  });
});
