/** What `simulate --fixed` reports: the JSON object and the warnings for stderr. */
import {
  qName,
  type FixedRunReport,
  type Implementation,
  type LimitCycleReport,
  type RoundoffNoise,
} from '../core/fixed/index.ts';

/** Overflow events and limit cycles, in words, for stderr. */
export function fixedWarnings(report: FixedRunReport & { afterInput: LimitCycleReport }): string[] {
  const out: string[] = [];
  if (report.inputClipped > 0)
    out.push(`${report.inputClipped} input sample(s) were beyond the data word and were saturated.`);
  const first = report.overflows[0];
  if (first)
    out.push(
      `${report.overflowCount} overflow event(s); the first at sample ${first.sample}, section ${first.section + 1} ` +
        `(${first.place === 'output' ? 'fitting the output to the data word' : 'in the accumulator'}).`,
    );
  const a = report.afterInput;
  if (a.verdict === 'cycle')
    out.push(
      `after the input the cascade does not come to rest: a limit cycle of period ${a.period} sample(s), ` +
        `amplitude ${a.amplitudeCodes} LSB${a.overflowCount > 0 ? ', with overflows (an overflow oscillation)' : ''}.`,
    );
  if (a.verdict === 'undecided')
    out.push(
      `after the input the cascade neither rested nor repeated within ${a.samplesRun} zero-input samples.`,
    );
  return out;
}

/** The JSON report of a fixed-point run (the caller adds the codes or the output file). */
export function fixedJson(
  impl: Implementation,
  report: FixedRunReport & { afterInput: LimitCycleReport },
  noise: RoundoffNoise,
  run: { input: string; sampleRate: number; frames: number },
) {
  const a = report.afterInput;
  return {
    sampleRate: run.sampleRate,
    input: run.input,
    samples: run.frames,
    settings: impl.settings,
    coefficientFormat: qName(impl.quantized.format),
    dataFormat: qName(impl.dataFormat),
    outputScale: 2 ** -(impl.settings.dataWordLength - 1),
    outputGain: impl.cascade.outputGain,
    quantizedStability: impl.stability.verdict,
    inputClipped: report.inputClipped,
    overflows: { count: report.overflowCount, listed: report.overflows },
    limitCycle: {
      verdict: a.verdict,
      period: a.period,
      amplitudeCodes: a.amplitudeCodes,
      amplitude: a.amplitude,
      zeroInputSamples: a.samplesRun,
      overflowCount: a.overflowCount,
    },
    ideal: report.ideal,
    roundoff: {
      measured: report.roundoff,
      predicted: {
        powerDbfs: noise.powerDbfs,
        rmsLsb: noise.rmsLsb,
        offsetLsb: noise.offsetLsb,
        snrDb: noise.snrDb,
        effectiveBits: noise.effectiveBits,
        sectionsDbfs: noise.sections.map((s) => s.powerDbfs),
        converged: noise.converged,
      },
    },
  };
}
