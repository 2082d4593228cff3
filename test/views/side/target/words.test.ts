import { describe, it, expect } from 'vitest';
import { cPrefix, exportFileName } from '../../../../src/views/side/target/fileNames.ts';
import { readTypedSamples } from '../../../../src/views/side/target/typedSamples.ts';
import { afterInputSummary, overflowSummary } from '../../../../src/views/side/target/simulationWords.ts';
import type { SimulationReport } from '../../../../src/store/implementationDerived.ts';

describe('export file names and C prefixes from the design name', () => {
  it('keeps letters and digits, joins words, and names a C header after its prefix', () => {
    expect(exportFileName('Hopper scale: 50 Hz hum notches', 'json')).toBe(
      'hopper-scale-50-hz-hum-notches.json',
    );
    expect(exportFileName('Hopper scale: 50 Hz hum notches', 'h')).toBe('hopper_scale_50_hz_hum_notches.h');
    expect(cPrefix('Pump skid — 3.15 kHz bracket')).toBe('pump_skid_3_15_khz_bracket');
  });

  it('never starts a C name with a digit and falls back when nothing is left', () => {
    expect(cPrefix('4th-order anti-alias')).toBe('f_4th_order_anti_alias');
    expect(cPrefix('→ ←')).toBe('pw_filter');
    expect(exportFileName('', 'csv')).toBe('filter.csv');
    expect(/^[A-Za-z_][A-Za-z0-9_]*$/.test(cPrefix('Ünïcödé names, too!'))).toBe(true);
  });

  it('stops at whole words when a name is long', () => {
    const p = cPrefix('a very long design name that goes on and on about its hum notches');
    expect(p.length).toBeLessThanOrEqual(32);
    expect(p.endsWith('_')).toBe(false);
    expect('a_very_long_design_name_that_goes_on'.startsWith(p)).toBe(true);
  });
});

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
