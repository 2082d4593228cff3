/** JSON export: the sections as floats and as quantized integer codes with their Q format, for other tools. */
import { qName, type Implementation, type QFormat } from '../fixed/index.ts';
import { conventionLines, structureName } from './conventions.ts';
import { designHash } from './hash.ts';
import { float17 } from './numbers.ts';
import { noiseJson } from './noise.ts';
import type { RequirementMask } from '../mask/index.ts';
import { exportWarnings } from './warnings.ts';

/** A value of the JSON writer: floats are written with 17 significant digits, integers as they are. */
export type Json = null | boolean | string | { float: number } | number | Json[] | { [k: string]: Json };

const isFloat = (v: Json): v is { float: number } =>
  typeof v === 'object' && v !== null && !Array.isArray(v) && Object.keys(v).length === 1 && 'float' in v;

export function write(v: Json, indent: string): string {
  if (v === null || typeof v === 'boolean' || typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'number') return String(v);
  if (isFloat(v)) return Number.isFinite(v.float) ? float17(v.float).replace(/^(-?)\./, '$10.') : 'null';
  const inner = `${indent}  `;
  if (Array.isArray(v)) {
    if (v.every((x) => typeof x === 'number' || isFloat(x)))
      return `[${v.map((x) => write(x, inner)).join(', ')}]`;
    return `[\n${v.map((x) => inner + write(x, inner)).join(',\n')}\n${indent}]`;
  }
  const entries = Object.entries(v).map(([k, x]) => `${inner}${JSON.stringify(k)}: ${write(x, inner)}`);
  return `{\n${entries.join(',\n')}\n${indent}}`;
}

const f = (x: number) => ({ float: x });

/** The coefficient and data formats as every JSON export states them (sections and FIR taps alike). */
export function formatsJson(
  q: QFormat,
  dataWordLength: number,
): { coefficientFormat: Json; dataFormat: Json } {
  return {
    coefficientFormat: {
      q: qName(q),
      wordLength: q.wordLength,
      integerBits: q.wordLength - 1 - q.fractionBits,
      fractionBits: q.fractionBits,
    },
    dataFormat: {
      q: `Q0.${dataWordLength - 1}`,
      wordLength: dataWordLength,
      fractionBits: dataWordLength - 1,
    },
  };
}

/**
 * The JSON export text (format "polewright-sections", version 1); `warnings` lists what makes the
 * implementation unsafe as it stands (empty when nothing does), judged against `opts.mask` when given.
 */
export function exportJson(impl: Implementation, opts: { mask?: RequirementMask } = {}): string {
  const s = impl.settings;
  const q = impl.quantized.format;
  const sign = s.feedbackSign === 'negated' ? -1 : 1;
  const doc: Json = {
    format: 'polewright-sections',
    version: 1,
    designHash: designHash(impl),
    warnings: exportWarnings(impl, opts.mask).map((w) => ({
      key: w.key,
      where: w.where,
      message: w.message,
    })),
    conventions: conventionLines(impl),
    sampleRate: f(impl.sampleRate),
    structure: s.structure,
    structureName: structureName(impl),
    coefficientOrder:
      s.feedbackSign === 'negated' ? ['b0', 'b1', 'b2', '-a1', '-a2'] : ['b0', 'b1', 'b2', 'a1', 'a2'],
    feedbackSign: s.feedbackSign,
    ...formatsJson(q, s.dataWordLength),
    accumulatorBits: s.accumulatorBits,
    postShift: impl.postShift,
    rounding: s.rounding,
    overflow: s.overflow,
    scaling: s.scaling,
    ordering: s.ordering,
    gainDistribution: s.gainDistribution,
    outputGain: f(impl.cascade.outputGain),
    stability: { ideal: impl.idealStability.verdict, quantized: impl.stability.verdict },
    roundoffNoise: noiseJson(impl),
    sections: impl.cascade.sections.map((sec, i) => {
      const c = sec.coefficients;
      const codes = impl.quantized.codes[i]!;
      return {
        float: [c[0], c[1], c[2], sign * c[4], sign * c[5]].map(f),
        fixed: [...codes.b, ...codes.a],
        scale: f(sec.scale),
        poleRadius: f(sec.poleRadius),
        peakGainDb: f(sec.peakGainDb),
      };
    }),
  };
  return write(doc, '') + '\n';
}
