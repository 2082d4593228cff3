import { describe, it, expect } from 'vitest';
import { readTypedSamples } from '../../../../src/views/side/target/typedSamples.ts';
import { afterInputSummary, overflowSummary } from '../../../../src/views/side/target/simulationWords.ts';
import type { SimulationReport } from '../../../../src/store/implementationDerived.ts';

describe('typed samples for the bit-exact run', () => {
  it('reads commas, spaces, new lines and the minus sign', () => {
    const r = readTypedSamples('0.5, -0.25\n1e-3  −0.5;.75');
    expect(r).toEqual({ ok: true, values: [0.5, -0.25, 0.001, -0.5, 0.75] });
  });

  it('names the first item that is not a number', () => {
    const r = readTypedSamples('0.1, 0.2, x3');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/Item 3, "x3"/);
    expect(readTypedSamples('  ').ok).toBe(false);
  });
});

describe('simulation report in words', () => {
  const report = (over: Partial<SimulationReport['afterInput']>, overflows = 0): SimulationReport =>
    ({
      simulation: {
        overflowCount: overflows,
        overflows: overflows ? [{ sample: 12, section: 1, place: 'accumulator' }] : [],
      },
      afterInput: {
        verdict: 'cycle',
        period: 40,
        amplitudeCodes: 29,
        amplitude: 29 / 32768,
        cycle: new Int32Array(0),
        samplesRun: 900,
        overflowCount: 0,
        ...over,
      },
      maxErrorLsb: 0,
    }) as unknown as SimulationReport;

  it('counts sections from 1 as the table does, and states period and amplitude', () => {
    expect(overflowSummary(report({}, 3), 512)).toBe(
      '3 overflows in 512 samples; the first at sample 12, section 2, in the accumulator.',
    );
    expect(afterInputSummary(report({}), 16)).toMatch(
      /limit cycle with a period of 40 samples and an amplitude of 29 LSB/,
    );
    expect(afterInputSummary(report({ overflowCount: 5 }), 16)).toMatch(/overflow oscillation/);
    expect(afterInputSummary(report({ verdict: 'rest' }), 16)).toMatch(/comes to rest/);
  });
});
