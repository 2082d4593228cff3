/** The fixed-point run of a recording in plain sentences. */
import { qName, type Implementation } from '../../core/fixed/index.ts';
import type { FixedRecordingResult } from '../../workers/fixedRecordingJob.ts';
import { formatDbFigure, formatNumber } from '../shared/format.ts';

const db1 = (x: number) => formatDbFigure(x, 1);

/** "Q1.14 coefficients, 16-bit data (Q0.15), transposed direct form II". */
export function implementationWords(impl: Implementation): string {
  const structure = impl.settings.structure === 'df1' ? 'direct form I' : 'transposed direct form II';
  return `${qName(impl.quantized.format)} coefficients, ${impl.settings.dataWordLength}-bit data (${qName(impl.dataFormat)}), ${structure}`;
}

/**
 * How far the fixed-point output is from the ideal filter, in LSB and dB, and how much of that is rounding
 * alone (the rest is the coefficients' quantization, and any overflow).
 */
export function differenceWords(r: FixedRecordingResult): string {
  const d = r.report.ideal;
  const below = d.referenceDbfs - d.powerDbfs;
  return (
    `differs from the ideal filter by at most ${formatNumber(d.maxLsb, 3)} LSB, ${formatNumber(d.rmsLsb, 3)} LSB rms ` +
    `(${db1(d.powerDbfs)} dBFS${Number.isFinite(below) ? `, ${db1(below)} dB below the output` : ''}); ` +
    `rounding alone ${formatNumber(r.report.roundoff.rmsLsb, 3)} LSB rms.`
  );
}

/** Overflows during the recording, with the time of the first. */
export function overflowWordsOf(r: FixedRecordingResult, sampleRate: number): string {
  const n = r.report.overflowCount;
  const clipped = r.report.inputClipped;
  const input = clipped > 0 ? ` ${clipped} input sample(s) beyond full scale were clipped first.` : '';
  if (n === 0) return `No overflow.${input}`;
  const e = r.report.overflows[0]!;
  const where = e.place === 'output' ? 'fitting its output to the data word' : 'in its accumulator';
  return `${n} overflow event${n === 1 ? '' : 's'}; the first at ${formatNumber(e.sample / sampleRate, 4)} s in section ${e.section + 1}, ${where}.${input}`;
}

/** What the filter does after the recording ends (zero input). */
export function afterWords(r: FixedRecordingResult): string {
  const a = r.report.afterInput;
  if (a.verdict === 'rest') return 'After the recording it comes to rest.';
  if (a.verdict === 'undecided')
    return `After the recording it neither rests nor repeats within ${a.samplesRun} samples.`;
  const kind = a.overflowCount > 0 ? 'an overflow oscillation' : 'a limit cycle';
  return `After the recording it never rests: ${kind} of period ${a.period} sample${a.period === 1 ? '' : 's'}, ±${a.amplitudeCodes} LSB.`;
}
