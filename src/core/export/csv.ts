/** CSV export: one row per section with float coefficients and integer codes; conventions as # comment lines. */
import type { Implementation } from '../fixed/index.ts';
import { conventionLines } from './conventions.ts';
import { float17 } from './numbers.ts';
import { noiseLines } from './noise.ts';
import type { RequirementMask } from '../mask/index.ts';
import { exportWarnings, warningLine } from './warnings.ts';

/**
 * The CSV export text: '#' lines (first the warnings, "# warnings: N" and one "# warning: …" line each, judged
 * against `opts.mask` when given), a header row, then one row per section in cascade order.
 */
export function exportCsv(impl: Implementation, opts: { mask?: RequirementMask } = {}): string {
  const neg = impl.settings.feedbackSign === 'negated';
  const sign = neg ? -1 : 1;
  const names = neg ? ['b0', 'b1', 'b2', 'neg_a1', 'neg_a2'] : ['b0', 'b1', 'b2', 'a1', 'a2'];
  const header = [
    'section',
    ...names,
    ...names.map((n) => `${n}_code`),
    'scale',
    'pole_radius',
    'peak_gain_db',
  ];
  const rows = impl.cascade.sections.map((sec, i) => {
    const c = sec.coefficients;
    const codes = impl.quantized.codes[i]!;
    return [
      String(i),
      ...[c[0], c[1], c[2], sign * c[4], sign * c[5]].map(float17),
      ...[...codes.b, ...codes.a].map(String),
      float17(sec.scale),
      float17(sec.poleRadius),
      float17(sec.peakGainDb),
    ].join(',');
  });
  const warnings = exportWarnings(impl, opts.mask);
  const top = [`warnings: ${warnings.length}`, ...warnings.map((w) => `warning: ${warningLine(w)}`)];
  return (
    [
      ...[...top, ...conventionLines(impl), ...noiseLines(impl)].map((l) => `# ${l}`),
      header.join(','),
      ...rows,
    ].join('\n') + '\n'
  );
}
