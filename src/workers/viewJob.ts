/**
 * What the before/after plot draws for a stretch of the recording, at its pixel width: per pixel column the
 * smallest and largest sample (from the pyramids, so the cost is set by the columns, not the samples), or
 * the samples themselves when there are fewer than two per column. During a root drag it also gives a
 * preview of the new design's output: the visible stretch filtered from rest a few time constants of the
 * slowest pole before it, as far as a fixed budget of work reaches (PREVIEW_BUDGET); the rest of the view
 * keeps the last full output until the design is released and run through the whole recording.
 */
import {
  INT16_FULL_SCALE,
  PYRAMID_BASE,
  INT24_FULL_SCALE,
  INT32_FULL_SCALE,
  ScaledInt16Samples,
  ScaledInt24Samples,
  ScaledInt32Samples,
  columnExtremes,
  isScaledInt,
  createSectionFilter,
  runSectionFilter,
  samplesSlice,
  sliceScratch,
  type RecordingSamples,
} from '../core/signal/index.ts';
import type { Section } from '../core/types.ts';
import type { JobContext } from './jobs.ts';
import { outputStretch } from './outputJob.ts';
import { OUTPUT_KEY, recordingOf, type StoredOutput } from './recordingKeys.ts';

export const VIEW_JOB = 'view';
/** Sample·section products one preview may take (about 5–15 ms of a worker's time). */
export const PREVIEW_BUDGET = 1 << 22;
/** Time constants of the slowest pole the preview starts before the view (its start-up transient e^−7 ≈ 0.1 %). */
export const PREVIEW_SETTLE_TIME_CONSTANTS = 7;

/** One trace: per-column extremes, or the samples [i0, i0 + values.length) as they are. */
export type Trace =
  { kind: 'band'; min: Float32Array; max: Float32Array } | { kind: 'line'; values: Float32Array };

export interface ViewRequest {
  id: number;
  /** Samples [i0, i1) over `columns` columns; `line` asks for the samples themselves. */
  i0: number;
  i1: number;
  columns: number;
  line: boolean;
  /** During a drag: the design being dragged, for the preview. */
  preview: { version: number; sections: Section[] } | null;
  /**
   * What the page already holds for exactly this stretch and width (then it is not computed or sent again):
   * the input's trace, and the output of this design version.
   */
  have?: { input: boolean; outputVersion: number | null };
}

/** What the worker sends back: as ViewResult, without the parts the page said it had. */
export interface ViewAnswer {
  request: ViewResult['request'];
  /** Null when the page has it (have.input). */
  input: Trace | null;
  output: ViewResult['output'];
  /** True when the output is the one the page has (have.outputVersion); `output` is then null. */
  outputKept: boolean;
  preview: PreviewTrace | null;
}

export interface PreviewTrace {
  version: number;
  /** The same columns (or samples) as the view's, filled up to `columns` (or values.length). */
  trace: Trace;
  /** First sample past the live stretch; i1 when it covers the view. */
  liveEnd: number;
  /** Columns (band) or samples (line) of the live stretch. */
  filled: number;
  /** Samples filtered before the view to settle the filter; false when that is short of the settling time. */
  warmup: number;
  settled: boolean;
}

export interface ViewResult {
  request: Omit<ViewRequest, 'preview' | 'have'>;
  input: Trace;
  /** The last full output (of design `version`), or null before the first has run. */
  output: { version: number; trace: Trace } | null;
  preview: PreviewTrace | null;
}

/** Radius of the cascade's slowest pole (the largest |p|), from each section's denominator. */
export function slowestPoleRadius(sections: readonly Section[]): number {
  let r = 0;
  for (const [, , , a0, a1, a2] of sections) {
    const p = a1 / a0;
    const q = a2 / a0;
    const disc = p * p - 4 * q;
    const rs =
      disc < 0
        ? Math.sqrt(q)
        : Math.max(Math.abs((-p + Math.sqrt(disc)) / 2), Math.abs((-p - Math.sqrt(disc)) / 2));
    if (rs > r) r = rs;
  }
  return r;
}

/** Samples for the cascade's start-up transient to fall to e^−PREVIEW_SETTLE_TIME_CONSTANTS; Infinity if it never does. */
export function settlingSamples(sections: readonly Section[]): number {
  const r = slowestPoleRadius(sections);
  if (!(r < 1)) return Infinity;
  if (r === 0) return 2;
  return Math.ceil(PREVIEW_SETTLE_TIME_CONSTANTS / -Math.log(r)) + 2;
}

/**
 * The first `count` columns of the view's grid over [i0, i1) (column c covers [i0 + ⌊c·per⌋, i0 + ⌊(c+1)·per⌋),
 * as columnExtremes), read from values[i − offset]; the rest NaN.
 */
function bandOf(
  values: ArrayLike<number>,
  offset: number,
  i0: number,
  i1: number,
  columns: number,
  count = columns,
): Trace {
  const min = new Float32Array(columns).fill(NaN);
  const max = new Float32Array(columns).fill(NaN);
  const per = (i1 - i0) / columns;
  for (let c = 0; c < count; c++) {
    const a = i0 + Math.floor(c * per);
    const b = Math.max(a + 1, Math.min(i1, i0 + Math.floor((c + 1) * per)));
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = a - offset; i < b - offset; i++) {
      const v = values[i]!;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    min[c] = lo;
    max[c] = hi;
  }
  return { kind: 'band', min, max };
}

/** Samples [i0, upTo) read from values[i − offset]. */
function lineOf(values: ArrayLike<number>, offset: number, i0: number, upTo: number): Trace {
  const out = new Float32Array(Math.max(0, upTo - i0));
  for (let k = 0; k < out.length; k++) out[k] = values[i0 - offset + k]!;
  return { kind: 'line', values: out };
}

export async function viewJob(
  req: ViewRequest,
  ctx: JobContext,
): Promise<{ value: ViewAnswer; transfer: Transferable[] }> {
  const { samples: x, info } = recordingOf(ctx, req.id);
  const i0 = Math.max(0, Math.min(req.i0, info.length));
  const i1 = Math.max(i0, Math.min(req.i1, info.length));
  const columns = Math.max(1, req.columns);
  const line = req.line;
  const input: Trace | null = req.have?.input
    ? null
    : line
      ? { kind: 'line', values: Float32Array.from(x.subarray(i0, i1)) }
      : x instanceof ScaledInt16Samples
        ? { kind: 'band', ...columnExtremes(info.pyramid, i0, i1, columns, x.codes, 1 / INT16_FULL_SCALE) }
        : x instanceof ScaledInt24Samples
          ? {
              kind: 'band',
              ...columnExtremes(info.pyramid, i0, i1, columns, (i) => x.code(i), 1 / INT24_FULL_SCALE),
            }
          : x instanceof ScaledInt32Samples
            ? {
                kind: 'band',
                ...columnExtremes(info.pyramid, i0, i1, columns, x.codes, 1 / INT32_FULL_SCALE),
              }
            : { kind: 'band', ...columnExtremes(info.pyramid, i0, i1, columns, x) };
  const stored = ctx.get<StoredOutput>(OUTPUT_KEY);
  let output: ViewResult['output'] = null;
  const outputKept =
    stored !== undefined && stored.id === req.id && stored.version === req.have?.outputVersion;
  if (stored && stored.id === req.id && !outputKept) {
    const perColumn = (i1 - i0) / columns;
    let trace: Trace;
    if (!line && perColumn >= 2 * PYRAMID_BASE) {
      trace = { kind: 'band', ...columnExtremes(stored.pyramid, i0, i1, columns) };
    } else {
      const y = outputStretch(stored, x, i0, i1);
      trace = line ? lineOf(y, i0, i0, i1) : bandOf(y, i0, i0, i1, columns);
    }
    output = { version: stored.version, trace };
  }
  const preview = req.preview ? previewOf(req.preview, x, i0, i1, columns, line) : null;
  const result: ViewAnswer = {
    request: { id: req.id, i0, i1, columns, line },
    input,
    output,
    outputKept,
    preview,
  };
  return { value: result, transfer: buffersOf(result) };
}

/**
 * The preview's filtered samples, reused from one pointer move to the next: a fresh array per move (up to
 * PREVIEW_BUDGET samples, 32 MB at one section) left hundreds of MB of garbage in the worker during a drag,
 * which V8 collected late.
 */
let previewScratch = new Float64Array(0);
/**
 * The preview's input, converted from integer codes (a recording kept so), reused likewise (float64 for
 * 32-bit codes, float32 for the others: see sliceScratch).
 */
let previewInput: Float32Array | Float64Array = new Float32Array(0);

function previewOf(
  p: { version: number; sections: Section[] },
  x: RecordingSamples,
  i0: number,
  i1: number,
  columns: number,
  line: boolean,
): PreviewTrace {
  const reach = Math.floor(PREVIEW_BUDGET / Math.max(1, p.sections.length));
  const settle = settlingSamples(p.sections);
  const warmup = Math.min(i0, settle, Math.floor(reach / 2));
  const start = i0 - warmup;
  const liveEnd = Math.min(i1, start + reach);
  if (previewScratch.length < liveEnd - start) previewScratch = new Float64Array(liveEnd - start);
  if (
    isScaledInt(x) &&
    (previewInput.length < liveEnd - start ||
      previewInput instanceof Float64Array !== x instanceof ScaledInt32Samples)
  ) {
    previewInput = sliceScratch(x, liveEnd - start);
  }
  const y = runSectionFilter(
    createSectionFilter(p.sections),
    samplesSlice(x, start, liveEnd, previewInput),
    previewScratch.subarray(0, liveEnd - start),
  );
  const per = (i1 - i0) / columns;
  // Only whole columns are live: a column needs all its samples for its extremes.
  const filled = line
    ? liveEnd - i0
    : liveEnd === i1
      ? columns
      : Math.max(0, Math.floor((liveEnd - i0) / per) - 1);
  const trace = line ? lineOf(y, start, i0, liveEnd) : bandOf(y, start, i0, i1, columns, filled);
  return { version: p.version, trace, liveEnd, filled, warmup, settled: start === 0 || warmup >= settle };
}

function buffersOf(r: ViewAnswer): Transferable[] {
  const out: Transferable[] = [];
  const add = (t: Trace) => {
    if (t.kind === 'line') out.push(t.values.buffer);
    else out.push(t.min.buffer, t.max.buffer);
  };
  if (r.input) add(r.input);
  if (r.output) add(r.output.trace);
  if (r.preview) add(r.preview.trace);
  return out;
}
