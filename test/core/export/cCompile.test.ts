/**
 * The exported C header compiled with the machine's gcc and run on the same inputs as the TypeScript
 * simulation: fixed point must match bit for bit (outputs and overflow-event count), double precision within
 * 1e-9 relative to the float64 cascade. A missing gcc fails these tests; nothing is skipped.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  quantizeInput,
  runFixedCodes,
  type Implementation,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import { exportC } from '../../../src/core/export/index.ts';
import { filterSections } from '../../../src/core/time/filter.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { compileFilter, requireToolchain } from '../../helpers/cProgram.ts';
import { butterBand, ellip, hot, hot64, hum, overflowInputs } from '../../helpers/fixedDesigns.ts';

beforeAll(() => requireToolchain('host'));

interface Case {
  name: string;
  zpk: Zpk;
  settings: Partial<ImplementationSettings>;
}

const cases: Case[] = [];
const designs: [string, Zpk][] = [
  ['hum notches', hum],
  ['elliptic 5', ellip],
  ['butterworth band-pass', butterBand],
  ['hot resonator (unscaled, overflows)', hot],
];
const rand = mulberry32(2024);
for (const [name, zpk] of designs) {
  for (const structure of ['df1', 'df2t'] as const) {
    for (const rounding of ['nearest', 'truncate'] as const) {
      const overflow = rand() < 0.5 ? 'saturate' : 'wrap';
      const feedbackSign = rand() < 0.5 ? 'denominator' : 'negated';
      const scaling = name.startsWith('hot')
        ? 'none'
        : (['linf', 'l2', 'l1'] as const)[Math.floor(rand() * 3)]!;
      cases.push({ name, zpk, settings: { structure, rounding, overflow, feedbackSign, scaling } });
    }
  }
}
// Both overflow modes on the overflowing design, narrow and wide paths, a 64-bit accumulator that wraps.
cases.push(
  {
    name: 'hot, saturate, 12-bit words',
    zpk: hot,
    settings: {
      scaling: 'none',
      overflow: 'saturate',
      wordLength: 12,
      dataWordLength: 12,
      accumulatorBits: 24,
    },
  },
  {
    name: 'hot, wrap, 12-bit words',
    zpk: hot,
    settings: {
      scaling: 'none',
      overflow: 'wrap',
      wordLength: 12,
      dataWordLength: 12,
      accumulatorBits: 23,
      structure: 'df1',
    },
  },
  {
    name: 'elliptic, 32-bit words, 64-bit accumulator',
    zpk: ellip,
    settings: { wordLength: 32, dataWordLength: 32, accumulatorBits: 64, structure: 'df2t' },
  },
  {
    name: 'hot, 32-bit words, 63-bit accumulator, wrap',
    zpk: hot,
    settings: { scaling: 'none', overflow: 'wrap', wordLength: 32, dataWordLength: 32, accumulatorBits: 63 },
  },
  {
    name: 'hot, 32/32, 64-bit accumulator, saturate, truncate',
    zpk: { ...hot, gain: 3.9 },
    settings: {
      scaling: 'none',
      overflow: 'saturate',
      rounding: 'truncate',
      wordLength: 32,
      dataWordLength: 32,
      accumulatorBits: 64,
      structure: 'df1',
    },
  },
  ...(['df1', 'df2t'] as const).flatMap((structure) =>
    (['wrap', 'saturate'] as const).map((overflow) => ({
      name: `hot Q2.29, 64-bit accumulator overflowing, ${structure} ${overflow}`,
      zpk: hot64,
      settings: {
        scaling: 'none' as const,
        overflow,
        structure,
        wordLength: 32,
        dataWordLength: 32,
        accumulatorBits: 64,
      },
    })),
  ),
  {
    name: 'hum, 24-bit data, 20-bit coefficients, fixed Q2.17',
    zpk: hum,
    settings: {
      wordLength: 20,
      fractionBits: 17,
      dataWordLength: 24,
      accumulatorBits: 48,
      feedbackSign: 'negated',
    },
  },
);

function implement(c: Case): Implementation {
  const r = buildImplementation(c.zpk, 1000, { ...DEFAULT_IMPLEMENTATION, ...c.settings });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

const inputs = overflowInputs;

describe('exported C against the TypeScript simulation', () => {
  for (const c of cases) {
    const label = `${c.name}: ${JSON.stringify(c.settings)}`;
    it(`${label} — fixed point bit for bit, float within 1e-9`, () => {
      const impl = implement(c);
      const program = compileFilter(exportC(impl));
      const x = inputs(1600);
      const { codes } = quantizeInput(impl, x);
      const ts = runFixedCodes(impl, codes);
      const out = program.run('fixed', codes);
      expect(out.pop()).toBe(`events ${ts.overflowCount}`);
      expect(out.map(Number)).toEqual(Array.from(ts.output));

      const ref = filterSections(
        impl.cascade.sections.map((s) => s.coefficients),
        x,
      );
      const got = program.run('float', x, (v) => v.toPrecision(17)).map(Number);
      const scale = ref.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
      let worst = 0;
      for (let i = 0; i < ref.length; i++) worst = Math.max(worst, Math.abs(got[i]! - ref[i]!) / scale);
      expect(worst).toBeLessThan(1e-9);
    });
  }

  it('the overflowing cases really overflow, in both modes', () => {
    const hotCases = cases.filter((c) => c.zpk.zeros === hot.zeros);
    const counts = hotCases.map((c) => {
      const impl = implement(c);
      return runFixedCodes(impl, quantizeInput(impl, inputs(1600)).codes).overflowCount;
    });
    for (const n of counts) expect(n).toBeGreaterThan(0);
    expect(new Set(hotCases.map((c) => c.settings.overflow))).toEqual(new Set(['saturate', 'wrap']));
  });

  it('the 64-bit accumulator cases overflow the accumulator itself', () => {
    for (const c of cases.filter((k) => k.zpk === hot64)) {
      const impl = implement(c);
      const run = runFixedCodes(impl, quantizeInput(impl, inputs(1600)).codes);
      expect(run.overflows.filter((e) => e.place === 'accumulator').length, c.name).toBeGreaterThan(0);
    }
  });
});
