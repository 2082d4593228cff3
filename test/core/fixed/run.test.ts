/** The streamed fixed-point run: any split into blocks gives the whole-signal codes, statistics and verdict. */
import { describe, it, expect } from 'vitest';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  detectLimitCycle,
  FixedRun,
  quantizeInput,
  simulateFixed,
  type Implementation,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { hot, hum, overflowInputs } from '../../helpers/fixedDesigns.ts';

function implement(zpk: Zpk, over: Partial<ImplementationSettings>): Implementation {
  const r = buildImplementation(zpk, 2000, { ...DEFAULT_IMPLEMENTATION, ...over });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('FixedRun', () => {
  const x = overflowInputs(4000);
  for (const [name, impl] of [
    ['hum notches, df1', implement(hum, { structure: 'df1' })],
    ['resonator overflowing, df2t, wrap', implement(hot, { scaling: 'none', overflow: 'wrap' })],
  ] as const) {
    it(`${name}: blocks of random sizes give the one-shot simulation`, () => {
      const whole = simulateFixed(impl, x);
      const run = new FixedRun(impl);
      const rand = mulberry32(3);
      const out: number[] = [];
      for (let i = 0; i < x.length;) {
        const n = 1 + Math.floor(rand() * 700);
        out.push(...run.pushValues(x.subarray(i, i + n)).output);
        i += n;
      }
      expect(out).toEqual(Array.from(whole.output));
      const report = run.finish();
      expect(report.overflowCount).toBe(whole.overflowCount);
      expect(report.overflows).toEqual(whole.overflows);
      expect(report.inputClipped).toBe(whole.inputClipped);
      // the ideal difference against simulateFixed's float reference, in LSBs
      let max = 0;
      for (let i = 0; i < x.length; i++)
        max = Math.max(max, Math.abs(whole.output[i]! - whole.reference[i]! * 32768));
      expect(report.ideal.maxLsb).toBeCloseTo(max, 6);
      expect(report.afterInput).toEqual(detectLimitCycle(impl, whole.input));
      expect(() => run.pushValues([0])).toThrow(/finished/);
    });
  }

  it('quantizes input values exactly as quantizeInput does (rounding, saturation, NaN)', () => {
    for (const rounding of ['nearest', 'truncate'] as const) {
      const impl = implement(hum, { rounding, dataWordLength: 12, accumulatorBits: 40 });
      const x = Float64Array.of(0.5, -0.5, 1, -1, 2, -3, NaN, 1 / 4096, 1.5 / 2048, -1.5 / 2048, 0.99999);
      const run = new FixedRun(impl);
      const ref = quantizeInput(impl, x);
      expect(Array.from(run.quantize(x))).toEqual(Array.from(ref.codes));
      expect(run.report().inputClipped).toBe(ref.clipped);
    }
  });

  it('clamps codes outside the data word and counts them', () => {
    const run = new FixedRun(implement(hum, {}));
    const codes = Int32Array.of(40000, -40000, 5);
    run.pushCodes(codes);
    expect(Array.from(codes)).toEqual([32767, -32768, 5]);
    expect(run.report().inputClipped).toBe(2);
  });
});
