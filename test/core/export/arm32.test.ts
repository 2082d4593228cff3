/**
 * A real 32-bit target: the exported C cross-compiled for 32-bit ARM (Debian's arm-linux-gnueabihf-gcc,
 * linked static) and run under qemu-arm. On ARMv7 int64_t arithmetic is a pair of 32-bit registers and long is
 * 32 bits, so this checks that the header's integer code does not lean on the host's 64-bit machine: fixed
 * point must equal the TypeScript simulation bit for bit (outputs and overflow-event count) for 16- and
 * 32-bit words, saturation and wraparound, direct form I and transposed direct form II; double precision
 * within 1e-9. A missing cross compiler or emulator fails these tests; nothing is skipped.
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
import type { Zpk } from '../../../src/core/types.ts';
import { compileFilter, requireToolchain } from '../../helpers/cProgram.ts';
import { ellip, hot, overflowInputs } from '../../helpers/fixedDesigns.ts';

beforeAll(() => requireToolchain('arm32'));

function implement(zpk: Zpk, settings: Partial<ImplementationSettings>): Implementation {
  const r = buildImplementation(zpk, 1000, { ...DEFAULT_IMPLEMENTATION, ...settings });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

interface Case {
  label: string;
  impl: Implementation;
}

const cases: Case[] = [];
for (const word of [16, 32] as const) {
  for (const overflow of ['saturate', 'wrap'] as const) {
    for (const structure of ['df1', 'df2t'] as const) {
      const words = { wordLength: word, dataWordLength: word, accumulatorBits: word === 16 ? 40 : 64 };
      // An unscaled resonator with gain above 1 overflows on the loud inputs; the elliptic low-pass does not.
      cases.push({
        label: `${word}-bit words, ${overflow}, ${structure}, resonator (overflows)`,
        impl: implement(hot, { ...words, overflow, structure, scaling: 'none' }),
      });
      cases.push({
        label: `${word}-bit words, ${overflow}, ${structure}, elliptic low-pass (L∞ scaled)`,
        impl: implement(ellip, { ...words, overflow, structure, rounding: 'truncate' }),
      });
    }
  }
}

describe('exported C on 32-bit ARM (qemu-arm) against the TypeScript simulation', () => {
  const x = overflowInputs(1600);
  for (const c of cases) {
    it(`${c.label}: fixed point bit for bit, float within 1e-9`, () => {
      const program = compileFilter(exportC(c.impl), 'arm32');
      const { codes } = quantizeInput(c.impl, x);
      const ts = runFixedCodes(c.impl, codes);
      const out = program.run('fixed', codes);
      expect(out.pop()).toBe(`events ${ts.overflowCount}`);
      expect(out.map(Number)).toEqual(Array.from(ts.output));
      if (c.label.includes('overflows')) expect(ts.overflowCount).toBeGreaterThan(0);

      const ref = filterSections(
        c.impl.cascade.sections.map((s) => s.coefficients),
        x,
      );
      const got = program.run('float', x, (v) => v.toPrecision(17)).map(Number);
      const scale = ref.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
      let worst = 0;
      for (let i = 0; i < ref.length; i++) worst = Math.max(worst, Math.abs(got[i]! - ref[i]!) / scale);
      expect(worst).toBeLessThan(1e-9);
    });
  }
});
