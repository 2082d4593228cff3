/** Zod pieces shared by every schema version: finite numbers, roots, gain rules, plain text. */
import { z } from 'zod';
import { MAX_COEFFICIENTS, MAX_MULTIPLICITY, MAX_ORDER, MAX_SAMPLE_RATE } from '../../core/model/limits.ts';
import { designProblem } from '../../core/model/check.ts';
import type { Design } from '../../core/model/design.ts';

// In the page, zod would probe `new Function` to compile fast validators; the page's CSP forbids eval and
// the probe would log a violation. The interpreted path is fast enough for designs of bounded size. Node
// (command line, tests) has no CSP and keeps the compiled validators.
if (typeof document !== 'undefined') z.config({ jitless: true });

/** A finite number (JSON has no NaN or infinity, and a link could smuggle them in). */
export const finite = z.number().refine(Number.isFinite, 'must be a finite number');

/** Plain text of at most `max` characters; lone UTF-16 surrogates are refused so text survives UTF-8. */
export function plainText(max: number) {
  return z
    .string()
    .max(max, `must be at most ${max} characters`)
    .refine((s) => !/\p{Cs}/u.test(s), 'must be well-formed Unicode text (a lone surrogate was found)');
}

export const sampleRate = finite.refine(
  (v) => v > 0 && v <= MAX_SAMPLE_RATE,
  `must be a sample rate above 0 and at most ${MAX_SAMPLE_RATE} Hz`,
);

export const root = z.object({
  re: finite,
  im: finite.refine((v) => v >= 0, 'must be ≥ 0 (a complex root is stored once, above the real axis)'),
  multiplicity: z.number().int().min(1).max(MAX_MULTIPLICITY),
});

export const roots = z.array(root).max(MAX_ORDER);

export const gainRule = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('fixed'), value: finite }),
  z.object({ kind: z.literal('dc') }),
  z.object({ kind: z.literal('nyquist') }),
  z.object({ kind: z.literal('frequency'), hz: finite.refine((v) => v >= 0, 'must be ≥ 0') }),
  z.object({ kind: z.literal('peak') }),
]);

export const coefficients = z.array(finite).min(1).max(MAX_COEFFICIENTS);

/**
 * Runs the workbench's own door (core/model/check.ts) on a document that has the shape of a design, so a
 * file, link or saved session accepts exactly the designs the page and the command line may hold.
 */
export function checkDesignLimits(d: Design, ctx: z.RefinementCtx) {
  const p = designProblem(d);
  if (p) ctx.addIssue({ code: 'custom', path: p.path, message: `${p.message} (accepted: ${p.expected})` });
}
