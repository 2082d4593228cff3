/** Final checks every entry form applies to its b/a arrays before handing them out. */
import type { TransferFunction } from '../types.ts';
import { fail } from './errors.ts';
import { MAX_COEFFICIENTS } from '../model/limits.ts';

/**
 * Returns tf when every coefficient is finite, a[0] is nonzero, b is not all zeros and neither list is longer
 * than a design may keep (MAX_COEFFICIENTS); fails otherwise.
 */
export function checkTransferFunction(tf: TransferFunction, pos: number): TransferFunction {
  for (const [name, list] of [
    ['b', tf.b],
    ['a', tf.a],
  ] as const) {
    if (list.length > MAX_COEFFICIENTS)
      fail(
        `${name} has ${list.length} coefficients (order ${list.length - 1})`,
        pos,
        `at most ${MAX_COEFFICIENTS} coefficients (order ${MAX_COEFFICIENTS - 1})`,
      );
  }
  const bad = [...tf.b, ...tf.a].find((v) => !Number.isFinite(v));
  if (bad !== undefined) fail(`a coefficient came out as ${bad}`, pos, 'finite coefficients');
  if (tf.a.length === 0 || tf.a[0] === 0) {
    fail('a[0] is zero: the newest output sample has no coefficient', pos, 'a nonzero a[0]');
  }
  if (tf.b.every((v) => v === 0)) fail('the numerator is zero, so H(z) = 0', pos, 'at least one nonzero b');
  return tf;
}
