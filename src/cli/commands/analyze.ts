/** `polewright analyze`: roots, gain, coefficients, sections, stability and per-root read-outs. */
import type { TransferFunction } from '../../core/types.ts';
import { expandRoots, zpkToTf, zpkToSections } from '../../core/system/index.ts';
import { stabilityOfZpk } from '../../core/stability/index.ts';
import { stabilityOfTyped } from '../../core/stability/typed.ts';
import {
  exactDiagnostics,
  typedDiagnostics,
  uncertainRoots,
  type SystemDiagnostics,
} from '../../core/system/diagnostics.ts';
import { rootReadouts } from '../../core/readouts.ts';
import { checkExpandedCoefficients } from '../../core/system/expandedCheck.ts';
import { parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign, type CliDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { shortNumber } from '../../core/shortNumber.ts';
import { formatDb } from '../../core/format.ts';

const ASCII = { ascii: true } as const;

/** b and a scaled so that a[0] = 1 (the typed coefficients when the design came as coefficients). */
export function normalisedTf(d: CliDesign): TransferFunction {
  const tf = d.typed ?? zpkToTf(d.zpk);
  const a0 = tf.a[0] ?? 1;
  return { b: tf.b.map((v) => v / a0), a: tf.a.map((v) => v / a0) };
}

/** The analysis object printed by `analyze --json`. */
export function analysis(d: CliDesign) {
  const stability = d.typed ? stabilityOfTyped(d.zpk, d.typed.a) : stabilityOfZpk(d.zpk);
  const diagnostics = d.typed ? typedDiagnostics(d.typed) : exactDiagnostics(d.zpk);
  // Roots placed or designed: do their own multiplied-out b, a still describe them?
  const expanded = d.typed || d.zpk.poles.length === 0 ? null : checkExpandedCoefficients(d.zpk);
  const { b, a } = normalisedTf(d);
  return {
    sampleRate: d.sampleRate,
    zeros: expandRoots(d.zpk.zeros),
    poles: expandRoots(d.zpk.poles),
    gain: d.zpk.gain,
    b,
    a,
    sections: zpkToSections(d.zpk),
    stability: {
      verdict: stability.verdict,
      maxPoleRadius: stability.maxPoleRadius,
      reason: stability.reason,
      responsible: stability.responsible,
      decidedBy: stability.decidedBy,
      ...(stability.rootsSuggested && { rootsSuggested: stability.rootsSuggested }),
    },
    readouts: rootReadouts(d.zpk, d.sampleRate),
    diagnostics,
    ...(expanded?.warn && {
      coefficientWarning: {
        message: expanded.message,
        coefficientVerdict: expanded.coefficientVerdict,
        designVerdict: expanded.designVerdict,
        maxResponseErrorDb: expanded.maxResponseErrorDb,
      },
    }),
  };
}

/** Readable warnings about the computed roots: non-convergence and roots the coefficients leave uncertain. */
export function diagnosticLines(diag: SystemDiagnostics): string[] {
  const lines: string[] = [];
  if (!diag.converged)
    lines.push(
      'warning: the root search did not converge for every root; the roots listed are approximations.',
    );
  const unsure = uncertainRoots(diag);
  if (unsure.length > 0) {
    const shown = unsure
      .slice(0, 4)
      .map(({ kind, root }) => `${kind} ${fmtRoot(root)} (within ±${shortNumber(root.errorBound, 2)})`);
    const more = unsure.length > 4 ? `, and ${unsure.length - 4} more` : '';
    lines.push(
      `warning: the coefficients as typed are ill-conditioned: ${unsure.length} root${unsure.length > 1 ? 's are' : ' is'} uncertain: ${shown.join(', ')}${more}. ` +
        'Second-order sections or the roots themselves are the safe form to work in.',
    );
  }
  return lines;
}

const fmt = (x: number) => shortNumber(x, 10);
const fmtRoot = (r: { re: number; im: number; multiplicity: number }) =>
  `${fmt(r.re)}${r.im === 0 ? '' : `${r.im < 0 ? ' - ' : ' + '}${fmt(Math.abs(r.im))}j`}${r.multiplicity > 1 ? `  (×${r.multiplicity})` : ''}`;

/** The readable lines for the system itself: gain, zeros, poles, b, a and the sections. */
export function systemLines(out: ReturnType<typeof analysis>): string[] {
  return [
    `gain k: ${fmt(out.gain)}`,
    `zeros (${out.zeros.length}):`,
    ...out.zeros.map((r) => `  ${fmtRoot(r)}`),
    `poles (${out.poles.length}):`,
    ...out.poles.map((r) => `  ${fmtRoot(r)}`),
    `b: ${out.b.map(fmt).join(', ')}`,
    `a: ${out.a.map(fmt).join(', ')}`,
    'second-order sections [b0 b1 b2 a0 a1 a2]:',
    ...out.sections.map((s) => `  ${s.map(fmt).join('  ')}`),
  ];
}

/** Runs `analyze`; returns the exit code. */
export function runAnalyze(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, DESIGN_FLAGS, ['json']);
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const out = analysis(d);
  if (args.switches.has('json')) {
    io.stdout(toJson(out));
    return 0;
  }
  const lines: string[] = [];
  lines.push(`design: ${d.source}, sample rate ${fmt(d.sampleRate)} Hz`);
  lines.push(`stability: ${out.stability.verdict.toUpperCase()} — ${out.stability.reason}`);
  lines.push(`largest pole radius: ${fmt(out.stability.maxPoleRadius)}`);
  lines.push(...diagnosticLines(out.diagnostics));
  if (out.coefficientWarning) lines.push(`warning: ${out.coefficientWarning.message}.`);
  lines.push(...systemLines(out));
  lines.push('roots:');
  for (const r of out.readouts) {
    const parts = [`${r.kind} ${fmtRoot(r.root)}`, `${fmt(r.frequencyHz)} Hz`, `radius ${fmt(r.radius)}`];
    if (r.q !== undefined) parts.push(`Q ${fmt(r.q)}`);
    if (r.bandwidthHz !== undefined) parts.push(`bandwidth ${fmt(r.bandwidthHz)} Hz`);
    if (r.timeConstantSeconds !== undefined) parts.push(`tau ${fmt(r.timeConstantSeconds)} s`);
    if (r.decay40dBSeconds !== undefined) parts.push(`40 dB decay ${fmt(r.decay40dBSeconds)} s`);
    if (r.notchDepthDb !== undefined) parts.push(`notch ${formatDb(r.notchDepthDb, 10, ASCII)}`);
    lines.push(`  ${parts.join(', ')}`);
  }
  io.stdout(lines.join('\n') + '\n');
  return 0;
}
