/** Small timing helpers for the benchmarks: medians of repeated runs, read with performance.now(). */
import { readFileSync } from 'node:fs';

/** Median of a list of numbers. */
export function median(xs: number[]): number {
  const s = xs.slice().sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** Percentile p (0..100) of a list, by nearest rank. */
export function percentile(xs: number[], p: number): number {
  const s = xs.slice().sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))]!;
}

/** Median milliseconds per call of fn, over enough repeats to last about `budgetMs`. */
export function timeMs(fn: () => void, budgetMs = 200, minRuns = 5): number {
  fn(); // warm up
  const times: number[] = [];
  const start = performance.now();
  while (times.length < minRuns || performance.now() - start < budgetMs) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
    if (times.length > 10_000) break;
  }
  return median(times);
}

/** A number for a table cell, 3 significant digits. */
export function cell(x: number): string {
  return Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x);
}

/**
 * Processor time of the calling thread so far, in ms (Linux: the first field of /proc/thread-self/schedstat,
 * nanoseconds on the processor). Unlike process.cpuUsage() it leaves out V8's garbage-collector and compiler
 * helper threads, which on an idle machine run beside the work on another core rather than adding to its wall
 * time; python's time.thread_time() is the same measure for the process on the other side of a comparison.
 * NaN where the file does not exist (not Linux).
 */
export function threadCpuMs(): number {
  try {
    return Number(readFileSync('/proc/thread-self/schedstat', 'utf8').split(' ')[0]) / 1e6;
  } catch {
    return NaN;
  }
}
