/**
 * A design taken to fixed point: the scaled cascade, its quantized coefficients, the quantized zeros and
 * poles, and the stability verdict after quantization. One result object the page and the exporters draw from.
 */
import type { Result, Root, Section, Zpk } from '../types.ts';
import { buildCascade, type Cascade } from '../sections/index.ts';
import { sectionsToZpk } from '../system/index.ts';
import { stabilityOfZpk, type Stability } from '../stability/index.ts';
import { responseZpk, type FrequencyResponse } from '../response/index.ts';
import { quantizeCascade, type QuantizedCoefficients } from './quantize.ts';
import { qName, type QFormat } from './qformat.ts';
import { validateSettings, type ImplementationSettings } from './settings.ts';

/** Zeros and poles of one section (stored form, conjugates implied). */
export interface SectionRoots {
  zeros: Root[];
  poles: Root[];
}

/** Everything about one fixed-point implementation of a design. */
export interface Implementation {
  /** The ideal design and its sample rate (Hz). */
  zpk: Zpk;
  sampleRate: number;
  settings: ImplementationSettings;
  /** The float cascade: ordered, gain-distributed and scaled. */
  cascade: Cascade;
  /** Coefficient codes, their Q format and the values they stand for. */
  quantized: QuantizedCoefficients;
  /** Format of the samples between sections: Q0.(D−1). */
  dataFormat: QFormat;
  /** Right shift from the accumulator (D−1+F fraction bits) back to the data word: F bits. */
  postShift: number;
  /** Roots of each quantized section, by the quadratic formula on its quantized coefficients. */
  sectionRoots: SectionRoots[];
  /** The quantized filter with the scaling's output gain restored, so it overlays the ideal design directly. */
  quantizedZpk: Zpk;
  /** Verdicts before and after quantization. */
  idealStability: Stability;
  stability: Stability;
  /** Things the user should know (saturated coefficients, unscaled cascade, lost stability). */
  notes: string[];
}

/**
 * Builds the implementation of the zpk (sample rate in Hz) under the settings, or says which setting is wrong.
 * `cascade` reuses a cascade already built from this zpk with the same pairing, ordering, gain and scaling.
 */
export function buildImplementation(
  zpk: Zpk,
  sampleRate: number,
  settings: ImplementationSettings,
  cascade: Cascade = cascadeFor(zpk, settings),
): Result<Implementation> {
  const checked = validateSettings(settings);
  if (!checked.ok) return checked;
  const float: Section[] = cascade.sections.map((s) => s.coefficients);
  const quantized = quantizeCascade(float, settings);
  const sectionRoots = quantized.sections.map((s) => {
    const z = sectionsToZpk([s]);
    return { zeros: z.zeros, poles: z.poles };
  });
  const q = sectionsToZpk(quantized.sections);
  const quantizedZpk = { ...q, gain: q.gain * cascade.outputGain };
  const stability = stabilityOfZpk(quantizedZpk);
  const idealStability = stabilityOfZpk(zpk);
  const notes = [...cascade.notes];
  if (quantized.saturated > 0)
    notes.push(
      `${quantized.saturated} coefficient(s) do not fit ${qName(quantized.format)} and were clamped to the largest code`,
    );
  if (stability.verdict !== 'stable' && idealStability.verdict === 'stable')
    notes.push(`quantization made the filter ${stability.verdict}: ${stability.reason}`);
  return {
    ok: true,
    value: {
      zpk,
      sampleRate,
      settings,
      cascade,
      quantized,
      dataFormat: { wordLength: settings.dataWordLength, fractionBits: settings.dataWordLength - 1 },
      postShift: quantized.format.fractionBits,
      sectionRoots,
      quantizedZpk,
      idealStability,
      stability,
      notes,
    },
  };
}

/** The float cascade the settings ask for (pairing, ordering, gain distribution, scaling). */
export function cascadeFor(zpk: Zpk, settings: ImplementationSettings): Cascade {
  return buildCascade(zpk, {
    pairing: settings.pairing,
    ordering: settings.ordering,
    gain: settings.gainDistribution,
    scaling: settings.scaling,
  });
}

/** Frequency response of the quantized filter (output gain restored) at each ω in radians per sample. */
export function quantizedResponse(impl: Implementation, omega: Float64Array): FrequencyResponse {
  return responseZpk(impl.quantizedZpk, omega);
}
