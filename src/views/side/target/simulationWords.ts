/** The bit-exact run's findings in plain sentences. */
import type { OverflowEvent } from '../../../core/fixed/index.ts';
import type { SimulationReport } from '../../../store/implementationDerived.ts';
import { formatNumber } from '../../shared/format.ts';

/** Overflow events listed by sample and section; the rest are counted. */
export const LISTED_OVERFLOWS = 6;

const PLACE_WORDS: Record<OverflowEvent['place'], string> = {
  accumulator: 'in the accumulator',
  output: 'fitting the output to the sample word',
};

/** "sample 12, section 2, in the accumulator" (sections counted from 1, as in the table). */
export function overflowWords(e: OverflowEvent): string {
  return `sample ${e.sample}, section ${e.section + 1}, ${PLACE_WORDS[e.place]}`;
}

/** One sentence on overflows during the run. */
export function overflowSummary(r: SimulationReport, samples: number): string {
  const n = r.simulation.overflowCount;
  if (n === 0) return `No overflow in ${samples} samples.`;
  const first = r.simulation.overflows[0]!;
  return `${n} overflow${n === 1 ? '' : 's'} in ${samples} samples; the first at ${overflowWords(first)}.`;
}

/** One sentence on what the filter does once the input stops (zero input). */
export function afterInputSummary(r: SimulationReport, dataBits: number): string {
  const a = r.afterInput;
  if (a.verdict === 'rest')
    return `After the input stops, the output comes to rest (all states zero within ${a.samplesRun} samples).`;
  if (a.verdict === 'undecided')
    return `After the input stops, the states had neither come to rest nor repeated within ${a.samplesRun} samples.`;
  const lsb = 2 ** -(dataBits - 1);
  const kind = a.overflowCount > 0 ? 'an overflow oscillation' : 'a limit cycle';
  return `After the input stops, the output never comes to rest: ${kind} with a period of ${a.period} sample${a.period === 1 ? '' : 's'} and an amplitude of ${a.amplitudeCodes} LSB (${formatNumber(a.amplitudeCodes * lsb, 3)} of full scale).`;
}

/** One sentence comparing the fixed-point output with the float cascade on the same input. */
export function errorSummary(r: SimulationReport): string {
  const e = r.maxErrorLsb;
  return `Largest difference from the unquantized cascade: ${formatNumber(e, 3)} LSB of the output.`;
}
