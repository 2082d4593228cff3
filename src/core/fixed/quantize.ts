/** Quantization of a cascade's coefficients to one Q format shared by every section. */
import type { Section } from '../types.ts';
import { autoFractionBits, codeValue, quantizeValue, type QFormat } from './qformat.ts';
import type { ImplementationSettings } from './settings.ts';

/** One section's codes: b0, b1, b2 and the stored feedback pair (a1, a2 or −a1, −a2 by the feedback sign). */
export interface FixedSection {
  b: [number, number, number];
  a: [number, number];
}

/** The quantized cascade. */
export interface QuantizedCoefficients {
  format: QFormat;
  /** Integer codes per section, as stored on the target. */
  codes: FixedSection[];
  /** The values the codes stand for, as sections [b0, b1, b2, 1, a1, a2] in the denominator's sign. */
  sections: Section[];
  /** Number of coefficients clamped to the largest code. */
  saturated: number;
}

/** The five stored values of a section (a0 = 1 is implied by the post-shift): b0, b1, b2, ±a1, ±a2. */
export function storedValues(s: Section, sign: ImplementationSettings['feedbackSign']): number[] {
  const f = sign === 'negated' ? -1 : 1;
  return [s[0] / s[3], s[1] / s[3], s[2] / s[3], (f * s[4]) / s[3], (f * s[5]) / s[3]];
}

/** Codes of every section coefficient in the settings' word length and Q format ('auto': largest that fits). */
export function quantizeCascade(
  sections: readonly Section[],
  settings: Pick<ImplementationSettings, 'wordLength' | 'fractionBits' | 'rounding' | 'feedbackSign'>,
): QuantizedCoefficients {
  const stored = sections.map((s) => storedValues(s, settings.feedbackSign));
  const fractionBits =
    settings.fractionBits === 'auto'
      ? autoFractionBits(stored.flat(), settings.wordLength, settings.rounding).fractionBits
      : settings.fractionBits;
  const format: QFormat = { wordLength: settings.wordLength, fractionBits };
  let saturated = 0;
  const f = settings.feedbackSign === 'negated' ? -1 : 1;
  const codes: FixedSection[] = [];
  const values: Section[] = [];
  for (const v of stored) {
    const c = v.map((x) => {
      const q = quantizeValue(x, format, settings.rounding);
      if (q.saturated) saturated++;
      return q.code;
    });
    codes.push({ b: [c[0]!, c[1]!, c[2]!], a: [c[3]!, c[4]!] });
    const [b0, b1, b2, a1, a2] = c.map((k) => codeValue(k, format));
    values.push([b0!, b1!, b2!, 1, f * a1!, f * a2!]);
  }
  return { format, codes, sections: values, saturated };
}
