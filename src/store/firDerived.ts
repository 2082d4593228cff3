/**
 * The FIR implementation of an FIR design (every pole at the origin) for the Target page: its taps, the
 * form and fixed-point settings from the design's implementation settings, the quantization error and the
 * worst-case run. Loaded with the Target page.
 */
import { type ImplementationSettings } from '../core/fixed/index.ts';
import {
  buildFirImplementation,
  firFormFor,
  firQuantizationError,
  firTapsOf,
  firWorstInput,
  runFirCodes,
  type FirImplementation,
} from '../core/fixed/fir.ts';
import type { Result, TransferFunction, Zpk } from '../core/types.ts';
import type { OverflowEvent } from '../core/fixed/index.ts';
import { selectZpk } from './derived.ts';
import { firMaskResult } from '../core/fixed/firMask.ts';
import type { MaskResult, RequirementMask } from '../core/mask/index.ts';
import { implementationOf } from './implementation.ts';
import { memoLast } from './memo.ts';
import type { WorkbenchState } from './store.ts';

const tapsOf = memoLast((zpk: Zpk, typed: TransferFunction | null) => firTapsOf(zpk, typed));
const typedOf = memoLast((t: WorkbenchState['design']['typed']) => (t ? { b: t.b, a: t.a } : null));

/** The design's taps when it is an FIR (typed coefficients as given), else null. */
export function selectFirTaps(s: WorkbenchState): number[] | null {
  return tapsOf(selectZpk(s), typedOf(s.design.typed));
}

const firOf = memoLast((taps: number[], fs: number, s: ImplementationSettings): Result<FirImplementation> =>
  buildFirImplementation(taps, fs, {
    form: firFormFor(taps, s.firForm),
    wordLength: s.wordLength,
    fractionBits: s.fractionBits,
    dataWordLength: s.dataWordLength,
    accumulatorBits: s.accumulatorBits,
    rounding: s.rounding,
    overflow: s.overflow,
  }),
);

/** The FIR implementation (or why the settings do not apply), or null for a design that is not an FIR. */
export function selectFirImplementation(s: WorkbenchState): Result<FirImplementation> | null {
  const taps = selectFirTaps(s);
  return taps ? firOf(taps, s.design.sampleRate, implementationOf(s.design)) : null;
}

export interface FirChecks {
  /** Largest |H_q − H| and its frequency in Hz. */
  quantization: { largest: number; hz: number };
  /** The worst-case full-scale input's run: overflow events in the accumulator and at the output. */
  worst: { samples: number; accumulator: number; output: number; first: OverflowEvent | null };
}

const checksOf = memoLast((impl: FirImplementation): FirChecks => {
  const q = firQuantizationError(impl);
  const x = firWorstInput(impl);
  const r = runFirCodes(impl, x);
  return {
    quantization: { largest: q.largest, hz: (q.omega / (2 * Math.PI)) * impl.sampleRate },
    worst: {
      samples: x.length,
      accumulator: r.overflows.filter((e) => e.place === 'accumulator').length,
      output: r.overflows.filter((e) => e.place === 'output').length,
      first: r.overflows[0] ?? null,
    },
  };
});

/** The quantization error and the worst-case run of the FIR implementation, or null. */
export function selectFirChecks(s: WorkbenchState): FirChecks | null {
  const r = selectFirImplementation(s);
  return r?.ok ? checksOf(r.value) : null;
}

const firMaskOf = memoLast((impl: FirImplementation, mask: RequirementMask | undefined) =>
  firMaskResult(impl, mask),
);
/**
 * The design's mask judged on the quantized taps the target runs, or null (not an FIR, no target settings,
 * no mask, or settings that do not apply).
 */
export function selectFirQuantizedMask(s: WorkbenchState): MaskResult | null {
  if (!s.design.implementation) return null;
  const fir = selectFirImplementation(s);
  return fir?.ok ? firMaskOf(fir.value, s.design.mask) : null;
}
