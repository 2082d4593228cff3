/** JSON and CSV exports of an FIR implementation (core/fixed/fir.ts): the taps as floats and as codes. */
import { type FirImplementation } from '../fixed/fir.ts';
import { firConventionLines, firHash } from './firC.ts';
import { float17 } from './numbers.ts';
import { firExportWarnings } from './firWarnings.ts';
import { warningLine } from './warnings.ts';
import type { RequirementMask } from '../mask/index.ts';
import { formatsJson, write, type Json } from './json.ts';

const f = (x: number) => ({ float: x });

/** Options of the FIR's JSON and CSV exports: the design's mask, failed by the quantized taps, is a warning. */
export interface FirTextOptions {
  mask?: RequirementMask;
}

/** The JSON export text (format "polewright-fir", version 1); `warnings` as in the sections' JSON. */
export function exportFirJson(impl: FirImplementation, opts: FirTextOptions = {}): string {
  const s = impl.settings;
  const q = impl.format;
  const doc: Json = {
    format: 'polewright-fir',
    version: 1,
    designHash: firHash(impl),
    warnings: firExportWarnings(impl, opts.mask).map((w) => ({
      key: w.key,
      where: w.where,
      message: w.message,
    })),
    conventions: firConventionLines(impl),
    sampleRate: f(impl.sampleRate),
    form: s.form,
    symmetry: impl.symmetry,
    taps: impl.codes.length,
    multipliesPerSample: impl.multiplies,
    preAddBits: impl.preAddBits,
    ...formatsJson(q, s.dataWordLength),
    accumulatorBits: s.accumulatorBits,
    accumulatorBitsNeeded: impl.accumulatorNeeded,
    postShift: impl.postShift,
    rounding: s.rounding,
    overflow: s.overflow,
    worstCaseGain: f(impl.worstGain),
    float: impl.taps.map(f),
    fixed: impl.codes,
  };
  return write(doc, '') + '\n';
}

/**
 * The CSV export text: '#' lines (the warnings, "# warnings: N" and one "# warning: …" line each, then the
 * conventions), a header row, then one row per tap (k, value, code).
 */
export function exportFirCsv(impl: FirImplementation, opts: FirTextOptions = {}): string {
  const warnings = firExportWarnings(impl, opts.mask);
  const top = [`warnings: ${warnings.length}`, ...warnings.map((w) => `warning: ${warningLine(w)}`)];
  const rows = impl.taps.map((t, k) => `${k},${float17(t)},${impl.codes[k]}`);
  return (
    [...[...top, ...firConventionLines(impl)].map((l) => `# ${l}`), 'tap,value,code', ...rows].join('\n') +
    '\n'
  );
}
