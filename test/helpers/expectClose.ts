import { expect } from 'vitest';

/** Tolerances for a numeric comparison: passes when |a - e| <= abs + rel·|e|. */
export interface Tolerance {
  rel?: number;
  abs?: number;
}

/** Largest violation ratio |a-e| / (abs + rel·|e|) over paired values; <= 1 means within tolerance. */
export function closeness(actual: ArrayLike<number>, expected: ArrayLike<number>, tol: Tolerance): number {
  const rel = tol.rel ?? 0;
  const abs = tol.abs ?? 0;
  let worst = 0;
  for (let i = 0; i < expected.length; i++) {
    const a = actual[i]!;
    const e = expected[i]!;
    if (Number.isNaN(e) && Number.isNaN(a)) continue;
    if (e === a) continue; // covers equal infinities
    const allowed = abs + rel * Math.abs(e);
    const ratio = Math.abs(a - e) / allowed;
    if (!(ratio <= worst)) worst = Number.isNaN(ratio) ? Infinity : ratio;
  }
  return worst;
}

/** Asserts two numbers or arrays agree within the stated tolerance, naming the worst index on failure. */
export function expectClose(
  actual: number | ArrayLike<number>,
  expected: number | ArrayLike<number>,
  tol: Tolerance,
  label = '',
): void {
  const a = typeof actual === 'number' ? [actual] : actual;
  const e = typeof expected === 'number' ? [expected] : expected;
  expect(a.length, `${label} length`).toBe(e.length);
  const rel = tol.rel ?? 0;
  const abs = tol.abs ?? 0;
  for (let i = 0; i < e.length; i++) {
    const ai = a[i]!;
    const ei = e[i]!;
    if (ai === ei || (Number.isNaN(ai) && Number.isNaN(ei))) continue;
    const allowed = abs + rel * Math.abs(ei);
    if (!(Math.abs(ai - ei) <= allowed)) {
      throw new Error(
        `${label}[${i}]: got ${ai}, expected ${ei} (difference ${Math.abs(ai - ei)} exceeds ${allowed}: rel ${rel}, abs ${abs})`,
      );
    }
  }
}
