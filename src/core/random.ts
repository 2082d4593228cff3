/**
 * The one seeded generator of the project (noise inputs, test signals, tests and benchmarks): the same seed
 * gives the same numbers on every platform.
 */

/** Uniform generator on [0, 1) from a 32-bit seed: mulberry32, a 32-bit-state mixer with period 2^32. */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
