/**
 * Zero-input limit cycles. With the input held at zero a fixed-point cascade is a finite-state machine, so
 * its state must end at rest or in a cycle; Brent's cycle-finding algorithm (R. P. Brent, 1980) finds the
 * cycle length with one saved state, comparing whole states (not outputs), so a detected period is exact.
 */
import type { Implementation } from './implementation.ts';
import type { FixedCascade } from './kernel.ts';
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
  const counter = { counting: false, count: 0 };
  const f = fixedCascadeOf(impl, () => {
    if (counter.counting) counter.count++;
  });
  for (let n = 0; n < excitation.length; n++) f.step(excitation[n]!, n);
  return zeroInputVerdict(f, excitation.length, impl.settings.dataWordLength, counter, maxSamples);
}

/**
 * Continues a running cascade (its state as the input left it, next sample index `start`) with zero input
 * until the state rests or repeats. `counter.counting` is switched on so the cascade's overflow callback can
 * count the zero-input run's overflows into `counter.count`. The cascade's state is changed.
 */
export function zeroInputVerdict(
  f: FixedCascade<number> | FixedCascade<bigint>,
  start: number,
  dataWordLength: number,
  counter: { counting: boolean; count: number },
  maxSamples = LIMIT_CYCLE_MAX_SAMPLES,
): LimitCycleReport {
  counter.counting = true;
  counter.count = 0;
  let n = start;
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
    overflowCount: counter.count,
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
    amplitude: amplitudeCodes * 2 ** -(dataWordLength - 1),
    cycle,
    samplesRun: run,
    overflowCount: counter.count,
  };
}
