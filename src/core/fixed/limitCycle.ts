/**
 * Zero-input limit cycles. With the input held at zero a fixed-point cascade is a finite-state machine, so
 * its state must end at rest or in a cycle; Brent's cycle-finding algorithm (R. P. Brent, 1980) finds the
 * cycle length with one saved state, comparing whole states (not outputs), so a detected period is exact.
 */
import type { Implementation } from './implementation.ts';
import { fixedCascadeOf } from './simulate.ts';

/** Zero-input samples run at most, by default, before the verdict is 'undecided'. */
export const LIMIT_CYCLE_MAX_SAMPLES = 200_000;

/** The verdict after excitation and a zero-input run. */
export interface LimitCycleReport {
  /** 'rest': all states reached zero; 'cycle': a periodic nonzero state; 'undecided': neither within the budget. */
  verdict: 'rest' | 'cycle' | 'undecided';
  /** Period in samples (0 unless a cycle). */
  period: number;
  /** Largest |output code| over one period, and as a value (code·2^−(D−1)). */
  amplitudeCodes: number;
  amplitude: number;
  /** One period of output codes (empty unless a cycle). */
  cycle: Int32Array;
  /** Zero-input samples run until the verdict. */
  samplesRun: number;
  /** Overflows during the zero-input run: an overflow oscillation when the verdict is 'cycle'. */
  overflowCount: number;
}

/**
 * Runs the excitation codes through the implementation from rest, then zero input until the state rests or
 * repeats (at most maxSamples zero-input samples).
 */
export function detectLimitCycle(
  impl: Implementation,
  excitation: Int32Array,
  maxSamples = LIMIT_CYCLE_MAX_SAMPLES,
): LimitCycleReport {
  let overflowCount = 0;
  let counting = false;
  const f = fixedCascadeOf(impl, () => {
    if (counting) overflowCount++;
  });
  for (let n = 0; n < excitation.length; n++) f.step(excitation[n]!, n);
  counting = true;
  let n = excitation.length;
  let saved = f.snapshot();
  let power = 1;
  let lambda = 1;
  f.step(0, n++);
  let run = 1;
  while (!f.stateEquals(saved) && run < maxSamples) {
    if (power === lambda) {
      saved = f.snapshot();
      power *= 2;
      lambda = 0;
    }
    f.step(0, n++);
    lambda++;
    run++;
  }
  const none = {
    period: 0,
    amplitudeCodes: 0,
    amplitude: 0,
    cycle: new Int32Array(0),
    samplesRun: run,
    overflowCount,
  };
  if (!f.stateEquals(saved)) return { verdict: 'undecided', ...none };
  if (f.atRest()) return { verdict: 'rest', ...none };
  const cycle = new Int32Array(lambda);
  for (let k = 0; k < lambda; k++) cycle[k] = f.step(0, n++);
  const amplitudeCodes = cycle.reduce((m, y) => Math.max(m, Math.abs(y)), 0);
  return {
    verdict: 'cycle',
    period: lambda,
    amplitudeCodes,
    amplitude: amplitudeCodes * 2 ** -(impl.settings.dataWordLength - 1),
    cycle,
    samplesRun: run,
    overflowCount,
  };
}
