/**
 * Derived round-off noise of the implementation in force, and the comparison of its arrangements (orderings,
 * scalings, structures), memoised like implementationDerived.ts. The comparison builds sixteen implementations,
 * so the page asks for it only while its table is open, and not during a drag.
 */
import {
  compareArrangements,
  roundoffNoise,
  type Arrangement,
  type Implementation,
  type ImplementationSettings,
  type RoundoffNoise,
} from '../core/fixed/index.ts';
import type { Zpk } from '../core/types.ts';
import { memoLast } from './memo.ts';
import { rootsZpk, selectImplementation, selectImplementationSettings } from './implementationDerived.ts';
import type { WorkbenchState } from './store.ts';

const noiseOf = memoLast((impl: Implementation) => roundoffNoise(impl));
const arrangementsOf = memoLast((zpk: Zpk, fs: number, settings: ImplementationSettings) =>
  compareArrangements(zpk, fs, settings),
);

/** Predicted output round-off noise of the implementation in force, or null when its settings do not apply. */
export const selectRoundoffNoise = (s: WorkbenchState): RoundoffNoise | null => {
  const r = selectImplementation(s);
  return r.ok ? noiseOf(r.value) : null;
};

/** Every ordering × scaling × structure with the other settings in force, quietest first. */
export const selectArrangements = (s: WorkbenchState): Arrangement[] =>
  arrangementsOf(rootsZpk(s), s.design.sampleRate, selectImplementationSettings(s));
