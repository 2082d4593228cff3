/**
 * Polewright design files: JSON in our own versioned shape, validated on the way in (zod). Version 1:
 *   { "polewright": "design", "version": 1, "name", "note", "sampleRate",
 *     "zeros": [{re, im, multiplicity}], "poles": [...], "gainRule": {...}, "typed"?: {b, a, text} }
 * Complex roots are stored once with im > 0 (the conjugate is implied), real roots with im = 0.
 */
import { z } from 'zod';
import type { Design } from '../store/design.ts';

/** Largest system order a file may describe (zeros or poles, counting conjugates and multiplicity). */
export const MAX_FILE_ORDER = 1024;
/** Largest file accepted, in characters. */
export const MAX_FILE_CHARS = 2_000_000;

const finite = z.number().refine(Number.isFinite, 'must be a finite number');
const root = z.object({
  re: finite,
  im: finite.refine((v) => v >= 0, 'must be ≥ 0 (a complex root is stored once, above the real axis)'),
  multiplicity: z.number().int().min(1).max(64),
});
const gainRule = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('fixed'), value: finite }),
  z.object({ kind: z.literal('dc') }),
  z.object({ kind: z.literal('nyquist') }),
  z.object({ kind: z.literal('frequency'), hz: finite.refine((v) => v >= 0, 'must be ≥ 0') }),
  z.object({ kind: z.literal('peak') }),
]);
const coefficients = z.array(finite).min(1).max(MAX_FILE_ORDER + 1);

export const designFileV1 = z.object({
  polewright: z.literal('design'),
  version: z.literal(1),
  name: z.string().max(200).default(''),
  note: z.string().max(20_000).default(''),
  sampleRate: finite.refine((v) => v > 0 && v <= 1e9, 'must be between 0 and 1e9 Hz'),
  zeros: z.array(root).max(MAX_FILE_ORDER),
  poles: z.array(root).max(MAX_FILE_ORDER),
  gainRule,
  typed: z.object({ b: coefficients, a: coefficients, text: z.string().max(20_000) }).optional(),
});

/** Order of a stored root list: conjugates and multiplicities counted. */
function order(roots: { im: number; multiplicity: number }[]): number {
  return roots.reduce((n, r) => n + r.multiplicity * (r.im > 0 ? 2 : 1), 0);
}

/** Reads a design file's text; on failure says which field was wrong and what is accepted. */
export function readDesignFile(text: string): { ok: true; design: Design } | { ok: false; message: string } {
  if (text.length > MAX_FILE_CHARS) {
    return { ok: false, message: `The file is ${text.length} characters; at most ${MAX_FILE_CHARS} are accepted.` };
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return { ok: false, message: `The file is not valid JSON: ${(e as Error).message}` };
  }
  const parsed = designFileV1.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue && issue.path.length ? issue.path.join('.') : 'the file';
    return { ok: false, message: `Not a Polewright design (version 1): ${where}: ${issue?.message ?? 'invalid'}` };
  }
  const d = parsed.data;
  for (const kind of ['zeros', 'poles'] as const) {
    if (order(d[kind]) > MAX_FILE_ORDER) {
      return { ok: false, message: `${kind}: order ${order(d[kind])} exceeds the limit of ${MAX_FILE_ORDER}.` };
    }
  }
  const design: Design = {
    sampleRate: d.sampleRate,
    zeros: d.zeros,
    poles: d.poles,
    gainRule: d.gainRule,
    name: d.name,
    note: d.note,
    ...(d.typed ? { typed: d.typed } : {}),
  };
  return { ok: true, design };
}

/** Writes a design as version-1 file text (numbers round-trip exactly). */
export function writeDesignFile(design: Design): string {
  const out = {
    polewright: 'design',
    version: 1,
    name: design.name,
    note: design.note,
    sampleRate: design.sampleRate,
    zeros: design.zeros,
    poles: design.poles,
    gainRule: design.gainRule,
    ...(design.typed ? { typed: design.typed } : {}),
  };
  return JSON.stringify(out, null, 2) + '\n';
}
