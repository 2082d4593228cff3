/**
 * The exported C header compiled with the machine's gcc and run on the same inputs as the TypeScript
 * simulation: fixed point must match bit for bit (outputs and overflow-event count), double precision within
 * 1e-9 relative to the float64 cascade. A missing gcc fails these tests; nothing is skipped.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  quantizeInput,
  runFixedCodes,
  type Implementation,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import { exportC } from '../../../src/core/export/index.ts';
import { designIir } from '../../../src/core/design/index.ts';
import { filterSections } from '../../../src/core/time.ts';
import { makeSine, makeWhiteNoise, mulberry32 } from '../../../src/core/signals.ts';
import type { Zpk } from '../../../src/core/types.ts';

const MAIN_C = `#include <stdio.h>
#include <stdlib.h>
#include "filter.h"

/* usage: prog fixed|float < "n v0 v1 ..."; processes in two pieces to check that state carries over */
int main(int argc, char **argv) {
  size_t n, i, half;
  if (argc < 2 || scanf("%lu", (unsigned long *)&n) != 1) return 2;
  half = n / 3;
  if (argv[1][0] == 'x') {
    pw_filter_sample *x = malloc(n * sizeof *x + 1), *y = malloc(n * sizeof *y + 1);
    pw_filter_fixed_state st;
    unsigned long events;
    for (i = 0; i < n; i++) {
      long long v;
      if (scanf("%lld", &v) != 1) return 3;
      x[i] = (pw_filter_sample)v;
    }
    pw_filter_fixed_reset(&st);
    events = pw_filter_fixed_process(&st, x, y, half);
    events += pw_filter_fixed_process(&st, x + half, y + half, n - half);
    for (i = 0; i < n; i++) printf("%lld\\n", (long long)y[i]);
    printf("events %lu\\n", events);
  } else {
    double *x = malloc(n * sizeof *x + 1), *y = malloc(n * sizeof *y + 1);
    pw_filter_float_state st;
    for (i = 0; i < n; i++)
      if (scanf("%lf", &x[i]) != 1) return 3;
    pw_filter_float_reset(&st);
    pw_filter_float_process(&st, x, y, half);
    pw_filter_float_process(&st, x + half, y + half, n - half);
    for (i = 0; i < n; i++) printf("%.17g\\n", y[i]);
  }
  return 0;
}
`;

let work = '';
let built = 0;
beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'polewright-c-'));
  // Fails (rather than skips) when gcc is missing.
  execFileSync('gcc', ['--version']);
});

/** Compiles the header with a strict C99 gcc and returns the program path. */
function compile(header: string): string {
  const dir = join(work, `b${built++}`);
  execFileSync('mkdir', ['-p', dir]);
  writeFileSync(join(dir, 'filter.h'), header);
  writeFileSync(join(dir, 'main.c'), MAIN_C);
  const exe = join(dir, 'prog');
  execFileSync(
    'gcc',
    ['-std=c99', '-O2', '-Wall', '-Wextra', '-pedantic', '-Werror', '-o', exe, join(dir, 'main.c')],
    {
      stdio: 'pipe',
    },
  );
  return exe;
}

function runProgram(
  exe: string,
  mode: 'fixed' | 'float',
  values: ArrayLike<number>,
  fmt: (v: number) => string,
): string[] {
  const input = `${values.length}\n${Array.from(values, fmt).join('\n')}\n`;
  return execFileSync(exe, [mode === 'fixed' ? 'x' : 'f'], { input, maxBuffer: 1 << 26 })
    .toString()
    .trim()
    .split('\n');
}

const hum: Zpk = (() => {
  const fs = 2000;
  const pair = (f: number, r: number) => ({
    re: r * Math.cos((2 * Math.PI * f) / fs),
    im: r * Math.sin((2 * Math.PI * f) / fs),
    multiplicity: 1,
  });
  const r = 1 - (4 * Math.PI) / fs;
  return {
    zeros: [50, 150, 250].map((f) => pair(f, 1)),
    poles: [50, 150, 250].map((f) => pair(f, r)),
    gain: 0.97,
  };
})();
const ellip = designIir({
  family: 'elliptic',
  response: 'lowpass',
  order: 5,
  edgesHz: [120],
  fs: 1000,
  rippleDb: 0.5,
  attenuationDb: 60,
});
const butterBand = designIir({
  family: 'butterworth',
  response: 'bandpass',
  order: 2,
  edgesHz: [300, 500],
  fs: 8000,
});
const hot: Zpk = {
  zeros: [{ re: -1, im: 0, multiplicity: 2 }],
  poles: [{ re: 0.7, im: 0.6, multiplicity: 1 }],
  gain: 1.5,
};

// b1 = 3.9 needs Q2.29 in 32 bits; with ±full-scale data the five products pass 2^63 in the accumulator.
const hot64: Zpk = { ...hot, gain: 1.95 };

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

/** Noise near full scale, a loud sine, and a full-scale step: inputs that push the overflow rules. */
function inputs(n: number): Float64Array {
  const x = new Float64Array(n);
  x.set(
    makeWhiteNoise(n / 2, 7, 0.6).map((v) => Math.max(-1.2, Math.min(1.2, v))),
    0,
  );
  x.set(
    makeSine(0.3, n / 4).map((v) => 0.98 * v),
    n / 2,
  );
  x.fill(-1, (3 * n) / 4, (7 * n) / 8);
  x.fill(0.999, (7 * n) / 8);
  return x;
}

describe('exported C against the TypeScript simulation', () => {
  for (const c of cases) {
    const label = `${c.name}: ${JSON.stringify(c.settings)}`;
    it(`${label} — fixed point bit for bit, float within 1e-9`, () => {
      const impl = implement(c);
      const exe = compile(exportC(impl));
      const x = inputs(1600);
      const { codes } = quantizeInput(impl, x);
      const ts = runFixedCodes(impl, codes);
      const out = runProgram(exe, 'fixed', codes, String);
      expect(out.pop()).toBe(`events ${ts.overflowCount}`);
      expect(out.map(Number)).toEqual(Array.from(ts.output));

      const ref = filterSections(
        impl.cascade.sections.map((s) => s.coefficients),
        x,
      );
      const got = runProgram(exe, 'float', x, (v) => v.toPrecision(17)).map(Number);
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
