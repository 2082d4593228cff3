/**
 * The exported FIR C header compiled with the machine's gcc, and cross-compiled for 32-bit ARM
 * (arm-linux-gnueabihf-gcc, run under qemu-arm), run on the same inputs as the TypeScript simulation: fixed
 * point must match bit for bit (outputs and overflow-event count), double precision within 1e-9 relative to
 * a float64 convolution. The driver filters in two pieces, so the delay line must carry over. A missing
 * compiler fails these tests; nothing is skipped.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import {
  buildFirImplementation,
  DEFAULT_FIR_SETTINGS,
  quantizeFirInput,
  runFirCodes,
  type FirImplementation,
  type FirSettings,
} from '../../../src/core/fixed/fir.ts';
import { exportFirC } from '../../../src/core/export/index.ts';
import { filterTf } from '../../../src/core/time/filter.ts';
import { compileFilter, requireToolchain, type CTarget } from '../../helpers/cProgram.ts';
import { differentiator21, lopsided16, lowpass41, lowpass42 } from '../../helpers/firDesigns.ts';
import { overflowInputs } from '../../helpers/fixedDesigns.ts';

interface Case {
  name: string;
  taps: number[];
  settings: Partial<FirSettings>;
  /** The case must overflow the accumulator (a narrow one) or the output word. */
  overflows?: boolean;
}

const cases: Case[] = [];
for (const [name, taps] of [
  ['low-pass 41 taps', lowpass41],
  ['low-pass 42 taps', lowpass42],
  ['differentiator 21 taps', differentiator21],
] as const) {
  for (const form of ['direct', 'symmetric'] as const) {
    cases.push({ name, taps: [...taps], settings: { form } });
    cases.push({ name, taps: [...taps], settings: { form, rounding: 'truncate', overflow: 'wrap' } });
  }
}
cases.push(
  { name: 'lopsided 16 taps', taps: lopsided16, settings: { form: 'direct' } },
  {
    name: 'low-pass 41, narrow accumulator, wrap',
    taps: lowpass41,
    settings: { form: 'symmetric', accumulatorBits: 22, overflow: 'wrap' },
    overflows: true,
  },
  {
    name: 'low-pass 42, narrow accumulator, saturate',
    taps: lowpass42,
    settings: { form: 'direct', accumulatorBits: 21, overflow: 'saturate' },
    overflows: true,
  },
  {
    name: 'low-pass 41, 24-bit data, 20-bit taps Q0.19',
    taps: lowpass41,
    settings: {
      form: 'symmetric',
      dataWordLength: 24,
      wordLength: 20,
      fractionBits: 19,
      accumulatorBits: 48,
    },
  },
  {
    name: 'differentiator, 32-bit data, 31-bit taps, 64-bit accumulator',
    taps: differentiator21,
    settings: { form: 'symmetric', dataWordLength: 32, wordLength: 31, accumulatorBits: 64 },
  },
  {
    name: 'low-pass 42, 32/32 direct, 64-bit accumulator',
    taps: lowpass42,
    settings: {
      form: 'direct',
      dataWordLength: 32,
      wordLength: 32,
      accumulatorBits: 64,
      rounding: 'truncate',
    },
  },
);

function implement(c: Case): FirImplementation {
  const r = buildFirImplementation(c.taps, 1000, { ...DEFAULT_FIR_SETTINGS, ...c.settings });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

function check(c: Case, target: CTarget) {
  const impl = implement(c);
  const program = compileFilter(exportFirC(impl), target);
  const x = overflowInputs(1600);
  const { codes } = quantizeFirInput(impl, x);
  const ts = runFirCodes(impl, codes);
  const out = program.run('fixed', codes);
  expect(out.pop()).toBe(`events ${ts.overflowCount}`);
  expect(out.map(Number)).toEqual(Array.from(ts.output));
  if (c.overflows) expect(ts.overflowCount).toBeGreaterThan(0);

  const ref = filterTf({ b: impl.taps, a: [1] }, x);
  const got = program.run('float', x, (v) => v.toPrecision(17)).map(Number);
  const scale = ref.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  let worst = 0;
  for (let i = 0; i < ref.length; i++) worst = Math.max(worst, Math.abs(got[i]! - ref[i]!) / scale);
  expect(worst).toBeLessThan(1e-9);
}

describe('exported FIR C against the TypeScript simulation (gcc)', () => {
  beforeAll(() => requireToolchain('host'));
  for (const c of cases) {
    it(`${c.name}: ${JSON.stringify(c.settings)} — fixed point bit for bit, float within 1e-9`, () =>
      check(c, 'host'));
  }
  it('the narrow cases overflow the accumulator itself', () => {
    for (const c of cases.filter((k) => k.overflows)) {
      const impl = implement(c);
      expect(impl.accumulatorSafe).toBe(false);
      const run = runFirCodes(impl, quantizeFirInput(impl, overflowInputs(1600)).codes);
      expect(
        run.overflows.some((e) => e.place === 'accumulator'),
        c.name,
      ).toBe(true);
    }
  });
});

describe('exported FIR C on 32-bit ARM (qemu-arm)', () => {
  beforeAll(() => requireToolchain('arm32'));
  for (const c of cases.filter((_, i) => i % 3 === 0 || _.overflows || _.settings.accumulatorBits === 64)) {
    it(`${c.name}: ${JSON.stringify(c.settings)}`, () => check(c, 'arm32'), 60_000);
  }
});
