/** JSON and CSV exports of an FIR implementation (core/fixed/fir.ts): the taps as floats and as codes. */
import { qName } from '../fixed/index.ts';
import { type FirImplementation } from '../fixed/fir.ts';
import { firConventionLines, firHash } from './firC.ts';
import { float17 } from './numbers.ts';
import { write, type Json } from './json.ts';

const f = (x: number) => ({ float: x });

/** The JSON export text (format "polewright-fir", version 1). */
export function exportFirJson(impl: FirImplementation): string {
  const s = impl.settings;
  const q = impl.format;
  const doc: Json = {
    format: 'polewright-fir',
    version: 1,
    designHash: firHash(impl),
    conventions: firConventionLines(impl),
    sampleRate: f(impl.sampleRate),
    form: s.form,
    symmetry: impl.symmetry,
    taps: impl.codes.length,
    multipliesPerSample: impl.multiplies,
    preAddBits: impl.preAddBits,
    coefficientFormat: {
      q: qName(q),
      wordLength: q.wordLength,
      integerBits: q.wordLength - 1 - q.fractionBits,
      fractionBits: q.fractionBits,
    },
    dataFormat: {
      q: `Q0.${s.dataWordLength - 1}`,
      wordLength: s.dataWordLength,
      fractionBits: s.dataWordLength - 1,
    },
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

/** The CSV export text: '#' convention lines, a header row, then one row per tap (k, value, code). */
export function exportFirCsv(impl: FirImplementation): string {
  const rows = impl.taps.map((t, k) => `${k},${float17(t)},${impl.codes[k]}`);
  return [...firConventionLines(impl).map((l) => `# ${l}`), 'tap,value,code', ...rows].join('\n') + '\n';
}
