/**
 * What an export must warn about: an implementation that is not safe to put on a target as it stands. Every
 * export format carries these in the file itself (C: a comment block and a count constant; JSON: a `warnings`
 * array; CSV: comment lines), and `polewright export` refuses to finish quietly while any are present.
 *
 * The checks read the quantized codes exactly: a code stands for code·2^−F, so the sums below (1 + a1 + a2
 * and 1 − a1 + a2) are exact in double precision and "on the unit circle" means exactly on it, not nearly.
 */
import { codeRange, qName, quantizeValue, storedValues, type Implementation } from '../fixed/index.ts';
import { evaluateMask, type MaskResult, type RequirementMask } from '../mask/index.ts';
import { shortNumber } from '../shortNumber.ts';

/** The kinds of warning, as they appear in every export format (stable keys for scripts). */
export type ExportWarningKey =
  | 'quantized-unstable'
  | 'quantized-marginal'
  | 'poles-on-unit-circle'
  | 'coefficients-clamped'
  | 'numerator-all-zero'
  | 'identical-clamped-sections'
  | 'mask-fails-quantized'
  | 'accumulator-can-overflow';

/** One warning: its key, where it applies ("section 2", "whole filter") and what is wrong, in words. */
export interface ExportWarning {
  key: ExportWarningKey;
  where: string;
  message: string;
}

const fmt = (v: number) => shortNumber(v, 4);

/** Names of the five stored values of a section, in the export's order. */
function storedNames(impl: Implementation): string[] {
  return impl.settings.feedbackSign === 'negated'
    ? ['b0', 'b1', 'b2', '-a1', '-a2']
    : ['b0', 'b1', 'b2', 'a1', 'a2'];
}

/** Per section, the names of the stored values that did not fit the Q format and were clamped. */
function clampedBySection(impl: Implementation): string[][] {
  const names = storedNames(impl);
  const q = impl.quantized.format;
  return impl.cascade.sections.map((sec) =>
    storedValues(sec.coefficients, impl.settings.feedbackSign)
      .map((v, i) => (quantizeValue(v, q, impl.settings.rounding).saturated ? names[i]! : null))
      .filter((n): n is string => n !== null),
  );
}

/** Where a quantized denominator 1 + a1 z^−1 + a2 z^−2 has poles exactly on the unit circle, in words. */
function onCircle(a1: number, a2: number): string | null {
  const found: string[] = [];
  if (1 + a1 + a2 === 0) found.push('z = 1');
  if (1 - a1 + a2 === 0) found.push('z = −1');
  if (a2 === 1 && a1 * a1 < 4) found.push(`a pair at radius 1 (angle ±${fmt(Math.acos(-a1 / 2))} rad)`);
  return found.length ? found.join(' and ') : null;
}

/**
 * The warnings of an implementation: quantized filter unstable or marginal, poles exactly on the unit
 * circle, clamped coefficients, sections whose numerator codes are all 0, sections clamped to identical
 * codes, and (with a mask) the quantized filter failing the requirement mask. Empty when none apply.
 */
export function exportWarnings(impl: Implementation, mask?: RequirementMask): ExportWarning[] {
  const out: ExportWarning[] = [];
  const q = qName(impl.quantized.format);
  const bits = impl.settings.wordLength;
  const circle: number[] = [];
  impl.quantized.sections.forEach((s, k) => {
    const where = onCircle(s[4], s[5]);
    if (!where) return;
    circle.push(k);
    out.push({
      key: 'poles-on-unit-circle',
      where: `section ${k}`,
      message: `the quantized denominator puts poles exactly on the unit circle at ${where}: the section never settles (${bits}-bit ${q})`,
    });
  });
  const st = impl.stability;
  if (st.verdict === 'unstable')
    out.push({
      key: 'quantized-unstable',
      where: 'whole filter',
      message: `the quantized filter is unstable: ${st.reason}`,
    });
  else if (st.verdict === 'marginal' && circle.length === 0)
    out.push({
      key: 'quantized-marginal',
      where: 'whole filter',
      message: `the quantized filter is marginally stable: ${st.reason}`,
    });
  const clamped = clampedBySection(impl);
  clamped.forEach((names, k) => {
    if (names.length === 0) return;
    const { min, max } = codeRange(bits);
    out.push({
      key: 'coefficients-clamped',
      where: `section ${k}`,
      message: `${names.join(', ')} ${names.length === 1 ? 'does' : 'do'} not fit ${q} and ${names.length === 1 ? 'was' : 'were'} clamped to ${min}…${max}: the section is not the designed one`,
    });
  });
  impl.quantized.codes.forEach((c, k) => {
    if (c.b.every((v) => v === 0))
      out.push({
        key: 'numerator-all-zero',
        where: `section ${k}`,
        message: `b0, b1 and b2 all quantize to code 0 in ${q}: the section, and so the whole filter, outputs only 0 (choose more fraction bits, a longer word or another scaling)`,
      });
  });
  // Identical codes are fine for a repeated root pair; after clamping they mean distinct sections collapsed.
  const groups = new Map<string, number[]>();
  impl.quantized.codes.forEach((c, k) => {
    if (clamped[k]!.length === 0) return;
    const key = [...c.b, ...c.a].join(',');
    groups.set(key, [...(groups.get(key) ?? []), k]);
  });
  for (const ks of groups.values())
    if (ks.length > 1)
      out.push({
        key: 'identical-clamped-sections',
        where: `sections ${ks.join(', ')}`,
        message: `clamping left these sections with identical codes: the design's different roots are lost`,
      });
  if (mask && mask.regions.length > 0) {
    const w = maskFailureWarning(evaluateMask(mask, impl.quantizedZpk, impl.sampleRate), `${bits}-bit ${q}`);
    if (w) out.push(w);
  }
  return out;
}

/** The 'mask-fails-quantized' warning of a mask verdict on the quantized filter (`filter`: "16-bit Q1.14"), or null when it passes. */
export function maskFailureWarning(v: MaskResult, filter: string): ExportWarning | null {
  if (v.pass) return null;
  const worst = v.regions.find((r) => r.id === v.worstRegionId);
  const at = Number.isFinite(v.worstAtHz) ? ` at ${fmt(v.worstAtHz)} Hz` : '';
  const by = Number.isFinite(v.worstMarginDb)
    ? `by ${fmt(-v.worstMarginDb)} dB${at}`
    : (worst?.problem ?? `at ${fmt(v.worstAtHz)} Hz (response ${fmt(worst?.worstDb ?? NaN)} dB)`);
  return {
    key: 'mask-fails-quantized',
    where: `mask region ${JSON.stringify(v.worstRegionId)}`,
    message: `the quantized filter (${filter}) fails the requirement mask in ${v.regions.filter((r) => !r.pass).length} of ${v.regions.length} regions, worst ${by}`,
  };
}

/** One warning as a line of text: "[key] where: message". */
export function warningLine(w: ExportWarning): string {
  return `[${w.key}] ${w.where}: ${w.message}`;
}
